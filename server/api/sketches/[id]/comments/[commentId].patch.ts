import { CommentParams, CommentUpdateBody } from '../../../../../shared/team/review'

/** Resolves or reopens a comment thread (comment access). Replies follow their thread: resolve the first comment. */
export default defineEventHandler(async (event) => {
  const { id, commentId } = await paramsAs(event, CommentParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'comment')
  const body = await readBodyAs(event, CommentUpdateBody)
  const db = await useDb()
  const comment = await db.Comment.findOne({ where: { id: commentId, sketchId: sketch.id } })
  if (!comment) throw createError({ statusCode: 404, message: 'Comment not found' })
  if (comment.parentId) throw createError({ statusCode: 409, message: 'This is a reply: resolve or reopen its thread (the first comment).' })
  if (comment.resolved !== body.resolved) {
    await comment.update(body.resolved ? { resolved: true, resolvedBy: user.id, resolvedAt: new Date() } : { resolved: false, resolvedBy: null, resolvedAt: null })
    await recordActivity(sketch.id, user.id, body.resolved ? 'resolved' : 'reopened', comment.body.slice(0, 120))
  }
  return commentJson(comment, await peopleById([comment.authorId, comment.resolvedBy]))
})

import { IdParams } from '../../../../../shared/auth/schemas'
import { CommentBody } from '../../../../../shared/team/review'

/**
 * Adds a comment (comment access): pinned at `at` (section coordinates, mm), on the sketch as a
 * whole (no `at`), or a reply to a thread (`parentId`; a reply sits in its thread, not at a point).
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'comment')
  const body = await readBodyAs(event, CommentBody)
  const db = await useDb()
  if (body.parentId) {
    const parent = await db.Comment.findOne({ where: { id: body.parentId, sketchId: sketch.id } })
    if (!parent) throw createError({ statusCode: 400, message: 'parentId names no comment of this sketch.' })
    if (parent.parentId) throw createError({ statusCode: 400, message: 'Reply to the thread’s first comment: replies are not nested.' })
    if (body.at) throw createError({ statusCode: 400, message: 'A reply sits in its thread: leave out at.' })
  }
  const comment = await db.Comment.create({
    sketchId: sketch.id,
    parentId: body.parentId ?? null,
    authorId: user.id,
    body: body.body,
    x: body.at?.x ?? null,
    y: body.at?.y ?? null,
  })
  await recordActivity(sketch.id, user.id, 'comment', body.body.slice(0, 120))
  setResponseStatus(event, 201)
  return commentJson(comment, await peopleById([user.id]))
})

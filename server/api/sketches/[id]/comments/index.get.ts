import { IdParams } from '../../../../../shared/auth/schemas'

/** The comments of a sketch, oldest first; replies carry their thread's `parentId`. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const db = await useDb()
  const comments = await db.Comment.findAll({ where: { sketchId: sketch.id }, order: [['createdAt', 'ASC'], ['id', 'ASC']] })
  const people = await peopleById(comments.flatMap(c => [c.authorId, c.resolvedBy]))
  return { comments: comments.map(c => commentJson(c, people)) }
})

import { IdParams } from '../../../../shared/auth/schemas'

/** Undoes a delete. */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, 'editSketches')
  const { id } = await paramsAs(event, IdParams)
  const sketch = await findOwnSketch(event, user, id, { deleted: true })
  await sketch.update({ deletedAt: null }, { silent: true })
  return sketchJson(sketch, false)
})

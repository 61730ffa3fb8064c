import { IdParams } from '../../../../shared/auth/schemas'

/** Undoes a delete (the owner, while the sketch is in the bin). */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'manage', { deleted: true })
  await sketch.update({ deletedAt: null }, { silent: true })
  return sketchJson(sketch, false)
})

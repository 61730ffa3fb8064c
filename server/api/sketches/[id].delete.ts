import { IdParams } from '../../../shared/auth/schemas'

/** Moves one of my sketches to the bin (owner or admin); `POST /api/sketches/:id/restore` brings it back. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'manage')
  await sketch.update({ deletedAt: new Date() }, { silent: true })
  return { ok: true, id: sketch.id }
})

import { IdParams } from '../../../shared/auth/schemas'

/** Moves one of my sketches to the bin; `POST /api/sketches/:id/restore` brings it back. */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, 'editSketches')
  const { id } = await paramsAs(event, IdParams)
  const sketch = await findOwnSketch(event, user, id)
  await sketch.update({ deletedAt: new Date() }, { silent: true })
  return { ok: true, id: sketch.id }
})

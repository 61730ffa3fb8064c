import { IdParams } from '../../../../shared/auth/schemas'

/** Who did what to this sketch and when, newest first (at most 200 lines). */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const db = await useDb()
  const rows = await db.Activity.findAll({ where: { sketchId: sketch.id }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 200 })
  const people = await peopleById(rows.map(r => r.actorId))
  return { activity: rows.map(r => ({ id: r.id, action: r.action, detail: r.detail, actor: people.get(r.actorId ?? '')?.name ?? null, createdAt: r.createdAt.toISOString() })) }
})

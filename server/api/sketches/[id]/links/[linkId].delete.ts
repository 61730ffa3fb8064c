import { LinkParams } from '../../../../../shared/team/access'

/** Revokes a read-only link (owner or admin): from now on it answers 404. */
export default defineEventHandler(async (event) => {
  const { id, linkId } = await paramsAs(event, LinkParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'manage')
  const db = await useDb()
  const link = await db.Link.findOne({ where: { id: linkId, sketchId: sketch.id } })
  if (!link) throw createError({ statusCode: 404, message: 'Link not found' })
  if (!link.revokedAt) {
    await link.update({ revokedAt: new Date() })
    await recordActivity(sketch.id, user.id, 'link revoked', `revision ${link.revision}`)
  }
  return { ok: true, id: link.id }
})

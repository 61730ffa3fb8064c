import { ShareParams } from '../../../../../shared/team/access'

/** Stops sharing with one address (owner or admin); the sketch is then 404 for them. */
export default defineEventHandler(async (event) => {
  const { id, shareId } = await paramsAs(event, ShareParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'manage')
  const db = await useDb()
  const share = await db.Share.findOne({ where: { id: shareId, sketchId: sketch.id } })
  if (!share) throw createError({ statusCode: 404, message: 'Share not found' })
  await share.destroy()
  await recordActivity(sketch.id, user.id, 'unshared', share.email)
  return { ok: true, id: share.id }
})

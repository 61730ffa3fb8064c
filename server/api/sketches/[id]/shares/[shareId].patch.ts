import { ShareParams, ShareUpdateBody } from '../../../../../shared/team/access'

/** Changes what a share grants (owner or admin). */
export default defineEventHandler(async (event) => {
  const { id, shareId } = await paramsAs(event, ShareParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'manage')
  const body = await readBodyAs(event, ShareUpdateBody)
  const db = await useDb()
  const share = await db.Share.findOne({ where: { id: shareId, sketchId: sketch.id } })
  if (!share) throw createError({ statusCode: 404, message: 'Share not found' })
  await share.update({ access: body.access })
  await recordActivity(sketch.id, user.id, 'shared', `${share.email}: now ${body.access}`)
  return { id: share.id, email: share.email, access: share.access }
})

import { IdParams } from '../../../../../shared/auth/schemas'
import { cappedAccess, ShareBody } from '../../../../../shared/team/access'

/**
 * Shares the sketch with an e-mail (owner or admin). An existing account gets a notice; an
 * address without an account gets an invitation, and the share applies when it registers.
 * Sharing again with the same address changes the access. 201 `{id, email, access}`.
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'manage')
  const body = await readBodyAs(event, ShareBody)
  const db = await useDb()
  const owner = sketch.ownerId === user.id ? user : await db.User.findByPk(sketch.ownerId)
  if (owner && owner.email === body.email) throw createError({ statusCode: 409, message: 'This is the owner’s own address: the owner has every access already.' })
  const [share, created] = await db.Share.findOrCreate({ where: { sketchId: sketch.id, email: body.email }, defaults: { sketchId: sketch.id, email: body.email, access: body.access, createdBy: user.id } })
  if (!created) await share.update({ access: body.access })
  const account = await db.User.findOne({ where: { email: body.email } })
  await recordActivity(sketch.id, user.id, 'shared', `${body.email}: ${body.access}${account ? '' : ' (invited)'}`)
  if (account) {
    const effective = cappedAccess(body.access, account.role)
    await mailAboutSketch(event, 'share', account.email, sketch, `${user.name} shared “${sketch.title}” with you`, [
      `You ${effective === 'edit' ? 'can edit' : effective === 'comment' ? 'can read and comment on' : 'can read'} “${sketch.title}”${sketch.project ? ` (${sketch.project})` : ''}.`,
    ])
  } else {
    await sendInvitation(event, body.email, user, `${user.name} shared the sketch “${sketch.title}” with you (${body.access} access). It is waiting in your account once you register.`)
  }
  setResponseStatus(event, created ? 201 : 200)
  return { id: share.id, email: share.email, access: share.access, invited: !account }
})

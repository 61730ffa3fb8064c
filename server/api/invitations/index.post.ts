import { InvitationBody } from '../../../shared/team/settings'

/** Invites a person to register (admin only): a mail with a single-use link for 14 days. */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, 'manageMembers')
  const { email } = await readBodyAs(event, InvitationBody)
  const db = await useDb()
  if (await db.User.findOne({ where: { email } })) throw createError({ statusCode: 409, message: 'An account with this e-mail exists already.' })
  await sendInvitation(event, email, user, `${user.name} invites you to work in this Kernwise workspace.`)
  setResponseStatus(event, 201)
  return { ok: true, email }
})

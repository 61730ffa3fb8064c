import { RegisterBody } from '../../../shared/auth/schemas'

/**
 * Creates an account and signs it in (10 an address in 10 minutes). The first account of an
 * empty workspace is its admin. When registration is by invitation only, the body must carry the
 * token of a live invitation to this address. Shares made to the address apply at once.
 */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, RegisterBody)
  await assertRegistrationAllowed(event, clientAddress(event))
  const db = await useDb()
  const invitation = await liveInvitation(body.email, body.invitation)
  if (body.invitation && !invitation) {
    throw createError({ statusCode: 403, message: 'This invitation does not work: it expired, was used, or was made for another address. Ask for a new one.' })
  }
  if (!invitation && (await db.User.count()) > 0 && (await registrationMode()) === 'invitation') {
    throw createError({ statusCode: 403, message: 'This workspace registers people by invitation only. Ask an admin (or a colleague who shares a sketch with you) for an invitation.' })
  }
  const passwordHash = await hashPassword(body.password)
  const user = await db.sequelize.transaction(async (transaction) => {
    const existing = await db.User.findOne({ where: { email: body.email }, transaction })
    if (existing) {
      throw createError({ statusCode: 409, message: 'An account with this e-mail already exists. Sign in instead, or use another address.' })
    }
    const count = await db.User.count({ transaction })
    if (invitation) await db.Invitation.update({ acceptedAt: new Date() }, { where: { email: body.email, acceptedAt: null }, transaction })
    return db.User.create(
      { email: body.email, name: body.name, passwordHash, role: count === 0 ? 'admin' : 'engineer' },
      { transaction },
    )
  })
  setResponseStatus(event, 201)
  return { user: await signIn(event, user) }
})

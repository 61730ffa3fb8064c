import { RegisterBody } from '../../../shared/auth/schemas'

/** Creates an account and signs it in (10 an address in 10 minutes). The first account of an empty workspace is its admin. */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, RegisterBody)
  await assertRegistrationAllowed(event, clientAddress(event))
  const db = await useDb()
  const passwordHash = await hashPassword(body.password)
  const user = await db.sequelize.transaction(async (transaction) => {
    const existing = await db.User.findOne({ where: { email: body.email }, transaction })
    if (existing) {
      throw createError({ statusCode: 409, message: 'An account with this e-mail already exists. Sign in instead, or use another address.' })
    }
    const count = await db.User.count({ transaction })
    return db.User.create(
      { email: body.email, name: body.name, passwordHash, role: count === 0 ? 'admin' : 'engineer' },
      { transaction },
    )
  })
  setResponseStatus(event, 201)
  return { user: await signIn(event, user) }
})

import { LoginBody } from '../../../shared/auth/schemas'

const WRONG = 'That e-mail and password do not match an account.'

/** Signs in with e-mail and password; throttled per e-mail and per address. */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, LoginBody)
  const ip = clientAddress(event)
  await assertNotThrottled(event, body.email, ip)
  const db = await useDb()
  const user = await db.User.findOne({ where: { email: body.email } })
  const ok = user ? await verifyPassword(user.passwordHash, body.password) : false
  if (!user || !ok) {
    await recordFailure(body.email, ip)
    throw createError({ statusCode: 401, message: WRONG })
  }
  await clearFailures(body.email)
  return { user: await signIn(event, user) }
})

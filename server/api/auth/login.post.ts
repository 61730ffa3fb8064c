import { LoginBody } from '../../../shared/auth/schemas'

const WRONG = 'That e-mail and password do not match an account.'

/**
 * Signs in with e-mail and password. The attempt is counted before the password is checked
 * (per e-mail and address, see server/utils/throttle.ts); an unknown e-mail costs one hash check too.
 */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, LoginBody)
  const ip = clientAddress(event)
  const attempt = await beginAttempt(event, body.email, ip)
  const db = await useDb()
  const user = await db.User.findOne({ where: { email: body.email } })
  const ok = await checkPassword(user?.passwordHash ?? null, body.password, verifyPassword, hashPassword)
  if (!user || !ok) {
    await attemptFailed()
    throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: WRONG })
  }
  await attemptSucceeded(attempt, body.email, ip)
  return { user: await signIn(event, user) }
})

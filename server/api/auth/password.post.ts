import { PasswordChangeBody } from '../../../shared/auth/schemas'

/**
 * Changes my password (browser session only). The current password is checked like a sign-in
 * (and counted against the same limits); every other session of mine ends, this one stays.
 */
export default defineEventHandler(async (event) => {
  const user = await requireBrowserSession(event, 'Changing the password')
  const body = await readBodyAs(event, PasswordChangeBody)
  const ip = clientAddress(event)
  const attempt = await beginAttempt(event, user.email, ip)
  if (!(await checkPassword(user.passwordHash, body.currentPassword, verifyPassword, hashPassword))) {
    await attemptFailed()
    throw createError({ statusCode: 400, message: 'The current password is not right; the password was not changed.' })
  }
  await attemptSucceeded(attempt, user.email, ip)
  const db = await useDb()
  await db.User.update({ passwordHash: await hashPassword(body.newPassword) }, { where: { id: user.id } })
  const ended = await endSessionsOf(user.id, event.context.kwSessionId as string)
  return { ok: true, endedSessions: ended }
})

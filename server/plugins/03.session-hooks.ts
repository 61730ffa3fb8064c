/**
 * nuxt-auth-utils' own session routes follow the session records too: GET /api/_auth/session
 * (what pages use to know who is signed in) answers 401 and clears the cookie once the record has
 * ended, and DELETE /api/_auth/session ends the record as well as the cookie.
 */
export default defineNitroPlugin(() => {
  sessionHooks.hook('fetch', async (_session, event) => {
    try {
      await requireUser(event)
    } catch {
      await clearUserSession(event, cookieConfig(event))
      throw createError({ statusCode: 401, statusMessage: 'Unauthorized', message: 'This session has ended. Sign in again.' })
    }
  })
  sessionHooks.hook('clear', async (data) => {
    const id = (data as { sessionId?: unknown }).sessionId
    if (typeof id === 'string') await endSession(id)
  })
})

/** Ends the session (a no-op when nobody is signed in). */
export default defineEventHandler(async (event) => {
  await clearUserSession(event)
  return { ok: true }
})

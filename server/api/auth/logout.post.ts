/** Ends the session (a no-op when nobody is signed in). */
export default defineEventHandler(async (event) => {
  await signOut(event)
  return { ok: true }
})

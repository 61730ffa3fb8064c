/** The signed-in account, re-read from the database; a cookie session is refreshed to match. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const pub = user.toPublic()
  if (!getHeader(event, 'authorization')) {
    const session = await getUserSession(event)
    if (session.user?.role !== pub.role || session.user?.name !== pub.name) await setUserSession(event, { user: pub }, cookieConfig(event))
  }
  return { user: pub }
})

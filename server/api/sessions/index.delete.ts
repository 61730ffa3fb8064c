/** Signs me out everywhere else: ends every session of mine but this one (a token ends them all). */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const ended = await endSessionsOf(user.id, event.context.kwSessionId as string | undefined)
  return { ended }
})

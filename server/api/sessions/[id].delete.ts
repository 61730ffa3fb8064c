import { IdParams } from '../../../shared/auth/schemas'

/** Ends one of my sessions; ending this one signs this browser out. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const { id } = await paramsAs(event, IdParams)
  const db = await useDb()
  if (id === event.context.kwSessionId) {
    await signOut(event)
    return { ok: true, current: true }
  }
  const ended = await db.Session.destroy({ where: { id, userId: user.id } })
  if (!ended) throw createError({ statusCode: 404, message: 'Session not found (it may have ended already).' })
  return { ok: true, current: false }
})

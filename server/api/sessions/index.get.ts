/** My signed-in browsers, newest first; `current` marks this one. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const db = await useDb()
  const rows = await db.Session.findAll({ where: { userId: user.id }, order: [['createdAt', 'DESC']], limit: 100 })
  const now = Date.now()
  return { sessions: rows.filter(r => r.expiresAt.getTime() > now).map(r => r.toPublic(event.context.kwSessionId)) }
})

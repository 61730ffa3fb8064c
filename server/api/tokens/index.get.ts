/** My tokens (never their text). */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const db = await useDb()
  const rows = await db.ApiToken.findAll({ where: { userId: user.id }, order: [['createdAt', 'DESC']] })
  return { tokens: rows.map(r => r.toPublic()) }
})

/** Every account of the workspace (admin only). */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  const db = await useDb()
  const users = await db.User.findAll({ order: [['createdAt', 'ASC']] })
  return { members: users.map(u => u.toPublic()) }
})

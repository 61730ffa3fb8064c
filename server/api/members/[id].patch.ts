import { IdParams, RoleBody } from '../../../shared/auth/schemas'

/** Changes a member's role (admin only); the last admin cannot be demoted. */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  const { id } = await paramsAs(event, IdParams)
  const { role } = await readBodyAs(event, RoleBody)
  const db = await useDb()
  const member = await db.User.findByPk(id)
  if (!member) throw createError({ statusCode: 404, message: 'Member not found' })
  if (member.role === 'admin' && role !== 'admin') {
    const admins = await db.User.count({ where: { role: 'admin' } })
    if (admins <= 1) throw createError({ statusCode: 409, message: 'This is the only admin. Make another member admin first.' })
  }
  await member.update({ role })
  return { member: member.toPublic() }
})

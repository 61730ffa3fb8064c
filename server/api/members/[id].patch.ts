import { countAndWrite } from '../../database/connection'
import { IdParams, RoleBody } from '../../../shared/auth/schemas'

/**
 * Changes a member's role (admin only); the last admin cannot be demoted. The admin count and
 * the change run in one transaction that holds the write lock (SQLite: BEGIN IMMEDIATE; other
 * databases: the admins' rows locked FOR UPDATE), so two admins demoting themselves at once
 * cannot both succeed.
 */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  const { id } = await paramsAs(event, IdParams)
  const { role } = await readBodyAs(event, RoleBody)
  const db = await useDb()
  const { options, lock } = countAndWrite(db.sequelize)
  const member = await db.sequelize.transaction(options, async (transaction) => {
    const found = await db.User.findByPk(id, { transaction, lock })
    if (!found) throw createError({ statusCode: 404, message: 'Member not found' })
    if (found.role === 'admin' && role !== 'admin') {
      const admins = await db.User.findAll({ where: { role: 'admin' }, attributes: ['id'], transaction, lock })
      if (admins.length <= 1) throw createError({ statusCode: 409, message: 'This is the only admin. Make another member admin first.' })
    }
    await found.update({ role }, { transaction })
    return found
  })
  return { member: member.toPublic() }
})

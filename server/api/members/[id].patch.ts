import { Transaction } from 'sequelize'
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
  const sqlite = db.sequelize.getDialect() === 'sqlite'
  const member = await db.sequelize.transaction(sqlite ? { type: Transaction.TYPES.IMMEDIATE } : {}, async (transaction) => {
    const found = await db.User.findByPk(id, { transaction, lock: !sqlite })
    if (!found) throw createError({ statusCode: 404, message: 'Member not found' })
    if (found.role === 'admin' && role !== 'admin') {
      const admins = await db.User.findAll({ where: { role: 'admin' }, attributes: ['id'], transaction, lock: !sqlite })
      if (admins.length <= 1) throw createError({ statusCode: 409, message: 'This is the only admin. Make another member admin first.' })
    }
    await found.update({ role }, { transaction })
    return found
  })
  return { member: member.toPublic() }
})

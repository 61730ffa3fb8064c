import { IdParams } from '../../../../shared/auth/schemas'

/** Signs a member out everywhere (admin only): every session of theirs ends; API tokens stay. */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  const { id } = await paramsAs(event, IdParams)
  const db = await useDb()
  const member = await db.User.findByPk(id)
  if (!member) throw createError({ statusCode: 404, message: 'Member not found' })
  const ended = await endSessionsOf(member.id)
  return { ended }
})

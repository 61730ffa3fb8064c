import { IdParams } from '../../../shared/auth/schemas'

/** Revokes one of my tokens; requests carrying it get 401 from now on. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const { id } = await paramsAs(event, IdParams)
  const db = await useDb()
  const removed = await db.ApiToken.destroy({ where: { id, userId: user.id } })
  if (!removed) throw createError({ statusCode: 404, message: 'Token not found' })
  return { ok: true }
})

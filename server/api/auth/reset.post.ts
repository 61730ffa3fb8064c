import { Op } from 'sequelize'
import { ResetBody } from '../../../shared/auth/schemas'

/**
 * Sets a new password with a reset link's token: the token is used up in one statement (a second
 * use, or one after its hour, is 400), and every session of the account ends.
 */
export default defineEventHandler(async (event) => {
  const body = await readBodyAs(event, ResetBody)
  const db = await useDb()
  const tokenHash = hashToken(body.token)
  const reset = await db.PasswordReset.findOne({ where: { tokenHash } })
  const invalid = () => createError({ statusCode: 400, message: 'This reset link is not valid any more (used, expired, or mistyped). Ask for a new one.' })
  if (!reset) throw invalid()
  const [used] = await db.PasswordReset.update({ usedAt: new Date() }, { where: { id: reset.id, usedAt: { [Op.is]: null }, expiresAt: { [Op.gt]: new Date() } } })
  if (used !== 1) throw invalid()
  await db.User.update({ passwordHash: await hashPassword(body.password) }, { where: { id: reset.userId } })
  await endSessionsOf(reset.userId)
  return { ok: true }
})

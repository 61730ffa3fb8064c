import { randomBytes } from 'node:crypto'
import { Op } from 'sequelize'
import { ResetRequestBody } from '../../../shared/auth/schemas'

/** A reset link lives this long (ms). */
const RESET_TTL_MS = 60 * 60 * 1000
/** At most this many reset mails per account per hour (more are silently not sent). */
const RESETS_PER_HOUR = 3
const ANSWER = 'If an account has this e-mail, a reset link is on its way. It works once, for one hour.'

/**
 * Mails a single-use reset link (a 256-bit token; only its SHA-256 is stored) through the app's
 * mail path. The answer is the same whether or not the e-mail has an account.
 */
export default defineEventHandler(async (event) => {
  const { email } = await readBodyAs(event, ResetRequestBody)
  const db = await useDb()
  const user = await db.User.findOne({ where: { email } })
  if (user) {
    const recent = await db.PasswordReset.count({ where: { userId: user.id, createdAt: { [Op.gt]: new Date(Date.now() - RESET_TTL_MS) } } })
    if (recent < RESETS_PER_HOUR) {
      const token = randomBytes(32).toString('base64url')
      await db.PasswordReset.create({ userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(Date.now() + RESET_TTL_MS) })
      const link = `${requestOrigin(event)}/reset-password?token=${token}`
      await sendMail({
        kind: 'password-reset',
        to: user.email,
        subject: 'Reset your Kernwise password',
        text: `Someone (hopefully you) asked to reset the password of ${user.email} on Kernwise.\n\nOpen this link within one hour to choose a new password; it works once:\n${link}\n\nIf it was not you, ignore this mail: your password stays as it is.\n`,
      })
    }
  }
  return { ok: true, message: ANSWER }
})

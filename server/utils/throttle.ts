import type { H3Event } from 'h3'
import { Op } from 'sequelize'

/** Sign-in throttling: this many failures for one e-mail or one address... */
export const MAX_FAILURES = 5
/** ...within this window lock further attempts until the oldest failure leaves it. */
export const WINDOW_MS = 10 * 60 * 1000

/** The caller's address as the server sees it (no proxy headers are trusted). */
export function clientAddress(event: H3Event): string {
  return getRequestIP(event) ?? 'unknown'
}

/** Throws 429 with Retry-After when the e-mail or the address has used up its attempts. */
export async function assertNotThrottled(event: H3Event, email: string, ip: string): Promise<void> {
  const db = await useDb()
  const since = new Date(Date.now() - WINDOW_MS)
  for (const where of [{ email }, { ip }]) {
    const recent = await db.LoginFailure.findAll({
      where: { ...where, createdAt: { [Op.gt]: since } },
      order: [['createdAt', 'DESC']],
      limit: MAX_FAILURES,
      attributes: ['createdAt'],
    })
    if (recent.length >= MAX_FAILURES) {
      const oldest = recent[recent.length - 1]!.createdAt.getTime()
      const retryAfter = Math.max(1, Math.ceil((oldest + WINDOW_MS - Date.now()) / 1000))
      setResponseHeader(event, 'Retry-After', String(retryAfter))
      const minutes = Math.ceil(retryAfter / 60)
      throw createError({
        statusCode: 429,
        message: `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? '' : 's'} (${retryAfter} s).`,
        data: { retryAfter },
      })
    }
  }
}

/** Records one failed attempt and forgets failures older than the window. */
export async function recordFailure(email: string, ip: string): Promise<void> {
  const db = await useDb()
  await db.LoginFailure.create({ email, ip })
  await db.LoginFailure.destroy({ where: { createdAt: { [Op.lt]: new Date(Date.now() - WINDOW_MS) } } })
}

/** A successful sign-in clears that e-mail's failures. */
export async function clearFailures(email: string): Promise<void> {
  const db = await useDb()
  await db.LoginFailure.destroy({ where: { email } })
}

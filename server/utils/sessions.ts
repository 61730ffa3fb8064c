import type { H3Event } from 'h3'
import { Op } from 'sequelize'
import type { User } from '../models'

/** Session lifetime (s): runtime config session.maxAge, 7 days by default. */
export function sessionMaxAge(): number {
  return Number(useRuntimeConfig().session?.maxAge) || 60 * 60 * 24 * 7
}

/**
 * Cookie settings for this request: `Secure` only when the browser reached us over HTTPS
 * (directly or through a trusted proxy), so sign-in also works over plain HTTP on an office
 * network (the layout then shows a banner that the connection is not encrypted).
 */
export function cookieConfig(event: H3Event) {
  return { cookie: { secure: isHttps(event), httpOnly: true, sameSite: 'lax' as const, path: '/' } }
}

/** Starts a fresh session for `user`: a session record, and a sealed cookie that names it. */
export async function signIn(event: H3Event, user: User) {
  const db = await useDb()
  const now = new Date()
  const record = await db.Session.create({
    userId: user.id,
    userAgent: String(getHeader(event, 'user-agent') ?? '').slice(0, 200),
    ip: clientAddress(event),
    lastSeenAt: now,
    expiresAt: new Date(now.getTime() + sessionMaxAge() * 1000),
  })
  const pub = user.toPublic()
  await replaceUserSession(event, { user: pub, sessionId: record.id, loggedInAt: now.toISOString() }, cookieConfig(event))
  event.context.kwSessionId = record.id
  return pub
}

/** Ends one session record (the cookie that names it stops counting on its next request). */
export async function endSession(id: string): Promise<void> {
  const db = await useDb()
  await db.Session.destroy({ where: { id } })
}

/** Ends every session of an account, except `keepId` when given; returns how many ended. */
export async function endSessionsOf(userId: string, keepId?: string): Promise<number> {
  const db = await useDb()
  const where = keepId ? { userId, id: { [Op.ne]: keepId } } : { userId }
  return db.Session.destroy({ where })
}

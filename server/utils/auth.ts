import { createHash } from 'node:crypto'
import type { H3Event } from 'h3'
import { can, type Capability } from '../../shared/auth/roles'
import { cachedAccount, cachedSession, cachedSessionRecord, cachedToken, forgetSession, rememberSession, type SealedSession } from '../database/account-cache'
import type { User } from '../models'

/** SHA-256 hex of a personal API token: what the database keeps. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

/**
 * The account behind this request: a `Authorization: Bearer <token>` header first, else the
 * sealed session cookie. Accounts and tokens come from the database through a short-lived cache
 * that every write to them clears (server/database/account-cache.ts), so a role change or a
 * revoked token counts at once. 401 when nobody is signed in.
 */
export async function requireUser(event: H3Event): Promise<User> {
  const cached = event.context.kwUser as User | undefined
  if (cached) return cached
  const db = await useDb()
  const header = getHeader(event, 'authorization')
  let user: User | null = null
  if (header) {
    const match = /^Bearer\s+(\S+)\s*$/i.exec(header)
    if (!match) throw createError({ statusCode: 401, message: 'The Authorization header must be "Bearer <token>".' })
    const tokenHash = hashToken(match[1]!)
    const token = await cachedToken(tokenHash, async () => {
      const row = await db.ApiToken.findOne({ where: { tokenHash } })
      return row ? { id: row.id, userId: row.userId, lastUsedAt: row.lastUsedAt, expiresAt: row.expiresAt } : null
    })
    if (!token) throw createError({ statusCode: 401, message: 'This API token is not valid or has been revoked.' })
    if (token.expiresAt && token.expiresAt.getTime() <= Date.now()) {
      throw createError({ statusCode: 401, message: `This API token expired on ${token.expiresAt.toISOString().slice(0, 10)}. Make a new one on the Account page.` })
    }
    event.context.kwAuth = 'token'
    user = await cachedAccount(token.userId, () => db.User.findByPk(token.userId))
    const now = new Date()
    // Record use at most once a minute: a scripted client should not turn reads into writes.
    // (Without hooks: a use is not a change to the token, so the cache stays.)
    if (user && (!token.lastUsedAt || now.getTime() - token.lastUsedAt.getTime() > 60_000)) {
      token.lastUsedAt = now
      await db.ApiToken.update({ lastUsedAt: now }, { where: { id: token.id }, hooks: false })
    }
  } else {
    const session = await liveSession(event)
    if (session) {
      user = await cachedAccount(session.userId, () => db.User.findByPk(session.userId))
      event.context.kwAuth = 'session'
      event.context.kwSessionId = session.sessionId
    }
  }
  if (!user) throw createError({ statusCode: 401, message: 'Sign in first (or send a personal API token).' })
  event.context.kwUser = user
  return user
}

let sessionName: string | null = null

/** The sealed session of this request (cookie, or h3's session header), if any. */
function sealedSession(event: H3Event): string | undefined {
  // Read once: useRuntimeConfig(event) re-applies the environment on every call.
  sessionName ??= String(useRuntimeConfig().session?.name || 'nuxt-session')
  const name = sessionName
  const header = getHeader(event, `x-${name}-session`)
  return header || getCookie(event, name) || undefined
}

/**
 * The user and session ids in the request's sealed cookie. Unsealing costs more than the rest of
 * a small request, so what a given sealed cookie holds is remembered (see rememberSession).
 */
async function sealedContent(event: H3Event): Promise<SealedSession | null> {
  const sealed = sealedSession(event)
  if (!sealed) return null
  const known = cachedSession(sealed)
  if (known !== undefined) return known
  const session = await getUserSession(event)
  const userId = (session.user as { id?: string } | undefined)?.id
  const sessionId = (session as { sessionId?: unknown }).sessionId
  const content = userId && typeof sessionId === 'string' ? { userId, sessionId } : null
  rememberSession(sealed, content)
  return content
}

/**
 * The cookie's session if its record still exists, belongs to the same account and has not
 * expired. The record is read through the accounts cache: a sign-out, password change or "sign
 * out everywhere" through this server counts on the next request, from another server within
 * ACCOUNT_TTL_MS. Last use is written at most once a minute.
 */
async function liveSession(event: H3Event): Promise<SealedSession | null> {
  const content = await sealedContent(event)
  if (!content) return null
  const db = await useDb()
  const record = await cachedSessionRecord(content.sessionId, async () => {
    const row = await db.Session.findByPk(content.sessionId)
    return row ? { userId: row.userId, lastSeenAt: row.lastSeenAt, expiresAt: row.expiresAt } : null
  })
  const now = Date.now()
  if (!record || record.userId !== content.userId || record.expiresAt.getTime() <= now) return null
  if (now - record.lastSeenAt.getTime() > 60_000) {
    record.lastSeenAt = new Date(now)
    await db.Session.update({ lastSeenAt: record.lastSeenAt }, { where: { id: content.sessionId }, hooks: false })
  }
  return content
}

/** Ends this request's session: its record is deleted, the cookie cleared and its remembered content forgotten. */
export async function signOut(event: H3Event): Promise<void> {
  const content = await sealedContent(event)
  if (content) await endSession(content.sessionId)
  const sealed = sealedSession(event)
  if (sealed) forgetSession(sealed)
  await clearUserSession(event, cookieConfig(event))
}

/** The signed-in account, which must have signed in with a browser session (not an API token); 403 otherwise. */
export async function requireBrowserSession(event: H3Event, what: string): Promise<User> {
  const user = await requireUser(event)
  if (event.context.kwAuth !== 'session') {
    throw createError({ statusCode: 403, message: `${what} needs a signed-in browser session (the Account page), not an API token.` })
  }
  return user
}

/** The signed-in account, which must hold `capability`; 403 with a plain reason otherwise. */
export async function requireRole(event: H3Event, capability: Capability): Promise<User> {
  const user = await requireUser(event)
  if (!can(user.role, capability)) {
    throw createError({ statusCode: 403, message: `Your role (${user.role}) does not allow this. Ask an admin if you need it.` })
  }
  return user
}

import { createHash } from 'node:crypto'
import type { H3Event } from 'h3'
import { can, type Capability } from '../../shared/auth/roles'
import { cachedAccount, cachedSession, cachedToken, forgetSession, rememberSession } from '../database/account-cache'
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
      return row ? { id: row.id, userId: row.userId, lastUsedAt: row.lastUsedAt } : null
    })
    if (!token) throw createError({ statusCode: 401, message: 'This API token is not valid or has been revoked.' })
    user = await cachedAccount(token.userId, () => db.User.findByPk(token.userId))
    const now = new Date()
    // Record use at most once a minute: a scripted client should not turn reads into writes.
    // (Without hooks: a use is not a change to the token, so the cache stays.)
    if (user && (!token.lastUsedAt || now.getTime() - token.lastUsedAt.getTime() > 60_000)) {
      token.lastUsedAt = now
      await db.ApiToken.update({ lastUsedAt: now }, { where: { id: token.id }, hooks: false })
    }
  } else {
    const id = await sessionUserId(event)
    if (id) user = await cachedAccount(id, () => db.User.findByPk(id))
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
 * The user id in the request's session. Unsealing costs more than the rest of a small request,
 * so what a given sealed cookie holds is remembered (see rememberSession); no cookie, no session.
 */
async function sessionUserId(event: H3Event): Promise<string | null> {
  const sealed = sealedSession(event)
  if (!sealed) return null
  const known = cachedSession(sealed)
  if (known !== undefined) return known
  const session = await getUserSession(event)
  const id = (session.user as { id?: string } | undefined)?.id ?? null
  rememberSession(sealed, id)
  return id
}

/** Ends this request's session: the cookie is cleared and its remembered content forgotten. */
export async function signOut(event: H3Event): Promise<void> {
  const sealed = sealedSession(event)
  if (sealed) forgetSession(sealed)
  await clearUserSession(event)
}

/** The signed-in account, which must hold `capability`; 403 with a plain reason otherwise. */
export async function requireRole(event: H3Event, capability: Capability): Promise<User> {
  const user = await requireUser(event)
  if (!can(user.role, capability)) {
    throw createError({ statusCode: 403, message: `Your role (${user.role}) does not allow this. Ask an admin if you need it.` })
  }
  return user
}

import { createHash } from 'node:crypto'
import type { H3Event } from 'h3'
import { can, type Capability } from '../../shared/auth/roles'
import type { User } from '../models'

/** SHA-256 hex of a personal API token: what the database keeps. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex')
}

/**
 * The account behind this request: a `Authorization: Bearer <token>` header first, else the
 * sealed session cookie. The account is re-read from the database each time so that a role
 * change or a revoked token counts at once. 401 when nobody is signed in.
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
    const token = await db.ApiToken.findOne({ where: { tokenHash: hashToken(match[1]!) } })
    if (!token) throw createError({ statusCode: 401, message: 'This API token is not valid or has been revoked.' })
    user = await db.User.findByPk(token.userId)
    const now = new Date()
    // Record use at most once a minute: a scripted client should not turn reads into writes.
    if (user && (!token.lastUsedAt || now.getTime() - token.lastUsedAt.getTime() > 60_000)) {
      await token.update({ lastUsedAt: now })
    }
  } else {
    const session = await getUserSession(event)
    const id = (session.user as { id?: string } | undefined)?.id
    if (id) user = await db.User.findByPk(id)
  }
  if (!user) throw createError({ statusCode: 401, message: 'Sign in first (or send a personal API token).' })
  event.context.kwUser = user
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

import { z } from 'zod'
import { Email } from '../auth/schemas'
import type { Role } from '../auth/roles'

/** What a share grants, from least to most. */
export const SHARE_ACCESS = ['view', 'comment', 'edit'] as const
export type ShareAccess = (typeof SHARE_ACCESS)[number]

/**
 * What someone may do with one sketch, from least to most: `view` reads, `comment` also comments,
 * `edit` also saves, `manage` (the owner or an admin) also shares, links, submits and deletes.
 */
export const ACCESS_LEVELS = ['view', 'comment', 'edit', 'manage'] as const
export type AccessLevel = (typeof ACCESS_LEVELS)[number]

/** The most a share can grant an account of each role: a viewer only reads, a checker comments (and decides a review). */
export const ROLE_CAP: Record<Role, ShareAccess> = { admin: 'edit', engineer: 'edit', checker: 'comment', viewer: 'view' }

/** True when `have` allows what `need` asks. */
export function allows(have: AccessLevel | null | undefined, need: AccessLevel): boolean {
  return !!have && ACCESS_LEVELS.indexOf(have) >= ACCESS_LEVELS.indexOf(need)
}

/** The access a share of `access` gives an account of `role`: the lower of the two. */
export function cappedAccess(access: ShareAccess, role: Role): ShareAccess {
  const cap = ROLE_CAP[role]
  return SHARE_ACCESS.indexOf(access) <= SHARE_ACCESS.indexOf(cap) ? access : cap
}

/** What a person reads for each level. */
export const ACCESS_LABELS: Record<AccessLevel, string> = {
  view: 'can view',
  comment: 'can comment',
  edit: 'can edit',
  manage: 'owner',
}

const Access = z.enum(SHARE_ACCESS, { error: `Access must be one of: ${SHARE_ACCESS.join(', ')}` })

export const ShareBody = z.object({ email: Email, access: Access })
export const ShareUpdateBody = z.object({ access: Access })
export const ShareParams = z.object({
  id: z.uuid({ error: 'Sketch not found' }),
  shareId: z.uuid({ error: 'Share not found' }),
})

/** The longest a read-only link may live (days). */
export const MAX_LINK_DAYS = 366

export const LinkBody = z.object({
  /** When the link stops working (ISO date-time, in the future); absent or null: never. */
  expiresAt: z.iso.datetime({ offset: true, error: 'expiresAt must be a date and time such as 2027-01-31T17:00:00Z' }).nullish(),
  /** The revision it shows; absent: the latest revision. */
  revision: z.number({ error: 'revision must be a revision number' }).int('revision must be a whole number').min(1, 'Revisions are numbered from 1').optional(),
})
export const LinkParams = z.object({
  id: z.uuid({ error: 'Sketch not found' }),
  linkId: z.uuid({ error: 'Link not found' }),
})
/** A link token: 32 random bytes in base64url (256 bits). */
export const LinkTokenParams = z.object({
  token: z.string().regex(/^[A-Za-z0-9_-]{22,100}$/, 'Link not found'),
})

export const ListScope = z.enum(['mine', 'shared', 'review'], { error: 'scope must be mine, shared or review' })

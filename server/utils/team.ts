import { randomBytes } from 'node:crypto'
import type { H3Event } from 'h3'
import { Op } from 'sequelize'
import type { AccessLevel } from '../../shared/team/access'
import type { Revision, Sketch, User } from '../models'
import { teamMail } from './team-mail'

/** The name mails and the calculation sheet give the workspace when an admin has not named it. */
export const DEFAULT_WORKSPACE = 'Kernwise workspace'
/** An invitation to register lives this long (ms). */
export const INVITATION_TTL_MS = 14 * 86_400_000

/** A workspace setting (JSON under `key`), or `fallback` when it was never set. */
export async function readSetting<T>(key: string, fallback: T): Promise<T> {
  const db = await useDb()
  const row = await db.Setting.findByPk(key)
  if (!row) return fallback
  try {
    return JSON.parse(row.value) as T
  } catch {
    return fallback
  }
}

/** Writes a workspace setting. */
export async function writeSetting(key: string, value: unknown): Promise<void> {
  const db = await useDb()
  await db.Setting.upsert({ key, value: JSON.stringify(value) })
}

/** The workspace's name (settings page), as mails and the sheet show it. */
export function workspaceName(): Promise<string> {
  return readSetting('workspaceName', DEFAULT_WORKSPACE)
}

/** Keeps one line of a sketch's activity. Consecutive edits by one person within 15 minutes count as one. */
export async function recordActivity(sketchId: string, actorId: string | null, action: string, detail = ''): Promise<void> {
  const db = await useDb()
  if (action === 'edited') {
    const last = await db.Activity.findOne({ where: { sketchId }, order: [['createdAt', 'DESC']] })
    if (last && last.action === 'edited' && last.actorId === actorId && last.createdAt.getTime() > Date.now() - 15 * 60_000) return
  }
  await db.Activity.create({ sketchId, actorId, action, detail: detail.slice(0, 300) })
}

/** Name and e-mail of each account id given (missing ones left out). */
export async function peopleById(ids: (string | null | undefined)[]): Promise<Map<string, { id: string; name: string; email: string }>> {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))]
  const db = await useDb()
  const users = wanted.length ? await db.User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ['id', 'name', 'email'] }) : []
  return new Map(users.map(u => [u.id, { id: u.id, name: u.name, email: u.email }]))
}

/** The newest approved revision of a sketch, if any. */
export async function lastApproved(sketchId: string): Promise<Revision | null> {
  const db = await useDb()
  return db.Revision.findOne({ where: { sketchId, status: 'approved' }, order: [['number', 'DESC']] })
}

/**
 * The API face of one sketch for someone with `access`: its document, the owner's name, the
 * review (status, the checker, the revision under review) and, when approved, who approved it
 * and when. `approvedRevision` keeps the last approval after a later edit made it a draft again.
 */
export async function sketchDetail(sketch: Sketch, access: AccessLevel, user: User) {
  const approved = await lastApproved(sketch.id)
  const people = await peopleById([sketch.ownerId, sketch.checkerId, approved?.approvedBy])
  const approvedRevision = approved
    ? { number: approved.number, note: approved.note, approvedBy: people.get(approved.approvedBy!)?.name ?? 'a former member', approvedAt: approved.approvedAt!.toISOString() }
    : null
  return {
    ...sketchJson(sketch, true),
    access,
    owner: people.get(sketch.ownerId)?.name ?? '',
    checker: sketch.checkerId ? (people.get(sketch.checkerId) ?? null) : null,
    reviewRevision: sketch.reviewRevision,
    isChecker: !!sketch.checkerId && sketch.checkerId === user.id,
    approvedBy: sketch.status === 'approved' ? approvedRevision?.approvedBy ?? null : null,
    approvedAt: sketch.status === 'approved' ? approvedRevision?.approvedAt ?? null : null,
    approvedRevision,
  }
}

/**
 * Mails an invitation to register with `email` (a 256-bit single-use token, 14 days; only its
 * SHA-256 is kept). `why` says what waits for them, in the mail's words.
 */
export async function sendInvitation(event: H3Event, email: string, invitedBy: User, why: string): Promise<void> {
  const db = await useDb()
  const token = randomBytes(32).toString('base64url')
  await db.Invitation.create({ email, tokenHash: hashToken(token), invitedBy: invitedBy.id, expiresAt: new Date(Date.now() + INVITATION_TTL_MS) })
  const workspace = await workspaceName()
  const link = `${requestOrigin(event)}/register?invitation=${token}&email=${encodeURIComponent(email)}`
  await sendMail({
    kind: 'invitation',
    to: email,
    subject: `${invitedBy.name} invites you to ${workspace} on Kernwise`,
    ...teamMail({
      workspace,
      heading: `${invitedBy.name} invites you to ${workspace}`,
      paragraphs: [why, 'Create your account with this address; the invitation works for 14 days.'],
      link,
      linkLabel: 'Create your account',
    }),
  })
}

/** Mails a person about a sketch (shared, review request, outcome) with a link that opens it. */
export async function mailAboutSketch(event: H3Event, kind: string, to: string, sketch: Sketch, subject: string, paragraphs: string[]): Promise<void> {
  const workspace = await workspaceName()
  await sendMail({
    kind,
    to,
    subject: `${subject} (${workspace})`,
    ...teamMail({ workspace, heading: subject, paragraphs, link: `${requestOrigin(event)}/sketches/${sketch.id}`, linkLabel: `Open “${sketch.title}”` }),
  })
}

/** The next revision number of a sketch. */
export async function nextRevisionNumber(sketchId: string): Promise<number> {
  const db = await useDb()
  const max = await db.Revision.max('number', { where: { sketchId } })
  return (typeof max === 'number' ? max : 0) + 1
}

/** One revision of a sketch, or 404 naming the number. */
export async function findRevision(sketchId: string, number: number): Promise<Revision> {
  const db = await useDb()
  const revision = await db.Revision.findOne({ where: { sketchId, number } })
  if (!revision) throw createError({ statusCode: 404, message: `Revision ${number} does not exist for this sketch.` })
  return revision
}

/** The API face of a revision (with its document when asked). */
export function revisionJson(revision: Revision, people: Map<string, { name: string }>, withDocument = false) {
  return {
    number: revision.number,
    note: revision.note,
    title: revision.title,
    status: revision.status,
    createdAt: revision.createdAt.toISOString(),
    createdBy: people.get(revision.createdBy ?? '')?.name ?? null,
    checker: people.get(revision.checkerId ?? '')?.name ?? null,
    approvedBy: revision.approvedBy ? people.get(revision.approvedBy)?.name ?? 'a former member' : null,
    approvedAt: revision.approvedAt ? revision.approvedAt.toISOString() : null,
    ...(withDocument ? { document: readDocument(revision.document) } : {}),
  }
}

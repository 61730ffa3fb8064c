import { randomBytes } from 'node:crypto'
import { IdParams } from '../../../../../shared/auth/schemas'
import { LinkBody, MAX_LINK_DAYS } from '../../../../../shared/team/access'

/**
 * Makes a read-only link to a revision (the latest unless `revision` is given) for someone
 * outside the workspace (owner or admin): a 256-bit random token, of which only the SHA-256 is
 * kept, so the url is shown once. Optional `expiresAt` (in the future, at most a year away).
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'manage')
  const body = await readBodyAs(event, LinkBody)
  const expiresAt = body.expiresAt ? new Date(body.expiresAt) : null
  if (expiresAt && expiresAt.getTime() <= Date.now()) throw createError({ statusCode: 400, message: 'expiresAt is in the past: choose a later date, or none.' })
  if (expiresAt && expiresAt.getTime() > Date.now() + MAX_LINK_DAYS * 86_400_000) throw createError({ statusCode: 400, message: `A link lives at most ${MAX_LINK_DAYS} days.` })
  const db = await useDb()
  const revision = body.revision
    ? await findRevision(sketch.id, body.revision)
    : await db.Revision.findOne({ where: { sketchId: sketch.id }, order: [['number', 'DESC']] })
  if (!revision) throw createError({ statusCode: 409, message: 'A link shows a revision, and this sketch has none yet. Make a revision first (Revisions).' })
  const token = randomBytes(32).toString('base64url')
  const link = await db.Link.create({ sketchId: sketch.id, tokenHash: hashToken(token), revision: revision.number, expiresAt, createdBy: user.id })
  await recordActivity(sketch.id, user.id, 'link made', `revision ${revision.number}${expiresAt ? `, until ${expiresAt.toISOString().slice(0, 10)}` : ''}`)
  setResponseStatus(event, 201)
  return { id: link.id, url: `${requestOrigin(event)}/l/${token}`, revision: revision.number, expiresAt: expiresAt?.toISOString() ?? null }
})

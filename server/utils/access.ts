import type { H3Event } from 'h3'
import { Op } from 'sequelize'
import { ACCESS_LABELS, allows, cappedAccess, type AccessLevel } from '../../shared/team/access'
import { BIN_DAYS } from '../../shared/sketch/api'
import type { Sketch, User } from '../models'

/** A sketch as the asking account may use it. */
export interface SketchAccess {
  sketch: Sketch
  user: User
  /** What this account may do with it. */
  access: AccessLevel
}

/**
 * The access of `user` to the sketch `id`: `manage` for its owner and for an admin, else the
 * share made to the account's e-mail capped by its role, else none (null). A deleted sketch is
 * nobody's (except, with `deleted`, its owner's while it is in the bin).
 */
export async function accessOf(user: User, sketch: Sketch): Promise<AccessLevel | null> {
  if (sketch.ownerId === user.id || user.role === 'admin') return 'manage'
  const db = await useDb()
  const share = await db.Share.findOne({ where: { sketchId: sketch.id, email: user.email.toLowerCase() } })
  return share ? cappedAccess(share.access, user.role) : null
}

/**
 * The one gate of every sketch route: signed in (401), the sketch exists and the account has
 * some access to it (404 otherwise: no hint that it exists), and that access allows `need`
 * (403 naming what they have). Every route under /api/sketches/:id goes through here.
 */
export async function requireSketchAccess(event: H3Event, id: string, need: AccessLevel, { deleted = false } = {}): Promise<SketchAccess> {
  const user = await requireUser(event)
  const db = await useDb()
  const sketch = await db.Sketch.findByPk(id)
  const notFound = createError({ statusCode: 404, message: 'Sketch not found' })
  if (!sketch || (!!sketch.deletedAt !== deleted)) throw notFound
  if (deleted) {
    if (sketch.ownerId !== user.id) throw notFound
    if (sketch.deletedAt!.getTime() < Date.now() - BIN_DAYS * 86_400_000) {
      throw createError({ statusCode: 404, message: `Sketch not found: it was deleted over ${BIN_DAYS} days ago` })
    }
    return { sketch, user, access: 'manage' }
  }
  const access = await accessOf(user, sketch)
  if (!access) throw notFound
  if (!allows(access, need)) {
    const what = need === 'manage' ? 'Only the owner (or an admin) can do this' : `This needs ${ACCESS_LABELS[need].replace('can ', '')} access`
    throw createError({ statusCode: 403, message: `${what}; you ${ACCESS_LABELS[access]} this sketch.` })
  }
  return { sketch, user, access }
}

/** Ids of the live sketches shared with this account's e-mail (any access). */
export async function sharedSketchIds(user: User): Promise<string[]> {
  const db = await useDb()
  const shares = await db.Share.findAll({ where: { email: user.email.toLowerCase() }, attributes: ['sketchId'] })
  return shares.map(s => s.sketchId)
}

/** A where clause for the sketches that are not deleted. */
export const live = { deletedAt: { [Op.is]: null } }

import { Op } from 'sequelize'
import { BIN_DAYS, ListSketchesQuery } from '../../../shared/sketch/api'
import { likeIgnoringCase } from '../../database/connection'

const COLUMN = { updated: 'updatedAt', created: 'createdAt', title: 'title', project: 'project' } as const

/**
 * Sketches by `scope`: mine (what I own), shared (what others share with me), review (what waits
 * for my check); searchable by title, project and description; with deleted=true, mine in the bin
 * for under BIN_DAYS days. `counts` gives the dashboard's numbers: to check, returned to me, shared with me.
 */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const query = await queryAs(event, ListSketchesQuery)
  const db = await useDb()
  const binned = query.deleted === 'true'
  const sharedIds = await sharedSketchIds(user)
  const notMine = { ownerId: { [Op.ne]: user.id } }
  const scopes = {
    mine: { ownerId: user.id },
    shared: { id: { [Op.in]: sharedIds }, ...notMine },
    review: { checkerId: user.id, status: 'submitted' },
  }
  const where: Record<string | symbol, unknown> = {
    ...(binned ? scopes.mine : scopes[query.scope]),
    deletedAt: binned ? { [Op.gte]: new Date(Date.now() - BIN_DAYS * 86_400_000) } : null,
  }
  const q = query.q?.trim()
  if (q) {
    const like = `%${q.replace(/[\\%_]/g, c => `\\${c}`)}%`
    const op = likeIgnoringCase(db.sequelize)
    where[Op.or] = ['title', 'project', 'description'].map(col => ({ [col]: { [op]: like } }))
  }
  const order = query.order ?? (query.sort === 'title' || query.sort === 'project' ? 'asc' : 'desc')
  const rows = await db.Sketch.findAll({ where, order: binned ? [['deletedAt', 'DESC']] : [[COLUMN[query.sort], order.toUpperCase()]] })
  const people = await peopleById(rows.map(r => r.ownerId))
  const [toCheck, returned, shared] = await Promise.all([
    db.Sketch.count({ where: { ...scopes.review, deletedAt: null } }),
    db.Sketch.count({ where: { ownerId: user.id, status: 'returned', deletedAt: null } }),
    db.Sketch.count({ where: { ...scopes.shared, deletedAt: null } }),
  ])
  return {
    sketches: rows.map((s) => {
      const base = { ...sketchJson(s, false), owner: people.get(s.ownerId)?.name ?? '' }
      return binned ? { ...base, deletedAt: s.deletedAt!.toISOString() } : base
    }),
    counts: { toCheck, returned, shared },
  }
})

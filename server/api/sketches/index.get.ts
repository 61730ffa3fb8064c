import { Op } from 'sequelize'
import { BIN_DAYS, ListSketchesQuery } from '../../../shared/sketch/api'
import { likeIgnoringCase } from '../../database/connection'

const COLUMN = { updated: 'updatedAt', created: 'createdAt', title: 'title', project: 'project' } as const

/** My sketches, searchable by title, project and description; with deleted=true, those in the bin for under BIN_DAYS days. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const query = await queryAs(event, ListSketchesQuery)
  const db = await useDb()
  const binned = query.deleted === 'true'
  const where: Record<string | symbol, unknown> = {
    ownerId: user.id,
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
  return { sketches: rows.map(s => (binned ? { ...sketchJson(s, false), deletedAt: s.deletedAt!.toISOString() } : sketchJson(s, false))) }
})

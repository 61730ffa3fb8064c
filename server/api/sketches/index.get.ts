import { Op } from 'sequelize'
import { ListSketchesQuery } from '../../../shared/sketch/api'
import { likeIgnoringCase } from '../../database/connection'

const COLUMN = { updated: 'updatedAt', created: 'createdAt', title: 'title', project: 'project' } as const

/** My sketches, searchable by title, project and description. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const query = await queryAs(event, ListSketchesQuery)
  const db = await useDb()
  const where: Record<string | symbol, unknown> = { ownerId: user.id, deletedAt: null }
  const q = query.q?.trim()
  if (q) {
    const like = `%${q.replace(/[\\%_]/g, c => `\\${c}`)}%`
    const op = likeIgnoringCase(db.sequelize)
    where[Op.or] = ['title', 'project', 'description'].map(col => ({ [col]: { [op]: like } }))
  }
  const order = query.order ?? (query.sort === 'title' || query.sort === 'project' ? 'asc' : 'desc')
  const rows = await db.Sketch.findAll({ where, order: [[COLUMN[query.sort], order.toUpperCase()]] })
  return { sketches: rows.map(s => sketchJson(s, false)) }
})

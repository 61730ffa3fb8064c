import { Op } from 'sequelize'
import { IdParams } from '../../../shared/auth/schemas'
import { UpdateSketchBody } from '../../../shared/sketch/api'

/**
 * Saves changes to a sketch I may edit (owner, admin, or an edit share). The body carries the
 * `version` it edited; when the sketch was saved elsewhere since, the answer is 409 and nothing
 * changes (no lost update). A new drawing of an approved sketch (not a rename) starts a new working
 * state whose status is draft again, while the approved revision stays approved.
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user, access } = await requireSketchAccess(event, id, 'edit')
  const body = await readBodyAs(event, UpdateSketchBody)
  const changes: Record<string, unknown> = {}
  if (body.title !== undefined) changes.title = body.title
  if (body.project !== undefined) changes.project = body.project
  if (body.description !== undefined) changes.description = body.description
  if (body.document !== undefined) changes.document = JSON.stringify(body.document)
  const current: Record<string, unknown> = { title: sketch.title, project: sketch.project, description: sketch.description, document: sketch.document }
  const changed = Object.entries(changes).some(([key, value]) => current[key] !== value)
  // The approval is of the section: a new drawing (not a rename) makes the working state a draft again.
  if (changes.document !== undefined && changes.document !== sketch.document && sketch.status === 'approved') changes.status = 'draft'
  const db = await useDb()
  // Compare-and-set on the version in one statement, so two saves cannot both win.
  const [count] = await db.Sketch.update(
    { ...changes, version: body.version + 1 },
    { where: { id: sketch.id, version: body.version, deletedAt: { [Op.is]: null } } },
  )
  if (count === 0) {
    // Report the version stored now, not the one read before the update (another save may have landed in between).
    const stored = await db.Sketch.findOne({ where: { id: sketch.id }, attributes: ['version', 'deletedAt'] })
    if (!stored || stored.deletedAt) throw createError({ statusCode: 404, message: 'Sketch not found (it was deleted meanwhile).' })
    throw createError({
      statusCode: 409,
      statusMessage: 'Conflict',
      message: `This sketch was saved elsewhere (now version ${stored.version}, you edited version ${body.version}). Reload it, or keep your work as a copy.`,
      data: { currentVersion: stored.version },
    })
  }
  if (changed) await recordActivity(sketch.id, user.id, 'edited', changes.status === 'draft' ? 'a new working state after the approval' : '')
  await sketch.reload()
  return sketchDetail(sketch, access, user)
})

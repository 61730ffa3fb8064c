import { IdParams } from '../../../../../shared/auth/schemas'

/** The numbered revisions of a sketch, newest first (without their documents). */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const db = await useDb()
  const revisions = await db.Revision.findAll({ where: { sketchId: sketch.id }, order: [['number', 'DESC']], attributes: { exclude: ['document'] } })
  const people = await peopleById(revisions.flatMap(r => [r.createdBy, r.checkerId, r.approvedBy]))
  return { revisions: revisions.map(r => revisionJson(r, people)) }
})

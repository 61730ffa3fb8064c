import { RevisionParams } from '../../../../../shared/team/review'

/** One revision with its frozen document, to open read-only. */
export default defineEventHandler(async (event) => {
  const { id, number } = await paramsAs(event, RevisionParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const revision = await findRevision(sketch.id, number)
  return revisionJson(revision, await peopleById([revision.createdBy, revision.checkerId, revision.approvedBy]), true)
})

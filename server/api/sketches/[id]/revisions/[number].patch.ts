import { RevisionNoteBody, RevisionParams } from '../../../../../shared/team/review'

/**
 * Corrects the note of a revision (edit access). Its document never changes; once the revision
 * is submitted or approved the note is fixed too (409): an approved revision is locked.
 */
export default defineEventHandler(async (event) => {
  const { id, number } = await paramsAs(event, RevisionParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'edit')
  const body = await readBodyAs(event, RevisionNoteBody)
  const revision = await findRevision(sketch.id, number)
  if (revision.status === 'approved') throw createError({ statusCode: 409, message: `Revision ${number} is approved and locked: it cannot change. Make a new revision instead.` })
  if (revision.status === 'submitted') throw createError({ statusCode: 409, message: `Revision ${number} is waiting for its check and cannot change meanwhile.` })
  await revision.update({ note: body.note })
  await recordActivity(sketch.id, user.id, 'revision', `revision ${number}: note changed`)
  return revisionJson(revision, await peopleById([revision.createdBy, revision.checkerId, revision.approvedBy]))
})

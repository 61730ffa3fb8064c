import { RevisionParams } from '../../../../../../shared/team/review'

/**
 * Makes a revision's drawing the working state again (edit access): a new save in the history
 * (the version goes up), not a rewrite; the revision itself stays as it was. An approved sketch
 * becomes a draft, as after any edit.
 */
export default defineEventHandler(async (event) => {
  const { id, number } = await paramsAs(event, RevisionParams)
  const { sketch, user, access } = await requireSketchAccess(event, id, 'edit')
  const revision = await findRevision(sketch.id, number)
  await sketch.update({ document: revision.document, version: sketch.version + 1, ...(sketch.status === 'approved' ? { status: 'draft' as const } : {}) })
  await recordActivity(sketch.id, user.id, 'restored', `revision ${number} as the working state`)
  return sketchDetail(sketch, access, user)
})

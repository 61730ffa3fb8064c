import { IdParams } from '../../../../../shared/auth/schemas'
import { can } from '../../../../../shared/auth/roles'
import { SubmitBody } from '../../../../../shared/team/review'

/**
 * Submits a revision for check to a named checker (owner or admin). The checker gets comment
 * access if the sketch is not shared with them yet, and a mail. Refused with 409 when it makes
 * no sense: already waiting for a check, an approved revision, one's own address, an account
 * whose role does not check. 201.
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'manage')
  const body = await readBodyAs(event, SubmitBody)
  const db = await useDb()
  if (sketch.status === 'submitted') {
    throw createError({ statusCode: 409, message: `Revision ${sketch.reviewRevision} is already waiting for its check. Wait for the outcome before submitting again.` })
  }
  const revision = await findRevision(sketch.id, body.revision)
  if (revision.status === 'approved') throw createError({ statusCode: 409, message: `Revision ${revision.number} is approved already; make a new revision for another check.` })
  const checker = await db.User.findOne({ where: { email: body.checker } })
  if (!checker) throw createError({ statusCode: 422, message: `No account has the address ${body.checker}. Share the sketch with them first (they get an invitation), then submit once they have registered.` })
  if (checker.id === sketch.ownerId || checker.id === user.id) throw createError({ statusCode: 409, message: 'Nobody checks their own sketch: name another checker.' })
  if (!can(checker.role, 'reviewSketches')) throw createError({ statusCode: 409, message: `${checker.name} is ${checker.role === 'engineer' ? 'an engineer' : `a ${checker.role}`}: only checkers and admins decide a check. Name a checker.` })
  const share = await db.Share.findOne({ where: { sketchId: sketch.id, email: checker.email } })
  if (!share) await db.Share.create({ sketchId: sketch.id, email: checker.email, access: 'comment', createdBy: user.id })
  else if (share.access === 'view') await share.update({ access: 'comment' })
  await revision.update({ status: 'submitted', checkerId: checker.id })
  await sketch.update({ status: 'submitted', checkerId: checker.id, reviewRevision: revision.number }, { silent: true })
  await recordActivity(sketch.id, user.id, 'submitted', `revision ${revision.number} to ${checker.name}`)
  await mailAboutSketch(event, 'review-request', checker.email, sketch, `${user.name} asks you to check “${sketch.title}”, revision ${revision.number}`, [
    `Revision ${revision.number}${revision.note ? ` (“${revision.note}”)` : ''} of “${sketch.title}”${sketch.project ? ` in ${sketch.project}` : ''} waits for your check.`,
    'Open it, pin comments where something needs a change, then approve it or return it with a comment.',
  ])
  setResponseStatus(event, 201)
  return { status: 'submitted', revision: revision.number, checker: { name: checker.name, email: checker.email } }
})

/**
 * The named checker approves the submitted revision: it is locked for good with who approved it
 * and when; the sketch's status is approved until its next edit. The owner gets a mail.
 */
export default defineEventHandler(async (event) => {
  const { sketch, user, revision } = await decidableReview(event, 'approve')
  const approvedAt = new Date()
  await revision.update({ status: 'approved', approvedBy: user.id, approvedAt })
  await sketch.update({ status: 'approved' }, { silent: true })
  await recordActivity(sketch.id, user.id, 'approved', `revision ${revision.number}`)
  const db = await useDb()
  const owner = await db.User.findByPk(sketch.ownerId)
  if (owner) {
    await mailAboutSketch(event, 'review-approved', owner.email, sketch, `${user.name} approved “${sketch.title}”, revision ${revision.number}`, [
      `Revision ${revision.number} is approved and locked (${approvedAt.toISOString().slice(0, 16).replace('T', ' ')} UTC). A later edit starts a new working state as a draft; the approved revision stays as it is.`,
    ])
  }
  return { status: 'approved', revision: revision.number, approvedBy: user.name, approvedAt: approvedAt.toISOString() }
})

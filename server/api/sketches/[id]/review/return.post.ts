import { ReturnBody } from '../../../../../shared/team/review'

/** The named checker returns the submitted revision with a comment (kept as a comment on the sketch); the owner gets a mail. */
export default defineEventHandler(async (event) => {
  const { sketch, user, revision } = await decidableReview(event, 'return')
  const body = await readBodyAs(event, ReturnBody)
  const db = await useDb()
  await revision.update({ status: 'returned' })
  await sketch.update({ status: 'returned' }, { silent: true })
  await db.Comment.create({ sketchId: sketch.id, parentId: null, authorId: user.id, body: `Returned revision ${revision.number}: ${body.comment}`.slice(0, 4000), x: null, y: null })
  await recordActivity(sketch.id, user.id, 'returned', `revision ${revision.number}: ${body.comment.slice(0, 200)}`)
  const owner = await db.User.findByPk(sketch.ownerId)
  if (owner) {
    await mailAboutSketch(event, 'review-returned', owner.email, sketch, `${user.name} returned “${sketch.title}”, revision ${revision.number}`, [
      `The checker says: ${body.comment}`,
      'Answer the comments, make a new revision and submit it again.',
    ])
  }
  return { status: 'returned', revision: revision.number }
})

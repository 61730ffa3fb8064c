import type { H3Event } from 'h3'
import { IdParams } from '../../shared/auth/schemas'
import type { Revision, Sketch, User } from '../models'

/**
 * The sketch and revision a checker's decision is about, or the reason it makes no sense: one's
 * own sketch (409), nothing waiting for a check (409), someone other than the named checker (403).
 */
export async function decidableReview(event: H3Event, verb: 'approve' | 'return'): Promise<{ sketch: Sketch; user: User; revision: Revision }> {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'comment')
  if (sketch.ownerId === user.id) throw createError({ statusCode: 409, message: `You cannot ${verb} your own sketch: its checker decides.` })
  if (sketch.status !== 'submitted') {
    const why = sketch.status === 'approved' ? 'it is approved already' : sketch.status === 'returned' ? 'it was returned and not submitted again' : 'it is a draft that was not submitted for check'
    throw createError({ statusCode: 409, message: `Nothing to ${verb}: ${why}.` })
  }
  if (sketch.checkerId !== user.id) throw createError({ statusCode: 403, message: 'Only the checker named in the submission decides it.' })
  const revision = await findRevision(sketch.id, sketch.reviewRevision!)
  return { sketch, user, revision }
}

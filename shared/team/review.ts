import { z } from 'zod'
import { Email } from '../auth/schemas'

/** A revision's own review state: frozen (never submitted), submitted, returned or approved (locked for good). */
export const REVISION_STATUSES = ['frozen', 'submitted', 'returned', 'approved'] as const
export type RevisionStatus = (typeof REVISION_STATUSES)[number]

export const RevisionBody = z.object({
  note: z.string({ error: 'note must be text' }).trim().max(500, 'A revision note has at most 500 characters').default(''),
})
export const RevisionNoteBody = z.object({
  note: z.string({ error: 'note must be text' }).trim().max(500, 'A revision note has at most 500 characters'),
})
export const RevisionParams = z.object({
  id: z.uuid({ error: 'Sketch not found' }),
  number: z.coerce.number({ error: 'Revision not found' }).int('Revision not found').min(1, 'Revision not found').max(1_000_000, 'Revision not found'),
})
export const CompareQuery = z.object({
  from: z.coerce.number({ error: 'from must be a revision number' }).int('from must be a revision number').min(1, 'from must be a revision number'),
  to: z.coerce.number({ error: 'to must be a revision number' }).int('to must be a revision number').min(1, 'to must be a revision number'),
})

export const SubmitBody = z.object({
  revision: z.number({ error: 'Name the revision to check (its number)' }).int('revision must be a whole number').min(1, 'Revisions are numbered from 1'),
  checker: Email,
})
export const ReturnBody = z.object({
  comment: z.string({ error: 'Say why it goes back (comment)' }).trim().min(1, 'Say why it goes back (comment)').max(4000, 'A comment has at most 4000 characters'),
})

/** A finite coordinate in mm, within a kilometre of the origin. */
const Coordinate = z.number({ error: 'at.x and at.y must be numbers (mm)' }).min(-1e6, 'at is more than a kilometre away').max(1e6, 'at is more than a kilometre away')

export const CommentBody = z.object({
  body: z.string({ error: 'Write the comment (body)' }).trim().min(1, 'Write the comment (body)').max(4000, 'A comment has at most 4000 characters'),
  at: z.object({ x: Coordinate, y: Coordinate }, { error: 'at must be {x, y} in mm' }).nullish(),
  parentId: z.uuid({ error: 'parentId must name a comment of this sketch' }).nullish(),
})
export const CommentUpdateBody = z.object({
  resolved: z.boolean({ error: 'resolved must be true or false' }),
})
export const CommentParams = z.object({
  id: z.uuid({ error: 'Sketch not found' }),
  commentId: z.uuid({ error: 'Comment not found' }),
})

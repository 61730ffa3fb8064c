import { z } from 'zod'
import { SketchDocumentSchema, migrateDocument, type SketchDocument } from './document'

const Title = z.string({ error: 'Give the sketch a title' }).trim().min(1, 'Give the sketch a title').max(160, 'A title has at most 160 characters')
const Project = z.string().trim().max(160, 'A project name has at most 160 characters')
const Description = z.string().max(5000, 'A description has at most 5000 characters')
/** A document of this or an older schema (upgraded first, so a script may send what it saved earlier). */
const Document = z.preprocess((value) => {
  try {
    return migrateDocument(value)
  } catch {
    return value // the schema check below then says what is wrong
  }
}, SketchDocumentSchema)

export const CreateSketchBody = z.object({
  title: Title,
  project: Project.default(''),
  description: Description.default(''),
  document: Document.optional(),
})

export const UpdateSketchBody = z.object({
  version: z.number({ error: 'Send the version you edited (a whole number)' }).int('The version is a whole number').positive(),
  title: Title.optional(),
  project: Project.optional(),
  description: Description.optional(),
  document: Document.optional(),
})

/** How long a deleted sketch can be restored (days). */
export const BIN_DAYS = 30

export const ListSketchesQuery = z.object({
  q: z.string().max(160).optional(),
  /** "true" lists what I deleted in the last BIN_DAYS days instead (newest first). */
  deleted: z.enum(['true', 'false'], { error: 'deleted is true or false' }).optional(),
  sort: z.enum(['updated', 'created', 'title', 'project'], { error: 'sort is one of: updated, created, title, project' }).default('updated'),
  order: z.enum(['asc', 'desc'], { error: 'order is asc or desc' }).optional(),
  /** mine: what I own; shared: what others share with me; review: what waits for my check. */
  scope: z.enum(['mine', 'shared', 'review'], { error: 'scope must be mine, shared or review' }).default('mine'),
})

/** A sketch as the API returns it. */
export interface SketchSummary {
  id: string
  title: string
  project: string
  description: string
  status: string
  version: number
  ownerId: string
  createdAt: string
  updatedAt: string
  partCount: number
  /** When it was moved to the bin (ISO), in the recently deleted list only. */
  deletedAt?: string
}

export interface SketchFull extends SketchSummary {
  document: SketchDocument
}

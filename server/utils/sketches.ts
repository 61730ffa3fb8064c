import type { H3Event } from 'h3'
import { SketchDocumentSchema, migrateDocument, type SketchDocument } from '../../shared/sketch/document'
import type { Sketch, User } from '../models'
import { BIN_DAYS } from '../../shared/sketch/api'

/** Parses a stored document, upgrading older schemas on the way. */
export function readDocument(text: string): SketchDocument {
  return SketchDocumentSchema.parse(migrateDocument(JSON.parse(text)))
}

/** The API face of a sketch, with or without its document. */
export function sketchJson(sketch: Sketch, withDocument: boolean) {
  // The list only needs a part count: a plain parse, not the full schema validation of every document.
  const document = withDocument ? readDocument(sketch.document) : null
  const partCount = document ? document.parts.length : countParts(sketch.document)
  const base = {
    id: sketch.id,
    title: sketch.title,
    project: sketch.project,
    description: sketch.description,
    status: sketch.status,
    version: sketch.version,
    ownerId: sketch.ownerId,
    createdAt: sketch.createdAt,
    updatedAt: sketch.updatedAt,
    partCount,
  }
  return withDocument ? { ...base, document } : base
}

function countParts(text: string): number {
  try {
    const parts = (JSON.parse(text) as { parts?: unknown }).parts
    return Array.isArray(parts) ? parts.length : 0
  } catch {
    return 0
  }
}

/**
 * One of the caller's own sketches, or 404: someone else's sketch does not exist for them. Not
 * deleted by default; with `deleted`, one in the bin for under BIN_DAYS days (older ones are gone).
 */
export async function findOwnSketch(event: H3Event, user: User, id: string, { deleted = false } = {}): Promise<Sketch> {
  const db = await useDb()
  const sketch = await db.Sketch.findOne({ where: { id, ownerId: user.id } })
  if (!sketch || (!!sketch.deletedAt !== deleted)) throw createError({ statusCode: 404, message: 'Sketch not found' })
  if (deleted && sketch.deletedAt!.getTime() < Date.now() - BIN_DAYS * 86_400_000) {
    throw createError({ statusCode: 404, message: `Sketch not found: it was deleted over ${BIN_DAYS} days ago` })
  }
  return sketch
}

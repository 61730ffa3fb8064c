import { migrateDocument, SketchDocumentSchema, type SketchDocument } from '../sketch/document'

/** The sketch document as Kernwise JSON (schema "kernwise.sketch/2"), pretty-printed, mm, N, MPa. */
export function exportJson(doc: SketchDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`
}

/** True when the text looks like a Kernwise document (a JSON object naming a kernwise.sketch schema). */
export function isKernwiseJson(text: string): boolean {
  return /^\s*\{/.test(text) && /"schema"\s*:\s*"kernwise\.sketch\//.test(text.slice(0, 4096))
}

/**
 * Reads Kernwise JSON back into a current document (older schemas upgraded). Throws an Error with
 * a readable message for text that is not JSON or not a valid document.
 */
export function importJson(text: string): SketchDocument {
  let raw: unknown
  try {
    raw = JSON.parse(text)
  } catch (error) {
    throw new Error(`The file is not valid JSON (${(error as Error).message}).`)
  }
  const parsed = SketchDocumentSchema.safeParse(migrateDocument(raw))
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    throw new Error(`The file is not a valid Kernwise sketch: ${issue ? `${issue.path.join('.')}: ${issue.message}` : 'unknown problem'}.`)
  }
  return parsed.data
}

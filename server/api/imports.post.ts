import { importCsv } from '../../shared/import/csv'
import { detectFormat, MAX_IMPORT_BYTES } from '../../shared/import/detect'
import { importDxf } from '../../shared/import/dxf'
import { ImportFields } from '../../shared/import/schema'
import { ImportError, type ImportResult } from '../../shared/import/types'

/**
 * Reads a DXF drawing or CSV coordinates (multipart field `file`, at most 10 MB, type told by
 * content) into proposed parts in mm; nothing is saved to the sketch (the editor inserts what
 * the user confirms). With `sketchId` the original is kept by content hash beside the database
 * and remembered with that sketch; `hash` (with `sketchId`) reads a remembered file again.
 */
export default defineEventHandler(async (event): Promise<ImportResult> => {
  const user = await requireRole(event, 'editSketches')
  const type = getHeader(event, 'content-type') ?? ''
  if (!type.toLowerCase().startsWith('multipart/form-data')) {
    throw createError({ statusCode: 415, message: 'Send the file as multipart/form-data in a field named "file".' })
  }
  const length = Number(getHeader(event, 'content-length') ?? 0)
  if (length > MAX_IMPORT_BYTES + 64 * 1024) throw tooLarge(length)
  // A chunked upload has no length: measure it once (h3 keeps the bytes for the parser).
  const raw = await readRawBody(event, false)
  if (raw && raw.length > MAX_IMPORT_BYTES + 64 * 1024) throw tooLarge(raw.length)
  let form: Awaited<ReturnType<typeof readMultipartFormData>>
  try {
    form = await readMultipartFormData(event)
  } catch {
    throw createError({ statusCode: 400, message: 'The upload is not valid multipart/form-data.' })
  }
  const fields: Record<string, string> = {}
  let file: { data: Buffer; filename?: string } | undefined
  for (const f of form ?? []) {
    if (f.name === 'file' && f.filename !== undefined) file = f
    else if (f.name && f.name !== 'file') fields[f.name] = f.data.toString('utf8').slice(0, 200)
  }
  const opts = parseOr400(ImportFields, fields)
  if (opts.sketchId) await requireSketchAccess(event, opts.sketchId, 'edit')
  let bytes: Uint8Array
  let name = file?.filename?.slice(0, 200) || 'import'
  if (file) {
    bytes = file.data
  } else if (opts.hash) {
    const remembered = opts.sketchId ? (await sketchImports(opts.sketchId)).find(e => e.hash === opts.hash) : undefined
    const stored = remembered ? await readImportFile(opts.hash) : null
    if (!remembered || !stored) throw createError({ statusCode: 404, message: 'No file with that hash was imported into this sketch.' })
    bytes = stored
    name = remembered.name
  } else {
    throw createError({ statusCode: 400, message: 'Attach the file in a multipart field named "file".' })
  }
  if (bytes.length > MAX_IMPORT_BYTES) throw tooLarge(bytes.length)
  if (bytes.length === 0) throw createError({ statusCode: 400, message: 'The file is empty.' })
  let result: ImportResult
  try {
    const { format, text } = detectFormat(bytes)
    result = format === 'dxf'
      ? importDxf(text, { units: opts.units, chordTolerance: opts.chordTolerance })
      : importCsv(text, opts.units ?? 'mm')
  } catch (error) {
    if (error instanceof ImportError) {
      throw createError({ statusCode: error.status, message: error.message, data: { line: error.line, entity: error.entity } })
    }
    throw error
  }
  // The original is kept only with a sketch; a bare preview needs just its hash.
  const hash = !file ? opts.hash! : opts.sketchId ? await storeImportFile(bytes) : contentHash(bytes)
  if (opts.sketchId) {
    await rememberImport(opts.sketchId, { hash, name, format: result.format, size: bytes.length, units: result.units, at: new Date().toISOString() })
  }
  return { ...result, file: { hash, name, size: bytes.length } }
})

function tooLarge(bytes: number) {
  return createError({ statusCode: 413, message: `The file is ${(bytes / 1048576).toFixed(1)} MB; the limit is 10 MB.` })
}

import { IdParams } from '../../../../shared/auth/schemas'
import { thumbnailSvg } from '../../../../shared/export/thumbnail'

/** Drawn thumbnails by sketch id and version: a version is never drawn twice while it is remembered. */
const drawn = new Map<string, { version: number; svg: string }>()
const KEEP = 2000

/**
 * A small drawing of a sketch I can read (SVG), for the dashboard. Its ETag is the sketch's
 * version: a browser that has it asks again with If-None-Match and gets 304 until the next save.
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const etag = `"${sketch.id}-v${sketch.version}"`
  setResponseHeaders(event, { 'content-type': 'image/svg+xml; charset=utf-8', 'cache-control': 'private, no-cache', etag })
  if (getRequestHeader(event, 'if-none-match') === etag) {
    setResponseStatus(event, 304)
    return ''
  }
  let hit = drawn.get(sketch.id)
  if (!hit || hit.version !== sketch.version) {
    hit = { version: sketch.version, svg: thumbnailSvg(readDocument(sketch.document)) }
    if (drawn.size >= KEEP) drawn.delete(drawn.keys().next().value!)
    drawn.set(sketch.id, hit)
  }
  return hit.svg
})

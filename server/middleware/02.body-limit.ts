import type { IncomingMessage } from 'node:http'

/** Largest request body the API accepts (5 MB); above it the answer is 413. */
export const BODY_LIMIT = 5 * 1024 * 1024
/** An upload to /api/imports may carry a file of 10 MB (plus its multipart framing). */
export const IMPORT_LIMIT = 10 * 1024 * 1024 + 64 * 1024
const PAYLOAD = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

/** After a refusal, bytes still taken in (and thrown away) so the client can read the 413 before the connection closes. */
const DISCARD_LIMIT = 16 * 1024 * 1024

/**
 * Throws away the rest of a refused body without keeping it, so the client is still reading when
 * the 413 arrives (closing at once would reset the connection under the client's upload and it
 * might never see the answer); past DISCARD_LIMIT the connection is closed.
 */
function discardRest(req: IncomingMessage): void {
  let dropped = 0
  req.on('data', (chunk: Buffer) => {
    dropped += chunk.length
    if (dropped > DISCARD_LIMIT) req.socket.destroy()
  })
  req.resume()
}

/** Reads the request body, counting bytes as they arrive; rejects as soon as the count passes `limit`. */
function readLimited(req: IncomingMessage, limit: number, label: string): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = []
    let size = 0
    const onData = (chunk: Buffer) => {
      size += chunk.length
      if (size > limit) {
        req.off('data', onData)
        chunks.length = 0
        discardRest(req)
        reject(createError({ statusCode: 413, statusMessage: 'Payload Too Large', message: `The request body is over the ${label} limit.` }))
        return
      }
      chunks.push(chunk)
    }
    req.on('data', onData)
    req.once('end', () => resolve(Buffer.concat(chunks)))
    req.once('error', reject)
  })
}

/**
 * Every API body is read here, before any route (signed in or not), and never past 5 MB (10 MB for an import): a
 * declared Content-Length over the limit is refused unread, a chunked upload as soon as it
 * passes the limit (what follows is thrown away, see discardRest). Routes read the kept bytes through h3.
 */
export default defineEventHandler(async (event) => {
  if (!event.path.startsWith('/api/') || !PAYLOAD.has(event.method)) return
  // Imports carry a file of up to 10 MB; the route checks the file itself.
  const upload = event.path.startsWith('/api/imports')
  const limit = upload ? IMPORT_LIMIT : BODY_LIMIT
  const label = upload ? '10 MB' : '5 MB'
  const length = Number(getHeader(event, 'content-length') ?? Number.NaN)
  if (Number.isFinite(length) && length > limit) {
    discardRest(event.node.req)
    throw createError({ statusCode: 413, statusMessage: 'Payload Too Large', message: `The request body is ${(length / 1048576).toFixed(1)} MB; the limit is ${label}.` })
  }
  if (length === 0) return
  const body = await readLimited(event.node.req, limit, label)
  ;(event.node.req as unknown as Record<symbol, unknown>)[Symbol.for('h3RawBody')] = Promise.resolve(body)
})

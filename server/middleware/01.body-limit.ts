/** Largest request body the API accepts (5 MB); above it the answer is 413. */
const BODY_LIMIT = 5 * 1024 * 1024

export default defineEventHandler(async (event) => {
  if (!event.path.startsWith('/api/')) return
  const method = event.method
  if (method === 'GET' || method === 'HEAD' || method === 'DELETE') return
  // Imports take files of 10 MB (the route checks its own limit on the file).
  if (event.path.startsWith('/api/imports')) return
  const length = Number(getHeader(event, 'content-length') ?? Number.NaN)
  if (Number.isFinite(length) && length > BODY_LIMIT) {
    throw createError({ statusCode: 413, message: `The request body is ${(length / 1048576).toFixed(1)} MB; the limit is 5 MB.` })
  }
  if (!Number.isFinite(length)) {
    // Chunked upload: read it once (h3 caches it for the route) and measure.
    const raw = await readRawBody(event, false)
    if (raw && raw.length > BODY_LIMIT) {
      throw createError({ statusCode: 413, message: 'The request body is over the 5 MB limit.' })
    }
  }
})

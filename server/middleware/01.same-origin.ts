const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE'])

/**
 * Cross-site request forgery guard on every state-changing API route (sign-in included): a body
 * must be `application/json` (a form or `text/plain` post from another site cannot be; an import's
 * file upload is `multipart/form-data`), and a
 * request carrying the session cookie must come from this site's own pages: a same-origin
 * `Origin`, or `Sec-Fetch-Site: same-origin` when a browser sends no Origin. A request with
 * `Authorization: Bearer` carries no ambient credential and skips the origin check.
 */
export default defineEventHandler((event) => {
  if (!event.path.startsWith('/api/') || !STATE_CHANGING.has(event.method)) return
  const hasBody = Number(getHeader(event, 'content-length') || 0) > 0 || getHeader(event, 'transfer-encoding') !== undefined
  if (hasBody && event.method !== 'DELETE') {
    const type = String(getHeader(event, 'content-type') ?? '').split(';')[0]!.trim().toLowerCase()
    // A file upload is multipart (POST /api/imports only); the origin check below still applies.
    const upload = type === 'multipart/form-data' && event.path.startsWith('/api/imports')
    if (type !== 'application/json' && !upload) {
      throw createError({ statusCode: 415, statusMessage: 'Unsupported Media Type', message: `Send the body as JSON with "Content-Type: application/json" (got "${type || 'none'}").` })
    }
  }
  if (getHeader(event, 'authorization')) return
  const origin = getHeader(event, 'origin')
  if (origin !== undefined) {
    if (origin.toLowerCase() !== requestOrigin(event)) {
      throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: `Requests from ${origin} are refused: changes come only from Kernwise's own pages (or a script with an API token).` })
    }
    return
  }
  if (getHeader(event, 'sec-fetch-site') === 'same-origin') return
  throw createError({ statusCode: 403, statusMessage: 'Forbidden', message: 'This request has no Origin header. Browsers send one; a script should use an API token (Authorization: Bearer …) or send Origin: ' + requestOrigin(event) + '.' })
})

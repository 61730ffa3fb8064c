/**
 * Headers on every answer: no MIME sniffing, no framing, the referrer kept to this site, and no
 * caching of API answers. Pages get their full content security policy (with a per-request
 * script nonce) from server/plugins/04.content-security.ts; this default covers everything else.
 */
export default defineEventHandler((event) => {
  const headers: Record<string, string> = {
    'x-content-type-options': 'nosniff',
    'referrer-policy': 'same-origin',
    'x-frame-options': 'DENY',
    'content-security-policy': "default-src 'none'; frame-ancestors 'none'; base-uri 'none'",
  }
  if (event.path.startsWith('/api/')) headers['cache-control'] = 'no-store'
  setResponseHeaders(event, headers)
  event.node.res.removeHeader('x-powered-by')
})

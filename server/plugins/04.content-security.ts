import { randomBytes } from 'node:crypto'

/**
 * Content security policy for pages: scripts and styles only from this origin or carrying this
 * response's nonce (Nuxt's one inline script, the runtime config, gets it), fonts and images from
 * this origin (images also as data:/blob: URLs the app makes for exports), no plugins, no
 * framing. Inline style attributes (Vue's :style bindings rendered on the server) stay allowed.
 * Off in development, where Vite injects its own inline scripts.
 */
export default defineNitroPlugin((nitroApp) => {
  if (import.meta.dev) return
  const nonces = new WeakMap<object, string>()
  nitroApp.hooks.hook('render:html', (html, { event }) => {
    const nonce = randomBytes(16).toString('base64')
    nonces.set(event, nonce)
    const stamp = (part: string) => part.replace(/<(script|style)(?![^>]*\snonce=)/g, `<$1 nonce="${nonce}"`)
    html.head = html.head.map(stamp)
    html.bodyPrepend = html.bodyPrepend.map(stamp)
    html.body = html.body.map(stamp)
    html.bodyAppend = html.bodyAppend.map(stamp)
  })
  nitroApp.hooks.hook('render:response', (response, { event }) => {
    const nonce = nonces.get(event)
    response.headers = response.headers ?? {}
    delete response.headers['x-powered-by']
    if (!nonce) return
    response.headers['content-security-policy'] = [
      "default-src 'self'",
      `script-src 'self' 'nonce-${nonce}'`,
      `style-src 'self' 'nonce-${nonce}'`,
      "style-src-attr 'unsafe-inline'",
      "img-src 'self' data: blob:",
      "font-src 'self'",
      "connect-src 'self'",
      "worker-src 'self' blob:",
      "object-src 'none'",
      "base-uri 'self'",
      "form-action 'self'",
      "frame-ancestors 'none'",
    ].join('; ')
  })
})

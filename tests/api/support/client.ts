/**
 * A tiny HTTP client for API tests: JSON in and out, one cookie jar per client. Like a browser on
 * the app's own page it sends `Origin` on every request that is not a GET or HEAD (the server's
 * same-origin check); pass `origin: ''` in `headers` to leave it out.
 */
export class Client {
  private cookies = new Map<string, string>()
  constructor(private readonly base: () => string, private readonly token?: string) {}

  /** A client that authenticates with `Authorization: Bearer <token>` instead of cookies. */
  withToken(token: string): Client {
    return new Client(this.base, token)
  }

  async request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}) {
    const h: Record<string, string> = { accept: 'application/json' }
    if (method !== 'GET' && method !== 'HEAD') h.origin = this.base()
    const raw = body instanceof FormData || body instanceof Uint8Array
    if (body !== undefined && typeof body !== 'string' && !raw) h['content-type'] = 'application/json'
    Object.assign(h, headers)
    if (h.origin === '') delete h.origin
    if (this.cookies.size) h.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ')
    if (this.token) h.authorization = `Bearer ${this.token}`
    const res = await fetch(this.base() + path, {
      method,
      headers: h,
      body: body === undefined ? undefined : typeof body === 'string' || raw ? (body as BodyInit) : JSON.stringify(body),
    })
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';')
      const i = pair!.indexOf('=')
      const name = pair!.slice(0, i)
      const value = pair!.slice(i + 1)
      if (value === '' || /max-age=0/i.test(c) || /expires=Thu, 01 Jan 1970/i.test(c)) this.cookies.delete(name)
      else this.cookies.set(name, value)
    }
    const text = await res.text()
    let json: any = null
    try { json = text ? JSON.parse(text) : null } catch { json = { raw: text } }
    return { status: res.status, body: json, headers: res.headers, text }
  }

  /** The cookie header this client would send, to replay it from elsewhere (a "saved" cookie). */
  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ')
  }

  /** Uses a cookie header saved from another client. */
  useCookieHeader(header: string): this {
    for (const pair of header.split('; ').filter(Boolean)) {
      const i = pair.indexOf('=')
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1))
    }
    return this
  }

  /** The cookie (or token) headers this client sends, for a raw fetch of a binary answer. */
  headersFor(): Record<string, string> {
    const h: Record<string, string> = {}
    if (this.cookies.size) h.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ')
    if (this.token) h.authorization = `Bearer ${this.token}`
    return h
  }

  get(path: string) { return this.request('GET', path) }
  post(path: string, body?: unknown) { return this.request('POST', path, body ?? {}) }
  patch(path: string, body?: unknown) { return this.request('PATCH', path, body ?? {}) }
  delete(path: string) { return this.request('DELETE', path) }
  /** A multipart upload (FormData), sent with the server's own Origin as a browser sends it. */
  upload(path: string, form: FormData) { return this.request('POST', path, form, { origin: this.base() }) }
}

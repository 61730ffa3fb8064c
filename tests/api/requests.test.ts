import { request } from 'node:http'
import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
let owner: Client
let token = ''

beforeAll(async () => {
  owner = new Client(() => server.url)
  expect((await owner.post('/api/auth/register', { email: 'owner@requests.test', password: PASSWORD, name: 'Owner' })).status).toBe(201)
  token = (await owner.post('/api/tokens', { name: 'script' })).body.token
})

/** A raw POST with full control of the headers (fetch would add its own). */
function rawPost(path: string, body: string, headers: Record<string, string>): Promise<{ status: number; body: any }> {
  const url = new URL(path, server.url)
  return new Promise((resolve, reject) => {
    const req = request({ host: url.hostname, port: url.port, path: url.pathname, method: 'POST', headers: { 'content-length': String(Buffer.byteLength(body)), ...headers } }, (res) => {
      let text = ''
      res.on('data', (c) => { text += c })
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(text || 'null') }))
    })
    req.on('error', reject)
    req.end(body)
  })
}

describe('cross-site request forgery', () => {
  const login = JSON.stringify({ email: 'owner@requests.test', password: PASSWORD })
  it('a form-encoded or text/plain body is refused with 415, sign-in included', async () => {
    const form = await rawPost('/api/auth/login', 'email=owner%40requests.test&password=x', { 'content-type': 'application/x-www-form-urlencoded', origin: server.url, cookie: owner.cookieHeader() })
    expect(form.status).toBe(415)
    const plain = await rawPost('/api/auth/login', login, { 'content-type': 'text/plain', origin: server.url })
    expect(plain.status).toBe(415)
    expect(plain.body.message).toMatch(/application\/json/)
    const sketch = await rawPost('/api/sketches', JSON.stringify({ title: 'by a form' }), { 'content-type': 'text/plain;charset=UTF-8', origin: server.url, cookie: owner.cookieHeader() })
    expect(sketch.status).toBe(415)
  })

  it('a foreign Origin, or neither Origin nor Sec-Fetch-Site, is refused with 403; the same origin passes', async () => {
    const foreign = await rawPost('/api/sketches', JSON.stringify({ title: 'forged' }), { 'content-type': 'application/json', origin: 'http://attacker.example', cookie: owner.cookieHeader() })
    expect(foreign.status).toBe(403)
    expect(foreign.body.message).toMatch(/attacker\.example/)
    const foreignLogin = await rawPost('/api/auth/login', login, { 'content-type': 'application/json', origin: 'http://attacker.example' })
    expect(foreignLogin.status).toBe(403)
    const none = await rawPost('/api/sketches', JSON.stringify({ title: 'no origin' }), { 'content-type': 'application/json', cookie: owner.cookieHeader() })
    expect(none.status).toBe(403)
    const crossSite = await rawPost('/api/sketches', JSON.stringify({ title: 'cross site' }), { 'content-type': 'application/json', 'sec-fetch-site': 'cross-site', cookie: owner.cookieHeader() })
    expect(crossSite.status).toBe(403)
    const sameSite = await rawPost('/api/sketches', JSON.stringify({ title: 'same origin' }), { 'content-type': 'application/json', 'sec-fetch-site': 'same-origin', cookie: owner.cookieHeader() })
    expect(sameSite.status).toBe(201)
    const list = await owner.get('/api/sketches')
    expect(list.body.sketches.map((s: any) => s.title)).toEqual(['same origin'])
  })

  it('a script with an API token needs no Origin (no ambient credential), but still sends JSON', async () => {
    const ok = await rawPost('/api/sketches', JSON.stringify({ title: 'scripted' }), { 'content-type': 'application/json', authorization: `Bearer ${token}` })
    expect(ok.status).toBe(201)
    const plain = await rawPost('/api/sketches', JSON.stringify({ title: 'scripted' }), { 'content-type': 'text/plain', authorization: `Bearer ${token}` })
    expect(plain.status).toBe(415)
  })
})

/**
 * Streams `total` bytes of spaces to `path` in 256 kB chunks until the server answers; resolves
 * with the status and how many bytes had been handed to the socket by then. A reset after the
 * answer (the server closes a refused upload) is expected and ignored.
 */
function upload(path: string, total: number, headers: Record<string, string>): Promise<{ status: number; sent: number; body: string }> {
  const url = new URL(path, server.url)
  const chunk = Buffer.alloc(256 * 1024, 0x20)
  return new Promise((resolve, reject) => {
    let sent = 0
    let answered = false
    const req = request({ host: url.hostname, port: url.port, path: url.pathname, method: 'POST', headers: { 'content-type': 'application/json', origin: server.url, ...headers } }, (res) => {
      answered = true
      const at = sent
      let text = ''
      res.on('data', (c) => { text += c })
      res.on('end', () => { resolve({ status: res.statusCode ?? 0, sent: at, body: text }); req.destroy() })
      res.on('error', () => resolve({ status: res.statusCode ?? 0, sent: at, body: text }))
    })
    req.on('error', (error) => { if (!answered) reject(error) })
    const pump = () => {
      while (!answered && sent < total) {
        const part = Math.min(chunk.length, total - sent)
        sent += part
        if (!req.write(part === chunk.length ? chunk : chunk.subarray(0, part))) { req.once('drain', pump); return }
      }
      if (!answered) req.end()
    }
    pump()
  })
}

describe('body size', () => {
  it('a chunked upload is cut off at 5 MB, signed out, long before 200 MB are sent', async () => {
    const r = await upload('/api/analysis', 200 * 1024 * 1024, { 'transfer-encoding': 'chunked' })
    expect(r.status).toBe(413)
    expect(r.sent).toBeLessThan(50 * 1024 * 1024)
  })

  it('a declared Content-Length over 5 MB is refused before the body is read; 413 carries a message', async () => {
    const total = 5 * 1024 * 1024 + 10
    const r = await upload('/api/auth/login', total, { 'content-length': String(total) })
    expect(r.status).toBe(413)
    expect(JSON.parse(r.body).message).toMatch(/5\.0 MB; the limit is 5 MB/)
  })
})

describe('headers', () => {
  it('pages carry a CSP with a per-request nonce that every inline script has', async () => {
    const res = await fetch(`${server.url}/sign-in`)
    const csp = res.headers.get('content-security-policy') ?? ''
    const html = await res.text()
    const nonce = /'nonce-([^']+)'/.exec(csp)?.[1]
    expect(nonce).toBeTruthy()
    expect(csp).toMatch(/script-src 'self' 'nonce-/)
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-inline'/)
    expect(csp).toMatch(/frame-ancestors 'none'/)
    expect(csp).toMatch(/font-src 'self'/)
    const scripts = html.match(/<script\b[^>]*>/g) ?? []
    expect(scripts.length).toBeGreaterThan(0)
    for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`)
    const again = await fetch(`${server.url}/sign-in`)
    expect(again.headers.get('content-security-policy')).not.toContain(nonce!)
    expect(res.headers.get('x-content-type-options')).toBe('nosniff')
    expect(res.headers.get('referrer-policy')).toBe('same-origin')
    expect(res.headers.get('x-powered-by')).toBeNull()
  })

  it('API answers are no-store and nosniff, without x-powered-by', async () => {
    const res = await fetch(`${server.url}/api/health`)
    expect(res.headers.get('cache-control')).toBe('no-store')
    expect(res.headers.get('x-content-type-options')).toBe('nosniff')
    expect(res.headers.get('x-powered-by')).toBeNull()
    const mine = await owner.get('/api/sketches')
    expect(mine.headers.get('cache-control')).toBe('no-store')
  })
})

describe('text fields', () => {
  it.each([
    ['a bell character', 'Crane\u0007column'],
    ['an escape character', '\u001b[31mred'],
    ['a C1 control', 'Post\u0085M1'],
    ['an unpaired high surrogate', 'Strut \uD83D'],
    ['an unpaired low surrogate', '\uDE00 Strut'],
  ])('reject %s with a 400 naming the field, and store nothing', async (_label, title) => {
    const before = (await owner.get('/api/sketches')).body.sketches.length
    const r = await owner.post('/api/sketches', { title })
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(/^title: contains/)
    expect((await owner.get('/api/sketches')).body.sketches.length).toBe(before)
  })

  it('accept tabs and line breaks in a description and a real emoji in a title', async () => {
    const r = await owner.post('/api/sketches', { title: 'Strut 😀', description: 'line one\nline two\tindented' })
    expect(r.status).toBe(201)
    expect(r.body.title).toBe('Strut 😀')
  })
})

describe('stale saves', () => {
  it('a 409 reports the version stored now, even when saves race', async () => {
    const made = await owner.post('/api/sketches', { title: 'Raced' })
    const answers = await Promise.all(Array.from({ length: 8 }, (_, i) => owner.patch(`/api/sketches/${made.body.id}`, { version: 1, title: `save ${i}` })))
    const won = answers.filter(a => a.status === 200)
    const lost = answers.filter(a => a.status === 409)
    expect(won).toHaveLength(1)
    expect(lost).toHaveLength(7)
    for (const a of lost) {
      expect(a.body.data.currentVersion).toBe(2)
      expect(a.body.message).toMatch(/now version 2/)
    }
  })
})

describe('unknown API paths', () => {
  it('answer 404 JSON signed out and signed in, never a redirect to the sign-in page', async () => {
    const out = await fetch(`${server.url}/api/no-such-route`, { redirect: 'manual' })
    expect(out.status).toBe(404)
    expect(out.headers.get('content-type')).toMatch(/json/)
    const body = await out.json()
    expect(body.statusMessage).toBe('Not Found')
    expect(body.message).toMatch(/no API route GET \/api\/no-such-route/)
    expect((await owner.get('/api/sketches/x/y/z')).status).toBe(404)
  })

  it('errors carry their own status message, not "Server Error"', async () => {
    const r = await new Client(() => server.url).get('/api/sketches')
    expect(r.status).toBe(401)
    expect(r.body.statusMessage).toBe('Unauthorized')
    const missing = await owner.get('/api/sketches/00000000-0000-4000-8000-000000000000')
    expect(missing.body.statusMessage).toBe('Not Found')
  })
})

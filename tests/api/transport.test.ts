import { request } from 'node:http'
import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer, type TestServer } from './support/server'

// The session cookie is Secure only when the browser came over HTTPS (a browser drops a Secure
// cookie set over plain HTTP to a non-loopback address: RFC 6265bis "Secure" attribute rules).
const direct = useTestServer()
const proxied = useTestServer({ NUXT_TRUSTED_PROXIES: '127.0.0.1' })
const PASSWORD = 'correct-horse-battery'

function sessionCookie(setCookies: string[]): string {
  const c = setCookies.find(s => s.startsWith('kernwise-session='))
  expect(c).toBeDefined()
  return c!
}

/** GET a page with a chosen Host header, as a colleague's browser reaching this machine by its LAN address would. */
function page(server: TestServer, path: string, headers: Record<string, string>): Promise<string> {
  const url = new URL(path, server.url)
  return new Promise((resolve, reject) => {
    const req = request({ host: url.hostname, port: url.port, path: url.pathname, headers }, (res) => {
      let text = ''
      res.on('data', (c) => { text += c })
      res.on('end', () => resolve(text))
    })
    req.on('error', reject)
    req.end()
  })
}

beforeAll(async () => {
  for (const server of [direct, proxied]) {
    const r = await new Client(() => server.url).post('/api/auth/register', { email: 'plain@transport.test', password: PASSWORD, name: 'Plain' })
    expect(r.status).toBe(201)
  }
})

describe('the session cookie over plain HTTP and HTTPS', () => {
  it('is not Secure over plain HTTP, so sign-in works from another machine', async () => {
    const r = await new Client(() => direct.url).post('/api/auth/login', { email: 'plain@transport.test', password: PASSWORD })
    expect(r.status).toBe(200)
    const cookie = sessionCookie(r.headers.getSetCookie())
    expect(cookie).not.toMatch(/;\s*Secure/i)
    expect(cookie).toMatch(/HttpOnly/i)
    expect(cookie).toMatch(/SameSite=Lax/i)
  })

  it('is Secure when a trusted proxy says the browser used HTTPS; an untrusted claim is ignored', async () => {
    const https = await new Client(() => proxied.url).request('POST', '/api/auth/login', { email: 'plain@transport.test', password: PASSWORD },
      { 'x-forwarded-proto': 'https', origin: 'https://' + new URL(proxied.url).host })
    expect(https.status).toBe(200)
    expect(sessionCookie(https.headers.getSetCookie())).toMatch(/;\s*Secure/i)
    const claimed = await new Client(() => direct.url).request('POST', '/api/auth/login', { email: 'plain@transport.test', password: PASSWORD }, { 'x-forwarded-proto': 'https' })
    expect(claimed.status).toBe(200)
    expect(sessionCookie(claimed.headers.getSetCookie())).not.toMatch(/;\s*Secure/i)
  })
})

describe('the plain-HTTP banner', () => {
  it('shows on pages reached over plain HTTP at a network address', async () => {
    const html = await page(direct, '/sign-in', { host: '192.168.10.20:3000' })
    expect(html).toContain('data-testid="insecure-banner"')
    expect(html).toContain('Not encrypted.')
  })

  it('does not show on loopback or behind HTTPS', async () => {
    expect(await page(direct, '/sign-in', { host: '127.0.0.1:3000' })).not.toContain('insecure-banner')
    expect(await page(proxied, '/sign-in', { host: 'kernwise.example.test', 'x-forwarded-proto': 'https' })).not.toContain('insecure-banner')
  })
})

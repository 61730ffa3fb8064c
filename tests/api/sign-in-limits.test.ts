import { request } from 'node:http'
import { beforeAll, describe, expect, it } from 'vitest'
import { useTestServer, type TestServer } from './support/server'

// Limits under test (server/utils/throttle.ts, stated in the README): 5 free failures per
// (e-mail, address) pair in 10 minutes, then a wait of 30 s doubling per failure; 100 attempts
// per address in 10 minutes. "Common practice" (OWASP authentication cheat sheet): limit per
// account and source, and slow attempts down rather than lock accounts.
const direct = useTestServer()
const proxied = useTestServer({ NUXT_TRUSTED_PROXIES: '127.0.0.1' })
const PASSWORD = 'correct-horse-battery'

interface Answer { status: number; body: any; retryAfter: string | undefined }

/** POST JSON from a chosen loopback source address (127.0.0.x), like a browser on the app's page. */
function postFrom(server: TestServer, localAddress: string, path: string, body: unknown, headers: Record<string, string> = {}): Promise<Answer> {
  const url = new URL(path, server.url)
  const data = JSON.stringify(body)
  return new Promise((resolve, reject) => {
    const req = request({ host: url.hostname, port: url.port, path: url.pathname, method: 'POST', localAddress,
      headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(data), origin: server.url, ...headers } }, (res) => {
      let text = ''
      res.on('data', (c) => { text += c })
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(text || 'null'), retryAfter: res.headers['retry-after'] as string | undefined }))
    })
    req.on('error', reject)
    req.end(data)
  })
}

const login = (server: TestServer, from: string, email: string, password: string, headers: Record<string, string> = {}) =>
  postFrom(server, from, '/api/auth/login', { email, password }, headers)

function tally(answers: Answer[]): Record<number, number> {
  const t: Record<number, number> = {}
  for (const a of answers) t[a.status] = (t[a.status] ?? 0) + 1
  return t
}

beforeAll(async () => {
  for (const server of [direct, proxied]) {
    for (const who of ['alice', 'bob', 'carol', 'dave', 'erin']) {
      const r = await postFrom(server, '127.0.0.9', '/api/auth/register', { email: `${who}@limits.test`, password: PASSWORD, name: who })
      expect(r.status).toBe(201)
    }
  }
})

describe('sign-in limits are counted before the password is checked', () => {
  it('20 parallel attempts for one e-mail: at most 5 are checked, the rest wait (429)', async () => {
    const batch = await Promise.all(Array.from({ length: 20 }, (_, i) =>
      login(direct, '127.0.0.2', 'dave@limits.test', i === 19 ? PASSWORD : `wrong-${i}-password`)))
    const t = tally(batch)
    expect((t[401] ?? 0) + (t[200] ?? 0)).toBeLessThanOrEqual(5)
    expect(t[429]).toBeGreaterThanOrEqual(15)
    // A second batch may not get a fresh allowance from a success in the first.
    const again = tally(await Promise.all(Array.from({ length: 20 }, (_, i) => login(direct, '127.0.0.2', 'dave@limits.test', `again-${i}-password`))))
    expect(again[401] ?? 0).toBeLessThanOrEqual(5)
    expect(again[429]).toBeGreaterThanOrEqual(15)
  })
})

describe('limits are per (e-mail, address): nobody can lock others out', () => {
  it('five failures for one account slow that pair down, with a wait of seconds, not a 10-minute lock', async () => {
    for (let i = 0; i < 5; i++) expect((await login(direct, '127.0.0.3', 'alice@limits.test', `wrong-${i}-password`)).status).toBe(401)
    const slowed = await login(direct, '127.0.0.3', 'alice@limits.test', PASSWORD)
    expect(slowed.status).toBe(429)
    const retry = Number(slowed.retryAfter)
    expect(retry).toBeGreaterThan(0)
    expect(retry).toBeLessThanOrEqual(30)
    expect(slowed.body.message).toMatch(/Wait \d+ s/)
  })

  it('another account signs in from that same address, and the same account from another address', async () => {
    expect((await login(direct, '127.0.0.3', 'bob@limits.test', PASSWORD)).status).toBe(200)
    expect((await login(direct, '127.0.0.4', 'alice@limits.test', PASSWORD)).status).toBe(200)
  })

  it('a success clears only its own pair: failures from another address stay counted', async () => {
    for (let i = 0; i < 5; i++) expect((await login(direct, '127.0.0.5', 'carol@limits.test', 'nope-nope-nope')).status).toBe(401)
    expect((await login(direct, '127.0.0.6', 'carol@limits.test', PASSWORD)).status).toBe(200)
    expect((await login(direct, '127.0.0.5', 'carol@limits.test', PASSWORD)).status).toBe(429)
  })

  it('X-Forwarded-For is not believed by default', async () => {
    for (let i = 0; i < 5; i++) {
      expect((await login(direct, '127.0.0.7', 'erin@limits.test', 'nope-nope-nope', { 'x-forwarded-for': `10.9.0.${i}` })).status).toBe(401)
    }
    expect((await login(direct, '127.0.0.7', 'erin@limits.test', PASSWORD, { 'x-forwarded-for': '10.9.0.99' })).status).toBe(429)
  })

  it('behind a trusted proxy each client address counts on its own', async () => {
    for (let i = 0; i < 5; i++) {
      expect((await login(proxied, '127.0.0.1', 'alice@limits.test', 'nope-nope-nope', { 'x-forwarded-for': '10.1.0.1' })).status).toBe(401)
    }
    expect((await login(proxied, '127.0.0.1', 'alice@limits.test', PASSWORD, { 'x-forwarded-for': '10.1.0.1' })).status).toBe(429)
    // The left of the list is the client's to forge: only the right-most untrusted hop counts.
    expect((await login(proxied, '127.0.0.1', 'alice@limits.test', PASSWORD, { 'x-forwarded-for': '10.1.0.2, 10.1.0.1' })).status).toBe(429)
    expect((await login(proxied, '127.0.0.1', 'alice@limits.test', PASSWORD, { 'x-forwarded-for': '10.1.0.2' })).status).toBe(200)
  })

  it('one address has a budget of 100 attempts over all e-mails', async () => {
    for (let round = 0; round < 10; round++) {
      const batch = await Promise.all(Array.from({ length: 10 }, (_, i) => login(direct, '127.0.0.8', `nobody-${round}-${i}@limits.test`, 'nope-nope-nope')))
      expect(tally(batch)[401]).toBe(10)
    }
    const over = await login(direct, '127.0.0.8', 'bob@limits.test', PASSWORD)
    expect(over.status).toBe(429)
    expect(over.body.message).toMatch(/from your address/)
  })

  it('registration is throttled: the eleventh account from one address in 10 minutes is 429', async () => {
    // 127.0.0.9 made five accounts in beforeAll.
    for (let i = 0; i < 5; i++) {
      expect((await postFrom(direct, '127.0.0.9', '/api/auth/register', { email: `extra-${i}@limits.test`, password: PASSWORD, name: 'extra' })).status).toBe(201)
    }
    const over = await postFrom(direct, '127.0.0.9', '/api/auth/register', { email: 'one-too-many@limits.test', password: PASSWORD, name: 'extra' })
    expect(over.status).toBe(429)
    expect(Number(over.retryAfter)).toBeGreaterThan(0)
    expect((await postFrom(direct, '127.0.0.10', '/api/auth/register', { email: 'elsewhere@limits.test', password: PASSWORD, name: 'extra' })).status).toBe(201)
  })
})

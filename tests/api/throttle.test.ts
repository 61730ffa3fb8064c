import { request } from 'node:http'
import { beforeAll, describe, expect, it } from 'vitest'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'

/** POST JSON from a chosen loopback source address (127.0.0.x) so throttling by address can be told apart. */
function postFrom(localAddress: string, path: string, body: unknown): Promise<{ status: number; body: any; retryAfter: string | undefined }> {
  const url = new URL(path, server.url)
  const data = JSON.stringify(body)
  return new Promise((resolve, reject) => {
    const req = request({ host: url.hostname, port: url.port, path: url.pathname, method: 'POST', localAddress,
      headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(data) } }, (res) => {
      let text = ''
      res.on('data', (c) => { text += c })
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(text || 'null'), retryAfter: res.headers['retry-after'] as string | undefined }))
    })
    req.on('error', reject)
    req.end(data)
  })
}

beforeAll(async () => {
  for (const who of ['alice', 'bob', 'carol']) {
    const r = await postFrom('127.0.0.9', '/api/auth/register', { email: `${who}@throttle.test`, password: PASSWORD, name: who })
    expect(r.status).toBe(201)
  }
})

describe('sign-in throttling (5 failures per e-mail or per address within 10 minutes)', () => {
  it('the sixth attempt for an e-mail is 429 with a retry time, even with the right password', async () => {
    for (let i = 0; i < 5; i++) {
      const r = await postFrom('127.0.0.2', '/api/auth/login', { email: 'alice@throttle.test', password: `wrong-${i}-password` })
      expect(r.status).toBe(401)
    }
    const locked = await postFrom('127.0.0.2', '/api/auth/login', { email: 'alice@throttle.test', password: PASSWORD })
    expect(locked.status).toBe(429)
    const retry = Number(locked.retryAfter)
    expect(retry).toBeGreaterThan(500) // the window is 600 s and the failures are seconds old
    expect(retry).toBeLessThanOrEqual(600)
    expect(locked.body.message).toMatch(/Try again in 10 minutes/)
  })

  it('the locked e-mail stays locked from another address', async () => {
    const r = await postFrom('127.0.0.3', '/api/auth/login', { email: 'alice@throttle.test', password: PASSWORD })
    expect(r.status).toBe(429)
  })

  it('the address that failed five times is locked for other e-mails too; other addresses are not', async () => {
    const sameAddress = await postFrom('127.0.0.2', '/api/auth/login', { email: 'bob@throttle.test', password: PASSWORD })
    expect(sameAddress.status).toBe(429)
    const elsewhere = await postFrom('127.0.0.4', '/api/auth/login', { email: 'bob@throttle.test', password: PASSWORD })
    expect(elsewhere.status).toBe(200)
  })

  it('four failures then a success clear the count for that e-mail', async () => {
    for (let i = 0; i < 4; i++) {
      expect((await postFrom('127.0.0.5', '/api/auth/login', { email: 'carol@throttle.test', password: 'nope-nope-nope' })).status).toBe(401)
    }
    expect((await postFrom('127.0.0.6', '/api/auth/login', { email: 'carol@throttle.test', password: PASSWORD })).status).toBe(200)
    expect((await postFrom('127.0.0.7', '/api/auth/login', { email: 'carol@throttle.test', password: 'nope-nope-nope' })).status).toBe(401)
    expect((await postFrom('127.0.0.8', '/api/auth/login', { email: 'carol@throttle.test', password: PASSWORD })).status).toBe(200)
  })
})

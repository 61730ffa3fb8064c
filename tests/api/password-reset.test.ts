import { join } from 'node:path'
import sqlite3 from 'sqlite3'
import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
const client = () => new Client(() => server.url)

function sql<T = Record<string, unknown>>(statement: string, params: unknown[] = []): Promise<T[]> {
  return new Promise((resolve, reject) => {
    const d = new sqlite3.Database(join(server.dir, 'test.sqlite'))
    d.all(statement, params, (error, rows) => {
      d.close()
      if (error) reject(error)
      else resolve(rows as T[])
    })
  })
}

/** The token in the newest reset mail to `to`, read from the outbox. */
async function mailedToken(to: string): Promise<string> {
  const [mail] = await sql<{ text: string; kind: string; sentAt: string | null }>('SELECT text, kind, sentAt FROM outbox WHERE "to" = ? ORDER BY createdAt DESC LIMIT 1', [to])
  expect(mail?.kind).toBe('password-reset')
  expect(mail?.sentAt).not.toBeNull() // no NUXT_SMTP_URL: delivered to the local SMTP server
  const token = /reset-password\?token=([A-Za-z0-9_-]+)/.exec(mail!.text)?.[1]
  expect(token).toBeDefined()
  return token!
}

beforeAll(async () => {
  expect((await client().post('/api/auth/register', { email: 'forgetful@reset.test', password: PASSWORD, name: 'Forgetful' })).status).toBe(201)
})

describe('password reset by e-mail', () => {
  it('answers the same for an unknown e-mail and mails nothing', async () => {
    const known = await client().post('/api/auth/reset-request', { email: 'forgetful@reset.test' })
    const unknown = await client().post('/api/auth/reset-request', { email: 'nobody@reset.test' })
    expect(known.status).toBe(200)
    expect(unknown.status).toBe(200)
    expect(unknown.body.message).toBe(known.body.message)
    expect(await sql('SELECT id FROM outbox WHERE "to" = ?', ['nobody@reset.test'])).toHaveLength(0)
  })

  it('mails a single-use token of at least 128 bits that sets a new password and ends every session', async () => {
    const signedIn = client()
    expect((await signedIn.post('/api/auth/login', { email: 'forgetful@reset.test', password: PASSWORD })).status).toBe(200)
    expect((await client().post('/api/auth/reset-request', { email: 'forgetful@reset.test' })).status).toBe(200)
    const token = await mailedToken('forgetful@reset.test')
    // base64url carries 6 bits a character ("common practice": OWASP asks for 128 bits or more).
    expect(token.length * 6).toBeGreaterThanOrEqual(128)
    const short = await client().post('/api/auth/reset', { token, password: 'short' })
    expect(short.status).toBe(400)
    const r = await client().post('/api/auth/reset', { token, password: 'a-fresh-password-42' })
    expect(r.status).toBe(200)
    expect((await signedIn.get('/api/auth/me')).status).toBe(401)
    expect((await client().post('/api/auth/login', { email: 'forgetful@reset.test', password: PASSWORD })).status).toBe(401)
    expect((await client().post('/api/auth/login', { email: 'forgetful@reset.test', password: 'a-fresh-password-42' })).status).toBe(200)
    const again = await client().post('/api/auth/reset', { token, password: 'yet-another-password' })
    expect(again.status).toBe(400)
    expect(again.body.message).toMatch(/not valid any more/)
  })

  it('a token past its hour is refused', async () => {
    expect((await client().post('/api/auth/reset-request', { email: 'forgetful@reset.test' })).status).toBe(200)
    const token = await mailedToken('forgetful@reset.test')
    await sql("UPDATE password_resets SET expiresAt = '2000-01-01 00:00:00.000 +00:00' WHERE usedAt IS NULL")
    expect((await client().post('/api/auth/reset', { token, password: 'too-late-password' })).status).toBe(400)
    expect((await client().post('/api/auth/reset', { token: 'x'.repeat(43), password: 'made-up-token-pw' })).status).toBe(400)
  })
})

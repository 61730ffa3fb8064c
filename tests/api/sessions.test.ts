import { join } from 'node:path'
import sqlite3 from 'sqlite3'
import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
const client = () => new Client(() => server.url)

async function signedIn(email: string, password = PASSWORD): Promise<Client> {
  const c = client()
  const r = await c.post('/api/auth/login', { email, password })
  expect(r.status).toBe(200)
  return c
}

/** Runs one statement on the server's SQLite file from outside (as another process would). */
function sql(statement: string, params: unknown[] = []): Promise<void> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(join(server.dir, 'test.sqlite'))
    db.run(statement, params, (error) => {
      db.close()
      if (error) reject(error)
      else resolve()
    })
  })
}

const ids: Record<string, string> = {}
beforeAll(async () => {
  for (const who of ['admin', 'second', 'member', 'owner']) {
    const r = await client().post('/api/auth/register', { email: `${who}@sessions.test`, password: PASSWORD, name: who })
    expect(r.status).toBe(201)
    ids[who] = r.body.user.id
  }
  const admin = await signedIn('admin@sessions.test')
  expect((await admin.patch(`/api/members/${ids.second}`, { role: 'admin' })).status).toBe(200)
})

describe('sessions end on the server', () => {
  it('a cookie saved before sign-out is refused after it (also by the session route the pages use)', async () => {
    const c = await signedIn('member@sessions.test')
    const saved = client().useCookieHeader(c.cookieHeader())
    expect((await saved.get('/api/auth/me')).status).toBe(200)
    expect((await c.post('/api/auth/logout')).status).toBe(200)
    expect((await saved.get('/api/auth/me')).status).toBe(401)
    expect((await saved.get('/api/sketches')).status).toBe(401)
    const page = await saved.get('/api/_auth/session')
    expect(page.body?.user).toBeUndefined()
  })

  it('lists my sessions with this one marked, and ending one signs that browser out', async () => {
    const laptop = await signedIn('member@sessions.test')
    const phone = await signedIn('member@sessions.test')
    const list = await laptop.get('/api/sessions')
    expect(list.status).toBe(200)
    expect(list.body.sessions.length).toBeGreaterThanOrEqual(2)
    expect(list.body.sessions.filter((s: any) => s.current)).toHaveLength(1)
    const mine = list.body.sessions.find((s: any) => s.current).id
    const phoneId = (await phone.get('/api/sessions')).body.sessions.find((s: any) => s.current).id
    expect(phoneId).not.toBe(mine)
    expect((await laptop.delete(`/api/sessions/${phoneId}`)).status).toBe(200)
    expect((await phone.get('/api/auth/me')).status).toBe(401)
    expect((await laptop.get('/api/auth/me')).status).toBe(200)
    // Someone else's session is not mine to end.
    const other = await signedIn('owner@sessions.test')
    expect((await other.delete(`/api/sessions/${mine}`)).status).toBe(404)
    expect((await laptop.get('/api/auth/me')).status).toBe(200)
  })

  it('"sign out everywhere else" keeps only this session', async () => {
    const a = await signedIn('owner@sessions.test')
    const b = await signedIn('owner@sessions.test')
    const r = await a.delete('/api/sessions')
    expect(r.status).toBe(200)
    expect(r.body.ended).toBeGreaterThanOrEqual(1)
    expect((await b.get('/api/auth/me')).status).toBe(401)
    expect((await a.get('/api/auth/me')).status).toBe(200)
  })

  it('an admin signs a member out everywhere; a non-admin cannot', async () => {
    const member = await signedIn('member@sessions.test')
    const admin = await signedIn('admin@sessions.test')
    expect((await member.post(`/api/members/${ids.admin}/sign-out`)).status).toBe(403)
    const r = await admin.post(`/api/members/${ids.member}/sign-out`)
    expect(r.status).toBe(200)
    expect((await member.get('/api/auth/me')).status).toBe(401)
  })

  it('a password change needs the current password and ends every other session', async () => {
    const here = await signedIn('member@sessions.test')
    const there = await signedIn('member@sessions.test')
    const wrong = await here.post('/api/auth/password', { currentPassword: 'not-my-password', newPassword: 'a-brand-new-password' })
    expect(wrong.status).toBe(400)
    const short = await here.post('/api/auth/password', { currentPassword: PASSWORD, newPassword: 'short' })
    expect(short.status).toBe(400)
    expect((await there.get('/api/auth/me')).status).toBe(200)
    const ok = await here.post('/api/auth/password', { currentPassword: PASSWORD, newPassword: 'a-brand-new-password' })
    expect(ok.status).toBe(200)
    expect((await there.get('/api/auth/me')).status).toBe(401)
    expect((await here.get('/api/auth/me')).status).toBe(200)
    expect((await client().post('/api/auth/login', { email: 'member@sessions.test', password: PASSWORD })).status).toBe(401)
    await signedIn('member@sessions.test', 'a-brand-new-password')
  })
})

describe('the last admin', () => {
  it('two admins demoting themselves at once leave one admin (one 200, one 409)', async () => {
    const first = await signedIn('admin@sessions.test')
    const second = await signedIn('second@sessions.test')
    const answers = await Promise.all([
      first.patch(`/api/members/${ids.admin}`, { role: 'engineer' }),
      second.patch(`/api/members/${ids.second}`, { role: 'engineer' }),
    ])
    expect(answers.map(a => a.status).sort()).toEqual([200, 409])
    const stillAdmin = answers[0]!.status === 409 ? first : second
    const members = await stillAdmin.get('/api/members')
    expect(members.status).toBe(200)
    expect(members.body.members.filter((m: any) => m.role === 'admin')).toHaveLength(1)
  })
})

describe('API tokens', () => {
  it('are made only from a browser session, not with another token', async () => {
    const owner = await signedIn('owner@sessions.test')
    const made = await owner.post('/api/tokens', { name: 'script' })
    expect(made.status).toBe(201)
    const r = await client().withToken(made.body.token).post('/api/tokens', { name: 'a token made by a token' })
    expect(r.status).toBe(403)
    expect(r.body.message).toMatch(/browser session/)
  })

  it('take an optional expiry; an expired token is refused, and the last use is shown', async () => {
    const owner = await signedIn('owner@sessions.test')
    const bad = await owner.post('/api/tokens', { name: 'forever', expiresInDays: 0 })
    expect(bad.status).toBe(400)
    const made = await owner.post('/api/tokens', { name: 'for a week', expiresInDays: 7 })
    expect(made.status).toBe(201)
    const days = (new Date(made.body.expiresAt).getTime() - Date.now()) / 86_400_000
    expect(days).toBeGreaterThan(6.9)
    expect(days).toBeLessThanOrEqual(7)
    const bearer = client().withToken(made.body.token)
    expect((await bearer.get('/api/auth/me')).status).toBe(200)
    const listed = (await owner.get('/api/tokens')).body.tokens.find((t: any) => t.id === made.body.id)
    expect(listed.lastUsedAt).not.toBeNull()

    const expiring = await owner.post('/api/tokens', { name: 'already over', expiresInDays: 1 })
    // Move its expiry into the past from outside, before this server has ever seen it used.
    await sql('UPDATE api_tokens SET expiresAt = ? WHERE id = ?', ['2000-01-01 00:00:00.000 +00:00', expiring.body.id])
    const refused = await client().withToken(expiring.body.token).get('/api/auth/me')
    expect(refused.status).toBe(401)
    expect(refused.body.message).toMatch(/expired/)
  })
})

import type { ChildProcess } from 'node:child_process'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
// @ts-expect-error plain ESM helper without types
import { freePort, startServer } from '../../scripts/lib.mjs'
import { Client } from '../api/support/client'
import { createTestDatabase, dropTestDatabase } from '../api/support/postgres'

// Two stateless server processes on one PostgreSQL database (run by .ci/run with
// KERNWISE_TEST_PG set): what one server writes, the other honours, within the account cache's
// stated lifetime of 5 s (README "Security and data").
const BOUND_MS = 5_000
const servers: { url: string; child: ChildProcess }[] = []
let database = ''

beforeAll(async () => {
  database = await createTestDatabase()
  for (let i = 0; i < 2; i++) {
    const port = await freePort()
    servers.push(await startServer({ PORT: String(port), NUXT_DATABASE_URL: database, NUXT_SESSION_PASSWORD: 'test-only-session-password-0123456789abcdef', NUXT_SEED_DEMO: 'false' }))
  }
})

afterAll(async () => {
  for (const s of servers) {
    const exited = new Promise(r => s.child.once('exit', r))
    s.child.kill('SIGTERM')
    await exited
  }
  if (database) await dropTestDatabase(database)
})

/** Asks `probe` until it gives `want` or the bound (plus a margin for the request itself) has passed. */
async function eventually(probe: () => Promise<number>, want: number): Promise<number> {
  const deadline = Date.now() + BOUND_MS + 1_000
  let got = await probe()
  while (got !== want && Date.now() < deadline) {
    await new Promise(r => setTimeout(r, 250))
    got = await probe()
  }
  return got
}

describe('two server processes on one PostgreSQL database', () => {
  it('a session made on one works on the other; a sign-out on one is refused by the other within the bound', async () => {
    const a = new Client(() => servers[0]!.url)
    expect((await a.post('/api/auth/register', { email: 'twin@pg.test', password: 'correct-horse-battery', name: 'Twin' })).status).toBe(201)
    const b = new Client(() => servers[1]!.url).useCookieHeader(a.cookieHeader())
    expect((await b.get('/api/auth/me')).status).toBe(200)
    expect((await a.post('/api/auth/logout')).status).toBe(200)
    expect(await eventually(async () => (await b.get('/api/auth/me')).status, 401)).toBe(401)
  })

  it('a token revoked on one is refused by the other within the bound', async () => {
    const a = new Client(() => servers[0]!.url)
    expect((await a.post('/api/auth/login', { email: 'twin@pg.test', password: 'correct-horse-battery' })).status).toBe(200)
    const made = await a.post('/api/tokens', { name: 'twin script' })
    const onB = new Client(() => servers[1]!.url).withToken(made.body.token)
    expect((await onB.get('/api/auth/me')).status).toBe(200)
    expect((await a.delete(`/api/tokens/${made.body.id}`)).status).toBe(200)
    expect(await eventually(async () => (await onB.get('/api/auth/me')).status, 401)).toBe(401)
  })

  it('concurrent saves through both keep the 409 rule: one wins, the rest see the stored version', async () => {
    const a = new Client(() => servers[0]!.url)
    expect((await a.post('/api/auth/login', { email: 'twin@pg.test', password: 'correct-horse-battery' })).status).toBe(200)
    const b = new Client(() => servers[1]!.url).useCookieHeader(a.cookieHeader())
    const made = await a.post('/api/sketches', { title: 'Shared' })
    const answers = await Promise.all(Array.from({ length: 8 }, (_, i) => (i % 2 ? b : a).patch(`/api/sketches/${made.body.id}`, { version: 1, title: `save ${i}` })))
    expect(answers.filter(r => r.status === 200)).toHaveLength(1)
    const lost = answers.filter(r => r.status === 409)
    expect(lost).toHaveLength(7)
    for (const r of lost) expect(r.body.data.currentVersion).toBe(2)
  })
})

import { spawnSync } from 'node:child_process'
import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

// `npm run db:seed` into a fresh file, then the built server opens that file.
const dir = mkdtempSync(join(tmpdir(), 'kernwise-seed-'))
const dbPath = join(dir, 'seeded.sqlite')
const seeded = spawnSync(process.execPath, ['scripts/db.mjs', 'seed'], { env: { ...process.env, NUXT_DB_PATH: dbPath }, encoding: 'utf8' })
const server = useTestServer({ NUXT_DB_PATH: dbPath })

describe('npm run db:seed', () => {
  it('exits 0 and says where it seeded', () => {
    expect(seeded.status, seeded.stderr).toBe(0)
    expect(seeded.stdout).toContain(dbPath)
  })

  it.each([
    ['admin@millrace.test', 'admin'],
    ['engineer@millrace.test', 'engineer'],
    ['checker@millrace.test', 'checker'],
    ['viewer@millrace.test', 'viewer'],
  ])('%s signs in with the demo password as %s', async (email, role) => {
    const r = await new Client(() => server.url).post('/api/auth/login', { email, password: 'millrace-demo-2026' })
    expect(r.status).toBe(200)
    expect(r.body.user.role).toBe(role)
  })

  it('the engineer owns the six demo sketches, one submitted and one approved, all valid documents', async () => {
    const c = new Client(() => server.url)
    await c.post('/api/auth/login', { email: 'engineer@millrace.test', password: 'millrace-demo-2026' })
    const list = await c.get('/api/sketches')
    expect(list.status).toBe(200)
    expect(list.body.sketches).toHaveLength(6)
    const statuses = list.body.sketches.map((s: any) => s.status).sort()
    expect(statuses.filter((s: string) => s === 'submitted')).toHaveLength(1)
    expect(statuses.filter((s: string) => s === 'approved')).toHaveLength(1)
    for (const s of list.body.sketches) {
      const full = await c.get(`/api/sketches/${s.id}`)
      expect(full.status).toBe(200)
      expect(full.body.document.parts.length).toBeGreaterThan(0)
    }
  })

  it('the team side of the demo: M1 awaits the checker with two comments (one answered), C3 revision 1 is approved with a link, S5 is shared with the viewer, and the outbox holds their mails', async () => {
    const login = async (email: string) => {
      const c = new Client(() => server.url)
      await c.post('/api/auth/login', { email, password: 'millrace-demo-2026' })
      return c
    }
    const checker = await login('checker@millrace.test')
    const review = (await checker.get('/api/sketches?scope=review')).body
    expect(review.sketches.map((s: any) => s.title)).toEqual(['Mezzanine post M1'])
    const m1 = review.sketches[0].id
    const comments = (await checker.get(`/api/sketches/${m1}/comments`)).body.comments
    expect(comments.filter((c: any) => !c.parentId).map((c: any) => c.body).sort()).toEqual(['Add the second load case for the crane bracket side', 'Confirm the 22 mm holes are drilled, not punched'])
    expect(comments.filter((c: any) => c.parentId)).toHaveLength(1)
    expect(comments.find((c: any) => c.body.startsWith('Confirm')).at).toEqual({ x: -112.5, y: 105 })
    const engineer = await login('engineer@millrace.test')
    const mine = (await engineer.get('/api/sketches')).body.sketches
    const c3 = mine.find((s: any) => s.title === 'Crane column C3').id
    const detail = (await engineer.get(`/api/sketches/${c3}`)).body
    expect(detail).toMatchObject({ status: 'approved', approvedBy: 'Cora Vint (checker)', approvedRevision: { number: 1, note: 'Issued for fabrication' } })
    const links = (await engineer.get(`/api/sketches/${c3}/links`)).body.links
    expect(links).toEqual([expect.objectContaining({ revision: 1, expiresAt: null, live: true })])
    const viewer = await login('viewer@millrace.test')
    const shared = (await viewer.get('/api/sketches?scope=shared')).body.sketches
    expect(shared.map((s: any) => s.title)).toEqual(['Canopy strut S5'])
    expect((await viewer.get(`/api/sketches/${shared[0].id}`)).body.access).toBe('view')
    const admin = await login('admin@millrace.test')
    const kinds = ((await admin.get('/api/outbox')).body as any[]).map(m => m.kind).sort()
    expect(kinds).toEqual(['review-approved', 'review-request', 'share'])
    expect((await admin.get('/api/settings')).body.workspaceName).toBe('Millrace Yard retrofit')
  })

  it('seeding again is safe: still one set of demo sketches', () => {
    // The server holds the file open in WAL mode; a second writer must still succeed.
    const again = spawnSync(process.execPath, ['scripts/db.mjs', 'seed'], { env: { ...process.env, NUXT_DB_PATH: dbPath }, encoding: 'utf8' })
    expect(again.status, again.stderr).toBe(0)
  })

  it('after re-seeding the list still has six sketches', async () => {
    const c = new Client(() => server.url)
    await c.post('/api/auth/login', { email: 'engineer@millrace.test', password: 'millrace-demo-2026' })
    expect((await c.get('/api/sketches')).body.sketches).toHaveLength(6)
    // The re-seed replaced the team side too: one set of mails, one submission.
    const admin = new Client(() => server.url)
    await admin.post('/api/auth/login', { email: 'admin@millrace.test', password: 'millrace-demo-2026' })
    expect(((await admin.get('/api/outbox')).body as any[])).toHaveLength(3)
  })
})

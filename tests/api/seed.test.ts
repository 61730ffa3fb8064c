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

  it('seeding again is safe: still one set of demo sketches', () => {
    // The server holds the file open in WAL mode; a second writer must still succeed.
    const again = spawnSync(process.execPath, ['scripts/db.mjs', 'seed'], { env: { ...process.env, NUXT_DB_PATH: dbPath }, encoding: 'utf8' })
    expect(again.status, again.stderr).toBe(0)
  })

  it('after re-seeding the list still has six sketches', async () => {
    const c = new Client(() => server.url)
    await c.post('/api/auth/login', { email: 'engineer@millrace.test', password: 'millrace-demo-2026' })
    expect((await c.get('/api/sketches')).body.sketches).toHaveLength(6)
  })
})

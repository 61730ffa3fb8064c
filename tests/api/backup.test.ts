import { spawnSync } from 'node:child_process'
import { existsSync, writeFileSync } from 'node:fs'
import { join } from 'node:path'
import sqlite3 from 'sqlite3'
import { beforeAll, describe, expect, it } from 'vitest'
// @ts-expect-error plain ESM helper without types
import { root } from '../../scripts/lib.mjs'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const dbPath = () => join(server.dir, 'test.sqlite')
let owner: Client

function db(...args: string[]) {
  return spawnSync(process.execPath, ['scripts/db.mjs', ...args], { cwd: root, env: { ...process.env, NUXT_DB_PATH: dbPath() }, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] })
}

function titles(file: string): Promise<string[]> {
  return new Promise((resolve, reject) => {
    const d = new sqlite3.Database(file, sqlite3.OPEN_READONLY)
    d.all('SELECT title FROM sketches ORDER BY title', (error, rows: { title: string }[]) => {
      d.close()
      if (error) reject(error)
      else resolve(rows.map(r => r.title))
    })
  })
}

beforeAll(async () => {
  owner = new Client(() => server.url)
  expect((await owner.post('/api/auth/register', { email: 'keeper@backup.test', password: 'correct-horse-battery', name: 'Keeper' })).status).toBe(201)
})

describe('db:backup and db:restore', () => {
  it('a backup taken while the server runs holds what was just saved (still in the WAL)', async () => {
    expect((await owner.post('/api/sketches', { title: 'Saved a moment ago' })).status).toBe(201)
    // Copying the file alone would miss this: the WAL has not been checkpointed into it.
    const target = join(server.dir, 'copy.sqlite')
    const r = db('backup', target)
    expect(r.status, r.stderr).toBe(0)
    expect(await titles(target)).toEqual(['Saved a moment ago'])
    expect(db('backup', target).status).toBe(1) // never overwrites
  })

  it('restore refuses a file that is not a Kernwise database and changes nothing', async () => {
    const junk = join(server.dir, 'junk.sqlite')
    writeFileSync(junk, 'not a database at all')
    const r = db('restore', junk, '--yes')
    expect(r.status).toBe(1)
    expect(r.stderr).toMatch(/Not restored.*unchanged/)
    expect(await titles(dbPath())).toEqual(['Saved a moment ago'])
  })

  it('restore asks first, then brings a backup back and keeps the replaced database', async () => {
    const target = join(server.dir, 'copy.sqlite')
    expect((await owner.post('/api/sketches', { title: 'Made after the backup' })).status).toBe(201)
    const asked = db('restore', target)
    expect(asked.status).toBe(1)
    expect(asked.stderr).toMatch(/Nothing restored/)
    const r = db('restore', target, '--yes')
    expect(r.status, r.stderr).toBe(0)
    const kept = /Kept the current database as (\S+)/.exec(r.stdout)?.[1]
    expect(kept && existsSync(kept)).toBe(true)
    expect(await titles(dbPath())).toEqual(['Saved a moment ago'])
    expect(await titles(kept!)).toEqual(['Made after the backup', 'Saved a moment ago'])
  })
})

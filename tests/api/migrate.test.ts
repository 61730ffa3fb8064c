import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { SequelizeStorage, Umzug } from 'umzug'
import { describe, expect, it } from 'vitest'
import { openDatabase } from '../../server/database/connection'
import { migrations } from '../../server/database/migrations'
import { Client } from './support/client'
import { useTestServer } from './support/server'

// An "older" database: only the first migration applied, as a first release would have left it.
const dir = mkdtempSync(join(tmpdir(), 'kernwise-migrate-'))
const dbPath = join(dir, 'old.sqlite')
const older = await openDatabase(dbPath)
await new Umzug({
  migrations: migrations.slice(0, 1).map(m => ({ name: m.name, up: m.up, down: m.down })),
  context: older.getQueryInterface(),
  storage: new SequelizeStorage({ sequelize: older, tableName: 'schema_migrations' }),
  logger: undefined,
}).up()
const before = (await older.getQueryInterface().showAllTables()).sort()
await older.close()

const server = useTestServer({ NUXT_DB_PATH: dbPath })

describe('the server migrates an older database at start', () => {
  it('the older file had no sketches table', () => {
    expect(before).toContain('users')
    expect(before).not.toContain('sketches')
  })

  it('after start, sketches can be created in it', async () => {
    const c = new Client(() => server.url)
    expect((await c.post('/api/auth/register', { email: 'late@migrate.test', password: 'correct-horse-battery', name: 'Late' })).status).toBe(201)
    expect((await c.post('/api/sketches', { title: 'After upgrade' })).status).toBe(201)
    const db = await openDatabase(dbPath)
    const [rows] = await db.query('SELECT name FROM schema_migrations ORDER BY name')
    await db.close()
    expect((rows as { name: string }[]).map(r => r.name)).toEqual(migrations.map(m => m.name))
  })
})

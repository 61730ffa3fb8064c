import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize'
import { afterEach, describe, expect, it } from 'vitest'
import { openDatabase } from '../../../server/database/connection'
import { migrate } from '../../../server/database/migrate'
import { migrations } from '../../../server/database/migrations'

const dirs: string[] = []
const open: Sequelize[] = []
afterEach(async () => {
  for (const s of open.splice(0)) await s.close()
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true })
})

async function fresh(): Promise<Sequelize> {
  const dir = mkdtempSync(join(tmpdir(), 'kernwise-migrate-'))
  dirs.push(dir)
  const s = await openDatabase(join(dir, 'm.sqlite'))
  open.push(s)
  return s
}

async function tables(s: Sequelize): Promise<string[]> {
  const [rows] = await s.query("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name") as [{ name: string }[], unknown]
  return rows.map(r => r.name)
}

const good = {
  name: '9001-good',
  up: async ({ context: qi }: { context: QueryInterface }) => { await qi.createTable('extra_good', { id: { type: DataTypes.INTEGER, primaryKey: true } }) },
  down: async ({ context: qi }: { context: QueryInterface }) => { await qi.dropTable('extra_good') },
}
const bad = {
  name: '9002-bad',
  up: async ({ context: qi }: { context: QueryInterface }) => {
    await qi.createTable('extra_half', { id: { type: DataTypes.INTEGER, primaryKey: true } })
    await qi.addColumn('users', 'nickname', { type: DataTypes.STRING(40), allowNull: true })
    throw new Error('this migration fails half-way')
  },
  down: async () => {},
}

describe('migrate(sequelize, list)', () => {
  it('a failing migration leaves the database as it was, the pending ones before it included', async () => {
    const s = await fresh()
    await migrate(s)
    const before = await tables(s)
    const [columnsBefore] = await s.query('PRAGMA table_info(users)')
    await expect(migrate(s, [...migrations, good, bad] as never)).rejects.toThrow(/fails half-way/)
    expect(await tables(s)).toEqual(before)
    expect(await s.query('PRAGMA table_info(users)').then(r => r[0])).toEqual(columnsBefore)
    const [applied] = await s.query('SELECT name FROM schema_migrations ORDER BY name') as [{ name: string }[], unknown]
    expect(applied.map(r => r.name)).toEqual(migrations.map(m => m.name))
    // The database still works and the good one applies once the bad one is gone.
    expect(await migrate(s, [...migrations, good] as never)).toEqual(['9001-good'])
  })

  it('sets synchronous = FULL (2) on the connection', async () => {
    const s = await fresh()
    const [rows] = await s.query('PRAGMA synchronous') as [{ synchronous: number }[], unknown]
    expect(rows[0]!.synchronous).toBe(2) // SQLite's documented code for FULL
  })
})

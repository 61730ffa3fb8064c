import { existsSync, mkdirSync, renameSync, rmSync } from 'node:fs'
import { dirname } from 'node:path'
import type { Sequelize } from 'sequelize'
import { migrations } from './migrations'

/**
 * Writes a consistent copy of the open database to `target` with VACUUM INTO: one read
 * transaction, so it holds everything committed (what is still in the WAL included) while the
 * app keeps running. Refuses to overwrite.
 */
export async function backupTo(sequelize: Sequelize, target: string): Promise<void> {
  if (existsSync(target)) throw new Error(`${target} exists already; choose another name.`)
  mkdirSync(dirname(target), { recursive: true })
  await sequelize.query('VACUUM INTO ?', { replacements: [target] })
}

/**
 * Checks that `db` (a connection to a candidate backup) is a sound Kernwise database this code
 * can run: SQLite's integrity check passes, it has the migration table, and every migration it
 * records is one this code knows. Throws with the reason otherwise.
 */
export async function checkBackup(db: Sequelize): Promise<{ migrations: string[]; users: number; sketches: number }> {
  const [integrity] = await db.query('PRAGMA integrity_check') as [{ integrity_check: string }[], unknown]
  if (integrity[0]?.integrity_check !== 'ok') throw new Error(`the integrity check failed: ${integrity.map(r => r.integrity_check).join('; ')}`)
  const [tables] = await db.query("SELECT name FROM sqlite_master WHERE type = 'table'") as [{ name: string }[], unknown]
  const names = new Set(tables.map(t => t.name))
  for (const needed of ['schema_migrations', 'users', 'sketches']) {
    if (!names.has(needed)) throw new Error(`it has no ${needed} table: not a Kernwise database`)
  }
  const [rows] = await db.query('SELECT name FROM schema_migrations') as [{ name: string }[], unknown]
  const known = new Set(migrations.map(m => m.name))
  const unknown = rows.map(r => r.name).filter(n => !known.has(n))
  if (unknown.length) throw new Error(`it was made by a newer Kernwise (migrations ${unknown.join(', ')}); update this one first`)
  const [[u]] = await db.query('SELECT COUNT(*) AS n FROM users') as [{ n: number }[], unknown]
  const [[s]] = await db.query('SELECT COUNT(*) AS n FROM sketches') as [{ n: number }[], unknown]
  return { migrations: rows.map(r => r.name), users: u!.n, sketches: s!.n }
}

/** Puts the checked file `source` in place of the database at `path` (its WAL and shared-memory files removed). */
export function replaceDatabase(source: string, path: string): void {
  for (const suffix of ['-wal', '-shm']) rmSync(path + suffix, { force: true })
  renameSync(source, path)
}

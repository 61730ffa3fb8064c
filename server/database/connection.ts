import { mkdirSync } from 'node:fs'
import { dirname, resolve } from 'node:path'
import { Sequelize } from 'sequelize'
import sqlite3 from 'sqlite3'

/**
 * Opens the SQLite file at `path` (created with its folder if missing): WAL journal, foreign keys
 * on, and synchronous = FULL, so a save that was acknowledged survives a power cut (with WAL,
 * NORMAL could lose the last commits; FULL syncs the log at every commit).
 */
export async function openDatabase(path: string): Promise<Sequelize> {
  const file = resolve(path)
  mkdirSync(dirname(file), { recursive: true })
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    dialectModule: sqlite3,
    storage: file,
    logging: false,
    // One connection: SQLite serialises writers anyway, and pragmas stay set on it.
    pool: { max: 1, min: 1, idle: 60_000 },
    retry: { max: 5, match: [/SQLITE_BUSY/] },
  })
  await sequelize.query('PRAGMA journal_mode = WAL;')
  await sequelize.query('PRAGMA synchronous = FULL;')
  await sequelize.query('PRAGMA foreign_keys = ON;')
  await sequelize.query('PRAGMA busy_timeout = 5000;')
  return sequelize
}

import { mkdirSync } from 'node:fs'
import { dirname, resolve } from 'node:path'
import pg from 'pg'
import { Op, Sequelize, Transaction, type TransactionOptions } from 'sequelize'
import sqlite3 from 'sqlite3'

// The database adapter: everything that differs between SQLite and PostgreSQL is in this file
// (backup.ts is the SQLite backup; PostgreSQL has pg_dump).

const targets = new WeakMap<Sequelize, string>()

/** True when `target` names a PostgreSQL database (postgres:// or postgresql:// URL) rather than a SQLite file. */
export function isPostgresUrl(target: string): boolean {
  return /^postgres(ql)?:\/\//i.test(target)
}

/**
 * Opens the database `target`: a PostgreSQL URL (Sequelize's postgres dialect through `pg`, a
 * pool of `poolMax` connections), else a SQLite file (created with its folder if missing) in WAL
 * mode with foreign keys on and synchronous = FULL, so a save that was acknowledged survives a
 * power cut (with WAL, NORMAL could lose the last commits; FULL syncs the log at every commit).
 */
export async function openDatabase(target: string, { poolMax = 10 } = {}): Promise<Sequelize> {
  if (isPostgresUrl(target)) {
    const sequelize = new Sequelize(target, { dialect: 'postgres', dialectModule: pg, logging: false, pool: { max: poolMax, min: 0, idle: 30_000 } })
    await sequelize.authenticate()
    targets.set(sequelize, target)
    return sequelize
  }
  const file = resolve(target)
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

/**
 * Runs `work` (the migrations) as one transaction on a connection that every query without a
 * transaction uses: SQLite's single connection (BEGIN IMMEDIATE), or, for PostgreSQL, a
 * one-connection Sequelize opened for it, holding an advisory lock so two instances starting at
 * once migrate one after the other. A failure rolls everything back.
 */
export async function inMigrationTransaction<T>(sequelize: Sequelize, work: (on: Sequelize) => Promise<T>): Promise<T> {
  const postgres = sequelize.getDialect() === 'postgres'
  const on = postgres ? await openDatabase(targets.get(sequelize)!, { poolMax: 1 }) : sequelize
  try {
    await on.query(postgres ? 'BEGIN' : 'BEGIN IMMEDIATE')
    if (postgres) await on.query('SELECT pg_advisory_xact_lock(7140014)')
    try {
      const result = await work(on)
      await on.query('COMMIT')
      return result
    } catch (error) {
      await on.query('ROLLBACK')
      throw error
    }
  } finally {
    if (on !== sequelize) await on.close()
  }
}

/**
 * Options for a transaction that reads a count and writes by it (the last admin): SQLite takes
 * the write lock at BEGIN (IMMEDIATE); PostgreSQL locks the rows read (`lock: true`, FOR UPDATE).
 */
export function countAndWrite(sequelize: Sequelize): { options: TransactionOptions; lock: boolean } {
  return sequelize.getDialect() === 'sqlite' ? { options: { type: Transaction.TYPES.IMMEDIATE }, lock: false } : { options: {}, lock: true }
}

/** The case-insensitive LIKE operator: SQLite's LIKE already ignores ASCII case, PostgreSQL needs ILIKE. */
export function likeIgnoringCase(sequelize: Sequelize): typeof Op.like | typeof Op.iLike {
  return sequelize.getDialect() === 'postgres' ? Op.iLike : Op.like
}

import type { Sequelize } from 'sequelize'
import { SequelizeStorage, Umzug } from 'umzug'
import { migrations as all } from './migrations'

type Migration = (typeof all)[number]

/**
 * Applies every pending migration; returns the names applied. On SQLite the whole run is one
 * transaction on the connection the migrations use (SQLite's DDL is transactional), so a
 * migration that fails leaves the database exactly as it was, earlier pending ones included.
 * `list` is for tests; the server always passes the full list.
 */
export async function migrate(sequelize: Sequelize, list: readonly Migration[] = all): Promise<string[]> {
  const umzug = new Umzug({
    migrations: list.map(m => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  })
  const sqlite = sequelize.getDialect() === 'sqlite'
  if (!sqlite || (await umzug.pending()).length === 0) return (await umzug.up()).map(m => m.name)
  // Raw statements on the one default connection that every query without a transaction uses.
  await sequelize.query('BEGIN IMMEDIATE')
  try {
    const done = await umzug.up()
    await sequelize.query('COMMIT')
    return done.map(m => m.name)
  } catch (error) {
    await sequelize.query('ROLLBACK')
    throw error
  }
}

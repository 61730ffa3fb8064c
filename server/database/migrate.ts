import type { Sequelize } from 'sequelize'
import { SequelizeStorage, Umzug } from 'umzug'
import { inMigrationTransaction } from './connection'
import { migrations as all } from './migrations'

type Migration = (typeof all)[number]

/**
 * Applies every pending migration; returns the names applied. The whole run is one transaction
 * (SQLite's and PostgreSQL's DDL are transactional, see inMigrationTransaction), so a migration
 * that fails leaves the database exactly as it was, earlier pending ones included.
 * `list` is for tests; the server always passes the full list.
 */
export async function migrate(sequelize: Sequelize, list: readonly Migration[] = all): Promise<string[]> {
  const run = async (on: Sequelize) => {
    const umzug = new Umzug({
      migrations: list.map(m => ({ name: m.name, up: m.up, down: m.down })),
      context: on.getQueryInterface(),
      storage: new SequelizeStorage({ sequelize: on, tableName: 'schema_migrations' }),
      logger: undefined,
    })
    return (await umzug.up()).map(m => m.name)
  }
  return inMigrationTransaction(sequelize, run)
}

import { openDatabase } from '../database/connection'
import { migrate } from '../database/migrate'
import { demoAccountsWithPublishedPassword, listensBeyondLoopback, refusalMessage } from '../database/demo-guard'
import { seedDemoIfEmpty } from '../database/seed'
import { initModels, type Db } from '../models'
import { hashPassword, verifyPassword } from '#imports'

let ready: Promise<Db> | null = null

/**
 * The one database of this server (NUXT_DATABASE_URL for PostgreSQL, else the SQLite file NUXT_DB_PATH): opened, migrated (and seeded with the demo workspace when
 * runtime config `seedDemo` is on and the database has no accounts) on first use.
 * Every route awaits it, so no request sees a half-migrated database. A production server that
 * listens beyond loopback while demo accounts keep their published password exits here, before
 * any request is served (README "Demo workspace").
 */
export function useDb(): Promise<Db> {
  if (!ready) {
    const config = useRuntimeConfig()
    ready = (async () => {
      const sequelize = await openDatabase(String(config.databaseUrl || config.dbPath || '.data/kernwise.sqlite'))
      await migrate(sequelize)
      const db = initModels(sequelize)
      if (config.seedDemo === true || config.seedDemo === 'true' || config.seedDemo === '1') {
        await seedDemoIfEmpty(db, hashPassword)
      }
      if (!import.meta.dev && listensBeyondLoopback()) {
        const open = await demoAccountsWithPublishedPassword(db, verifyPassword)
        if (open.length) {
          console.error(refusalMessage(process.env.NITRO_HOST || process.env.HOST, open))
          process.exit(1)
        }
      }
      return db
    })()
    ready.catch(() => { ready = null })
  }
  return ready
}

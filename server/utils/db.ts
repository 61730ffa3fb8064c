import { openDatabase } from '../database/connection'
import { migrate } from '../database/migrate'
import { seedDemoIfEmpty } from '../database/seed'
import { initModels, type Db } from '../models'
import { hashPassword } from '#imports'

let ready: Promise<Db> | null = null

/**
 * The one database of this server: opened, migrated (and seeded with the demo workspace when
 * runtime config `seedDemo` is on and the database has no accounts) on first use.
 * Every route awaits it, so no request sees a half-migrated database.
 */
export function useDb(): Promise<Db> {
  if (!ready) {
    const config = useRuntimeConfig()
    ready = (async () => {
      const sequelize = await openDatabase(String(config.dbPath || '.data/kernwise.sqlite'))
      await migrate(sequelize)
      const db = initModels(sequelize)
      if (config.seedDemo === true || config.seedDemo === 'true' || config.seedDemo === '1') {
        await seedDemoIfEmpty(db, hashPassword)
      }
      return db
    })()
    ready.catch(() => { ready = null })
  }
  return ready
}

// Command-line database tasks (npm run db:seed, npm run db:reset), run with tsx outside Nitro.
import { rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import { openDatabase } from './connection'
import { migrate } from './migrate'
import { seedDemo } from './seed'
import { initModels } from '../models'

// The same scrypt defaults nuxt-auth-utils' hashPassword uses, so seeded passwords verify.
const hasher = new Hash(new Scrypt({}))

async function main(): Promise<void> {
  const task = process.argv[2]
  const path = resolve(process.env.NUXT_DB_PATH || '.data/kernwise.sqlite')
  if (task === 'reset') {
    for (const suffix of ['', '-wal', '-shm']) rmSync(path + suffix, { force: true })
    console.log(`Removed ${path}`)
  } else if (task !== 'seed') {
    console.error('usage: db.mjs seed|reset')
    process.exit(2)
  }
  const sequelize = await openDatabase(path)
  const applied = await migrate(sequelize)
  if (applied.length) console.log(`Applied migrations: ${applied.join(', ')}`)
  await seedDemo(initModels(sequelize), pw => hasher.make(pw))
  await sequelize.close()
  console.log(`Seeded the demo workspace into ${path}`)
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

// Command-line database tasks (npm run db:seed, db:reset, db:passwords), run with tsx outside Nitro.
import { randomBytes } from 'node:crypto'
import { rmSync } from 'node:fs'
import { resolve } from 'node:path'
import { createInterface } from 'node:readline/promises'
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import { openDatabase } from './connection'
import { demoAccountsWithPublishedPassword } from './demo-guard'
import { migrate } from './migrate'
import { seedDemo } from './seed'
import { initModels } from '../models'

// The same scrypt defaults nuxt-auth-utils' hashPassword uses, so seeded passwords verify.
const hasher = new Hash(new Scrypt({}))
const USAGE = 'usage: db.mjs seed | reset [--yes] [--no-demo] | passwords'

/** Asks on the terminal; anything but "yes" (or no terminal at all) is a no. */
async function confirm(question: string): Promise<boolean> {
  if (!process.stdin.isTTY) return false
  const rl = createInterface({ input: process.stdin, output: process.stdout })
  const answer = await rl.question(`${question} Type "yes" to go on: `)
  rl.close()
  return answer.trim().toLowerCase() === 'yes'
}

async function main(): Promise<void> {
  const [task, ...flags] = process.argv.slice(2)
  const path = resolve(process.env.NUXT_DB_PATH || '.data/kernwise.sqlite')
  if (!['seed', 'reset', 'passwords'].includes(task ?? '')) {
    console.error(USAGE)
    process.exit(2)
  }
  if (task === 'reset') {
    if (!flags.includes('--yes') && !(await confirm(`This deletes ${path} with every account and sketch in it.`))) {
      console.error('Nothing deleted. (Pass --yes to reset without the question, e.g. in a script.)')
      process.exit(1)
    }
    for (const suffix of ['', '-wal', '-shm']) rmSync(path + suffix, { force: true })
    console.log(`Removed ${path}`)
  }
  const sequelize = await openDatabase(path)
  const applied = await migrate(sequelize)
  if (applied.length) console.log(`Applied migrations: ${applied.join(', ')}`)
  const db = initModels(sequelize)
  if (task === 'passwords') {
    const open = await demoAccountsWithPublishedPassword(db, (hash, pw) => hasher.verify(hash, pw))
    for (const email of open) {
      const password = randomBytes(12).toString('base64url')
      await db.User.update({ passwordHash: await hasher.make(password) }, { where: { email } })
      console.log(`${email}  ${password}`)
    }
    console.log(open.length ? 'New passwords set (shown this once).' : 'No demo account has the published password.')
  } else if (flags.includes('--no-demo')) {
    console.log(`Empty database ready at ${path}; the first account registered becomes admin.`)
  } else {
    await seedDemo(db, pw => hasher.make(pw))
    console.log(`Seeded the demo workspace into ${path}`)
  }
  await sequelize.close()
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

// Command-line database tasks (npm run db:seed, db:reset, db:passwords, db:backup, db:restore), run with tsx outside Nitro.
import { randomBytes } from 'node:crypto'
import { copyFileSync, existsSync, rmSync } from 'node:fs'
import { dirname, join, resolve } from 'node:path'
import { createInterface } from 'node:readline/promises'
import { Hash } from '@adonisjs/hash'
import { Scrypt } from '@adonisjs/hash/drivers/scrypt'
import { backupTo, checkBackup, replaceDatabase } from './backup'
import { openDatabase } from './connection'
import { demoAccountsWithPublishedPassword } from './demo-guard'
import { migrate } from './migrate'
import { seedDemo } from './seed'
import { initModels } from '../models'

// The same scrypt defaults nuxt-auth-utils' hashPassword uses, so seeded passwords verify.
const hasher = new Hash(new Scrypt({}))
const USAGE = 'usage: db.mjs seed | reset [--yes] [--no-demo] | passwords | backup [FILE] | restore FILE [--yes]'

const stamp = () => new Date().toISOString().replace(/[-:]/g, '').replace(/\..*$/, '').replace('T', '-')

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
  const url = process.env.NUXT_DATABASE_URL || ''
  const path = resolve(process.env.NUXT_DB_PATH || '.data/kernwise.sqlite')
  if (url && ['backup', 'restore', 'reset'].includes(task ?? '')) {
    console.error(`${task} works on the SQLite file; for PostgreSQL use pg_dump / pg_restore / dropdb.`)
    process.exit(2)
  }
  if (!['seed', 'reset', 'passwords', 'backup', 'restore'].includes(task ?? '')) {
    console.error(USAGE)
    process.exit(2)
  }
  if (task === 'backup') return backup(path, flags.find(f => !f.startsWith('--')))
  if (task === 'restore') return restore(path, flags.find(f => !f.startsWith('--')), flags.includes('--yes'))
  if (task === 'reset') {
    if (!flags.includes('--yes') && !(await confirm(`This deletes ${path} with every account and sketch in it.`))) {
      console.error('Nothing deleted. (Pass --yes to reset without the question, e.g. in a script.)')
      process.exit(1)
    }
    for (const suffix of ['', '-wal', '-shm']) rmSync(path + suffix, { force: true })
    console.log(`Removed ${path}`)
  }
  const sequelize = await openDatabase(url || path)
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

/** npm run db:backup [FILE]: a consistent copy while the app runs (default .data/backups/kernwise-<time>.sqlite beside the database). */
async function backup(path: string, target?: string): Promise<void> {
  if (!existsSync(path)) throw new Error(`There is no database at ${path}.`)
  const file = resolve(target ?? join(dirname(path), 'backups', `kernwise-${stamp()}.sqlite`))
  const sequelize = await openDatabase(path)
  try {
    await backupTo(sequelize, file)
  } finally {
    await sequelize.close()
  }
  console.log(`Backed up ${path} to ${file}`)
}

/** npm run db:restore FILE: checks the backup, keeps a copy of the current database, then puts the backup in its place. */
async function restore(path: string, source: string | undefined, yes: boolean): Promise<void> {
  if (!source || !existsSync(source)) throw new Error(`Name a backup file that exists: npm run db:restore -- FILE (got ${source ?? 'nothing'}).`)
  const candidate = `${path}.restore-${stamp()}`
  copyFileSync(resolve(source), candidate)
  let summary: Awaited<ReturnType<typeof checkBackup>>
  try {
    const db = await openDatabase(candidate)
    try {
      summary = await checkBackup(db)
    } finally {
      await db.close()
    }
  } catch (error) {
    rmSync(candidate, { force: true })
    throw new Error(`Not restored: ${source} cannot be used (${error instanceof Error ? error.message : String(error)}). The database is unchanged.`)
  }
  const what = `${source}: ${summary.users} accounts, ${summary.sketches} sketches, ${summary.migrations.length} migrations`
  if (!yes && !(await confirm(`This replaces ${path} with ${what}. Stop the server first.`))) {
    rmSync(candidate, { force: true })
    console.error('Nothing restored. (Pass --yes to restore without the question.)')
    process.exit(1)
  }
  if (existsSync(path)) {
    const keep = join(dirname(path), 'backups', `before-restore-${stamp()}.sqlite`)
    const current = await openDatabase(path)
    try {
      await backupTo(current, keep)
    } finally {
      await current.close()
    }
    console.log(`Kept the current database as ${keep}`)
  }
  replaceDatabase(candidate, path)
  console.log(`Restored ${what} into ${path}. Start the server again.`)
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error)
  process.exit(1)
})

import type { Db } from '../models'
import type { Role } from '../../shared/auth/roles'
import { demoSketches } from './demo-sketches'
import { seedDemoTeam } from './demo-team'

/** The demo password of every demo account (README: change it, or reset, before real use). */
export const DEMO_PASSWORD = 'millrace-demo-2026'

/** The Millrace Yard retrofit demo workspace (an invented scenario). */
export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@millrace.test', name: 'Ada Marsh (admin)', role: 'admin' },
  { email: 'engineer@millrace.test', name: 'Eli Brandt (engineer)', role: 'engineer' },
  { email: 'checker@millrace.test', name: 'Cora Vint (checker)', role: 'checker' },
  { email: 'viewer@millrace.test', name: 'Vic Hale (fabricator, viewer)', role: 'viewer' },
]

type Hasher = (password: string) => Promise<string>

/** Seeds the demo workspace when the database holds no account at all. Returns whether it seeded. */
export async function seedDemoIfEmpty(db: Db, hash: Hasher): Promise<boolean> {
  if ((await db.User.count()) > 0) return false
  await seedDemo(db, hash)
  return true
}

/**
 * (Re)creates the demo accounts and their sketches. Existing demo accounts get their demo
 * password and role back and their demo sketches replaced; other accounts are left alone.
 */
export async function seedDemo(db: Db, hash: Hasher): Promise<void> {
  const passwordHash = await hash(DEMO_PASSWORD)
  await db.sequelize.transaction(async (transaction) => {
    const ids: Record<string, string> = {}
    const emails: Record<string, string> = {}
    for (const account of DEMO_ACCOUNTS) {
      const [user] = await db.User.findOrCreate({
        where: { email: account.email },
        defaults: { ...account, passwordHash },
        transaction,
      })
      await user.update({ name: account.name, role: account.role, passwordHash }, { transaction })
      ids[account.role] = user.id
      emails[account.role] = user.email
    }
    const ownerId = ids.engineer!
    const sketches = demoSketches()
    await db.Sketch.destroy({ where: { ownerId, title: sketches.map(s => s.title) }, transaction })
    const made = new Map<string, Awaited<ReturnType<typeof db.Sketch.create>>>()
    for (const sketch of sketches) {
      // Drafts here; the team seed sets the review state of the sketches it submits or approves.
      made.set(sketch.title, await db.Sketch.create({ ...sketch, status: 'draft', ownerId, document: JSON.stringify(sketch.document) }, { transaction }))
    }
    await seedDemoTeam(db, ids, made, emails, transaction)
  })
}

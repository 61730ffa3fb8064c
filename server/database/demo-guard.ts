import { isLoopbackHost } from '../../shared/net/loopback'
import type { Db } from '../models'
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './seed'

/**
 * True when the server listens beyond this machine: HOST (or NITRO_HOST) names a non-loopback
 * address, or is unset (the built server then listens on every interface; `npm start` sets
 * 127.0.0.1 unless HOST is given).
 */
export function listensBeyondLoopback(env: NodeJS.ProcessEnv = process.env): boolean {
  const host = env.NITRO_HOST || env.HOST
  return !host || !isLoopbackHost(host)
}

/** The demo accounts that still sign in with the password printed in the README. */
export async function demoAccountsWithPublishedPassword(db: Db, verify: (hash: string, password: string) => Promise<boolean>): Promise<string[]> {
  const users = await db.User.findAll({ where: { email: DEMO_ACCOUNTS.map(a => a.email) } })
  const open: string[] = []
  for (const user of users) if (await verify(user.passwordHash, DEMO_PASSWORD)) open.push(user.email)
  return open
}

/** The message the server prints when it refuses to start: what is wrong and the commands that fix it. */
export function refusalMessage(host: string | undefined, emails: string[]): string {
  return [
    `[kernwise] Refusing to start: the server would listen on ${host || 'every interface'} and the demo account${emails.length === 1 ? '' : 's'} ${emails.join(', ')} still ${emails.length === 1 ? 'has' : 'have'} the published password.`,
    '[kernwise] Anyone on the network could sign in as the demo admin. Either give the demo accounts new passwords:',
    '[kernwise]   npm run db:passwords            (sets and prints a new random password for each)',
    '[kernwise] or start from an empty database without the demo:',
    '[kernwise]   npm run db:reset -- --no-demo   (deletes the database; the first account registered becomes admin)',
    '[kernwise] or listen on this machine only: HOST=127.0.0.1.',
  ].join('\n')
}

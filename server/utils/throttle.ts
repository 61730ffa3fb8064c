import type { H3Event } from 'h3'
import { Op } from 'sequelize'

/** Failed sign-ins one (e-mail, address) pair may make within WINDOW_MS before it is slowed down. */
export const PAIR_FREE_FAILURES = 5
/** Sign-in attempts one address may make within WINDOW_MS, over all e-mails (an office behind one proxy shares it). */
export const ADDRESS_BUDGET = 100
/** The window the counts run over (ms). */
export const WINDOW_MS = 10 * 60 * 1000
/** Wait after the free failures (ms), doubling with each further failure, at most WINDOW_MS. */
export const FIRST_DELAY_MS = 30_000

/** How long a pair with `failures` recent failures must wait after its last one (ms); 0 while free. */
export function pairDelayMs(failures: number): number {
  if (failures < PAIR_FREE_FAILURES) return 0
  return Math.min(WINDOW_MS, FIRST_DELAY_MS * 2 ** (failures - PAIR_FREE_FAILURES))
}

function tooMany(event: H3Event, retryAfter: number, who: string): never {
  setResponseHeader(event, 'Retry-After', String(retryAfter))
  throw createError({
    statusCode: 429,
    statusMessage: 'Too Many Requests',
    message: `Too many failed sign-ins ${who}. Wait ${retryAfter} s and try again.`,
    data: { retryAfter },
  })
}

/**
 * Counts a sign-in attempt before its password is checked: the attempt's row is inserted first
 * (one statement, so parallel attempts get distinct, ordered ids) and only the attempts before it
 * are counted. Throws 429 with Retry-After when the (e-mail, address) pair must wait or the address
 * has used its budget; such a refused attempt is not kept. Returns the attempt's id.
 */
export async function beginAttempt(event: H3Event, email: string, ip: string): Promise<number> {
  const db = await useDb()
  const now = Date.now()
  const since = new Date(now - WINDOW_MS)
  const row = await db.SignInAttempt.create({ email, ip })
  const before = { id: { [Op.lt]: row.id }, createdAt: { [Op.gt]: since } }
  const pair = await db.SignInAttempt.findAll({ where: { ...before, email, ip }, order: [['id', 'DESC']], attributes: ['createdAt'], limit: 50 })
  const delay = pairDelayMs(pair.length)
  if (delay > 0) {
    const wait = pair[0]!.createdAt.getTime() + delay - now
    if (wait > 0) {
      await row.destroy()
      tooMany(event, Math.ceil(wait / 1000), 'for this account from your address')
    }
  }
  const fromAddress = await db.SignInAttempt.count({ where: { ...before, ip } })
  if (fromAddress >= ADDRESS_BUDGET) {
    await row.destroy()
    tooMany(event, Math.ceil(WINDOW_MS / 1000 / 10), 'from your address')
  }
  return row.id
}

/** A failed attempt stays counted; rows older than the window are dropped on the way. */
export async function attemptFailed(): Promise<void> {
  const db = await useDb()
  await db.SignInAttempt.destroy({ where: { createdAt: { [Op.lt]: new Date(Date.now() - WINDOW_MS) } } })
}

/** A success clears that pair's attempts up to its own, and nothing of other addresses or later attempts. */
export async function attemptSucceeded(id: number, email: string, ip: string): Promise<void> {
  const db = await useDb()
  await db.SignInAttempt.destroy({ where: { email, ip, id: { [Op.lte]: id } } })
}

/** Accounts one address may register within WINDOW_MS. */
export const REGISTRATIONS_PER_ADDRESS = 10
/** The e-mail column's marker for a registration in the attempts table (not an address anyone can have). */
const REGISTRATION = '(registration)'

/**
 * Counts a registration from `ip` (in the same attempts table, so every instance shares it);
 * 429 with Retry-After once the address has registered REGISTRATIONS_PER_ADDRESS accounts
 * within the window.
 */
export async function assertRegistrationAllowed(event: H3Event, ip: string): Promise<void> {
  const db = await useDb()
  const row = await db.SignInAttempt.create({ email: REGISTRATION, ip })
  const earlier = await db.SignInAttempt.count({ where: { email: REGISTRATION, ip, id: { [Op.lt]: row.id }, createdAt: { [Op.gt]: new Date(Date.now() - WINDOW_MS) } } })
  if (earlier >= REGISTRATIONS_PER_ADDRESS) {
    await row.destroy()
    setResponseHeader(event, 'Retry-After', String(WINDOW_MS / 1000))
    throw createError({ statusCode: 429, statusMessage: 'Too Many Requests', message: `Too many new accounts from your address; try again in ${WINDOW_MS / 60_000} minutes.`, data: { retryAfter: WINDOW_MS / 1000 } })
  }
}

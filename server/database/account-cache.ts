import type { ModelStatic, Model, Transaction } from 'sequelize'

/**
 * What the server remembers between requests about who is asking: accounts by id, API tokens by
 * hash, session records by id, and sealed session cookies by their text. Every write to the users, api_tokens or sessions tables
 * through this server's models clears the accounts and tokens at once (model hooks, again after a
 * transaction commits), so a role change or a revoked token still counts on the very next
 * request. Writes from another process (the db scripts) bypass the hooks; the short lifetimes
 * bound how long such a change can go unseen.
 */

/** Lifetime of a remembered account or token without a write through this server (ms). */
export const ACCOUNT_TTL_MS = 5_000
/** Lifetime of a remembered session cookie (ms); never beyond the seal's own expiry. */
export const SESSION_TTL_MS = 60_000
/** Entries kept per map before it is emptied (a bound, not an expected size). */
const MAX_ENTRIES = 10_000

interface Entry<T> {
  value: T
  until: number
}

/** A token as requireUser needs it. */
export interface CachedToken {
  id: string
  userId: string
  lastUsedAt: Date | null
  expiresAt: Date | null
}

/** What a sealed session cookie holds, as requireUser needs it. */
export interface SealedSession {
  userId: string
  sessionId: string
}

/** A session record as requireUser needs it. */
export interface CachedSessionRecord {
  userId: string
  lastSeenAt: Date
  expiresAt: Date
}

let generation = 0
const accounts = new Map<string, Entry<unknown>>()
const tokens = new Map<string, Entry<CachedToken>>()
const sessions = new Map<string, Entry<SealedSession | null>>()
const records = new Map<string, Entry<CachedSessionRecord>>()

function read<T>(map: Map<string, Entry<T>>, key: string): T | undefined {
  const hit = map.get(key)
  if (!hit) return undefined
  if (hit.until > Date.now()) return hit.value
  map.delete(key)
  return undefined
}

function write<T>(map: Map<string, Entry<T>>, key: string, value: T, until: number): void {
  if (map.size >= MAX_ENTRIES) map.clear()
  map.set(key, { value, until })
}

/**
 * Looks `key` up in the accounts cache, else loads it. A load that raced with a write (the
 * generation moved while it ran) is returned but not remembered, so it cannot outlive the write.
 */
async function remembered<T>(map: Map<string, Entry<T>>, key: string, load: () => Promise<T>): Promise<T> {
  const hit = read(map, key)
  if (hit !== undefined) return hit
  const seen = generation
  const value = await load()
  if (seen === generation && value !== null) write(map, key, value, Date.now() + ACCOUNT_TTL_MS)
  return value
}

/** The account with this id (null when none), remembered for a few seconds. */
export function cachedAccount<T>(id: string, load: () => Promise<T | null>): Promise<T | null> {
  return remembered(accounts as Map<string, Entry<T | null>>, id, load)
}

/** The API token with this SHA-256 hash (null when none), remembered for a few seconds. */
export function cachedToken(hash: string, load: () => Promise<CachedToken | null>): Promise<CachedToken | null> {
  return remembered(tokens as Map<string, Entry<CachedToken | null>>, hash, load)
}

/** The session record with this id (null when ended), remembered for a few seconds like accounts. */
export function cachedSessionRecord(id: string, load: () => Promise<CachedSessionRecord | null>): Promise<CachedSessionRecord | null> {
  return remembered(records as Map<string, Entry<CachedSessionRecord | null>>, id, load)
}

/** What this session cookie holds (null for an empty or invalid one), or undefined if not known. */
export function cachedSession(sealed: string): SealedSession | null | undefined {
  return read(sessions, sealed)
}

/**
 * Remembers what a sealed session cookie holds, until the earlier of SESSION_TTL_MS and the
 * expiry the seal carries in clear (the sixth `*`-separated field of an iron seal, in ms).
 */
export function rememberSession(sealed: string, content: SealedSession | null): void {
  const sealExpiry = Number(sealed.split('*')[5])
  const until = Math.min(Date.now() + SESSION_TTL_MS, sealExpiry > 0 ? sealExpiry : Number.POSITIVE_INFINITY)
  write(sessions, sealed, content, until)
}

/** Forgets one session cookie (at sign-out). */
export function forgetSession(sealed: string): void {
  sessions.delete(sealed)
}

/** Forgets every remembered account, token and session record (any write to their tables). */
export function forgetAccounts(): void {
  generation++
  accounts.clear()
  tokens.clear()
  records.clear()
}

const WRITE_HOOKS = ['afterCreate', 'afterUpdate', 'afterSave', 'afterDestroy', 'afterUpsert', 'afterBulkCreate', 'afterBulkUpdate', 'afterBulkDestroy'] as const

/** Clears the cache on every write to these models, and once more when the write's transaction commits. */
export function watchAccountTables(models: readonly ModelStatic<Model>[]): void {
  const onWrite = (first: unknown, second: unknown): void => {
    forgetAccounts()
    const options = (second ?? first) as { transaction?: Transaction | null } | undefined
    options?.transaction?.afterCommit(() => forgetAccounts())
  }
  for (const model of models) {
    for (const hook of WRITE_HOOKS) model.addHook(hook as 'afterUpdate', 'kernwise-account-cache', onWrite as never)
  }
}

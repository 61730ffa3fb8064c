import { randomBytes } from 'node:crypto'

type Verify = (hash: string, password: string) => Promise<boolean>
type Make = (password: string) => Promise<string>

let dummy: Promise<string> | null = null

/**
 * Checks `password` against `hash`; with no account (hash null) it verifies against a dummy hash
 * made once with the same hasher, so an unknown e-mail costs the same time as a known one and
 * answer timing does not tell which e-mails have accounts. Always false without an account.
 */
export async function checkPassword(hash: string | null, password: string, verify: Verify, make: Make): Promise<boolean> {
  if (hash) return verify(hash, password)
  dummy ??= make(`kernwise-no-account-${randomBytes(16).toString('hex')}`)
  await verify(await dummy, password)
  return false
}

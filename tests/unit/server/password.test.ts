import { describe, expect, it } from 'vitest'
import { checkPassword } from '../../../server/utils/password'

// A stand-in hasher that records what it is asked to verify: the rule under test is that an
// unknown e-mail costs one verification too ("common practice", OWASP authentication cheat sheet:
// answer unknown and known accounts in the same time).
function recorder() {
  const verified: string[] = []
  const made: string[] = []
  return {
    verified,
    made,
    verify: async (hash: string, password: string) => { verified.push(hash); return hash === `h(${password})` },
    make: async (password: string) => { made.push(password); return `h(${password})` },
  }
}

describe('checkPassword(hash, password, verify, make)', () => {
  it('verifies against the stored hash when there is an account', async () => {
    const r = recorder()
    expect(await checkPassword('h(secret-words)', 'secret-words', r.verify, r.make)).toBe(true)
    expect(await checkPassword('h(secret-words)', 'other-words', r.verify, r.make)).toBe(false)
    expect(r.verified).toEqual(['h(secret-words)', 'h(secret-words)'])
  })

  it('runs one verification against a dummy hash when there is no account, and answers false', async () => {
    const r = recorder()
    expect(await checkPassword(null, 'anything-at-all', r.verify, r.make)).toBe(false)
    expect(r.verified).toHaveLength(1)
    expect(await checkPassword(null, 'anything-else', r.verify, r.make)).toBe(false)
    expect(r.verified).toHaveLength(2)
    // The dummy is made once, not per request.
    expect(r.made.length).toBeLessThanOrEqual(1)
  })
})

import { randomBytes } from 'node:crypto'
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs'
import { dirname, join, resolve } from 'node:path'

/**
 * Sessions are sealed with NUXT_SESSION_PASSWORD when it is set. Otherwise a random secret is
 * generated once, kept beside the database (mode 600, never committed) and reused on restart,
 * so sign-ins survive a restart and there is never a fixed default.
 */
export default defineNitroPlugin(() => {
  const current = process.env.NUXT_SESSION_PASSWORD
  if (current && current.length >= 32) return
  if (current) console.warn('[kernwise] NUXT_SESSION_PASSWORD is shorter than 32 characters; using a generated secret instead.')
  const config = useRuntimeConfig()
  const file = join(dirname(resolve(String(config.dbPath || '.data/kernwise.sqlite'))), 'session-secret')
  let secret = existsSync(file) ? readFileSync(file, 'utf8').trim() : ''
  if (secret.length < 32) {
    mkdirSync(dirname(file), { recursive: true })
    secret = randomBytes(32).toString('base64url')
    writeFileSync(file, secret + '\n', { mode: 0o600 })
  }
  process.env.NUXT_SESSION_PASSWORD = secret
})

import type { ChildProcess } from 'node:child_process'
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, beforeAll } from 'vitest'
import { createTestDatabase, dropTestDatabase } from './postgres'
// @ts-expect-error plain ESM helper without types
import { freePort, startServer } from '../../../scripts/lib.mjs'

export interface TestServer {
  url: string
  dir: string
}

/**
 * Starts the built server on a free loopback port with its own empty database for the test
 * file that calls it, and stops it afterwards. The returned object is filled in beforeAll.
 * With KERNWISE_TEST_PG set (the PostgreSQL run of .ci/run) the database is a fresh PostgreSQL
 * one instead of a SQLite file.
 */
export function useTestServer(env: Record<string, string> = {}): TestServer {
  const server: TestServer = { url: '', dir: '' }
  let child: ChildProcess | undefined
  let database = ''
  beforeAll(async () => {
    server.dir = mkdtempSync(join(tmpdir(), 'kernwise-api-'))
    const port = await freePort()
    if (process.env.KERNWISE_TEST_PG) database = await createTestDatabase()
    const started = await startServer({
      PORT: String(port),
      NUXT_DB_PATH: join(server.dir, 'test.sqlite'),
      ...(database ? { NUXT_DATABASE_URL: database } : {}),
      NUXT_SESSION_PASSWORD: 'test-only-session-password-0123456789abcdef',
      NUXT_SEED_DEMO: 'false',
      // Tests register several accounts freely; tests/api/registration.test.ts covers the real default.
      NUXT_REGISTRATION_DEFAULT: 'open',
      ...env,
    })
    child = started.child
    server.url = started.url
  })
  afterAll(async () => {
    if (child && child.exitCode === null) {
      const exited = new Promise(resolve => child!.once('exit', resolve))
      child.kill('SIGTERM')
      await exited
    }
    if (server.dir) rmSync(server.dir, { recursive: true, force: true })
    if (database) await dropTestDatabase(database)
  })
  return server
}

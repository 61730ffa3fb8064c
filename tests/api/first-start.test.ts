import { spawn, spawnSync } from 'node:child_process'
import { existsSync, mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
// @ts-expect-error plain ESM helper without types
import { freePort, root, startServer } from '../../scripts/lib.mjs'

const dir = mkdtempSync(join(tmpdir(), 'kernwise-first-'))
const SECRET = 'test-only-session-password-0123456789abcdef'
afterAll(() => rmSync(dir, { recursive: true, force: true }))

function db(dbPath: string, ...args: string[]) {
  return spawnSync(process.execPath, ['scripts/db.mjs', ...args], { cwd: root, env: { ...process.env, NUXT_DB_PATH: dbPath }, encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] })
}

/** Runs the built server until it exits (or 40 s pass); returns its code and what it printed. */
function runUntilExit(env: Record<string, string>): Promise<{ code: number | null; output: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [join(root, '.output/server/index.mjs')], { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] })
    let output = ''
    child.stdout.on('data', (c) => { output += c })
    child.stderr.on('data', (c) => { output += c })
    const timer = setTimeout(() => child.kill('SIGTERM'), 40_000)
    child.on('exit', (code) => { clearTimeout(timer); resolve({ code, output }) })
  })
}

describe('the first start', () => {
  const dbPath = join(dir, 'demo.sqlite')

  it('refuses to listen beyond loopback while the demo accounts keep the published password', async () => {
    expect(db(dbPath, 'seed').status).toBe(0)
    const port = String(await freePort())
    const run = await runUntilExit({ PORT: port, HOST: '0.0.0.0', NUXT_DB_PATH: dbPath, NUXT_SESSION_PASSWORD: SECRET })
    expect(run.code).toBe(1)
    expect(run.output).toMatch(/Refusing to start/)
    expect(run.output).toMatch(/admin@millrace\.test/)
    expect(run.output).toMatch(/npm run db:passwords/)
  })

  it('starts on the network once db:passwords has given the demo accounts new passwords', async () => {
    const set = db(dbPath, 'passwords')
    expect(set.status).toBe(0)
    expect(set.stdout).toMatch(/admin@millrace\.test {2}\S{12,}/)
    const port = String(await freePort())
    const { child } = await startServer({ PORT: port, HOST: '0.0.0.0', NUXT_DB_PATH: dbPath, NUXT_SESSION_PASSWORD: SECRET })
    const exited = new Promise(r => child.once('exit', r))
    child.kill('SIGTERM')
    await exited
  })

  it('npm start serves 127.0.0.1 unless HOST is set', async () => {
    const port = String(await freePort())
    const env = { ...process.env, PORT: port, NUXT_DB_PATH: join(dir, 'start.sqlite'), NUXT_SESSION_PASSWORD: SECRET, KERNWISE_SKIP_BUILD: '1' }
    delete env.HOST
    const child = spawn(process.execPath, ['scripts/start.mjs'], { cwd: root, env, stdio: ['ignore', 'pipe', 'inherit'] })
    let output = ''
    child.stdout.on('data', (c) => { output += c })
    try {
      const deadline = Date.now() + 60_000
      let ok = false
      while (!ok && Date.now() < deadline && child.exitCode === null) {
        ok = await fetch(`http://127.0.0.1:${port}/api/health`).then(r => r.ok, () => false)
        if (!ok) await new Promise(r => setTimeout(r, 200))
      }
      expect(ok).toBe(true)
      expect(output).toContain(`serving http://127.0.0.1:${port}`)
    } finally {
      const exited = new Promise(r => child.once('exit', r))
      child.kill('SIGTERM')
      await exited
    }
  })

  it('db:reset asks first: without --yes and without a terminal it deletes nothing', () => {
    const path = join(dir, 'keep.sqlite')
    expect(db(path, 'seed').status).toBe(0)
    const refused = db(path, 'reset')
    expect(refused.status).toBe(1)
    expect(refused.stderr).toMatch(/Nothing deleted/)
    expect(existsSync(path)).toBe(true)
    const reset = db(path, 'reset', '--yes', '--no-demo')
    expect(reset.status).toBe(0)
    expect(reset.stdout).toMatch(/Empty database ready/)
  })
})

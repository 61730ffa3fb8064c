// npm test: every test. Makes sure Debian's chromium is there, builds the server once, then runs
// vitest (unit + API against the built server) and Playwright (browser tests in chromium).
import { spawnSync } from 'node:child_process'
import { existsSync } from 'node:fs'
import { join } from 'node:path'
import { buildIfStale, root } from './lib.mjs'

function ensureChromium() {
  const path = process.env.CHROMIUM_PATH || '/usr/bin/chromium'
  if (existsSync(path)) return path
  const debian = existsSync('/etc/debian_version')
  const rootUser = typeof process.getuid === 'function' && process.getuid() === 0
  if (!debian || !rootUser) {
    console.error(`[kernwise] No chromium at ${path}. Install Debian's package (apt-get install -y chromium) or set CHROMIUM_PATH; tests never download a browser.`)
    process.exit(1)
  }
  console.log('[kernwise] installing Debian chromium with apt-get...')
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' }
  let r = spawnSync('apt-get', ['update'], { stdio: 'inherit', env })
  if (r.status === 0) r = spawnSync('apt-get', ['install', '-y', '--no-install-recommends', 'chromium', 'fonts-dejavu-core'], { stdio: 'inherit', env })
  if (r.status !== 0 || !existsSync(path)) {
    console.error('[kernwise] apt-get could not install chromium; browser tests cannot run.')
    process.exit(1)
  }
  return path
}

function run(label, args) {
  console.log(`\n[kernwise] ${label}`)
  const r = spawnSync(process.execPath, args, { cwd: root, stdio: 'inherit', env: { ...process.env, CHROMIUM_PATH: chromium } })
  return r.status === 0
}

const chromium = ensureChromium()
buildIfStale()
const bin = p => join(root, 'node_modules', p)
const results = {
  vitest: run('vitest: unit and API tests', [bin('vitest/vitest.mjs'), 'run']),
  playwright: run('playwright: browser tests', [bin('@playwright/test/cli.js'), 'test']),
}
const failed = Object.entries(results).filter(([, ok]) => !ok).map(([k]) => k)
if (failed.length) {
  console.error(`\n[kernwise] FAILED: ${failed.join(', ')}`)
  process.exit(1)
}
console.log('\n[kernwise] all test suites passed')

// npm test: every test. Makes sure Debian's chromium is there, builds the server once, then runs
// vitest (unit + API against the built server) and Playwright (browser tests in chromium).
import { spawnSync } from 'node:child_process'
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
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
const reports = mkdtempSync(join(tmpdir(), 'kernwise-test-'))
const vitestJson = join(reports, 'vitest.json')
const playwrightJson = join(reports, 'playwright.json')
process.env.PLAYWRIGHT_JSON_OUTPUT_NAME = playwrightJson
const results = {
  vitest: run('vitest: unit and API tests', [bin('vitest/vitest.mjs'), 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestJson}`]),
  playwright: run('playwright: browser tests', [bin('@playwright/test/cli.js'), 'test', '--reporter=list,json']),
}

/** Totals from the two runners' JSON reports, for one closing line. */
function totals() {
  const t = { passed: 0, failed: 0, skipped: 0 }
  try {
    const v = JSON.parse(readFileSync(vitestJson, 'utf8'))
    t.passed += v.numPassedTests
    t.failed += v.numFailedTests
    t.skipped += (v.numPendingTests ?? 0) + (v.numTodoTests ?? 0)
  } catch { t.failed += results.vitest ? 0 : 1 }
  try {
    const s = JSON.parse(readFileSync(playwrightJson, 'utf8')).stats
    t.passed += s.expected
    t.failed += s.unexpected + (s.flaky ?? 0)
    t.skipped += s.skipped
  } catch { t.failed += results.playwright ? 0 : 1 }
  return t
}

const t = totals()
rmSync(reports, { recursive: true, force: true })
const failed = Object.entries(results).filter(([, ok]) => !ok).map(([k]) => k)
console.log(`\n${t.passed} passed, ${t.failed} failed, ${t.skipped} skipped`)
if (failed.length) {
  console.error(`[kernwise] FAILED: ${failed.join(', ')}`)
  process.exit(1)
}
console.log('[kernwise] all test suites passed')

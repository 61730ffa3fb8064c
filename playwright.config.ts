import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { defineConfig } from '@playwright/test'

// Browser tests drive Debian's chromium (never a downloaded browser) against the built server
// on its own port and a fresh temporary database seeded with the demo workspace.
const port = Number(process.env.E2E_PORT || 3217)
const dbDir = process.env.E2E_DB_DIR || mkdtempSync(join(tmpdir(), 'kernwise-e2e-'))
process.env.E2E_DB_DIR = dbDir

export default defineConfig({
  testDir: 'e2e',
  outputDir: 'test-results',
  workers: 1,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1440, height: 900 },
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
    },
  },
  webServer: {
    command: 'node .output/server/index.mjs',
    url: `http://127.0.0.1:${port}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: {
      PORT: String(port),
      HOST: '127.0.0.1',
      NUXT_DB_PATH: join(dbDir, 'e2e.sqlite'),
      NUXT_SEED_DEMO: 'true',
      NUXT_SESSION_PASSWORD: 'e2e-only-session-password-0123456789abcdef',
      // Browser tests register new accounts beside the seeded admin.
      NUXT_REGISTRATION_DEFAULT: 'open',
    },
  },
})

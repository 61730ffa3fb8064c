import { expect, test } from '@playwright/test'
import { DEMO_PASSWORD, shot } from './support/helpers'

// A colleague's browser on the office network: the app is reached by a name that is not loopback,
// over plain HTTP (chromium resolves the name to this machine, so it is an insecure origin).
const port = Number(process.env.E2E_PORT || 3217)
const lan = `http://kernwise.office.test:${port}`
test.use({
  launchOptions: {
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-quic', '--host-resolver-rules=MAP kernwise.office.test 127.0.0.1'],
  },
})

test('over plain HTTP at a network name sign-in works and every page says the connection is not encrypted', async ({ page }) => {
  await page.goto(`${lan}/sign-in`)
  await expect(page.locator('html[data-hydrated="true"]')).toHaveCount(1)
  await expect(page.getByTestId('insecure-banner')).toContainText('Not encrypted')
  await page.getByLabel('E-mail').fill('engineer@millrace.test')
  await page.getByLabel('Password').fill(DEMO_PASSWORD)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByTestId('sign-out')).toBeVisible()
  await page.goto(`${lan}/account`)
  await expect(page.getByTestId('session-current')).toBeVisible()
  await expect(page.getByTestId('insecure-banner')).toBeVisible()
  await shot(page, 'plain-http-banner')
})

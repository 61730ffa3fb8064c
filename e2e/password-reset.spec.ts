import { join } from 'node:path'
import { expect, test } from '@playwright/test'
import sqlite3 from 'sqlite3'
import { DEMO_PASSWORD, open, shot, signIn } from './support/helpers'

/** The newest mail's text for `to`, read from the outbox of the e2e database (no SMTP in tests). */
function lastMail(to: string): Promise<string> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(join(process.env.E2E_DB_DIR!, 'e2e.sqlite'), sqlite3.OPEN_READONLY)
    db.get('SELECT text FROM outbox WHERE "to" = ? ORDER BY createdAt DESC LIMIT 1', [to], (error, row: { text: string } | undefined) => {
      db.close()
      if (error || !row) reject(error ?? new Error('no mail'))
      else resolve(row.text)
    })
  })
}

test('a forgotten password is reset through the mailed link', async ({ page }) => {
  await open(page, '/sign-in')
  await page.getByRole('link', { name: 'Forgot your password?' }).click()
  await expect(page).toHaveURL(/\/forgot-password/)
  await expect(page.getByTestId('forgot-form')).toBeVisible()
  await page.getByLabel('E-mail').fill('checker@millrace.test')
  await page.getByRole('button', { name: 'Mail me a reset link' }).click()
  await expect(page.getByRole('status')).toContainText('reset link is on its way')
  await shot(page, 'forgot-password')
  const link = /http\S+reset-password\?token=\S+/.exec(await lastMail('checker@millrace.test'))![0]
  await open(page, new URL(link).pathname + new URL(link).search)
  await page.getByLabel('New password').fill('checker-reset-password')
  await page.getByRole('button', { name: 'Set the new password' }).click()
  await expect(page).toHaveURL(/\/sign-in/)
  await signIn(page, 'checker@millrace.test', 'checker-reset-password')
  // Put the demo password back for the other browser tests.
  await open(page, '/account')
  await page.getByLabel('Current password').fill('checker-reset-password')
  await page.getByLabel('New password').fill(DEMO_PASSWORD)
  await page.getByRole('button', { name: 'Change password' }).click()
  await expect(page.getByRole('status').filter({ hasText: 'Password changed' })).toBeVisible()
})

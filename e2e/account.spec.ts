import { expect, test } from '@playwright/test'
import { DEMO_PASSWORD, open, shot, signIn } from './support/helpers'

test('the account page lists where I am signed in; ending the other browser signs it out', async ({ browser }) => {
  const laptop = await browser.newPage()
  const phone = await browser.newPage({ userAgent: 'Mozilla/5.0 (Windows NT 10.0; Win64; x64) Firefox/140.0' })
  await signIn(laptop, 'checker@millrace.test')
  await signIn(phone, 'checker@millrace.test')
  await open(laptop, '/account')
  await expect(laptop.getByTestId('session-current')).toHaveCount(1)
  await expect(laptop.getByTestId('session-other').first()).toContainText('Firefox on Windows')
  await shot(laptop, 'account-sessions')
  await laptop.getByTestId('end-other-sessions').click()
  await expect(laptop.getByTestId('session-other')).toHaveCount(0)
  // The other browser's cookie no longer counts: its next page is the sign-in page.
  await open(phone, '/account')
  await expect(phone).toHaveURL(/\/sign-in/)
  await laptop.close()
  await phone.close()
})

test('a password change keeps this browser signed in and the new password works', async ({ page }) => {
  await signIn(page, 'viewer@millrace.test')
  await open(page, '/account')
  await page.getByLabel('Current password').fill(DEMO_PASSWORD)
  await page.getByLabel('New password').fill('viewer-new-password-1')
  await page.getByRole('button', { name: 'Change password' }).click()
  await expect(page.getByRole('status').filter({ hasText: 'Password changed' })).toBeVisible()
  await page.getByTestId('sign-out').click()
  await signIn(page, 'viewer@millrace.test', 'viewer-new-password-1')
  // Put the demo password back for the other browser tests.
  await open(page, '/account')
  await page.getByLabel('Current password').fill('viewer-new-password-1')
  await page.getByLabel('New password').fill(DEMO_PASSWORD)
  await page.getByRole('button', { name: 'Change password' }).click()
  await expect(page.getByRole('status').filter({ hasText: 'Password changed' })).toBeVisible()
})

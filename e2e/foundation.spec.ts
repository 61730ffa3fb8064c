import { expect, test } from '@playwright/test'
import { open, shot, signIn } from './support/helpers'

test('a new engineer registers, sees the empty dashboard, signs out and signs back in', async ({ page }) => {
  const email = `new.engineer.${Date.now()}@example.test`
  const password = 'a-long-enough-password'
  await open(page, '/register')
  await shot(page, 'register')
  await page.getByLabel('Name').fill('Nell Weir')
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password').fill(password)
  await page.getByRole('button', { name: 'Create account' }).click()

  // The demo workspace already has an admin, so a self-registration is an engineer.
  await expect(page.getByTestId('account-link')).toContainText('engineer')
  await expect(page.getByTestId('empty-state')).toBeVisible()
  await expect(page.getByTestId('caution')).toContainText('qualified engineer')
  await shot(page, 'dashboard-empty')

  await page.getByTestId('sign-out').click()
  await expect(page).toHaveURL(/\/sign-in/)
  await shot(page, 'sign-in')

  await page.getByLabel('E-mail').fill(email.toUpperCase())
  await page.getByLabel('Password').fill('wrong-password-here')
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByRole('alert')).toContainText('do not match')

  await page.getByLabel('Password').fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByTestId('empty-state')).toBeVisible()
})

test('the admin changes a role on the members page; an engineer makes and revokes an API token', async ({ page }) => {
  await signIn(page, 'admin@millrace.test')
  await open(page, '/members')
  const viewerRole = page.getByLabel('Role of Vic Hale (fabricator, viewer)')
  await expect(viewerRole).toHaveValue('viewer')
  await shot(page, 'members')
  await viewerRole.selectOption('checker')
  await expect(page.getByRole('status').filter({ hasText: 'is now checker' })).toBeVisible()
  await page.reload()
  await expect(page.getByLabel('Role of Vic Hale (fabricator, viewer)')).toHaveValue('checker')
  await page.getByLabel('Role of Vic Hale (fabricator, viewer)').selectOption('viewer')
  await expect(page.getByRole('status').filter({ hasText: 'is now viewer' })).toBeVisible()
  await page.getByTestId('sign-out').click()

  await signIn(page, 'engineer@millrace.test')
  await open(page, '/members')
  await expect(page.getByTestId('error-page')).toContainText('Not for your role') // the route middleware keeps engineers out
  await expect(page.getByTestId('members')).toHaveCount(0)
  await shot(page, 'members-forbidden')
  await open(page, '/account')
  await page.getByTestId('token-name').fill('e2e script')
  await page.getByTestId('create-token').click()
  const token = (await page.getByTestId('fresh-token').locator('code').first().textContent())!.trim()
  expect(token).toMatch(/^kw_/)
  await shot(page, 'account-token')
  const me = await page.request.get('/api/auth/me', { headers: { authorization: `Bearer ${token}` } })
  expect(me.status()).toBe(200)
  page.once('dialog', d => d.accept())
  await page.getByRole('button', { name: 'Revoke' }).first().click()
  await expect(page.getByText('No tokens yet.')).toBeVisible()
  const after = await page.request.get('/api/auth/me', { headers: { authorization: `Bearer ${token}`, cookie: '' } })
  expect(after.status()).toBe(401)
})

import { expect, test } from '@playwright/test'
import { open, shot } from './support/helpers'

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

import { expect, test } from '@playwright/test'
import { open, SAME_ORIGIN, shot, signIn } from './support/helpers'

test('dashboard: rename with Enter saves once, Escape cancels, delete asks, its undo outlives the page, and Recently deleted restores', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const made = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Rename me' } })
  const { id } = await made.json()
  await open(page, '/')
  // Enter: saved, no "saved elsewhere" conflict.
  await page.getByTestId(`rename-${id}`).click()
  await page.getByTestId('rename-field').fill('Renamed once')
  await page.getByTestId('rename-field').press('Enter')
  await expect(page.getByTestId('sketch-list')).toContainText('Renamed once')
  await expect(page.getByText(/saved elsewhere/)).toHaveCount(0)
  await expect(page.locator('[role="alert"]')).toHaveCount(0)
  // Escape: nothing is saved.
  await page.getByTestId(`rename-${id}`).click()
  await page.getByTestId('rename-field').fill('Not this')
  await page.getByTestId('rename-field').press('Escape')
  await expect(page.getByTestId('sketch-list')).toContainText('Renamed once')
  const stored = await (await page.request.get(`/api/sketches/${id}`)).json()
  expect(stored.title).toBe('Renamed once')
  expect(stored.version).toBe(2)
  // Delete asks first; Keep leaves it.
  await page.getByTestId(`delete-${id}`).click()
  await expect(page.getByRole('alertdialog')).toContainText('Recently deleted for 30 days')
  await shot(page, 'dashboard-delete-confirm')
  await page.getByTestId(`confirm-delete-${id}`).click()
  await expect(page.getByTestId('sketch-list')).not.toContainText('Renamed once')
  // The undo is still offered after leaving the page and coming back.
  await open(page, '/account')
  await open(page, '/')
  await expect(page.getByTestId('undo-delete')).toBeVisible()
  await page.getByTestId('toggle-bin').click()
  await expect(page.getByTestId('bin-row').first()).toContainText('Renamed once')
  await expect(page.getByTestId('bin-row').first()).toContainText('30 days left')
  await shot(page, 'dashboard-recently-deleted')
  await page.getByTestId(`restore-${id}`).click()
  await expect(page.getByTestId('sketch-list')).toContainText('Renamed once')
  await expect(page.getByTestId('bin-row').filter({ hasText: 'Renamed once' })).toHaveCount(0)
})

import { expect, test, type Page } from '@playwright/test'
import { canvasTransform, open, SAME_ORIGIN, signIn } from './support/helpers'

async function outline(page: Page, points: readonly (readonly [number, number])[]): Promise<void> {
  const at = await canvasTransform(page)
  await page.getByTestId('tool-outline').click()
  for (const [x, y] of points) await page.mouse.click(at(x, y).x, at(x, y).y)
  await page.keyboard.press('Enter')
}

test('a change made while a save is under way, then opening another sketch at once, is saved to its own sketch: a self-crossing outline is kept as drawn', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const { id } = await (await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Leave at once' } })).json()
  await open(page, `/sketches/${id}`)
  await page.waitForSelector('[data-testid="sketch-canvas"] canvas')
  // Every save of this sketch takes 3 s, so the next change lands while one is under way.
  let patches = 0
  await page.route(`**/api/sketches/${id}`, async (route) => {
    if (route.request().method() === 'PATCH') {
      patches++
      await new Promise(resolve => setTimeout(resolve, 3000))
    }
    await route.continue()
  })
  await outline(page, [[0, 0], [100, 0], [100, 50], [0, 50]])
  await expect(page.getByTestId('save-indicator')).toHaveAttribute('data-status', 'saving')
  // A bow-tie (it crosses itself: flagged, but kept as drawn), then straight back to the dashboard.
  await outline(page, [[-50, -150], [50, -250], [50, -150], [-50, -250]])
  await expect(page.getByTestId('analysis-error')).toBeVisible()
  await page.getByRole('link', { name: 'Back to sketches' }).click()
  await page.getByTestId('sketch-list').getByRole('link', { name: 'Crane column C3' }).click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  const crane = page.url().split('/').pop()!
  const craneBefore = await (await page.request.get(`/api/sketches/${crane}`)).json()
  await expect.poll(() => patches, { timeout: 10_000 }).toBe(2)
  await expect.poll(async () => (await (await page.request.get(`/api/sketches/${id}`)).json()).document.parts.length, { timeout: 10_000 }).toBe(2)
  const stored = await (await page.request.get(`/api/sketches/${id}`)).json()
  const sorted = (ring: number[][]) => ring.map(p => p.join(',')).sort()
  expect(sorted(stored.document.parts[1].outline)).toEqual(sorted([[-50, -150], [50, -250], [50, -150], [-50, -250]]))
  // The sketch opened meanwhile was not written over, and it still saves without a false conflict.
  const craneAfter = await (await page.request.get(`/api/sketches/${crane}`)).json()
  expect(craneAfter.version).toBe(craneBefore.version)
  expect(craneAfter.document.parts.length).toBe(craneBefore.document.parts.length)
  await page.getByTestId('sketch-title').fill('Crane column C3 (renamed)')
  await page.getByTestId('sketch-title').press('Enter')
  await expect(page.getByTestId('save-indicator')).toHaveAttribute('data-status', 'saved', { timeout: 10_000 })
  await expect(page.getByTestId('save-conflict')).toHaveCount(0)
  // Back to the demo title, for the tests that look for it.
  await page.getByTestId('sketch-title').fill('Crane column C3')
  await page.getByTestId('sketch-title').press('Enter')
  await expect(page.getByTestId('save-indicator')).toHaveAttribute('data-status', 'saved', { timeout: 10_000 })
  // Opened again at once: both parts are there.
  await page.unroute(`**/api/sketches/${id}`)
  await open(page, `/sketches/${id}`)
  await expect(page.getByTestId('analysis-error')).toBeVisible()
})

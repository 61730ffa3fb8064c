import { expect, test, type Page } from '@playwright/test'
import { canvasTransform, open, SAME_ORIGIN, shot, signIn } from './support/helpers'

test('with no load the legend and the tension panel say so; with invalid geometry every stress panel says so', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const { id } = await (await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'No load yet' } })).json()
  await open(page, `/sketches/${id}`)
  await page.waitForSelector('[data-testid="sketch-canvas"] canvas')
  let at = await canvasTransform(page)
  await page.getByTestId('tool-box').click()
  await page.mouse.move(at(-50, -50).x, at(-50, -50).y)
  await page.mouse.down()
  await page.mouse.move(at(50, 50).x, at(50, 50).y, { steps: 8 })
  await page.mouse.up()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  await expect(page.getByTestId('stress-legend-no-load')).toContainText('No load yet')
  await expect(page.getByTestId('stress-legend')).toHaveCount(0)
  await expect(page.getByTestId('no-load')).toBeVisible()
  await shot(page, 'papercut-no-load')
  // A bow-tie: the geometry is invalid, and no stress panel shows stresses of the drawing before.
  at = await canvasTransform(page)
  await page.getByTestId('tool-outline').click()
  for (const [x, y] of [[-50, -150], [50, -250], [50, -150], [-50, -250]] as const) await page.mouse.click(at(x, y).x, at(x, y).y)
  await page.keyboard.press('Enter')
  await expect(page.getByTestId('analysis-error')).toBeVisible()
  await expect(page.getByTestId('stress-invalid')).toHaveCount(7) // tension, contact, check, cut line, shear flow, torsion, vertex stresses
  await shot(page, 'papercut-invalid-geometry')
  await page.getByTestId('undo').click()
  await expect(page.getByTestId('stress-invalid')).toHaveCount(0)
})

test('after typing a title and Enter, a shortcut key acts (B picks the box tool) and types nothing into the title', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const { id } = await (await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Shortcut after title' } })).json()
  await open(page, `/sketches/${id}`)
  await page.waitForSelector('[data-testid="sketch-canvas"] canvas')
  const title = page.getByTestId('sketch-title')
  await title.fill('Column base plate')
  await title.press('Enter')
  await page.keyboard.press('b')
  await expect(title).toHaveValue('Column base plate')
  await expect(page.getByTestId('tool-box')).toHaveAttribute('aria-pressed', 'true')
  // While the focus is in a text field, a key is text, not a shortcut.
  await title.click()
  await page.keyboard.press('End')
  await page.keyboard.type(' v')
  await expect(title).toHaveValue('Column base plate v')
  await expect(page.getByTestId('tool-box')).toHaveAttribute('aria-pressed', 'true')
})

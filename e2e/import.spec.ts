import { expect, test } from '@playwright/test'
import { circle, dxf, line, lwpolyline } from '../tests/unit/import/dxf-text'
import { open, shot, signIn } from './support/helpers'

// A 200 × 100 plate with a Ø40 hole on its own layer, and an open pair of lines on a notes layer.
const drawing = dxf([
  lwpolyline('Plate', [[0, 0], [200, 0], [200, 100], [0, 100]]),
  circle('Holes', 60, 50, 20),
  line('Notes', 0, 150, 50, 150),
  line('Notes', 50, 150, 50, 180),
], { insunits: 4 })

test('import a DXF: a bad file changes nothing; the preview lists layers and skips; insert adds the plate with its hole', async ({ page, baseURL }) => {
  await signIn(page, 'engineer@millrace.test')
  const made = await page.request.post('/api/sketches', { data: { title: 'Imported plate' }, headers: { origin: baseURL! } })
  expect(made.status()).toBe(201)
  await open(page, `/sketches/${(await made.json()).id}`)
  await expect(page.getByTestId('sketch-editor')).toBeVisible()
  await expect(page.getByTestId('prop-area')).toHaveCount(0) // an empty sketch shows no area

  await page.getByTestId('open-import').click()
  const dialog = page.getByTestId('import-dialog')
  await dialog.getByTestId('import-file').setInputFiles({ name: 'broken.dxf', mimeType: 'application/dxf', buffer: Buffer.from(drawing.replace('\n40\n20\n', '\n40\ntwenty\n')) })
  await expect(dialog.getByTestId('import-error')).toContainText('"twenty" should be a number')
  await expect(dialog.getByTestId('import-error')).toContainText('Nothing was changed')
  await expect(dialog.getByTestId('import-insert')).toBeDisabled()

  await dialog.getByTestId('import-file').setInputFiles({ name: 'plate.dxf', mimeType: 'application/dxf', buffer: Buffer.from(drawing) })
  await expect(dialog.getByTestId('import-summary')).toContainText('1 part, 1 hole')
  await expect(dialog.getByTestId('import-layers')).toContainText('Holes')
  await expect(dialog.getByTestId('import-skipped')).toContainText('(0, 150) to (50, 180)')
  await shot(page, 'import-preview')
  await dialog.getByLabel('Layer Holes becomes').selectOption('skip')
  await expect(dialog.getByTestId('import-summary')).toContainText('1 part, 0 holes')
  await dialog.getByLabel('Layer Holes becomes').selectOption('hole')
  await expect(dialog.getByTestId('import-summary')).toContainText('1 part, 1 hole')
  await dialog.getByTestId('import-insert').click()
  await expect(dialog).toHaveCount(0)

  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  const area = Number(await page.getByTestId('prop-area').getAttribute('data-value'))
  // 200·100 − π·20² (closed form), the round within 0.05 % (README "Method", arcs).
  const expected = 200 * 100 - Math.PI * 400
  expect(Math.abs(area - expected) / expected).toBeLessThan(5e-4)
})

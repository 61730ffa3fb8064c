import { expect, test } from '@playwright/test'
import { canvasTransform, dragMouse, open, SAME_ORIGIN, shot, showGroup, signIn } from './support/helpers'

// The numbers a checker signs, as the editor shows them on the demo sketches.

async function openDemo(page: import('@playwright/test').Page, title: string): Promise<void> {
  await open(page, '/')
  await page.getByTestId('sketch-list').getByRole('link', { name: title }).click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
}

test('Mezzanine post M1: bolt-hole cuts go through plate and flange, connections list their contact and close a cell', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await openDemo(page, 'Mezzanine post M1')
  // The only warning is the closed cell's: no hole is "treated as a cut".
  await expect(page.getByTestId('analysis-warnings')).toHaveText(/close a cell/)
  await expect(page.getByTestId('analysis-warnings')).not.toHaveText(/hole|notch|treated/)
  // Channels and plates close the box: every plate-to-channel line is part of a closed cell.
  await showGroup(page, 'checks')
  await page.getByTestId('shear-vy').fill('100')
  await page.getByTestId('shear-vy').press('Enter')
  const rows = page.getByTestId('shear-row')
  await expect(rows.first()).toBeVisible()
  expect(await rows.count()).toBeGreaterThan(0)
  for (const status of await rows.evaluateAll(rs => rs.map(r => r.getAttribute('data-status')))) expect(status).toBe('closed-cell')
  await expect(rows.first()).toContainText('closed cell')
  await page.getByTestId('panel-shear').scrollIntoViewIfNeeded()
  await shot(page, 'checker-m1-shear')
})

test('a tee of two plates: the weld line carries Vy·Q/I and is halved per line when two lines are chosen; a part becomes a cut', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const made = await page.request.post('/api/sketches', { headers: SAME_ORIGIN,
    data: {
      title: 'Tee of two plates',
      document: {
        schema: 'kernwise.sketch/2',
        parts: [
          { id: 'flange', name: 'Flange 200 × 20', outline: [[-100, 180], [100, 180], [100, 200], [-100, 200]], holes: [], material: { name: 'Steel', E: 200000, fy: 355, density: 7850 }, shape: null },
          { id: 'web', name: 'Web 10 × 180', outline: [[-5, 0], [5, 0], [5, 180], [-5, 180]], holes: [], material: { name: 'Steel', E: 200000, fy: 355, density: 7850 }, shape: null },
        ],
        cases: [{ id: 'case-1', name: 'Case 1', Mx: 0, My: 0 }],
        combinations: [],
        loads: [],
        settings: { shear: { Vx: 0, Vy: 50000 } },
      },
    },
  })
  expect(made.status()).toBe(201)
  const { id } = await made.json()
  await open(page, `/sketches/${id}`)
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  // By hand (parallel axes): yc = (4000·190 + 1800·90)/5800, Q = 4000·(190 - yc), q = Vy·Q/Ixx.
  const yc = (4000 * 190 + 1800 * 90) / 5800
  const Ixx = (200 * 20 ** 3) / 12 + 4000 * (190 - yc) ** 2 + (10 * 180 ** 3) / 12 + 1800 * (90 - yc) ** 2
  const q = (50000 * 4000 * (190 - yc)) / Ixx
  const shown = Number(await page.getByTestId('shear-q-0').getAttribute('data-value'))
  expect(Math.abs(shown - q) / q).toBeLessThan(1e-9)
  await showGroup(page, 'checks')
  await page.getByTestId('shear-lines').selectOption('2')
  await expect(page.getByTestId('shear-line-0')).toHaveText(String(Number((q / 2).toPrecision(4))))
  // The plastic modulus of one material is geometric and the panel groups its values.
  await showGroup(page, 'section')
  await expect(page.getByTestId('prop-group-strength')).toBeVisible()
  await expect(page.getByTestId('plastic-note')).toContainText('geometric')
  await shot(page, 'checker-tee-properties')
  // A box drawn across the joint, made a cut: it takes 20 x 20 from the flange and 10 x 10 from the web.
  const at = await canvasTransform(page)
  await page.getByTestId('tool-box').click()
  await dragMouse(page, at(-10, 170), at(10, 210))
  await page.getByTestId('make-cut').click()
  await expect(page.getByTestId('part-kind')).toHaveValue('cut')
  await expect.poll(async () => Number(await page.getByTestId('prop-area').getAttribute('data-value'))).toBeCloseTo(5800 - 400 - 100, 6)
  await shot(page, 'checker-tee-cut')
  // Undo: the box is material again, joined with the tee (union by hand: 5800 + 800 - 400 - 100).
  await page.getByTestId('undo').click()
  await expect.poll(async () => Number(await page.getByTestId('prop-area').getAttribute('data-value'))).toBeCloseTo(5800 + 800 - 400 - 100, 6)
})

test('Canopy strut S5: principal moduli and the note that M/S about x is not the extreme stress', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await openDemo(page, 'Canopy strut S5')
  await expect(page.getByTestId('moduli-note')).toContainText('not the extreme stress')
  const su = Number(await page.getByTestId('prop-SuPos').getAttribute('data-value'))
  expect(su).toBeGreaterThan(0)
  await expect(page.getByTestId('prop-Zu')).toBeVisible()
  await page.getByTestId('prop-group-strength').scrollIntoViewIfNeeded()
  await shot(page, 'checker-s5-moduli')
})

test('Pad footing F4: the peak pressure is checked against the soil\'s bearing strength, flagged in the panel and on the drawing', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await openDemo(page, 'Pad footing F4')
  await expect(page.getByTestId('contact-panel')).toHaveAttribute('data-status', 'partial')
  const row = page.getByTestId('bearing-checks').locator('li').first()
  await expect(row).toHaveAttribute('data-over', 'true')
  await expect(row).toContainText('over what it can bear')
  await expect(page.getByTestId('analysis-warnings')).toContainText('bearing strength 0.2 MPa')
  await showGroup(page, 'loads')
  await page.getByTestId('panel-contact').scrollIntoViewIfNeeded()
  await shot(page, 'checker-f4-bearing')
})

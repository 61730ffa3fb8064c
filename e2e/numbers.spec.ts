import { expect, test, type Locator, type Page } from '@playwright/test'
import { mkdirSync } from 'node:fs'
import { ARTIFACTS, SAME_ORIGIN, open, shot, showGroup, signIn } from './support/helpers'

// Typed numbers (issue 17 item 1, issue 10 §6): every numeric field applies a value or refuses it
// where the user sees it. Conversion factors from NIST SP 811, Appendix B: 1 in = 25.4 mm,
// 1 kip = 4448.2216152605 N, 1 ksi = 6.894757293168 MPa, 1 in² = 645.16 mm², 1 in⁴ = 416 231.4256 mm⁴.
const b = 400
const h = 600

function pierDocument() {
  return {
    schema: 'kernwise.sketch/1',
    parts: [{
      id: 'part-1', name: 'Pier', holes: [], shape: null,
      outline: [[-b / 2, -h / 2], [b / 2, -h / 2], [b / 2, h / 2], [-b / 2, h / 2]],
      material: { name: 'Masonry', E: 5000, fy: 40, density: 1900 },
    }],
    cases: [{ id: 'case-1', name: 'Dead', Mx: 0, My: 0 }],
    combinations: [],
    loads: [{ id: 'load-1', name: 'G', caseId: 'case-1', P: 100_000, x: 0, y: 0 }],
    settings: {},
  }
}

async function newSketch(page: Page, title: string, document: unknown): Promise<string> {
  const res = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title, document } })
  expect(res.status()).toBe(201)
  return (await res.json()).id as string
}

/** The document as the server stored it, once the autosave is done. */
async function stored(page: Page, id: string) {
  await expect(page.getByTestId('save-indicator')).toHaveAttribute('data-status', 'saved')
  const res = await page.request.get(`/api/sketches/${id}`)
  return (await res.json()).document
}

/** A screenshot of one panel, scrolled into view (looked at by a person, not compared). */
async function panelShot(panel: Locator, name: string): Promise<void> {
  mkdirSync(ARTIFACTS, { recursive: true })
  await panel.scrollIntoViewIfNeeded()
  await panel.screenshot({ path: `${ARTIFACTS}/${name}.png` })
}

/** Types `text` into a field and commits it with Enter, as a user does. */
async function type(field: Locator, text: string): Promise<void> {
  await field.fill(text)
  await field.press('Enter')
}

/** The error shown beside a field (AppNumberInput puts it right after the input). */
const errorOf = (field: Locator) => field.locator('xpath=following-sibling::*[@data-testid="field-error"]')

test('load, moment, shear and effective length fields apply converted values and refuse what they cannot read', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const id = await newSketch(page, 'Typed numbers', pierDocument())
  await open(page, `/sketches/${id}`)
  await showGroup(page, 'loads')
  const P = page.getByTestId('load-P-0')
  await expect(P).toHaveValue('100')

  // The field's own unit as a suffix is accepted (issue 17: "150 kN" stayed on screen unapplied).
  await type(P, '150 kN')
  await expect(P).toHaveValue('150')
  await expect(P).not.toHaveAttribute('aria-invalid', 'true')
  expect((await stored(page, id)).loads[0].P).toBe(150_000)

  // A unit of the same kind is converted and shown converted: 2 kip = 8.89644 kN.
  await type(P, '2 kip')
  await expect(P).toHaveValue('8.89644')
  expect((await stored(page, id)).loads[0].P).toBeCloseTo(2 * 4448.2216152605, 6)

  // Anything else is refused beside the field; the applied value comes back; nothing is stored.
  await type(P, 'abc')
  await expect(P).toHaveAttribute('aria-invalid', 'true')
  await expect(errorOf(P)).toContainText('“abc” is not a number')
  await expect(P).toHaveValue('8.89644')
  await type(P, '150 mm')
  await expect(errorOf(P)).toContainText('is a length, not a force')
  await panelShot(page.getByTestId('load-panel'), 'numbers-refused-P')
  expect((await stored(page, id)).loads[0].P).toBeCloseTo(2 * 4448.2216152605, 6)

  // A comma that may separate thousands is refused with the reason; one that cannot is a decimal mark.
  const x = page.getByTestId('load-x-0')
  await type(x, '1,500')
  await expect(errorOf(x)).toContainText('can be read two ways')
  await expect(x).toHaveValue('0')
  await type(x, '12,5')
  await expect(x).toHaveValue('12.5')
  await expect(x).not.toHaveAttribute('aria-invalid', 'true')
  // A locale minus (U+2212) is a minus; the field shows it back the same way.
  const y = page.getByTestId('load-y-0')
  await type(y, '−0.02 m')
  await expect(y).toHaveValue('−20')
  const doc = await stored(page, id)
  expect(doc.loads[0].x).toBe(12.5)
  expect(doc.loads[0].y).toBe(-20)

  // Mx in kN·m; 10 kip·ft = 10 × 4448.2216152605 N × 304.8 mm = 13.5582 kN·m.
  const Mx = page.getByTestId('case-Mx-0')
  await type(Mx, '10 kip·ft')
  await expect(Mx).toHaveValue('13.5582')
  await type(Mx, '5 kg')
  await expect(Mx).toHaveAttribute('aria-invalid', 'true')
  await expect(Mx).toHaveValue('13.5582')
  expect((await stored(page, id)).cases[0].Mx).toBeCloseTo(10 * 4448.2216152605 * 304.8, 3)

  // Shear Vy and the effective length use the same parser.
  await showGroup(page, 'checks')
  const Vy = page.getByTestId('shear-vy')
  await type(Vy, '1,000')
  await expect(Vy).toHaveAttribute('aria-invalid', 'true')
  await expect(Vy).toHaveValue('0')
  await type(Vy, '20')
  await expect(Vy).toHaveValue('20')
  const KLu = page.getByTestId('effective-length-u')
  await type(KLu, '3 m')
  await expect(KLu).toHaveValue('3000')
  await type(KLu, '-1')
  await expect(errorOf(KLu)).toContainText('must be positive')
  await expect(KLu).toHaveValue('3000')
  const saved = await stored(page, id)
  expect(saved.settings.shear.Vy).toBe(20_000)
  expect(saved.settings.effectiveLength).toEqual({ u: 3000, v: null })
})

test('material fields and the shape form refuse what they cannot read', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const id = await newSketch(page, 'Typed material', pierDocument())
  await open(page, `/sketches/${id}`)
  const canvas = page.getByTestId('sketch-canvas')
  const box = (await canvas.boundingBox())!
  const panX = Number(await canvas.getAttribute('data-pan-x'))
  const panY = Number(await canvas.getAttribute('data-pan-y'))
  await page.mouse.click(box.x + panX + 30, box.y + panY + 30) // inside the pier, beside the load at (0, 0)
  const E = page.getByTestId('material-E')
  await expect(E).toHaveValue('5000')
  await type(E, '30 GPa')
  await expect(E).toHaveValue('30000')
  await type(E, '')
  await expect(E).toHaveAttribute('aria-invalid', 'true')
  await expect(E).toHaveValue('30000')
  await panelShot(page.getByTestId('material-form'), 'numbers-material-refused')
  const aC = page.getByTestId('material-allowable-c')
  await type(aC, '1.5 ksi')                        // 1.5 × 6.894757293168 = 10.3421 MPa
  await expect(aC).toHaveValue('10.3421')
  const material = (await stored(page, id)).parts[0].material
  expect(material.E).toBe(30_000)
  expect(material.allowableC).toBeCloseTo(1.5 * 6.894757293168, 9)

  // The shape form: "abc" in a position no longer becomes 0 (issue 17).
  await page.getByTestId('tool-shape').click()
  const ax = page.getByTestId('shape-at-x')
  await ax.fill('abc')
  await expect(ax).toHaveAttribute('aria-invalid', 'true')
  await expect(page.getByTestId('shape-error')).toContainText('“abc” is not a number')
  await expect(page.getByTestId('shape-insert')).toBeDisabled()
  await panelShot(page.getByTestId('shape-form'), 'numbers-shape-form-refused')
  await ax.fill('0.5 m')
  await expect(page.getByTestId('shape-insert')).toBeEnabled()
})

/** The number a display string starts with ("17298 in⁴", "−20", "159.1 × 10⁶ mm⁴"). */
function shownNumber(text: string | null): number {
  const t = (text ?? '').replace('\u2212', '-')
  const m = /^(-?[\d.]+)(?: × 10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+))?/.exec(t.trim())!
  const sup = (m[2] ?? '').replace(/[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]/g, c => '-0123456789'['⁻⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c)]!)
  return Number(m[1]) * 10 ** Number(sup || 0)
}

test('a US-units round trip through the editor: typed in US units, stored in mm and N, shown back in SI unchanged', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const id = await newSketch(page, 'US round trip', pierDocument())
  await open(page, `/sketches/${id}`)
  await expect(page.getByTestId('grid-size')).toHaveValue('10')

  await page.getByTestId('units').selectOption('US')
  // 10 mm becomes the nearest 1-2-5 step in inches, 0.5 in (12.7 mm).
  await expect(page.getByTestId('grid-size')).toHaveValue('0.5')
  await showGroup(page, 'loads')
  const P = page.getByTestId('load-P-0')
  await expect(P).toHaveValue('22.4809')           // 100 kN / 4.4482216152605 kN per kip
  await type(P, '50')                              // kip, the field's own unit
  await type(page.getByTestId('load-x-0'), '2')    // in
  await type(page.getByTestId('load-y-0'), '100 mm')
  await expect(page.getByTestId('load-y-0')).toHaveValue('3.93701')
  let doc = await stored(page, id)
  expect(doc.loads[0].P).toBeCloseTo(50 * 4448.2216152605, 6)
  expect(doc.loads[0].x).toBeCloseTo(50.8, 9)
  expect(doc.loads[0].y).toBe(100)
  expect(doc.settings.gridMm).toBeCloseTo(12.7, 9)

  // Areas and second moments in US units: A = 400 × 600 = 240 000 mm² = 371.99 in²;
  // Ixx = b·h³/12 = 7.2 × 10⁹ mm⁴ = 17 298 in⁴ (closed form; 645.16 mm² and 416 231.4256 mm⁴ per unit).
  await expect(page.getByTestId('prop-area')).toContainText('in²')
  expect(shownNumber(await page.getByTestId('prop-area').textContent()) / (240_000 / 645.16)).toBeCloseTo(1, 3)
  await expect(page.getByTestId('prop-Ixx')).toContainText('in⁴')
  expect(shownNumber(await page.getByTestId('prop-Ixx').textContent()) / (7.2e9 / 416231.4256)).toBeCloseTo(1, 3)
  await shot(page, 'numbers-us-units')

  // The trade's metric choices: cm² and cm⁴ (1 cm² = 100 mm², 1 cm⁴ = 10⁴ mm⁴).
  await page.getByTestId('area-unit').selectOption('cm2')
  await page.getByTestId('inertia-unit').selectOption('cm4')
  await expect(page.getByTestId('prop-area')).toHaveText('2400 cm²')
  await expect(page.getByTestId('prop-Ixx')).toHaveText('720000 cm⁴')
  await page.getByTestId('inertia-unit').selectOption('m4')
  await expect(page.getByTestId('prop-Ixx')).toHaveText('0.0072 m⁴')

  // Back to SI: nothing changed but the display (issue 17: the grid became 20 mm).
  await page.getByTestId('units').selectOption('SI')
  await expect(page.getByTestId('grid-size')).toHaveValue('10')
  await expect(P).toHaveValue('222.411')
  await expect(page.getByTestId('load-x-0')).toHaveValue('50.8')
  await page.getByTestId('area-unit').selectOption('')
  await page.getByTestId('inertia-unit').selectOption('')
  await expect(page.getByTestId('prop-area')).toHaveText('240000 mm²')
  await expect(page.getByTestId('prop-Ixx')).toHaveText('7.2 × 10⁹ mm⁴')
  doc = await stored(page, id)
  expect(doc.settings.gridMm).toBe(10)
  expect(doc.loads[0].P).toBeCloseTo(50 * 4448.2216152605, 6)
  expect(doc.loads[0].x).toBeCloseTo(50.8, 9)
  expect(doc.settings.areaUnit).toBeNull()
  await shot(page, 'numbers-si-back')
})

test('the check lists tension and compression against their own allowables, and slenderness per principal axis', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const doc = pierDocument()
  // P = 1000 kN at x = 100 mm, outside the core (e > b/6): sigma = P/A·(1 ± 6e/b) = 4.1667·(1 ± 1.5)
  // = 10.417 MPa C at x = +200 and 2.083 MPa T at x = −200 (closed form, tension allowed).
  doc.loads[0] = { ...doc.loads[0]!, P: 1_000_000, x: 100 }
  Object.assign(doc.parts[0]!.material, { allowableT: 1.5, allowableC: 12 })
  const id = await newSketch(page, 'Two allowables', doc)
  await open(page, `/sketches/${id}`)
  await showGroup(page, 'checks')
  const row = page.getByTestId('check-row')
  // 2.083 / 1.5 = 1.389 (tension) governs over 10.417 / 12 = 0.868 (compression).
  await expect(row).toHaveAttribute('data-governing', 'tension')
  await expect(row).toHaveAttribute('data-status', 'over')
  await expect(row.getByTestId('check-tension-use')).toHaveText('1.39')
  await expect(row.getByTestId('check-compression-use')).toHaveText('0.868')
  await expect(row).toContainText('139 % of the allowable tension (tension governs)')

  // K·L about u and v: the major axis u is x (Ixx = 400·600³/12 = 7.2 × 10⁹ mm⁴), the minor v is y
  // (Iyy = 600·400³/12 = 3.2 × 10⁹ mm⁴); r_u = sqrt(Ixx/A) = 173.2 mm, r_v = sqrt(Iyy/A) = 115.5 mm (closed form).
  await expect(page.getByTestId('torsional-note')).toContainText('Flexural-torsional')
  // The second length typed straight after the first: neither is lost.
  await type(page.getByTestId('effective-length-u'), '6000')
  await type(page.getByTestId('effective-length-v'), '3000')
  await expect(page.getByTestId('klr-u')).toHaveText('34.6')   // 6000 / 173.2
  await expect(page.getByTestId('klr-v')).toHaveText('26')     // 3000 / 115.47 = 25.98
  // Euler load π²·E·I/(KL)² with E = 5000 MPa: u 9 870 kN, v 17 546 kN, so u governs (closed form).
  expect(shownNumber(await page.getByTestId('euler-u').textContent()) / (Math.PI ** 2 * 5000 * 7.2e9 / 6000 ** 2 / 1000)).toBeCloseTo(1, 3)
  expect(shownNumber(await page.getByTestId('euler-v').textContent()) / (Math.PI ** 2 * 5000 * 3.2e9 / 3000 ** 2 / 1000)).toBeCloseTo(1, 3)
  await expect(page.getByTestId('slender-u')).toContainText('governs')
  await panelShot(page.getByTestId('check-panel'), 'numbers-check-slenderness')
})

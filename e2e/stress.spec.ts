import { expect, test, type Page } from '@playwright/test'
import { open, shot, showGroup, signIn, SAME_ORIGIN } from './support/helpers'

// A b × h rectangle centred on the origin, b along x. Values the test computes itself:
// A = b·h; core edge on the x axis at b/6 (middle third rule, README "Method");
// sigma_max = P/A·(1 + 6e/b) (closed form, README "Method" with Ixy = 0);
// footing (README "Method"): contact length 3(L/2 − e) and q_max = 2P / (3B(L/2 − e)) for e > L/6.
const b = 400
const h = 600
const P = 1_000_000 // N (1000 kN), compression positive

function rectangleDocument(noTension = false) {
  return {
    schema: 'kernwise.sketch/1',
    parts: [{
      id: 'part-1', name: 'Pier', holes: [], shape: null,
      outline: [[-b / 2, -h / 2], [b / 2, -h / 2], [b / 2, h / 2], [-b / 2, h / 2]],
      material: { name: 'Masonry', E: 5000, allowable: 20, density: 1900 },
    }],
    cases: [{ id: 'case-1', name: 'Dead', Mx: 0, My: 0 }],
    combinations: [],
    loads: [{ id: 'load-1', name: 'G', caseId: 'case-1', P, x: 0, y: 0 }],
    settings: { noTension },
  }
}

async function newSketch(page: Page, title: string, document: unknown): Promise<string> {
  const res = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title, document } })
  expect(res.status()).toBe(201)
  return (await res.json()).id as string
}

/** Opens a sketch in the editor, whose canvas carries the stress overlay and whose panels show it. */
async function openStress(page: Page, id: string): Promise<void> {
  await open(page, `/sketches/${id}`)
  await showGroup(page, 'loads')
  await expect(page.getByTestId('tension-panel')).toBeVisible()
}

/** Screen position (page px) of a model point (mm), from the canvas's transform. */
async function toPage(page: Page, x: number, y: number): Promise<[number, number]> {
  const canvas = page.getByTestId('sketch-canvas')
  const box = (await canvas.boundingBox())!
  const zoom = Number(await canvas.getAttribute('data-zoom'))
  const panX = Number(await canvas.getAttribute('data-pan-x'))
  const panY = Number(await canvas.getAttribute('data-pan-y'))
  return [box.x + panX + zoom * x, box.y + panY - zoom * y]
}

async function modelX(page: Page, sx: number): Promise<number> {
  const canvas = page.getByTestId('sketch-canvas')
  const box = (await canvas.boundingBox())!
  const zoom = Number(await canvas.getAttribute('data-zoom'))
  const panX = Number(await canvas.getAttribute('data-pan-x'))
  return (sx - box.x - panX) / zoom
}

/** The first number in a text ("12.4 MPa C at ..." → 12.4). */
function firstNumber(text: string | null): number {
  return Number((text ?? '').replace('−', '-').match(/-?\d+(\.\d+)?/)![0])
}

test('dragging a load across the core edge changes the state where the test expects, and the peak stress matches P/A(1 + 6e/b)', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const id = await newSketch(page, 'Stress e2e rectangle', rectangleDocument())
  await openStress(page, id)
  const tension = page.getByTestId('tension-panel')
  await expect(tension).toHaveAttribute('data-state', 'inside')
  await expect(page.getByTestId('max-compression')).toContainText('C')
  // At the centroid: uniform P/A (hand calculation 1e6 / 240 000 = 4.167 MPa).
  expect(firstNumber(await page.getByTestId('max-compression').textContent())).toBeCloseTo(P / (b * h), 2)
  await shot(page, 'stress-centroid')

  const [sx, sy] = await toPage(page, 0, 0)
  await page.mouse.move(sx, sy)
  await page.mouse.down()
  const edge = b / 6
  // Just inside the core edge: still all compression.
  const [ix] = await toPage(page, edge - 15, 0)
  await page.mouse.move(ix, sy, { steps: 12 })
  await expect(tension).toHaveAttribute('data-state', 'inside')
  await shot(page, 'stress-drag-inside')
  // Just outside: tension appears.
  const [ox] = await toPage(page, edge + 15, 0)
  await page.mouse.move(ox, sy, { steps: 6 })
  await expect(tension).toHaveAttribute('data-state', 'outside')
  // Release at e = 100 mm.
  const [ex] = await toPage(page, 100, 0)
  await page.mouse.move(ex, sy, { steps: 6 })
  await page.mouse.up()
  await expect(tension).toHaveAttribute('data-state', 'outside')
  const e = await modelX(page, ex)
  await expect(page.getByTestId('load-x-0')).toHaveValue(/^\d/)
  const typed = Number((await page.getByTestId('load-x-0').inputValue()).replace('\u2212', '-'))
  // The pointer lands on whole CSS pixels: agree within one pixel.
  const zoom = Number(await page.getByTestId('sketch-canvas').getAttribute('data-zoom'))
  expect(Math.abs(typed - e)).toBeLessThan(1 / zoom)
  const expected = (P / (b * h)) * (1 + (6 * typed) / b)
  const shown = firstNumber(await page.getByTestId('max-compression').textContent())
  expect(Math.abs(shown - expected) / expected).toBeLessThan(0.005)
  const tensionShown = firstNumber(await page.getByTestId('max-tension').textContent())
  const expectedT = (P / (b * h)) * ((6 * typed) / b - 1)
  expect(Math.abs(tensionShown - expectedT) / expectedT).toBeLessThan(0.01)
  await expect(page.getByTestId('onset-vertex')).toContainText('−200')
  await shot(page, 'stress-drag-outside')

  // Type the eccentricity exactly and use the footing values (README "Method") in the no-tension view.
  await page.getByTestId('load-x-0').fill('100')
  await page.getByTestId('load-x-0').press('Enter')
  // P/A·(1 + 6·100/400) = 4.167·2.5 = 10.4 MPa (closed form).
  await expect(page.getByTestId('max-compression')).toContainText('10.4')
  await page.getByTestId('no-tension-toggle').check()
  const contact = page.getByTestId('contact-panel')
  await expect(contact).toHaveAttribute('data-status', 'partial')
  const L = b
  const B = h
  const length = 3 * (L / 2 - 100)
  const qmax = (2 * P) / (3 * B * (L / 2 - 100))
  expect(firstNumber(await page.getByTestId('contact-area').textContent())).toBeCloseTo(B * length, -2)
  expect(Math.abs(firstNumber(await page.getByTestId('peak-pressure').textContent()) - qmax) / qmax).toBeLessThan(0.005)
  await shot(page, 'stress-no-tension')

  // Beyond the hull: overturning, stated plainly.
  await page.getByTestId('load-x-0').fill('250')
  await page.getByTestId('load-x-0').press('Enter')
  await expect(page.getByTestId('overturning')).toBeVisible()
  await shot(page, 'stress-overturning')
})

test('a cut line across the section plots the stress with end values and the zero crossing; combinations and the envelope', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const doc = rectangleDocument()
  doc.loads[0]!.x = 100
  doc.cases.push({ id: 'case-2', name: 'Wind', Mx: 1e8, My: 0 })
  ;(doc.combinations as unknown[]).push({ id: 'c1', name: 'Example: dead + wind', factors: { 'case-1': 1, 'case-2': 1 } }, { id: 'c2', name: 'Example: dead − wind', factors: { 'case-1': 1, 'case-2': -1 } })
  const id = await newSketch(page, 'Stress e2e cut line', doc)
  await openStress(page, id)
  await expect(page.getByTestId('tension-panel')).toHaveAttribute('data-state', 'outside')

  await page.getByTestId('cut-draw').click()
  const [ax, ay] = await toPage(page, -260, 0)
  const [bx, by] = await toPage(page, 260, 0)
  await page.mouse.move(ax, ay)
  await page.mouse.down()
  await page.mouse.move(bx, by, { steps: 8 })
  await page.mouse.up()
  await expect(page.getByTestId('cut-chart')).toBeVisible()
  // Along y = 0: sigma = −P/A·(1 + 6e·x/(b·b/2))... ends are the edges x = ∓200: 2.08 T and 10.4 C (hand calculation, e = 100).
  const ends = await page.getByTestId('cut-end').allTextContents()
  expect(ends[0]).toContain('T')
  expect(ends[1]).toContain('C')
  expect(firstNumber(ends[0]!)).toBeCloseTo((P / (b * h)) * ((6 * 100) / b - 1), 1)
  expect(firstNumber(ends[1]!)).toBeCloseTo((P / (b * h)) * ((6 * 100) / b + 1), 1)
  // Zero where 1 + 12·e·x/b² = 0: x = −b²/(12e) = −133.3 mm, i.e. 126.7 mm from A at x = −260 (hand calculation).
  const zero = await page.getByTestId('cut-zero').first().textContent()
  expect(firstNumber(zero)).toBeCloseTo(260 - (b * b) / (12 * 100), 0)
  await shot(page, 'stress-cut-line')

  await page.getByTestId('show-picker').selectOption({ label: 'Combination: Example: dead + wind' })
  await expect(page.getByTestId('max-compression')).toBeVisible()
  await page.getByTestId('show-picker').selectOption({ label: 'Envelope of all combinations' })
  await expect(page.getByTestId('stress-legend')).toContainText('Envelope')
  // Envelope worst compression: dead at e = 100 plus or minus wind, corner (200, ±300):
  // 4.167·(1 + 1.5) + 4.167 = 14.58 MPa C (hand calculation).
  const expectedEnv = (P / (b * h)) * (1 + (6 * 100) / b) + (1e8 * 300) / ((b * h ** 3) / 12)
  expect(firstNumber(await page.getByTestId('max-compression').textContent())).toBeCloseTo(expectedEnv, 1)
  // Both combinations reach it (at opposite corners): the legend names the one that governs.
  await expect(page.getByTestId('governs-compression')).toHaveText(/Example: dead [+−] wind/)
  // Single cases stay selectable beside the combinations.
  await page.getByTestId('show-picker').selectOption({ label: 'Case: Wind' })
  await expect(page.getByTestId('stress-legend')).toContainText('Normal stress')
  await page.getByTestId('show-picker').selectOption({ label: 'Envelope of all combinations' })
  await shot(page, 'stress-envelope')
})

test('while a dragged vertex waits for its answer, the stress field is not repainted: it changes once, with the drawing', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const id = await newSketch(page, 'Stress e2e held vertex', rectangleDocument())
  await openStress(page, id)
  await expect(page.getByTestId('tension-panel')).toHaveAttribute('data-state', 'inside')
  // Every paint of the stress layer, with the drawn parts' revision on screen when it was painted.
  await page.evaluate(() => {
    const w = window as unknown as { Konva: { Layer: { prototype: { drawScene: (...a: unknown[]) => unknown } } }; kwPaints: string[] }
    w.kwPaints = []
    const layer = w.Konva.Layer.prototype
    const draw = layer.drawScene
    layer.drawScene = function (this: { name: () => string }, ...a: unknown[]) {
      if (this.name() === 'stress-field') w.kwPaints.push(document.querySelector('[data-testid="sketch-canvas"]')!.getAttribute('data-parts-revision') ?? '')
      return draw.apply(this, a)
    }
  })
  const canvas = page.getByTestId('sketch-canvas')
  const rev0 = await canvas.getAttribute('data-parts-revision')
  const area0 = await page.getByTestId('prop-area').getAttribute('data-value')
  const [px, py] = await toPage(page, -120, -80)
  await page.mouse.click(px, py) // pick the part (away from the load on the centroid)
  const [vx, vy] = await toPage(page, b / 2, -h / 2)
  const [wx] = await toPage(page, b / 2 + 40, -h / 2)
  await page.evaluate(() => { (window as unknown as { kwPaints: string[] }).kwPaints = [] })
  await page.mouse.move(vx, vy)
  await page.keyboard.down('Alt') // no snapping: the corner lands where the pointer does
  await page.mouse.down()
  for (let k = 1; k <= 8; k++) await page.mouse.move(vx + ((wx - vx) * k) / 8, vy)
  await page.mouse.up()
  await page.keyboard.up('Alt')
  await expect(page.getByTestId('prop-area')).not.toHaveAttribute('data-value', area0!)
  await expect(canvas).not.toHaveAttribute('data-parts-revision', rev0!)
  await expect.poll(() => page.evaluate(() => (window as unknown as { kwPaints: string[] }).kwPaints.length)).toBeGreaterThan(0)
  const paints = await page.evaluate(() => (window as unknown as { kwPaints: string[] }).kwPaints)
  // Painted only for the new drawing: none while the drawing still showed the parts before the edit.
  expect(paints.filter(r => r === rev0), 'stress paints while the change was held').toEqual([])
})

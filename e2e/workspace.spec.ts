import { expect, test, type Page } from '@playwright/test'
import { open, SAME_ORIGIN, shot, signIn } from './support/helpers'

// The editor's workspace: panel groups remembered per user, labels that stay clear of each other
// and the legend, the legend moved and collapsed, tool tooltips, the first-use hint, the dark
// canvas, the phone layout with a load dragged by touch, and the dashboard's drawings.

async function sketchId(page: Page, title: string): Promise<string> {
  const { sketches } = await (await page.request.get('/api/sketches')).json() as { sketches: { id: string; title: string }[] }
  return sketches.find(s => s.title === title)!.id
}

interface Placed { text: string; x: number; y: number; w: number; h: number }
const overlap = (a: { x: number; y: number; w: number; h: number }, b: { x: number; y: number; w: number; h: number }) =>
  a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h

/** The stress labels as last painted, and the canvas and legend boxes (CSS px, canvas top left). */
async function labelsNow(page: Page): Promise<{ labels: Placed[]; canvas: { w: number; h: number }; legend: Placed | null }> {
  return page.evaluate(() => {
    const canvas = document.querySelector('[data-testid="sketch-canvas"]') as HTMLElement
    const dock = document.querySelector('[data-testid="legend-dock"]') as HTMLElement | null
    const c = canvas.getBoundingClientRect()
    const d = dock && dock.offsetParent ? dock.getBoundingClientRect() : null
    return {
      labels: ((window as unknown as { kwStressLabels?: Placed[] }).kwStressLabels ?? []).map(l => ({ ...l })),
      canvas: { w: c.width, h: c.height },
      legend: d ? { text: 'legend', x: d.left - c.left, y: d.top - c.top, w: d.width, h: d.height } : null,
    }
  })
}

test('panel groups: one click shows a group, the arrow keys move between tabs, and the choice is remembered per user', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await open(page, `/sketches/${await sketchId(page, 'Crane column C3')}`)
  await expect(page.getByTestId('properties-panel')).toBeVisible()
  await expect(page.getByTestId('check-panel')).toBeHidden()
  await page.getByTestId('group-tab-checks').click()
  await expect(page.getByTestId('group-tab-checks')).toHaveAttribute('aria-selected', 'true')
  await expect(page.getByTestId('panel-check')).toBeVisible()
  await expect(page.getByTestId('properties-panel')).toBeHidden()
  // Keyboard: the focused tab moves with the arrows, and the editor's arrow nudges do not run.
  await page.getByTestId('group-tab-checks').focus()
  await page.keyboard.press('ArrowRight')
  await expect(page.getByTestId('group-tab-part')).toBeFocused()
  await expect(page.getByTestId('group-tab-part')).toHaveAttribute('aria-selected', 'true')
  await page.keyboard.press('ArrowLeft')
  await expect(page.getByTestId('group-tab-checks')).toHaveAttribute('aria-selected', 'true')
  await page.reload()
  await expect(page.getByTestId('group-tab-checks')).toHaveAttribute('aria-selected', 'true')
  await expect(page.getByTestId('panel-check')).toBeVisible()

  // Another user on the same browser starts with the default group.
  await page.context().clearCookies()
  await signIn(page, 'admin@millrace.test')
  const made = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Admin scratch' } })
  expect(made.status()).toBe(201)
  await open(page, `/sketches/${(await made.json()).id}`)
  await expect(page.getByTestId('group-tab-section')).toHaveAttribute('aria-selected', 'true')
})

for (const width of [1440, 1024]) {
  test(`labels on the drawing at ${width} px: none overlaps another or the legend, none is cut off at the canvas edge`, async ({ page }) => {
    await page.setViewportSize({ width, height: width === 1440 ? 900 : 768 })
    await signIn(page, 'engineer@millrace.test')
    for (const title of ['Crane column C3', 'Brick pier P2', 'Pad footing F4', 'Fabricated T-stub T6']) {
      await open(page, `/sketches/${await sketchId(page, title)}`)
      await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
      await expect.poll(async () => (await labelsNow(page)).labels.length, { message: `${title}: labels painted` }).toBeGreaterThan(2)
      const { labels, canvas, legend } = await labelsNow(page)
      for (const l of labels) {
        expect(l.x, `${title}: "${l.text}" left edge`).toBeGreaterThanOrEqual(0)
        expect(l.y, `${title}: "${l.text}" top edge`).toBeGreaterThanOrEqual(0)
        expect(l.x + l.w, `${title}: "${l.text}" right edge`).toBeLessThanOrEqual(canvas.w)
        expect(l.y + l.h, `${title}: "${l.text}" bottom edge`).toBeLessThanOrEqual(canvas.h)
        if (legend) expect(overlap(l, legend), `${title}: "${l.text}" under the legend`).toBe(false)
      }
      for (let i = 0; i < labels.length; i++) {
        for (let j = i + 1; j < labels.length; j++) expect(overlap(labels[i]!, labels[j]!), `${title}: "${labels[i]!.text}" over "${labels[j]!.text}"`).toBe(false)
      }
      // The callouts that used to be cut off are drawn.
      expect(labels.some(l => /^(max C|uniform)/.test(l.text)), `${title}: the max C callout`).toBe(true)
    }
  })
}

test('the legend collapses to its title bar and moves by its grip (keys or drag); both are remembered', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await open(page, `/sketches/${await sketchId(page, 'Crane column C3')}`)
  const dock = page.getByTestId('legend-dock')
  await expect(page.getByTestId('stress-legend')).toBeVisible()
  const before = (await dock.boundingBox())!
  await page.getByTestId('legend-grip').focus()
  for (let i = 0; i < 4; i++) await page.keyboard.press('ArrowLeft')
  await page.keyboard.press('ArrowDown')
  await expect.poll(async () => (await dock.boundingBox())!.x).toBeCloseTo(before.x - 40, 0)
  expect((await dock.boundingBox())!.y).toBeCloseTo(before.y + 10, 0)
  // A pointer drag of the grip moves it too.
  const grip = (await page.getByTestId('legend-grip').boundingBox())!
  await page.mouse.move(grip.x + 5, grip.y + 5)
  await page.mouse.down()
  await page.mouse.move(grip.x - 95, grip.y + 65, { steps: 5 })
  await page.mouse.up()
  await expect.poll(async () => (await dock.boundingBox())!.x).toBeCloseTo(before.x - 140, 0)
  const moved = (await dock.boundingBox())!
  await page.getByTestId('legend-toggle').click()
  await expect(page.getByTestId('stress-legend')).toBeHidden()
  await expect(page.getByTestId('legend-toggle')).toHaveAttribute('aria-expanded', 'false')
  await page.reload()
  await expect(page.getByTestId('legend-toggle')).toHaveAttribute('aria-expanded', 'false')
  expect((await dock.boundingBox())!.y).toBeCloseTo(moved.y, 0)
  await page.getByTestId('legend-toggle').click()
  await expect(page.getByTestId('stress-legend')).toBeVisible()
})

test('tool buttons show a tooltip naming the action and its key, on hover and on keyboard focus', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await open(page, `/sketches/${await sketchId(page, 'Crane column C3')}`)
  await page.getByTestId('undo').hover()
  await expect(page.getByTestId('rail-tooltip')).toHaveText(/^Undo.*\(Ctrl\+Z\)$/)
  await page.getByTestId('tool-box').focus()
  await expect(page.getByTestId('rail-tooltip')).toHaveText('Drag a rectangle (B)')
  await expect(page.getByTestId('tool-box')).toHaveAccessibleName('Box (B)')
  await expect(page.getByTestId('fit')).toHaveAccessibleName('Zoom to fit (F)')
  // Every rail button has a drawn icon, none a lone character.
  const glyphs = await page.getByTestId('sketch-toolbar').locator('button').evaluateAll(bs => bs.filter(b => !b.querySelector('svg path')).length)
  expect(glyphs).toBe(0)
  await shot(page, 'workspace-tooltip')
})

test('an empty sketch says what to do first; its buttons open the shape form and the keys', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const res = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'First use' } })
  await open(page, `/sketches/${(await res.json()).id}`)
  await expect(page.getByTestId('first-use')).toContainText('Outline')
  await page.getByTestId('first-use-keys').click()
  await expect(page.getByTestId('shortcut-sheet')).toBeVisible()
  await page.keyboard.press('Escape')
  await expect(page.getByTestId('shortcut-sheet')).toBeHidden()
  await page.getByTestId('first-use-shape').click()
  await expect(page.getByTestId('first-use')).toBeHidden()
  await page.getByRole('button', { name: 'Insert', exact: true }).click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  await expect(page.getByTestId('first-use')).toHaveCount(0)
})

test('the dark theme darkens the canvas itself: its background and grid are drawn dark', async ({ page }) => {
  await page.addInitScript(() => localStorage.setItem('kw-theme', 'dark'))
  await signIn(page, 'engineer@millrace.test')
  await open(page, `/sketches/${await sketchId(page, 'Crane column C3')}`)
  await expect(page.locator('html')).toHaveClass(/dark/)
  const bg = await page.getByTestId('sketch-canvas').evaluate(el => getComputedStyle(el).backgroundColor)
  const [r, g, b] = bg.match(/\d+/g)!.map(Number)
  // Relative luminance well below mid-grey (WCAG formula, roughly): a dark canvas.
  expect(0.2126 * r! + 0.7152 * g! + 0.0722 * b!).toBeLessThan(40)
})

test('on a phone the drawing fills the width, the panels open as a sheet below, and a load drags with a finger', async ({ browser }) => {
  const context = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true })
  const page = await context.newPage()
  await signIn(page, 'engineer@millrace.test')
  const doc = {
    schema: 'kernwise.sketch/2',
    parts: [{ id: 'p', name: 'Pier', holes: [], shape: null, outline: [[-200, -300], [200, -300], [200, 300], [-200, 300]], material: { name: 'Masonry', E: 5000 } }],
    cases: [{ id: 'c', name: 'Dead', Mx: 0, My: 0 }], combinations: [], loads: [{ id: 'l', name: 'G', caseId: 'c', P: 1e6, x: 0, y: 0 }], settings: {},
  }
  const id = (await (await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Phone drag', document: doc } })).json()).id
  await open(page, `/sketches/${id}`)
  const canvas = page.getByTestId('sketch-canvas')
  await expect(canvas).toBeVisible()
  const box = (await canvas.boundingBox())!
  expect(box.width).toBeGreaterThan(385)
  expect(box.height).toBeGreaterThan(300)
  await expect(page.getByTestId('sketch-toolbar')).toBeHidden()
  await expect(page.getByTestId('right-panels')).toBeHidden()
  await page.getByTestId('open-panels').click()
  await expect(page.getByTestId('right-panels')).toBeVisible()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')

  // A finger on the load at the centroid, moved 60 px right (touch events through the DevTools protocol).
  const zoom = Number(await canvas.getAttribute('data-zoom'))
  const sx = box.x + Number(await canvas.getAttribute('data-pan-x'))
  const sy = box.y + Number(await canvas.getAttribute('data-pan-y'))
  const cdp = await context.newCDPSession(page)
  const touch = (type: string, x: number) => cdp.send('Input.dispatchTouchEvent', { type, touchPoints: type === 'touchEnd' ? [] : [{ x, y: sy, id: 1 }] })
  await touch('touchStart', sx)
  for (let k = 1; k <= 10; k++) await touch('touchMove', sx + 6 * k)
  await touch('touchEnd', sx + 60)
  await page.getByTestId('group-tab-loads').click()
  const x = page.getByTestId('load-x-0')
  await expect.poll(async () => Number((await x.inputValue()).replace('\u2212', '-'))).toBeCloseTo(60 / zoom, -1)
  await shot(page, 'workspace-phone-dragged')

  // The team panel opens on a phone too, across the width, and closes again.
  await page.getByTestId('open-team').click()
  const drawer = page.getByTestId('team-drawer')
  await expect(drawer).toBeVisible()
  expect((await drawer.boundingBox())!.width).toBeGreaterThan(385)
  await shot(page, 'workspace-phone-team')
  await drawer.getByRole('button', { name: 'Close the team panel' }).click()
  await expect(drawer).toBeHidden()
  await context.close()
})

test('the dashboard shows a small drawing of each section beside its title', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const row = page.getByTestId('sketch-list').locator('tr', { hasText: 'Crane column C3' })
  const img = row.getByTestId('sketch-thumb').locator('img')
  await expect(img).toHaveAttribute('src', /\/thumbnail\.svg\?v=\d+$/)
  await expect.poll(() => img.evaluate(i => (i as HTMLImageElement).complete && (i as HTMLImageElement).naturalWidth)).toBeGreaterThan(0)
})

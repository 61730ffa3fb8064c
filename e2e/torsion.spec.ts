import { expect, test, type Page } from '@playwright/test'
import { open, SAME_ORIGIN, shot, showGroup, signIn } from './support/helpers'

// A thin channel: web mid-line on x = 0, flange mid-lines at y = ±h/2, tips at x = b, all t thick.
// Shear centre at e = 3b²/(h + 6b) behind the web (thin-walled closed form, equal thicknesses).
const h = 200; const b = 100; const t = 4
const channel = [[-t / 2, -h / 2 - t / 2], [b, -h / 2 - t / 2], [b, -h / 2 + t / 2], [t / 2, -h / 2 + t / 2], [t / 2, h / 2 - t / 2], [b, h / 2 - t / 2], [b, h / 2 + t / 2], [-t / 2, h / 2 + t / 2]]

async function newSketch(page: Page): Promise<string> {
  const document = {
    schema: 'kernwise.sketch/1',
    parts: [{ id: 'part-1', name: 'Channel', holes: [], shape: null, outline: channel, material: { name: 'Steel', E: 200_000, fy: 355, density: 7850 } }],
    cases: [{ id: 'case-1', name: 'Dead', Mx: 0, My: 0 }],
    combinations: [],
    loads: [],
    settings: { shear: { Vx: 0, Vy: 10_000 } },
  }
  const res = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Torsion e2e channel', document } })
  expect(res.status()).toBe(201)
  return (await res.json()).id as string
}

test('the torsion panel shows J, Cw, the shear centre of a channel where the closed form puts it, the mesh study and the τ field', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const id = await newSketch(page)
  await open(page, `/sketches/${id}`)
  const panel = page.getByTestId('torsion-panel')
  await expect(panel).toHaveAttribute('data-state', 'ready', { timeout: 20_000 })
  // The live properties came first and still show Ip as the polar moment, not J.
  await expect(page.getByTestId('properties-panel')).toContainText('Ip polar (not J)')
  const e = (3 * b * b) / (h + 6 * b)
  const x = Number(await page.getByTestId('torsion-scx').getAttribute('data-value'))
  expect(Math.abs(x + e) / e).toBeLessThan(0.03)
  // Σ b·t³/3 over the mid-lines (thin-walled open section): within 10 % (corners add a little).
  const J = Number(await page.getByTestId('torsion-J').getAttribute('data-value'))
  const thin = ((2 * b + h) * t ** 3) / 3
  expect(Math.abs(J - thin) / thin).toBeLessThan(0.1)
  await expect(page.getByTestId('torsion-Cw')).toContainText('⁶')

  await showGroup(page, 'checks')
  await page.getByTestId('torsion-study').check()
  await expect(page.getByTestId('torsion-study-difference')).toContainText('%', { timeout: 20_000 })
  await page.getByTestId('torsion-field').check()
  await expect(page.getByTestId('torsion-taumax')).toContainText('τ max', { timeout: 20_000 })
  await expect(panel).toHaveAttribute('data-state', 'ready', { timeout: 20_000 })
  await expect(page.getByTestId('torsion-status')).not.toContainText('solving')
  await shot(page, 'torsion-channel')
})

test('a box of four welded plates: the closed-cell welds show |q| from the FE shear solution, Vy·Q/Ixx of half a flange (thin-walled result, the symmetry cut has q = 0)', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  const plate = (id: string, name: string, x: number, y: number, w: number, hh: number) => ({ id, name, outline: [[x, y], [x + w, y], [x + w, y + hh], [x, y + hh]], holes: [], shape: null, material: { name: 'Steel', E: 200_000, fy: 355, density: 7850 } })
  const document = {
    schema: 'kernwise.sketch/2',
    parts: [plate('t', 'Top flange', -100, 140, 200, 10), plate('r', 'Right web', 90, -140, 10, 280), plate('b', 'Bottom flange', -100, -150, 200, 10), plate('l', 'Left web', -100, -140, 10, 280)],
    cases: [{ id: 'case-1', name: 'Dead', Mx: 0, My: 0 }],
    combinations: [],
    loads: [],
    settings: { shear: { Vx: 0, Vy: 100_000 } },
  }
  const res = await page.request.post('/api/sketches', { headers: SAME_ORIGIN, data: { title: 'Welded box', document } })
  expect(res.status()).toBe(201)
  await open(page, `/sketches/${(await res.json()).id}`)
  await showGroup(page, 'checks')
  await expect(page.getByTestId('torsion-panel')).toHaveAttribute('data-state', 'ready', { timeout: 20_000 })
  const rows = page.getByTestId('shear-row')
  await expect(rows).toHaveCount(4)
  await expect(rows.first()).toHaveAttribute('data-source', 'fe')
  // Parallel axes by hand; Q of half a flange = 100·10·145 mm³.
  const Ixx = 2 * (200 * 10 ** 3 / 12 + 2000 * 145 ** 2) + 2 * (10 * 280 ** 3 / 12)
  const expected = (100_000 * 100 * 10 * 145) / Ixx
  for (let i = 0; i < 4; i++) {
    await expect(rows.nth(i)).toHaveAttribute('data-status', 'closed-cell')
    await expect(page.getByTestId(`shear-source-${i}`)).toContainText('from the FE shear solution')
    const q = Number(await page.getByTestId(`shear-q-${i}`).getAttribute('data-value'))
    expect(Math.abs(q - expected) / expected).toBeLessThan(0.01)
  }
  await page.getByTestId('shear-panel').scrollIntoViewIfNeeded()
  await shot(page, 'shear-closed-cell-fe')
})

import { mkdirSync } from 'node:fs'
import { expect, type Page } from '@playwright/test'

/** Screenshots kept as artifacts of the run (looked at by a person, not compared). */
export const ARTIFACTS = 'e2e/artifacts'

export async function shot(page: Page, name: string): Promise<void> {
  mkdirSync(ARTIFACTS, { recursive: true })
  await page.screenshot({ path: `${ARTIFACTS}/${name}.png`, fullPage: false })
}

/** Opens a page and waits until Vue has hydrated it (clicks before that are lost). */
export async function open(page: Page, path: string): Promise<void> {
  await page.goto(path)
  await expect(page.locator('html[data-hydrated="true"]')).toHaveCount(1)
}

/** The app's origin: page.request calls send it as a browser would (the server's same-origin check). */
export const ORIGIN = `http://127.0.0.1:${Number(process.env.E2E_PORT || 3217)}`
/** Headers for page.request.post/patch/delete: a same-origin Origin. */
export const SAME_ORIGIN = { origin: ORIGIN }

export const DEMO_PASSWORD = 'millrace-demo-2026'

/** Signs in through the form as a demo account. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await open(page, '/sign-in')
  await page.getByLabel('E-mail').fill(email)
  await page.getByLabel('Password').fill(password)
  await page.getByRole('button', { name: 'Sign in' }).click()
  await expect(page.getByTestId('sign-out')).toBeVisible()
}

/** The canvas transform as the editor publishes it: screen = (panX + zoom·x, panY − zoom·y). */
export async function canvasTransform(page: Page): Promise<(x: number, y: number) => { x: number; y: number }> {
  const canvas = page.getByTestId('sketch-canvas')
  const box = (await canvas.boundingBox())!
  const zoom = Number(await canvas.getAttribute('data-zoom'))
  const panX = Number(await canvas.getAttribute('data-pan-x'))
  const panY = Number(await canvas.getAttribute('data-pan-y'))
  return (x: number, y: number) => ({ x: box.x + panX + zoom * x, y: box.y + panY - zoom * y })
}

/** Drags the mouse in small steps, as a person would. */
export async function dragMouse(page: Page, from: { x: number; y: number }, to: { x: number; y: number }): Promise<void> {
  await page.mouse.move(from.x, from.y)
  await page.mouse.down()
  for (let k = 1; k <= 8; k++) await page.mouse.move(from.x + ((to.x - from.x) * k) / 8, from.y + ((to.y - from.y) * k) / 8)
  await page.mouse.up()
}

/** Shows one group of the editor's right column (its panels are hidden behind the other tabs). */
export async function showGroup(page: Page, group: 'section' | 'loads' | 'checks' | 'part'): Promise<void> {
  await page.getByTestId(`group-tab-${group}`).click()
  await expect(page.getByTestId(`group-tab-${group}`)).toHaveAttribute('aria-selected', 'true')
}

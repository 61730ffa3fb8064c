import { expect, test } from '@playwright/test'
import { open, shot, signIn } from './support/helpers'

// The demo workspace as a user first meets it: every demo sketch opens, analyses without a
// geometry error, and shows the state the scenario describes.
const EXPECT: Record<string, { kern?: 'inside' | 'outside'; contact?: 'partial' | 'full' }> = {
  'Crane column C3': { kern: 'inside' },
  'Mezzanine post M1': {},
  'Brick pier P2': { kern: 'outside', contact: 'partial' },
  'Pad footing F4': { kern: 'outside', contact: 'partial' },
  'Canopy strut S5': {},
  'Fabricated T-stub T6': {},
}

test('every demo sketch opens with its properties and the state the scenario describes', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await expect(page.getByTestId('sketch-list')).toBeVisible()
  await shot(page, 'demo-dashboard')
  const links = page.getByTestId('sketch-list').locator('a')
  // Earlier specs in the same run may have added sketches of their own: every demo sketch is listed.
  const all = (await links.allTextContents()).map(t => t.trim())
  expect(all.filter(t => t in EXPECT).sort()).toEqual(Object.keys(EXPECT).sort())
  const allHrefs = await links.evaluateAll(as => as.map(a => (a as HTMLAnchorElement).getAttribute('href')))
  const titles = all.filter(t => t in EXPECT)
  const hrefs = allHrefs.filter((_, i) => all[i]! in EXPECT)
  for (let i = 0; i < titles.length; i++) {
    const title = titles[i]!
    await open(page, hrefs[i]!)
    await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
    await expect(page.getByTestId('analysis-error')).toHaveCount(0)
    const area = Number(await page.getByTestId('prop-area').getAttribute('data-value'))
    expect(area, `${title} area`).toBeGreaterThan(0)
    const want = EXPECT[title]!
    if (want.kern) await expect(page.getByTestId('tension-panel')).toHaveAttribute('data-state', want.kern)
    if (want.contact) await expect(page.getByTestId('contact-panel')).toHaveAttribute('data-status', want.contact)
    await page.waitForTimeout(300)
    await shot(page, `demo-${title.toLowerCase().replace(/[^a-z0-9]+/g, '-')}`)
  }
})

import { expect, test } from '@playwright/test'
import { shot } from './support/helpers'
import { openScreen, SCREENS } from './support/screens'

// Every screen at a laptop, a tablet and a phone width, light and dark, kept in e2e/artifacts/
// for a person to open and look at. Checked here: the page does not scroll sideways (nothing is
// cut off or pushed out at that width) and the editor's drawing is on screen.
const WIDTHS = [{ w: 1440, h: 900 }, { w: 1024, h: 768 }, { w: 390, h: 844 }]

for (const theme of ['light', 'dark'] as const) {
  for (const { w, h } of WIDTHS) {
    test(`every screen at ${w} px, ${theme}: fits the width, the drawing shows`, async ({ page }) => {
      test.setTimeout(180_000)
      await page.setViewportSize({ width: w, height: h })
      await page.addInitScript(t => localStorage.setItem('kw-theme', t), theme)
      const who = { who: null as string | null }
      for (const s of SCREENS) {
        await openScreen(page, s, who)
        await expect(page.locator('html')).toHaveClass(theme === 'dark' ? /dark/ : /^(?!.*dark)/)
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)
        expect(overflow, `${s.name} scrolls sideways at ${w} px`).toBeLessThanOrEqual(0)
        if (s.editor) {
          const box = await page.getByTestId('sketch-canvas').boundingBox()
          expect(box!.width, `${s.name}: canvas width at ${w} px`).toBeGreaterThan(w < 640 ? w - 2 : 300)
          expect(box!.height, `${s.name}: canvas height at ${w} px`).toBeGreaterThan(250)
        }
        await shot(page, `screen-${s.name}-${w}-${theme}`)
      }
    })
  }
}

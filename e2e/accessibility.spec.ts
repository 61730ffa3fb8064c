import AxeBuilder from '@axe-core/playwright'
import { expect, test, type Page } from '@playwright/test'
import { openScreen, SCREENS } from './support/screens'

// axe-core (the accessibility engine, run in the page) on every screen, light and dark: WCAG 2.1
// A and AA rules, colour contrast included. Nothing is excluded: a violation is fixed in the app.
async function violations(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze()
  return result.violations.map(v => `${v.id} (${v.impact}): ${v.help}\n${v.nodes.slice(0, 5).map(n => `    ${n.target.join(' ')} ${n.failureSummary?.split('\n').slice(1, 2).join('') ?? ''}`).join('\n')}`)
}

for (const theme of ['light', 'dark'] as const) {
  test(`axe finds no WCAG A/AA violation on any screen (${theme})`, async ({ page }) => {
    test.setTimeout(180_000)
    await page.addInitScript(t => localStorage.setItem('kw-theme', t), theme)
    const who = { who: null as string | null }
    const found: string[] = []
    for (const s of SCREENS) {
      await openScreen(page, s, who)
      for (const v of await violations(page)) found.push(`${s.name}: ${v}`)
    }
    expect(found, found.join('\n')).toEqual([])
  })
}

test('axe finds no violation in the editor with its dialogs and every panel group open', async ({ page }) => {
  test.setTimeout(120_000)
  const who = { who: null as string | null }
  await openScreen(page, SCREENS.find(s => s.name === 'editor')!, who)
  const found: string[] = []
  for (const g of ['loads', 'checks', 'part']) {
    await page.getByTestId(`group-tab-${g}`).click()
    for (const v of await violations(page)) found.push(`group ${g}: ${v}`)
  }
  await page.getByTestId('shortcuts').click()
  await expect(page.getByTestId('shortcut-sheet')).toBeVisible()
  for (const v of await violations(page)) found.push(`shortcuts: ${v}`)
  await page.keyboard.press('Escape')
  await page.getByTestId('tool-shape').click()
  for (const v of await violations(page)) found.push(`shape form: ${v}`)
  expect(found, found.join('\n')).toEqual([])
})

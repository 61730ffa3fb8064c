import { expect, test } from '@playwright/test'
import { open, signIn } from './support/helpers'

// The content security policy allows only the app's own scripts (and Nuxt's inline one by its
// nonce): the pages must work under it with no violation reported by the browser.
test('sign-in, dashboard, editor and account run under the CSP without a violation', async ({ page }) => {
  const violations: string[] = []
  page.on('console', (m) => { if (/Content Security Policy|Refused to/i.test(m.text())) violations.push(m.text()) })
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => console.error(`Refused to: ${e.violatedDirective} ${e.blockedURI} ${e.sourceFile}:${e.lineNumber}:${e.columnNumber} on ${location.pathname}`))
  })
  await signIn(page, 'engineer@millrace.test')
  await expect(page.getByTestId('sketch-list')).toBeVisible()
  const href = await page.getByTestId('sketch-list').locator('a').first().getAttribute('href')
  await open(page, href!)
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  await open(page, '/account')
  await expect(page.getByTestId('session-current')).toBeVisible()
  expect(violations).toEqual([])
})

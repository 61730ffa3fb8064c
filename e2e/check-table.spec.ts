import { readFileSync } from 'node:fs'
import { expect, test } from '@playwright/test'
import { open, shot, signIn } from './support/helpers'

test('the check table of the crane column: rows per part, sums equal to the section panel, the stress written out, CSV download', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await open(page, '/')
  await page.getByTestId('sketch-list').getByRole('link', { name: 'Crane column C3' }).click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  await page.getByTestId('open-check-table').click()
  const rows = page.getByTestId('check-table-row')
  await expect(rows).toHaveCount(2) // the H section and the bracket plate
  await expect(rows.first()).toContainText('H 300 × 300')
  const area = Number(await page.getByTestId('prop-area').getAttribute('data-value'))
  const sumA = Number(await page.getByTestId('check-sum-A').getAttribute('data-value'))
  expect(Math.abs(sumA - area) / area).toBeLessThan(1e-9)
  const Ixx = Number(await page.getByTestId('prop-Ixx').getAttribute('data-value'))
  const sumI = Number(await page.getByTestId('check-sum-Ixx').getAttribute('data-value'))
  expect(Math.abs(sumI - Ixx) / Ixx).toBeLessThan(1e-9)
  // The stress terms at the extremes add up to the legend's extremes (the same plane).
  await expect(page.getByTestId('stress-terms-row').first()).toContainText('most compressive')
  const totals = await page.getByTestId('stress-terms-total').evaluateAll(els => els.map(e => Number(e.getAttribute('data-value'))))
  expect(totals.length).toBeGreaterThanOrEqual(1)
  expect(totals[0]!).toBeLessThan(0) // compression, tension-positive convention
  await shot(page, 'check-table-crane-column')
  const download = page.waitForEvent('download')
  await page.getByTestId('check-table-csv').click()
  const file = await (await download).path()
  const csv = readFileSync(file!, 'utf8').trim().split('\n')
  expect(csv[0]).toMatch(/^Row,Sign,n,A \(mm²\)/)
  expect(csv[1]).toMatch(/^H 300 × 300,1,1,/)
  const ixxLine = csv.find(l => l.startsWith('"Ixx = '))!
  expect(Math.abs(Number(ixxLine.split(',').pop()) - Ixx) / Ixx).toBeLessThan(1e-9)
})

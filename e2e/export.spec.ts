import { readFileSync } from 'node:fs'
import DxfParser from 'dxf-parser'
import { expect, test, type Page } from '@playwright/test'
import { canvasTransform, open, shot, signIn } from './support/helpers'

/** The RGB of a PNG at each pixel (x, y), decoded in the page. */
async function pngPixels(page: Page, png: Buffer, points: [number, number][]): Promise<number[][]> {
  return page.evaluate(async ({ b64, points }) => {
    const img = new Image()
    img.src = `data:image/png;base64,${b64}`
    await img.decode()
    const c = document.createElement('canvas')
    c.width = img.width; c.height = img.height
    const g = c.getContext('2d')!
    g.drawImage(img, 0, 0)
    return points.map(([x, y]) => Array.from(g.getImageData(x, y, 1, 1).data.slice(0, 3)))
  }, { b64: png.toString('base64'), points })
}

/** True if an RGB triple is within 20 of each channel of a #rrggbb colour. */
function near(rgb: number[], hex: string): boolean {
  return rgb.every((v, i) => Math.abs(v - parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16)) < 20)
}

async function download(page: Page, testid: string): Promise<Buffer> {
  const wait = page.waitForEvent('download')
  await page.getByTestId('open-export').click()
  await page.getByTestId(testid).click()
  return readFileSync((await (await wait).path())!)
}

test('exports of the brick pier: JSON re-imports, DXF reads back, PNG has its size and colours, CSVs, PDF preview', async ({ page, baseURL }) => {
  await signIn(page, 'engineer@millrace.test')
  await open(page, '/')
  await page.getByTestId('sketch-list').getByRole('link', { name: 'Brick pier P2' }).click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  const area = Number(await page.getByTestId('prop-area').getAttribute('data-value'))
  await page.getByTestId('open-export').click()
  await expect(page.getByTestId('export-menu')).toBeVisible()
  await shot(page, 'export-menu')
  await page.getByTestId('open-export').click()

  const json = JSON.parse((await download(page, 'export-json')).toString('utf8'))
  expect(json.schema).toBe('kernwise.sketch/2')
  const partCount = json.parts.length as number
  expect(partCount).toBeGreaterThan(0)

  const dxf = new DxfParser().parseSync((await download(page, 'export-dxf')).toString('utf8'))!
  const rings = json.parts.reduce((n: number, p: { holes: unknown[] }) => n + 1 + p.holes.length, 0)
  expect(dxf.entities.filter(e => e.type === 'LWPOLYLINE')).toHaveLength(rings)

  // The whole section, fitted (the other choice is the current view, below).
  await page.getByTestId('open-export').click()
  await page.getByTestId('export-area-section').check()
  await page.getByTestId('open-export').click()
  const png = await download(page, 'export-png')
  expect(png.subarray(1, 4).toString('latin1')).toBe('PNG')
  expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([1200, 800]) // IHDR width, height (PNG spec)
  // Decode in the page: the background is white; the pier carries no tension, so its legend runs from
  // zero pressure (top) to the peak compression (bottom), and no tension colour is drawn.
  const [corner, top, bottom] = await pngPixels(page, png, [[5, 5], [1022, 62], [1022, 297]])
  expect(corner).toEqual([255, 255, 255])
  expect(near(top!, '#f4f4f1'), `top ${top}`).toBe(true) // EXPORT_COLOURS.zero
  expect(near(bottom!, '#2f5fa7'), `bottom ${bottom}`).toBe(true) // EXPORT_COLOURS.compression

  const props = (await download(page, 'export-properties')).toString('utf8').split('\n')
  expect(props[0]).toBe('Property,Value,Unit')
  const [name, value, unit] = props[1]!.split(',')
  expect(name).toBe('A')
  expect(unit).toBe('mm²')
  expect(Math.abs(Number(value) - area) / area).toBeLessThan(1e-9) // the same analysis as the panel

  const vertices = (await download(page, 'export-vertices')).toString('utf8').trim().split('\n')
  expect(vertices[0]).toMatch(/^Material,Polygon,Ring,Vertex,x \(mm\),y \(mm\),Stress/)
  expect(vertices.length).toBeGreaterThan(4)

  await page.getByTestId('open-export').click()
  const href = await page.getByTestId('export-pdf-a4').getAttribute('href')
  const pdf = await page.request.get(href!)
  expect(pdf.headers()['content-type']).toBe('application/pdf')
  expect((await pdf.body()).subarray(0, 5).toString('latin1')).toBe('%PDF-')

  // The JSON re-imports into a new sketch with the same parts and area.
  const made = await page.request.post('/api/sketches', { data: { title: 'Pier again' }, headers: { origin: baseURL! } })
  await open(page, `/sketches/${(await made.json()).id}`)
  await page.getByTestId('open-import').click()
  await page.getByTestId('import-file').setInputFiles({ name: 'pier.kernwise.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(json)) })
  await expect(page.getByTestId('import-summary')).toContainText(`${partCount} part`)
  await page.getByTestId('import-insert').click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  const again = Number(await page.getByTestId('prop-area').getAttribute('data-value'))
  expect(Math.abs(again - area) / area).toBeLessThan(1e-9)
})

test('SVG and PNG of the current view: the zoom and pan on screen, with the legend and a scale bar at that zoom', async ({ page }) => {
  await signIn(page, 'engineer@millrace.test')
  await open(page, '/')
  await page.getByTestId('sketch-list').getByRole('link', { name: 'Brick pier P2' }).click()
  await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', 'ready')
  // Zoom in twice about a point off the centre, so the view differs from the fitted section.
  const canvas = page.getByTestId('sketch-canvas')
  const box = (await canvas.boundingBox())!
  await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.4)
  const zoom0 = Number(await canvas.getAttribute('data-zoom'))
  await page.mouse.wheel(0, -100)
  await expect.poll(async () => Number(await canvas.getAttribute('data-zoom'))).toBeGreaterThan(zoom0)
  await page.mouse.wheel(0, -100)
  await page.waitForTimeout(200)
  const zoom = Number(await canvas.getAttribute('data-zoom'))
  const panX = Number(await canvas.getAttribute('data-pan-x'))
  const panY = Number(await canvas.getAttribute('data-pan-y'))
  expect(zoom).toBeGreaterThan(zoom0)

  await page.getByTestId('open-export').click()
  await expect(page.getByTestId('export-area-view')).toBeChecked() // the current view is the default
  await expect(page.getByTestId('export-svg')).toContainText('the view on screen')
  await shot(page, 'export-menu-view')
  await page.getByTestId('open-export').click()
  const svg = (await download(page, 'export-svg')).toString('utf8')
  const size = svg.match(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="(\d+)" height="(\d+)"/)
  expect(size).not.toBeNull()
  const [w, h] = [Number(size![1]), Number(size![2])]
  expect(w).toBe(Math.round(box.width) + 200) // the canvas and the legend column
  expect(h).toBe(Math.round(box.height))
  expect(svg).toContain('data-mode="view"')
  expect(svg).toContain('data-role="legend"')
  // Each outline vertex of the exported drawing sits where the canvas draws it: screen = pan + zoom·(x, −y).
  const json = JSON.parse((await download(page, 'export-json')).toString('utf8'))
  const [x, y] = json.parts[0].outline[0] as [number, number]
  expect(svg).toContain(`${+(panX + zoom * x).toFixed(2)},${+(panY - zoom * y).toFixed(2)}`)
  const at = await canvasTransform(page)
  expect(Math.abs(at(x, y).x - box.x - (panX + zoom * x))).toBeLessThan(1e-6)
  // The scale bar is drawn at the view's zoom.
  const bar = svg.match(/data-role="scale-bar" data-mm="([\d.e+-]+)" data-px="([\d.]+)"/)
  expect(bar).not.toBeNull()
  expect(Number(bar![2])).toBeCloseTo(zoom * Number(bar![1]), 1)

  const png = await download(page, 'export-png')
  expect(png.subarray(1, 4).toString('latin1')).toBe('PNG')
  expect([png.readUInt32BE(16), png.readUInt32BE(20)]).toEqual([2 * w, 2 * h]) // IHDR: two pixels per screen pixel
  // Decoded: white where the view is empty (top left corner), the legend's compression colour at its foot.
  const legendX = w - 200 + 10
  const [legendFoot] = await pngPixels(page, png, [[2 * (legendX + 12), 2 * 297]])
  expect(near(legendFoot!, '#2f5fa7'), `legend foot ${legendFoot}`).toBe(true) // EXPORT_COLOURS.compression
  await page.setContent(svg)
  await shot(page, 'export-view-svg')
})

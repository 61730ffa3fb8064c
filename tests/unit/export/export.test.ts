import DxfParser from 'dxf-parser'
import { describe, expect, it } from 'vitest'
import { AnalysisRequest } from '../../../shared/analysis/contract'
import { analysisRequestFor } from '../../../shared/editor/analysis-request'
import { propertiesCsv, vertexStressCsv } from '../../../shared/export/csv'
import { DXF_LAYERS, exportDxf } from '../../../shared/export/dxf'
import { exportJson, importJson, isKernwiseJson } from '../../../shared/export/json'
import { EXPORT_COLOURS, exportSvg } from '../../../shared/export/svg'
import { formatNumber } from '../../../shared/editor/units'
import { importDxf } from '../../../shared/import/dxf'
import { ringArea as signedArea } from '../../../shared/geometry/moments'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { SketchDocumentSchema } from '../../../shared/sketch/document'

// A 200 × 100 plate with a 40 × 20 void, a cut square, 100 kN off centre.
const doc = SketchDocumentSchema.parse({
  schema: 'kernwise.sketch/2',
  parts: [
    { id: 'p1', name: 'Plate, "A"', outline: [[0, 0], [200, 0], [200, 100], [0, 100]], holes: [{ id: 'h1', ring: [[20, 20], [20, 40], [60, 40], [60, 20]] }], material: { name: 'Steel', E: 200000, fy: 355 }, shape: null },
    { id: 'c1', name: 'Bolt', kind: 'cut', outline: [[150, 45], [160, 45], [160, 55], [150, 55]], holes: [], material: { name: 'Steel', E: 200000 }, shape: null },
  ],
  cases: [{ id: 'd', name: 'Dead', Mx: 0, My: 0 }],
  loads: [{ id: 'l', name: 'Column', caseId: 'd', P: 100000, x: 120, y: 60 }],
  settings: { units: 'SI' },
})
const analysis = analyseSection(AnalysisRequest.parse(analysisRequestFor(doc)))

describe('exportJson / importJson', () => {
  it('round-trips the document exactly', () => {
    const text = exportJson(doc)
    expect(isKernwiseJson(text)).toBe(true)
    expect(importJson(text)).toEqual(doc)
  })
  it('refuses text that is not a Kernwise document, saying why', () => {
    expect(() => importJson('{"schema": "kernwise.sketch/2", "parts": 3}')).toThrow(/not a valid Kernwise sketch/)
    expect(() => importJson('{nope')).toThrow(/not valid JSON/)
  })
})

describe('exportDxf', () => {
  it('is read back by dxf-parser (an npm library as the outside check) with every ring on its layer', () => {
    const parsed = new DxfParser().parseSync(exportDxf(doc))!
    expect(parsed.header.$INSUNITS).toBe(4)
    const polys = parsed.entities.filter(e => e.type === 'LWPOLYLINE') as unknown as { layer: string; shape: boolean; vertices: { x: number; y: number }[] }[]
    expect(polys.map(p => p.layer)).toEqual([DXF_LAYERS.parts, DXF_LAYERS.holes, DXF_LAYERS.cuts])
    expect(polys.every(p => p.shape)).toBe(true)
    expect(polys[0]!.vertices.map(v => [v.x, v.y])).toEqual(doc.parts[0]!.outline)
  })
  it('imports back into the same section: the plate with its void and the cut nested as holes (area 200·100 − 40·20 − 10·10)', () => {
    const back = importDxf(exportDxf(doc))
    expect(back.units).toBe('mm')
    expect(back.parts).toHaveLength(1)
    const plate = back.parts[0]!
    expect(plate.holes).toHaveLength(2)
    expect(Math.abs(signedArea(plate.outline)) - plate.holes.reduce((s, h) => s + Math.abs(signedArea(h)), 0)).toBe(200 * 100 - 40 * 20 - 10 * 10)
  })
})

describe('CSV exports', () => {
  it('the property table lists A in the display unit: 200·100 − 40·20 − 10·10 = 19 100 mm², and in in² for US customary', () => {
    const si = propertiesCsv(analysis.properties, 'SI').split('\n')
    expect(si[0]).toBe('Property,Value,Unit')
    expect(si[1]).toMatch(/^A,19100,/) // 20000 − 800 − 100 (closed form)
    const us = propertiesCsv(analysis.properties, 'US').split('\n')
    expect(Number(us[1]!.split(',')[1])).toBeCloseTo(19100 / 645.16, 6) // 1 in² = 645.16 mm² (NIST SP 811)
  })
  it('the vertex stresses equal the plane at each vertex, one row per vertex', () => {
    const lines = vertexStressCsv(analysis, 'SI').trim().split('\n')
    const count = analysis.stress!.vertices.reduce((n, v) => n + v.values.length, 0)
    expect(lines).toHaveLength(count + 1)
    const [, , , , x, y, s] = lines[1]!.split(',').map(Number)
    const { a, b, c } = analysis.stress!.plane
    // σ = a + b·x + c·y (README "Method", stress is a plane).
    expect(s).toBeCloseTo(a + b * x! + c * y!, 6)
  })
})

describe('exportSvg', () => {
  it('draws the regions with a stress gradient, the legend with the extremes and a scale bar', () => {
    const svg = exportSvg(analysis, 'Plate <1>', 'SI')
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="1200" height="800"/)
    expect(svg).toContain('linearGradient id="g0"')
    expect(svg).toContain('data-role="legend"')
    expect(svg).toContain('data-role="scale-bar"')
    expect(svg).toContain('Plate &lt;1&gt;')
    expect(svg).toMatch(/min [\d.]+ MPa C/)
  })
})

describe('exportSvg of a no-tension section', () => {
  it('shows the contact pressure, compression only (no tension colour), with the peak 2P/(3B(L/2 - e)) of the standard footing result', () => {
    const a = analyseSection({ parts: [{ outline: [[-500, -500], [500, -500], [500, 500], [-500, 500]], material: { E: 50 } }], loads: [{ P: 1e6, x: 0, y: 300 }], noTension: true })
    const svg = exportSvg(a, 'Pad', 'SI')
    expect(svg).toContain('>Contact pressure</text><text')
    expect(svg).toContain('>(no tension)</text>')
    expect(svg).not.toContain(EXPORT_COLOURS.tension)
    expect(svg).toContain(`peak ${formatNumber(2e6 / (3 * 1000 * 200))} MPa C`)
  })

  it('says overturning when the resultant leaves the base', () => {
    const a = analyseSection({ parts: [{ outline: [[-500, -500], [500, -500], [500, 500], [-500, 500]], material: { E: 50 } }], loads: [{ P: 1e6, x: 0, y: 700 }], noTension: true })
    expect(exportSvg(a, 'Pad', 'SI')).toContain('Overturning')
  })
})

describe('exports follow the area and inertia units chosen in the settings bar', () => {
  it('a 200 x 100 plate in cm² and cm⁴: A = 200 cm², Ixx = 1666.67 cm⁴ (closed form bh³/12, 1 cm⁴ = 10⁴ mm⁴)', () => {
    const a = analyseSection({ parts: [{ outline: [[0, 0], [200, 0], [200, 100], [0, 100]] }] })
    const csv = propertiesCsv(a.properties, { units: 'SI', areaUnit: 'cm2', inertiaUnit: 'cm4' }).split('\n')
    const row = (name: string) => csv.find(l => l.startsWith(`${name},`))!.split(',')
    expect(row('A')).toEqual(['A', '200', 'cm²'])
    expect(Number(row('Ixx')[1])).toBeCloseTo((200 * 100 ** 3) / 12 / 1e4, 6)
    expect(row('Ixx')[2]).toBe('cm⁴')
  })
})

describe('exportSvg of the current view', () => {
  const view = { zoom: 3, panX: 100, panY: 500, width: 900, height: 600 }
  it('draws at the view\'s zoom and pan (screen = panX + zoom·x, panY − zoom·y, as the canvas does), clipped to it, the legend to its right', () => {
    const svg = exportSvg(analysis, 'Plate', 'SI', 1200, 800, view)
    expect(svg).toMatch(/^<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="1100" height="600"/) // 900 + the 200 px legend column
    expect(svg).toContain('data-mode="view"')
    expect(svg).toContain('<clipPath id="drawing"><rect width="900" height="600"/></clipPath>')
    // Every outline vertex is where the canvas puts it.
    const ring = analysis.regions[0]!.polygons[0]![0]!
    for (const [x, y] of ring) expect(svg).toContain(`${+(100 + 3 * x).toFixed(2)},${+(500 - 3 * y).toFixed(2)}`)
    expect(svg).toContain('data-role="legend"')
    expect(svg).toContain('<rect x="910" y="60" width="24" height="240"') // the legend column starts after the view
  })
  it('the scale bar is a 1, 2 or 5 × 10^k length at the view\'s zoom, at most a quarter of the view wide', () => {
    const svg = exportSvg(analysis, 'Plate', 'SI', 1200, 800, view)
    const m = svg.match(/data-role="scale-bar" data-mm="([\d.e+-]+)" data-px="([\d.]+)"/)
    expect(m).not.toBeNull()
    const mm = Number(m![1]); const px = Number(m![2])
    expect(px).toBeCloseTo(3 * mm, 2) // zoom = 3 px per mm
    expect(px).toBeLessThanOrEqual(900 / 4)
    expect(mm / 10 ** Math.floor(Math.log10(mm))).toBeOneOf([1, 2, 5])
    expect(svg).toContain(`>${formatNumber(mm)} mm</text>`)
  })
  it('a zoom twice as close draws the same section twice as large', () => {
    const near = exportSvg(analysis, 'Plate', 'SI', 1200, 800, { ...view, zoom: 6 })
    const [x, y] = analysis.regions[0]!.polygons[0]![0]![0]!
    expect(near).toContain(`${+(100 + 6 * x).toFixed(2)},${+(500 - 6 * y).toFixed(2)}`)
  })
  it('without a view the whole section is fitted into 1200 × 800 as before', () => {
    const svg = exportSvg(analysis, 'Plate', 'SI')
    expect(svg).toContain('data-mode="section"')
    expect(svg).toContain('<clipPath id="drawing"><rect width="1000" height="800"/></clipPath>')
  })
})

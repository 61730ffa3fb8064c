import { describe, expect, it } from 'vitest'
import { AnalysisRequest } from '../../../shared/analysis/contract'
import { analysisRequestFor } from '../../../shared/editor/analysis-request'
import type { Point } from '../../../shared/geometry/types'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { stressTerms } from '../../../shared/mechanics/check-table'
import { demoSketches } from '../../../server/database/demo-sketches'
import { expectClose } from '../../support/expect-close'

const rect = (x: number, y: number, w: number, h: number): Point[] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]

describe('the check table: the hand tabulation, row by row', () => {
  it('a built-up I (flanges 200 x 16, web 10 x 268) with a 240 x 15 plate welded on: every row and the sums by hand (rectangles, parallel axes)', () => {
    const parts = [
      { name: 'Top flange', outline: rect(-100, 134, 200, 16) },
      { name: 'Web', outline: rect(-5, -134, 10, 268) },
      { name: 'Bottom flange', outline: rect(-100, -150, 200, 16) },
      { name: 'Plate', outline: rect(-120, 150, 240, 15) },
    ]
    const a = analyseSection({ parts, checkTable: true })
    const t = a.checkTable!
    // By hand: A, own centroid y and own Ixx of each rectangle.
    const hand = [
      { A: 3200, y: 142, I: (200 * 16 ** 3) / 12, Iy: (16 * 200 ** 3) / 12 },
      { A: 2680, y: 0, I: (10 * 268 ** 3) / 12, Iy: (268 * 10 ** 3) / 12 },
      { A: 3200, y: -142, I: (200 * 16 ** 3) / 12, Iy: (16 * 200 ** 3) / 12 },
      { A: 3600, y: 157.5, I: (240 * 15 ** 3) / 12, Iy: (15 * 240 ** 3) / 12 },
    ]
    const A = hand.reduce((s, r) => s + r.A, 0)
    const yc = hand.reduce((s, r) => s + r.A * r.y, 0) / A
    const Ixx = hand.reduce((s, r) => s + r.I + r.A * (r.y - yc) ** 2, 0)
    expect(t.rows.map(r => [r.name, r.kind, r.sign])).toEqual([['Top flange', 'part', 1], ['Web', 'part', 1], ['Bottom flange', 'part', 1], ['Plate', 'part', 1]])
    t.rows.forEach((row, k) => {
      expectClose(row.A, hand[k]!.A, 1e-12)
      expectClose(row.y, hand[k]!.y, 1e-12, 1e-9)
      expectClose(row.Ixx0, hand[k]!.I, 1e-9)
      expectClose(row.Iyy0, hand[k]!.Iy, 1e-9)
      expectClose(row.dy, hand[k]!.y - yc, 1e-9, 1e-9)
      expectClose(row.Ady2, hand[k]!.A * (hand[k]!.y - yc) ** 2, 1e-9)
    })
    expectClose(t.sums.A, A, 1e-12)
    expectClose(t.sums.y, yc, 1e-12)
    expectClose(t.sums.Ixx, Ixx, 1e-12)
    expectClose(t.sums.Ixx, a.properties.Ixx, 1e-12)
  })

  it('a plate with a hole has a negative hole row; a section-wide cut has one negative row per part it cuts (by hand)', () => {
    const a = analyseSection({
      parts: [{ name: 'Plate', outline: rect(0, 0, 200, 100), holes: [rect(20, 20, 40, 30)] }, { name: 'Flange', outline: rect(0, 100, 200, 20) }],
      cuts: [rect(150, 80, 20, 50)],
      checkTable: true,
    })
    const t = a.checkTable!
    expect(t.rows.map(r => [r.name, r.kind, r.sign])).toEqual([
      ['Plate', 'part', 1],
      ['Plate: hole 1', 'hole', -1],
      ['Cut 1 through Plate', 'cut', -1],
      ['Flange', 'part', 1],
      ['Cut 1 through Flange', 'cut', -1],
    ])
    expectClose(t.rows[1]!.A, 40 * 30, 1e-12)
    expectClose(t.rows[1]!.Ixx0, (40 * 30 ** 3) / 12, 1e-9)
    expectClose(t.rows[2]!.A, 20 * 20, 1e-12)
    expectClose(t.rows[4]!.A, 20 * 20, 1e-12)
    expectClose(t.sums.A, 200 * 120 - 1200 - 800, 1e-12)
    expectClose(t.sums.Ixx, a.properties.Ixx, 1e-12)
    expectClose(t.sums.Iyy, a.properties.Iyy, 1e-12)
  })

  it('two materials: n and n·A per row, the sums are the equivalent section (steel plate on a concrete block, n = 200 000 / 30 000)', () => {
    const a = analyseSection({
      parts: [{ name: 'Concrete', outline: rect(0, 0, 300, 200), material: { E: 30_000 } }, { name: 'Steel plate', outline: rect(0, 200, 300, 10), material: { E: 200_000 } }],
      referenceE: 30_000,
      checkTable: true,
    })
    const t = a.checkTable!
    expectClose(t.rows[1]!.n, 200_000 / 30_000, 1e-12)
    expectClose(t.rows[1]!.nA, 3000 * (200_000 / 30_000), 1e-12)
    const A = 60_000 + 3000 * (20 / 3)
    expectClose(t.sums.A, A, 1e-12)
    expectClose(t.sums.y, (60_000 * 100 + 20_000 * 205) / A, 1e-12)
    expectClose(t.sums.Ixx, a.properties.Ixx, 1e-12)
  })

  it('a tee drawn as a flange over a full-height web shows the overlap counted once', () => {
    const a = analyseSection({ parts: [{ name: 'Flange', outline: rect(-100, 180, 200, 20) }, { name: 'Web', outline: rect(-5, 0, 10, 200) }], checkTable: true })
    const t = a.checkTable!
    expect(t.rows.map(r => r.kind)).toEqual(['part', 'part', 'overlap'])
    expectClose(t.rows[2]!.A, 10 * 20, 1e-12)
    expectClose(t.sums.A, 5800, 1e-12)
    expectClose(t.sums.Ixx, a.properties.Ixx, 1e-12)
  })

  it('the stress terms N/A + ky·(y - ȳ) + kx·(x - x̄) sum to the stress at that vertex (general formula)', () => {
    const angle: Point[] = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]
    const a = analyseSection({ parts: [{ outline: angle }], loads: [{ P: 50_000, x: 20, y: 30 }], moments: { Mx: 2e6, My: -1e6 } })
    const s = a.stress!
    for (const [x, y] of angle) {
      const terms = stressTerms(a.properties, s.N, s.Mx, s.My, x, y)!
      expectClose(terms.direct + terms.fromY + terms.fromX, terms.total, 1e-15, 1e-12)
      expectClose(terms.total, s.plane.a + s.plane.b * x + s.plane.c * y, 1e-9, 1e-9)
    }
  })

  it.each(demoSketches().map(d => [d.title, d.document] as const))('%s: the sums equal the section properties', (_title, doc) => {
    const a = analyseSection({ ...AnalysisRequest.parse(analysisRequestFor(doc)), checkTable: true })
    const t = a.checkTable!
    expect(t.rows.filter(r => r.kind === 'remainder')).toEqual([])
    expectClose(t.sums.A, a.properties.area, 1e-9)
    expectClose(t.sums.x, a.properties.centroid.x, 1e-9, 1e3) // to 1e-6 mm
    expectClose(t.sums.y, a.properties.centroid.y, 1e-9, 1e3)
    expectClose(t.sums.Ixx, a.properties.Ixx, 1e-9)
    expectClose(t.sums.Iyy, a.properties.Iyy, 1e-9)
    expectClose(t.sums.Ixy, a.properties.Ixy, 1e-9, 1e-6 * a.properties.Ixx)
    const rounded = doc.parts.filter(p => p.kind !== 'cut' && p.shape && p.shape.kind !== 'plate').length
    expect(t.rows.filter(r => r.note?.includes("the shape's own polygon")).length).toBe(rounded)
  })
})

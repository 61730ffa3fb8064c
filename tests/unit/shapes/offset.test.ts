import { describe, expect, it } from 'vitest'
import type { Point, Ring } from '../../../shared/geometry/types'
import { ringArea } from '../../../shared/geometry/moments'
import { ShapeError } from '../../../shared/shapes/common'
import { makeHollow, offsetRing } from '../../../shared/shapes/offset'
import { expectClose } from '../../support/expect-close'
import { thrown } from './centroidal'

const rect = (x0: number, y0: number, x1: number, y1: number): Point[] => [[x0, y0], [x1, y0], [x1, y1], [x0, y1]]
const sorted = (r: Ring) => r.map((p) => `${p[0]},${p[1]}`).sort()
// An L of legs 100 and thickness 20 with its re-entrant corner at (20, 20).
const L: Point[] = [[0, 0], [100, 0], [100, 20], [20, 20], [20, 100], [0, 100]]

describe('makeHollow(outline, t)', () => {
  it('a 200 × 100 rectangle with t = 10 (miter) has a 180 × 80 hole: area 200·100 - 180·80 (by hand)', () => {
    const g = makeHollow(rect(0, 0, 200, 100), 10)
    expect(g.holes.length).toBe(1)
    expect(sorted(g.holes[0]!)).toEqual(sorted(rect(10, 10, 190, 90)))
    expect(ringArea(g.outline)).toBeGreaterThan(0)
    expect(ringArea(g.holes[0]!)).toBeLessThan(0)
    expectClose(ringArea(g.outline) + ringArea(g.holes[0]!), 200 * 100 - 180 * 80, 1e-12)
  })

  it('accepts a clockwise outline and returns it counter-clockwise with the same hole', () => {
    const g = makeHollow([...rect(0, 0, 200, 100)].reverse(), 10)
    expect(ringArea(g.outline)).toBe(20_000)
    expect(sorted(g.holes[0]!)).toEqual(sorted(rect(10, 10, 190, 90)))
  })

  it('round join: the hole of an L gets radius t at the re-entrant corner, area by hand 1700 + t²(1 - π/4)', () => {
    const t = 5
    const tol = 0.01
    const miter = makeHollow(L, t)
    const round = makeHollow(L, t, { join: 'round', tol })
    // Miter hole by hand: [5, 95] × [5, 15] plus [5, 15] × [15, 95] = 900 + 800; its corner at
    // (15, 15) is √2·t from the outline's corner (20, 20), so the wall is thicker there.
    expectClose(-ringArea(miter.holes[0]!), 1700, 1e-9)
    // The round hole reaches to t from (20, 20): it gains the square [15, 20]² less the quarter
    // disc of radius t, t²(1 - π/4). Its chords cut into the disc, so it is within arc length × tol above.
    const hand = 1700 + t * t * (1 - Math.PI / 4)
    const area = -ringArea(round.holes[0]!)
    expect(area).toBeGreaterThanOrEqual(hand - 1e-3)
    expect(area - hand).toBeLessThanOrEqual((Math.PI / 2) * t * tol + 1e-3)
    // Round join keeps the wall at t: hole vertices near the corner lie t from (20, 20).
    const nearCorner = round.holes[0]!.filter(([x, y]) => x > 15 && x < 20 && y > 15 && y < 20)
    expect(nearCorner.length).toBeGreaterThan(2)
    for (const [x, y] of nearCorner) expect(Math.abs(Math.hypot(x - 20, y - 20) - t)).toBeLessThan(tol + 2e-4)
  })

  it.each([[50], [60], [1000]])('a wall of t = %d mm in a 200 × 100 rectangle leaves nothing: ShapeError on "t"', (t) => {
    const e = thrown(() => makeHollow(rect(0, 0, 200, 100), t))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe('t')
    expect(e.message).toMatch(new RegExp(`Wall thickness t = ${t} mm is too thick for this outline`))
  })

  it.each([[0], [-2], [Number.NaN]])('refuses t = %f', (t) => {
    expect((thrown(() => makeHollow(rect(0, 0, 10, 10), t)) as ShapeError).field).toBe('t')
  })
})

describe('offsetRing(ring, delta, join, miterLimit)', () => {
  it('miter outward offset of a 100 mm square by 10 mm is the 120 mm square (by hand)', () => {
    const out = offsetRing(rect(0, 0, 100, 100), 10, 'miter')
    expect(out.length).toBe(1)
    expect(sorted(out[0]!)).toEqual(sorted(rect(-10, -10, 110, 110)))
  })

  it('round outward offset by δ gives corner radius δ: area b² + 4bδ + πδ² (closed form), within 2πδ·tol', () => {
    const d = 10
    const tol = 0.05
    const out = offsetRing(rect(0, 0, 100, 100), d, 'round', 2, tol)
    expect(out.length).toBe(1)
    const exact = 100 * 100 + 4 * 100 * d + Math.PI * d * d
    const area = ringArea(out[0]!)
    expect(area).toBeLessThanOrEqual(exact + 1e-3)
    expect(exact - area).toBeLessThanOrEqual(2 * Math.PI * d * tol + 1e-3)
    // Every vertex beyond the square's corner lies on the corner arc of radius δ (to tol and the 1e-4 mm grid).
    for (const [x, y] of out[0]!) {
      if (x > 100 && y > 100) expect(Math.abs(Math.hypot(x - 100, y - 100) - d)).toBeLessThan(2e-4)
    }
  })

  it('an inward offset can split a ring: a dumbbell with a 4 mm neck becomes two CCW outlines', () => {
    const dumbbell: Point[] = [[0, 0], [40, 0], [40, 18], [60, 18], [60, 0], [100, 0], [100, 40], [60, 40], [60, 22], [40, 22], [40, 40], [0, 40]]
    const out = offsetRing(dumbbell, -3)
    expect(out.length).toBe(2)
    for (const r of out) expectClose(ringArea(r), 34 * 34, 1e-9)
  })

  it('keeps 1e-4 mm precision far from the origin (works about the bounding-box centre)', () => {
    const near = offsetRing(rect(0, 0, 200, 100), -10)[0]!
    const far = offsetRing(rect(5_000_000, 0, 5_000_200, 100), -10)[0]!
    expect(sorted(far)).toEqual(sorted(near.map(([x, y]) => [x + 5_000_000, y] as Point)))
  })

  it('delta = 0 returns the ring counter-clockwise; an offset that consumes the ring returns []', () => {
    expect(ringArea(offsetRing([...rect(0, 0, 10, 10)].reverse(), 0)[0]!)).toBe(100)
    expect(offsetRing(rect(0, 0, 10, 10), -6)).toEqual([])
  })

  it.each<[string, () => unknown, string]>([
    ['NaN delta', () => offsetRing(rect(0, 0, 10, 10), Number.NaN), 'delta'],
    ['miter limit below 1', () => offsetRing(rect(0, 0, 10, 10), 1, 'miter', 0.5), 'miterLimit'],
    ['two-vertex ring', () => offsetRing([[0, 0], [1, 1]], 1), 'ring'],
    ['non-finite vertex', () => offsetRing([[0, 0], [1, Number.NaN], [0, 1]], 1), 'ring'],
    ['bad tolerance', () => offsetRing(rect(0, 0, 10, 10), 1, 'round', 2, 0), 'tol'],
  ])('%s throws a ShapeError on the right field', (_name, fn, field) => {
    const e = thrown(fn)
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
  })
})

import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import {
  arcPoints,
  arcSegmentCount,
  circleRing,
  DEFAULT_CHORD_TOLERANCE,
  MAX_ARC_SEGMENTS,
  roundCorners,
  sagitta,
} from '../../../shared/shapes/arc'
import { fmt, ShapeError, taperFromSlopePercent } from '../../../shared/shapes/common'
import { expectClose } from '../../support/expect-close'

function shapeError(fn: () => unknown): ShapeError {
  try {
    fn()
  } catch (e) {
    expect(e).toBeInstanceOf(ShapeError)
    return e as ShapeError
  }
  throw new Error('expected a ShapeError')
}

describe('sagitta and arcSegmentCount', () => {
  it('DEFAULT_CHORD_TOLERANCE is 0.05 mm', () => {
    expect(DEFAULT_CHORD_TOLERANCE).toBe(0.05)
  })

  it('sagitta(r, angle) is r(1 - cos(angle/2)) (chord geometry)', () => {
    expectClose(sagitta(10, Math.PI / 2), 10 * (1 - Math.SQRT1_2), 1e-15)
    expect(sagitta(10, 0)).toBe(0)
  })

  const tolerances = [1, 0.2, 0.05, 0.01, 0.001, 0.0001]

  it.each([
    [100, Math.PI / 2],
    [12, Math.PI / 2],
    [84.15, 2 * Math.PI],
    [1000, 2 * Math.PI],
  ])('arcSegmentCount(r = %d mm, sweep = %f rad) meets the sagitta bound and is the least that does', (r, sweep) => {
    for (const tol of tolerances) {
      const n = arcSegmentCount(r, sweep, tol)
      expect(sagitta(r, sweep / n)).toBeLessThanOrEqual(tol * (1 + 1e-9))
      expect(sweep / n).toBeLessThanOrEqual(Math.PI / 2 + 1e-12)
      if (n > 1 && sweep / (n - 1) <= Math.PI / 2) expect(sagitta(r, sweep / (n - 1))).toBeGreaterThan(tol)
    }
  })

  it('arcSegmentCount grows as the tolerance shrinks', () => {
    const counts = tolerances.map((tol) => arcSegmentCount(100, Math.PI / 2, tol))
    for (let i = 1; i < counts.length; i++) expect(counts[i]!).toBeGreaterThanOrEqual(counts[i - 1]!)
    expect(counts[counts.length - 1]!).toBeGreaterThan(counts[0]! * 10)
  })

  it('arcSegmentCount uses no fixed count: a 12 mm root fillet at 0.05 mm gets 9 chords, a 1 m arc many more', () => {
    // By hand: 12(1 - cos(Δ/2)) <= 0.05 gives Δ <= 2·acos(1 - 0.05/12) = 0.1827 rad; (π/2)/0.1827 = 8.6, so 9 chords.
    expect(arcSegmentCount(12, Math.PI / 2, 0.05)).toBe(9)
    expect(arcSegmentCount(1000, Math.PI / 2, 0.05)).toBeGreaterThan(70)
  })

  it('arcSegmentCount returns 0 for a zero radius or sweep, 1 for a quarter arc finer than the tolerance, 4 for a coarse full circle', () => {
    expect(arcSegmentCount(0, Math.PI / 2)).toBe(0)
    expect(arcSegmentCount(10, 0)).toBe(0)
    expect(arcSegmentCount(0.01, Math.PI / 2, 0.05)).toBe(1)
    expect(arcSegmentCount(0.01, 2 * Math.PI, 0.05)).toBe(4)
  })

  it.each([[0], [-0.05], [Number.NaN], [Number.POSITIVE_INFINITY]])('arcSegmentCount refuses tol = %f with a ShapeError on "tol"', (tol) => {
    const e = shapeError(() => arcSegmentCount(10, 1, tol))
    expect(e.field).toBe('tol')
    expect(e.message).toMatch(/chord tolerance/)
  })

  it('arcSegmentCount refuses a tolerance needing more than MAX_ARC_SEGMENTS chords and names a usable one', () => {
    const e = shapeError(() => arcSegmentCount(1000, 2 * Math.PI, 1e-9))
    expect(e.field).toBe('tol')
    expect(e.message).toMatch(/use at least/)
    const usable = sagitta(1000, (2 * Math.PI) / MAX_ARC_SEGMENTS)
    expect(arcSegmentCount(1000, 2 * Math.PI, usable * 1.0001)).toBeLessThanOrEqual(MAX_ARC_SEGMENTS)
  })
})

describe('arcPoints and circleRing', () => {
  it('arcPoints keeps every point on the circle, from start through sweep, ends included', () => {
    const pts = arcPoints([10, 20], 5, 0, Math.PI / 2, 0.01)
    expect(pts.length).toBe(arcSegmentCount(5, Math.PI / 2, 0.01) + 1)
    for (const [x, y] of pts) expectClose(Math.hypot(x - 10, y - 20), 5, 1e-14)
    expectClose(pts[0]![0], 15, 1e-15)
    expectClose(pts[pts.length - 1]![1], 25, 1e-15)
  })

  it('circleRing is counter-clockwise, a multiple of 4 vertices, symmetric about both axes', () => {
    const ring = circleRing([0, 0], 50, 0.05)
    expect(ring.length % 4).toBe(0)
    expect(ringArea(ring)).toBeGreaterThan(0)
    const q = ring.length / 4
    expect(ring[0]).toEqual([50, 0])
    expect(ring[q]![0] === 0 && ring[q]![1] === 50).toBe(true)
    for (let i = 0; i < q; i++) {
      const p = ring[i]!
      const mirror = ring[2 * q + i]!
      // Exact point symmetry about the centre (=== so that -0 and 0 compare equal).
      expect(mirror[0] === -p[0] && mirror[1] === -p[1]).toBe(true)
    }
  })
})

describe('roundCorners', () => {
  it('rounds the convex corners of a square: area b² - (4 - π)r², within arc length × tol (closed form)', () => {
    const b = 100
    const r = 10
    const tol = 0.05
    const ring = roundCorners(
      [[0, 0], [b, 0], [b, b], [0, b]].map((p) => ({ p: p as [number, number], r })),
      tol,
    )
    const exact = b * b - (4 - Math.PI) * r * r
    const area = ringArea(ring)
    expect(area).toBeLessThan(exact)
    expect(exact - area).toBeLessThanOrEqual(2 * Math.PI * r * tol)
  })

  it('rounds a re-entrant corner with material added (root fillet of an L): area + r²(1 - π/4)', () => {
    const r = 8
    const ring = roundCorners(
      [
        { p: [0, 0], r: 0 },
        { p: [100, 0], r: 0 },
        { p: [100, 10], r: 0 },
        { p: [10, 10], r },
        { p: [10, 100], r: 0 },
        { p: [0, 100], r: 0 },
      ],
      0.01,
    )
    const exact = 100 * 10 + 90 * 10 + r * r * (1 - Math.PI / 4)
    const area = ringArea(ring)
    // Chords of a root fillet cut into the void, so the polygon has slightly more material.
    expect(area).toBeGreaterThan(exact)
    expect(area - exact).toBeLessThanOrEqual((Math.PI / 2) * r * 0.01)
  })

  it('throws a ShapeError naming the radius when the fillets at both ends of an edge overlap', () => {
    const e = shapeError(() =>
      roundCorners([
        { p: [0, 0], r: 6, field: 'ro' },
        { p: [10, 0], r: 6, field: 'ro' },
        { p: [10, 10], r: 0 },
        { p: [0, 10], r: 0 },
      ]),
    )
    expect(e.field).toBe('ro')
    expect(e.message).toContain('do not fit')
  })
})

describe('common helpers', () => {
  it('ShapeError carries the field and its name', () => {
    const e = new ShapeError('tf', 'message')
    expect(e).toBeInstanceOf(Error)
    expect(e.name).toBe('ShapeError')
    expect(e.field).toBe('tf')
  })

  it('fmt prints at most six significant digits', () => {
    expect(fmt(47.2)).toBe('47.2')
    expect(fmt(1 / 3)).toBe('0.333333')
    expect(fmt(Number.NaN)).toBe('NaN')
  })

  it('taperFromSlopePercent(14) is atan(0.14) = 7.97° (IPN slope), 8 % is 4.57° (UPN)', () => {
    expectClose(taperFromSlopePercent(14), 7.9696, 1e-4)
    expectClose(taperFromSlopePercent(8), 4.5739, 1e-4)
  })
})

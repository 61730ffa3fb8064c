import { describe, expect, it } from 'vitest'
import type { Point, Ring } from '../../../shared/geometry/types'
import { regionsHull } from '../../../shared/geometry/hull'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { kernPolygon } from '../../../shared/mechanics/kern'
import { inKern, kernMargin } from '../../../shared/mechanics/stress'
import type { InertiaLike } from '../../../shared/mechanics/stress'
import { SectionError } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'

/** Axis-aligned rectangle ring, CCW. */
function rect(x0: number, y0: number, x1: number, y1: number): Ring {
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]]
}

/** Regular n-gon of circumradius R centred at (cx, cy), CCW, first vertex on +x. */
function ngon(n: number, R: number, cx = 0, cy = 0): Ring {
  return Array.from({ length: n }, (_, i) => [cx + R * Math.cos((2 * Math.PI * i) / n), cy + R * Math.sin((2 * Math.PI * i) / n)] as const)
}

/** Notes §10 (exact for the polygon): A = n R² sin(2π/n)/2, I = n R⁴ sin(2π/n)(2 + cos(2π/n))/24. */
function ngonAI(n: number, R: number): { A: number; I: number } {
  const s = Math.sin((2 * Math.PI) / n)
  return { A: (n * R * R * s) / 2, I: (n * R ** 4 * s * (2 + Math.cos((2 * Math.PI) / n))) / 24 }
}

/** Notes §6 core inequality written out directly (not through the code under test): f >= 0 is compression. */
function coreValue(p: InertiaLike, ex: number, ey: number, x: number, y: number): number {
  const D = p.Ixx * p.Iyy - p.Ixy * p.Ixy
  const xi = x - p.centroid.x
  const yi = y - p.centroid.y
  return 1 + (p.area * ((p.Ixx * xi - p.Ixy * yi) * ex + (p.Iyy * yi - p.Ixy * xi) * ey)) / D
}

function signedArea(ring: readonly Point[]): number {
  let s = 0
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i]!
    const q = ring[(i + 1) % ring.length]!
    s += p[0] * q[1] - q[0] * p[1]
  }
  return s / 2
}

function isConvexCCW(ring: readonly Point[]): boolean {
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i]!
    const q = ring[(i + 1) % ring.length]!
    const r = ring[(i + 2) % ring.length]!
    if ((q[0] - p[0]) * (r[1] - q[1]) - (q[1] - p[1]) * (r[0] - q[0]) <= 0) return false
  }
  return true
}

function sortedPoints(points: readonly Point[]): Point[] {
  return [...points].sort((p, q) => p[0] - q[0] || p[1] - q[1])
}

describe('kernPolygon', () => {
  const b = 300
  const h = 600
  const cx = 2_500_000 // far from the origin
  const cy = 40_000
  const props: InertiaLike = { area: b * h, centroid: { x: cx, y: cy }, Ixx: (b * h ** 3) / 12, Iyy: (h * b ** 3) / 12, Ixy: 0 }
  const expectedRhombus: Point[] = [[cx - b / 6, cy], [cx, cy - h / 6], [cx + b / 6, cy], [cx, cy + h / 6]] // standard kern result b/6, h/6

  it.each([
    ['a CCW hull', rect(cx - b / 2, cy - h / 2, cx + b / 2, cy + h / 2)],
    ['a CW hull', [...rect(cx - b / 2, cy - h / 2, cx + b / 2, cy + h / 2)].reverse()],
    ['a hull with collinear mid-edge vertices', [
      [cx - b / 2, cy - h / 2], [cx, cy - h / 2], [cx + b / 2, cy - h / 2], [cx + b / 2, cy], [cx + b / 2, cy + h / 2], [cx - b / 2, cy + h / 2],
    ] as Ring],
  ])('kernPolygon(rectangle b×h, %s) is the rhombus with half-diagonals b/6 and h/6 (standard "middle third" result)', (_n, hull) => {
    const kern = kernPolygon(props, hull)
    expect(kern).toHaveLength(4)
    expect(signedArea(kern.map(([x, y]) => [x - cx, y - cy] as const))).toBeGreaterThan(0)
    const got = sortedPoints(kern)
    const want = sortedPoints(expectedRhombus)
    for (let i = 0; i < 4; i++) {
      expectClose(got[i]![0] - cx, want[i]![0] - cx, 1e-9, b)
      expectClose(got[i]![1] - cy, want[i]![1] - cy, 1e-9, h)
    }
  })

  it.each([6, 12, 97, 720])('kernPolygon(regular %i-gon) has every vertex at r_g²/apothem from the centroid (README "Method" n-gon A and I)', (n) => {
    const R = 500
    const { A, I } = ngonAI(n, R)
    const poly: InertiaLike = { area: A, centroid: { x: 100, y: -50 }, Ixx: I, Iyy: I, Ixy: 0 }
    const kern = kernPolygon(poly, ngon(n, R, 100, -50))
    const expected = I / A / (R * Math.cos(Math.PI / n)) // r_g² / d, d = apothem
    expect(kern).toHaveLength(n)
    for (const [x, y] of kern) expectClose(Math.hypot(x - 100, y + 50), expected, 1e-9)
  })

  it('kernPolygon(720-gon of diameter D) approximates the circle of radius D/8 (standard result, README "Method")', () => {
    const D = 1000
    const { A, I } = ngonAI(720, D / 2)
    const kern = kernPolygon({ area: A, centroid: { x: 0, y: 0 }, Ixx: I, Iyy: I, Ixy: 0 }, ngon(720, D / 2))
    for (const [x, y] of kern) expectClose(Math.hypot(x, y), D / 8, 1e-4)
  })

  it('kernPolygon(tube D×d as 720-gons) has radius (D² + d²)/(8D) (standard result, README "Method")', () => {
    const D = 800
    const d = 600
    const outer = ngonAI(720, D / 2)
    const inner = ngonAI(720, d / 2)
    const A = outer.A - inner.A
    const I = outer.I - inner.I
    const kern = kernPolygon({ area: A, centroid: { x: 0, y: 0 }, Ixx: I, Iyy: I, Ixy: 0 }, ngon(720, D / 2))
    const exactPolygon = I / A / ((D / 2) * Math.cos(Math.PI / 720)) // n-gon formulas, README "Method"
    for (const [x, y] of kern) {
      expectClose(Math.hypot(x, y), exactPolygon, 1e-9)
      expectClose(Math.hypot(x, y), (D * D + d * d) / (8 * D), 1e-4)
    }
  })

  describe('unequal angle L 150×90×10 (Ixy ≠ 0)', () => {
    // Parallel-axis theorem by hand: leg 1 = 10×150 at x ∈ [0, 10]; leg 2 = 80×10 at x ∈ [10, 90], y ∈ [0, 10].
    const A1 = 10 * 150
    const A2 = 80 * 10
    const A = A1 + A2
    const xc = (A1 * 5 + A2 * 50) / A
    const yc = (A1 * 75 + A2 * 5) / A
    const Ixx = (10 * 150 ** 3) / 12 + A1 * (75 - yc) ** 2 + (80 * 10 ** 3) / 12 + A2 * (5 - yc) ** 2
    const Iyy = (150 * 10 ** 3) / 12 + A1 * (5 - xc) ** 2 + (10 * 80 ** 3) / 12 + A2 * (50 - xc) ** 2
    const Ixy = A1 * (5 - xc) * (75 - yc) + A2 * (50 - xc) * (5 - yc)
    const angle: InertiaLike = { area: A, centroid: { x: xc, y: yc }, Ixx, Iyy, Ixy }
    const hull: Ring = [[0, 0], [90, 0], [90, 10], [10, 150], [0, 150]]
    const reentrant: Point = [10, 10]
    const kern = kernPolygon(angle, hull)

    it('has one vertex per hull edge, is convex and CCW, and contains the centroid', () => {
      expect(Ixy).toBeLessThan(0) // sanity of the hand values: the legs lie in quadrants 2 and 4 of the centroid
      expect(kern).toHaveLength(hull.length)
      expect(isConvexCCW(kern)).toBe(true)
      expect(kernMargin(kern, xc, yc)!).toBeGreaterThan(0)
    })

    it('every kern vertex puts exactly one hull edge at zero stress and the rest in compression (README "Method" inequality)', () => {
      for (const [kx, ky] of kern) {
        const ex = kx - xc
        const ey = ky - yc
        const values = [...hull, reentrant].map(([x, y]) => coreValue(angle, ex, ey, x, y))
        for (const v of values) expect(v).toBeGreaterThan(-1e-9)
        expect(values.filter((v) => Math.abs(v) < 1e-9)).toHaveLength(2)
      }
    })

    it.each([
      [0, 0], [5, 5], [-5, 20], [10, -3], [-8, -8], [3, 40], [15, 15], [-12, 30], [20, -10],
    ])('agrees with inKern at the eccentricity (%d, %d) mm', (ex, ey) => {
      const margin = kernMargin(kern, xc + ex, yc + ey)!
      if (Math.abs(margin) > 1e-6) expect(inKern(angle, hull, ex, ey)).toBe(margin > 0)
    })
  })

  it.each([
    ['zero area', { area: 0, centroid: { x: 0, y: 0 }, Ixx: 1, Iyy: 1, Ixy: 0 }, rect(-1, -1, 1, 1)],
    ['D = 0', { area: 4, centroid: { x: 0, y: 0 }, Ixx: 1, Iyy: 1, Ixy: 1 }, rect(-1, -1, 1, 1)],
    ['a two-point hull', { area: 4, centroid: { x: 0, y: 0 }, Ixx: 1, Iyy: 1, Ixy: 0 }, [[0, 0], [1, 0]] as Ring],
  ])('kernPolygon(%s) returns an empty ring', (_n, p, hull) => {
    expect(kernPolygon(p, hull)).toEqual([])
  })

  it('kernPolygon(properties, regionsHull(regions)) of an answer is the answer\'s own kern (what a client that omits it derives)', () => {
    // A T-stub with a slot and a welded plate: several parts, a hole and an unsymmetric hull.
    const a = analyseSection({
      parts: [
        { outline: [[-120, 0], [120, 0], [120, 20], [15, 20], [15, 200], [-15, 200], [-15, 20], [-120, 20]], holes: [[[-5, 60], [5, 60], [5, 120], [-5, 120]]] },
        { outline: rect(15, 150, 175, 160), material: { E: 70_000 } },
      ],
    })
    expect(kernPolygon(a.properties, regionsHull(a.regions))).toEqual(a.kern)
  })

  it('kernPolygon(a non-convex ring) throws a SectionError', () => {
    const ring: Ring = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]
    const p: InertiaLike = { area: 2300, centroid: { x: 20, y: 50 }, Ixx: 5e6, Iyy: 1.5e6, Ixy: -1e6 }
    expect(() => kernPolygon(p, ring)).toThrow(SectionError)
  })

  it('kernPolygon(a centroid outside the hull) throws a SectionError', () => {
    const p: InertiaLike = { area: 4, centroid: { x: 5, y: 0 }, Ixx: 1, Iyy: 1, Ixy: 0 }
    expect(() => kernPolygon(p, rect(-1, -1, 1, 1))).toThrow(SectionError)
  })
})

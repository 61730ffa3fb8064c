import { describe, expect, it } from 'vitest'
import { polygonMoments } from '../../../shared/geometry/moments'
import { ringArea } from '../../../shared/geometry/moments'
import { circleRing, DEFAULT_CHORD_TOLERANCE } from '../../../shared/shapes/arc'
import { circle } from '../../../shared/shapes/circle'
import { ShapeError } from '../../../shared/shapes/common'
import { expectClose } from '../../support/expect-close'

// Regular n-gon of circumradius R (README "Method", exact for the polygon):
// A = n R² sin(2π/n) / 2, I = n R⁴ sin(2π/n)(2 + cos(2π/n)) / 24 about any centroidal axis.
const ngonArea = (n: number, R: number) => (n * R * R * Math.sin((2 * Math.PI) / n)) / 2
const ngonI = (n: number, R: number) => (n * R ** 4 * Math.sin((2 * Math.PI) / n) * (2 + Math.cos((2 * Math.PI) / n))) / 24

describe('circle(d)', () => {
  it.each([[0.5], [0.05], [0.005]])('circle(d = 100) at tol = %f mm equals the regular-polygon formulas exactly', (tol) => {
    const g = circle({ d: 100 }, { tol })
    const n = g.outline.length
    const m = polygonMoments([g.outline])
    expectClose(m.A, ngonArea(n, 50), 1e-13)
    expectClose(m.Jxx, ngonI(n, 50), 1e-13)
    expectClose(m.Jyy, ngonI(n, 50), 1e-13)
    expectClose(m.Jxy, 0, 1e-12, m.Jxx)
    expectClose(m.Qx, 0, 1e-12, m.A * 50)
  })

  // Error bound from the tolerance: the inscribed polygon loses only area lying within the
  // sagitta s <= tol of the circle, i.e. inside the annulus R - tol <= ρ <= R, so
  // 0 <= πd²/4 - A <= π(R² - (R - tol)²) <= 2πR·tol = πd·tol, and
  // 0 <= πd⁴/64 - I <= π(R⁴ - (R - tol)⁴)/4 <= πR³·tol.
  it.each([[1], [0.05], [0.01]])('circle(d = 100) at tol = %f mm is within the tolerance bound of πd²/4 and πd⁴/64 (closed form)', (tol) => {
    const d = 100
    const R = d / 2
    const m = polygonMoments([circle({ d }, { tol }).outline])
    const lossA = (Math.PI * d * d) / 4 - m.A
    const lossI = (Math.PI * d ** 4) / 64 - m.Jxx
    expect(lossA).toBeGreaterThan(0)
    expect(lossA).toBeLessThanOrEqual(Math.PI * d * tol)
    expect(lossI).toBeGreaterThan(0)
    expect(lossI).toBeLessThanOrEqual(Math.PI * R ** 3 * tol)
  })

  it('circle vertices lie on the circle and no chord has a sagitta above tol', () => {
    const R = 84.15
    const tol = 0.05
    const ring = circle({ d: 2 * R }, { tol }).outline
    expect(ring.length % 4).toBe(0)
    for (let i = 0; i < ring.length; i++) {
      const p = ring[i]!
      const q = ring[(i + 1) % ring.length]!
      expectClose(Math.hypot(p[0], p[1]), R, 1e-14)
      const c = Math.hypot(q[0] - p[0], q[1] - p[1])
      expect(R - Math.sqrt(R * R - (c * c) / 4)).toBeLessThanOrEqual(tol * (1 + 1e-9))
    }
  })

  it('a finer tolerance gives more vertices and a smaller error', () => {
    const coarse = circle({ d: 100 }, { tol: 0.1 }).outline
    const fine = circle({ d: 100 }, { tol: 0.001 }).outline
    expect(fine.length).toBeGreaterThan(coarse.length)
    const err = (r: typeof fine) => (Math.PI * 2500) - polygonMoments([r]).A
    expect(err(fine)).toBeLessThan(err(coarse))
  })

  it('circle({ d }, { origin }) centres the bar on the origin offset', () => {
    const m = polygonMoments([circle({ d: 20 }, { origin: { x: 300, y: 40 } }).outline])
    expectClose(m.Qy / m.A, 300, 1e-12)
    expectClose(m.Qx / m.A, 40, 1e-12)
  })

  it.each([[{ d: 0 }, 'd'], [{ d: -5 }, 'd'], [{ d: Number.NaN }, 'd']])('circle(%o) throws a ShapeError on %s', (params, field) => {
    expect(() => circle(params)).toThrowError(ShapeError)
    expect(() => circle(params)).toThrowError(/Diameter d must be a positive number/)
    try {
      circle(params)
    } catch (e) {
      expect((e as ShapeError).field).toBe(field)
    }
  })

  it('circle refuses a non-positive tolerance on "tol"', () => {
    try {
      circle({ d: 10 }, { tol: 0 })
      expect.unreachable()
    } catch (e) {
      expect((e as ShapeError).field).toBe('tol')
    }
  })
})

describe('a round keeps its area within 0.05 % of the circle at any size (README "Method", arcs)', () => {
  it.each([2, 20, 200, 2000, 20_000])('circle of D = %d mm at the default tolerance: |A - πD²/4| / (πD²/4) <= 0.05 %', (D) => {
    const A = Math.abs(ringArea(circleRing([0, 0], D / 2)))
    expect(Math.abs(A - (Math.PI * D * D) / 4) / ((Math.PI * D * D) / 4)).toBeLessThanOrEqual(5e-4)
  })

  it('a 20 mm bar is no longer 0.64 % low (closed form πD²/4 = 314.16 mm²)', () => {
    const A = Math.abs(ringArea(circleRing([0, 0], 10, DEFAULT_CHORD_TOLERANCE)))
    expect(A / (Math.PI * 100)).toBeGreaterThan(1 - 5e-4)
  })
})

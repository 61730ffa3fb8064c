import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { ShapeError } from '../../../shared/shapes/common'
import { rhs, tube } from '../../../shared/shapes/hollow'
import { expectClose } from '../../support/expect-close'
import { centroidal, thrown } from './centroidal'

// Regular n-gon of circumradius R (README "Method", exact for the polygon itself).
const ngonArea = (n: number, R: number) => (n * R * R * Math.sin((2 * Math.PI) / n)) / 2
const ngonI = (n: number, R: number) => (n * R ** 4 * Math.sin((2 * Math.PI) / n) * (2 + Math.cos((2 * Math.PI) / n))) / 24

describe('tube(d, t)', () => {
  it('tube(168.3, 8) is a CCW outer n-gon minus a CW inner n-gon: exact regular-polygon A and I', () => {
    const g = tube({ d: 168.3, t: 8 })
    expect(g.holes.length).toBe(1)
    expect(ringArea(g.outline)).toBeGreaterThan(0)
    expect(ringArea(g.holes[0]!)).toBeLessThan(0)
    const no = g.outline.length
    const ni = g.holes[0]!.length
    const p = centroidal(g)
    expectClose(p.A, ngonArea(no, 84.15) - ngonArea(ni, 76.15), 1e-12)
    expectClose(p.Ixx, ngonI(no, 84.15) - ngonI(ni, 76.15), 1e-12)
    expectClose(p.Iyy, ngonI(no, 84.15) - ngonI(ni, 76.15), 1e-12)
  })

  // Error bound: each inscribed circle loses at most πd·tol of area and πR³·tol of I (see
  // circle.test.ts); the outer loss lowers the section, the inner loss raises it, so the
  // difference from the closed form is at most the outer bound.
  it.each([[0.5], [0.05], [0.005]])('tube(168.3, 8) at tol = %f mm is within the tolerance bound of π(D² - d²)/4 and π(D⁴ - d⁴)/64 (closed form)', (tol) => {
    const D = 168.3
    const d = D - 16
    const p = centroidal(tube({ d: D, t: 8 }, { tol }))
    expect(Math.abs(p.A - (Math.PI * (D * D - d * d)) / 4)).toBeLessThanOrEqual(Math.PI * D * tol)
    expect(Math.abs(p.Ixx - (Math.PI * (D ** 4 - d ** 4)) / 64)).toBeLessThanOrEqual(Math.PI * (D / 2) ** 3 * tol)
  })

  it.each([
    [{ d: 100, t: 50 }, 't', /less than half the outside diameter d = 100 mm/],
    [{ d: 100, t: 60 }, 't', /less than half/],
    [{ d: 100, t: 0 }, 't', /positive number/],
    [{ d: -100, t: 5 }, 'd', /positive number/],
    [{ d: 100, t: Number.NaN }, 't', /got NaN/],
  ])('tube(%o) throws a ShapeError on %s', (params, field, message) => {
    const e = thrown(() => tube(params))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
    expect(e.message).toMatch(message)
  })
})

describe('rhs(b, h, t, ro, ri)', () => {
  // Hand value: b·h - (b - 2t)(h - 2t) minus the four corner corrections (4 - π)(ro² - ri²),
  // i.e. 4 × (ro² - ri²)(1 - π/4). The polygon differs by at most arc length × tol.
  it.each([
    [200, 100, 8, 20, 12],
    [200, 100, 8, 20, undefined],
    [100, 100, 5, 10, 5],
    [150, 100, 10, 25, 0],
  ])('rhs(b = %d, h = %d, t = %d, ro = %d, ri = %s) has the hand-computed area with corner radii', (b, h, t, ro, riIn) => {
    const ri = riIn ?? Math.max(ro - t, 0)
    const tol = 0.05
    const g = rhs({ b, h, t, ro, ri: riIn }, { tol })
    const hand = b * h - (b - 2 * t) * (h - 2 * t) - 4 * (ro * ro - ri * ri) * (1 - Math.PI / 4)
    expect(Math.abs(centroidal(g).A - hand)).toBeLessThanOrEqual(2 * Math.PI * (ro + ri) * tol)
  })

  it('rhs with sharp corners matches b·h³/12 - (b - 2t)(h - 2t)³/12 exactly (closed form, parallel axes)', () => {
    const p = centroidal(rhs({ b: 200, h: 100, t: 8, ro: 0 }))
    expectClose(p.A, 200 * 100 - 184 * 84, 1e-13)
    expectClose(p.Ixx, (200 * 100 ** 3 - 184 * 84 ** 3) / 12, 1e-12)
    expectClose(p.Iyy, (100 * 200 ** 3 - 84 * 184 ** 3) / 12, 1e-12)
    expect(Math.abs(p.Ixy)).toBeLessThan(1e-6)
  })

  it('rhs defaults ri to ro - t, and is centred on the origin with a CCW outline and one CW hole', () => {
    const a = rhs({ b: 200, h: 100, t: 8, ro: 20 })
    const b = rhs({ b: 200, h: 100, t: 8, ro: 20, ri: 12 })
    expect(a).toEqual(b)
    expect(ringArea(a.outline)).toBeGreaterThan(0)
    expect(ringArea(a.holes[0]!)).toBeLessThan(0)
    const p = centroidal(a)
    expect(p.bounds).toEqual({ minX: -100, maxX: 100, minY: -50, maxY: 50 })
    expectClose(p.xc, 0, 1e-12, 1)
    expectClose(p.yc, 0, 1e-12, 1)
  })

  it('rhs with ro = half the side is a stadium without repeated vertices', () => {
    const g = rhs({ b: 200, h: 100, t: 10, ro: 50 })
    const keys = new Set(g.outline.map((p) => `${p[0]},${p[1]}`))
    expect(keys.size).toBe(g.outline.length)
  })

  it.each([
    [{ b: 100, h: 60, t: 30, ro: 0 }, 't', /less than half the smaller side, 60 mm/],
    [{ b: 100, h: 60, t: 5, ro: 31 }, 'ro', /at most half the smaller side, 30 mm/],
    [{ b: 100, h: 60, t: 5, ro: 10, ri: 26 }, 'ri', /at most half the smaller inside dimension, 25 mm/],
    [{ b: 100, h: 100, t: 8, ro: 40, ri: 0 }, 'ri', /breaks through/],
    [{ b: 100, h: 100, t: 8, ro: -1 }, 'ro', /zero or a positive number/],
  ])('rhs(%o) throws a ShapeError on %s', (params, field, message) => {
    const e = thrown(() => rhs(params))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
    expect(e.message).toMatch(message)
  })
})

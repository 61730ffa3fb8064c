import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { angle } from '../../../shared/shapes/angle'
import type { AngleParams } from '../../../shared/shapes/angle'
import { ShapeError } from '../../../shared/shapes/common'
import { expectClose } from '../../support/expect-close'
import { centroidal, thrown } from './centroidal'

describe('angle(h, b, t, r, r2)', () => {
  // Hand value for an unequal angle: the two legs (h + b - t)·t, plus the root fillet
  // r²(1 - π/4), minus the two toe roundings r2²(1 - π/4). Polygon within (arc lengths) × tol.
  it.each([
    [150, 90, 10, 12, 6],
    [100, 100, 10, 12, 6],
    [200, 100, 15, 15, 0],
  ])('angle(h = %d, b = %d, t = %d, r = %d, r2 = %d) has the hand area with fillets', (h, b, t, r, r2) => {
    const tol = 0.05
    const k = 1 - Math.PI / 4
    const hand = (h + b - t) * t + r * r * k - 2 * r2 * r2 * k
    const A = centroidal(angle({ h, b, t, r, r2 }, { tol })).A
    expect(Math.abs(A - hand)).toBeLessThanOrEqual((Math.PI / 2) * (r + 2 * r2) * tol)
  })

  it('a sharp unequal angle has the centroid, Ixx, Iyy and a negative Ixy of its two rectangles (parallel axes)', () => {
    const h = 150
    const b = 90
    const t = 10
    // Rectangles from the heel: the vertical leg t × h, and the rest of the horizontal leg (b - t) × t.
    const parts = [
      { A: t * h, x: t / 2, y: h / 2, Ix: (t * h ** 3) / 12, Iy: (h * t ** 3) / 12 },
      { A: (b - t) * t, x: t + (b - t) / 2, y: t / 2, Ix: ((b - t) * t ** 3) / 12, Iy: (t * (b - t) ** 3) / 12 },
    ]
    const A = parts.reduce((s, q) => s + q.A, 0)
    const xc = parts.reduce((s, q) => s + q.A * q.x, 0) / A
    const yc = parts.reduce((s, q) => s + q.A * q.y, 0) / A
    const Ixx = parts.reduce((s, q) => s + q.Ix + q.A * (q.y - yc) ** 2, 0)
    const Iyy = parts.reduce((s, q) => s + q.Iy + q.A * (q.x - xc) ** 2, 0)
    const Ixy = parts.reduce((s, q) => s + q.A * (q.x - xc) * (q.y - yc), 0)
    const p = centroidal(angle({ h, b, t, r: 0 }, { anchor: 'heel' }))
    expectClose(p.A, A, 1e-13)
    expectClose(p.xc, xc, 1e-12)
    expectClose(p.yc, yc, 1e-12)
    expectClose(p.Ixx, Ixx, 1e-12)
    expectClose(p.Iyy, Iyy, 1e-12)
    expectClose(p.Ixy, Ixy, 1e-12)
    expect(Ixy).toBeLessThan(0)
  })

  it('angle is bbox-centred by default and has its heel at the origin with anchor "heel"', () => {
    const centred = angle({ h: 150, b: 90, t: 10, r: 12, r2: 6 })
    const heel = angle({ h: 150, b: 90, t: 10, r: 12, r2: 6 }, { anchor: 'heel', origin: { x: 5, y: 7 } })
    expect(centroidal(centred).bounds).toEqual({ minX: -45, maxX: 45, minY: -75, maxY: 75 })
    expect(centroidal(heel).bounds).toEqual({ minX: 5, maxX: 95, minY: 7, maxY: 157 })
    expect(heel.outline[0]).toEqual([5, 7])
    expect(ringArea(centred.outline)).toBeGreaterThan(0)
  })

  it.each<[string, AngleParams, string, RegExp]>([
    ['thickness as long as the short leg', { h: 150, b: 90, t: 90, r: 0 }, 't', /Thickness t = 90 mm must be less than the shorter leg b = 90 mm/],
    ['toe radius above t', { h: 100, b: 100, t: 10, r: 12, r2: 11 }, 'r2', /Toe radius r2 = 11 mm must be at most the thickness t = 10 mm/],
    ['root radius beyond the outstand', { h: 150, b: 50, t: 10, r: 36, r2: 5 }, 'r', /at most 35 mm to fit on the shorter leg's outstand b - t = 40 mm/],
    ['negative leg', { h: -1, b: 100, t: 10, r: 0 }, 'h', /positive number/],
    ['NaN root radius', { h: 100, b: 100, t: 10, r: Number.NaN }, 'r', /got NaN/],
  ])('%s throws a ShapeError on the right field', (_name, params, field, message) => {
    const e = thrown(() => angle(params))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
    expect(e.message).toMatch(message)
  })
})

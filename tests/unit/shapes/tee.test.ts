import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { ShapeError } from '../../../shared/shapes/common'
import { tee } from '../../../shared/shapes/tee'
import type { TeeParams } from '../../../shared/shapes/tee'
import { expectClose } from '../../support/expect-close'
import { centroidal, thrown } from './centroidal'

describe('tee(h, b, tw, tf, r)', () => {
  it('tee area is b·tf + (h - tf)·tw + 2r²(1 - π/4) by hand, within 2 × arc length × tol', () => {
    const tol = 0.05
    const hand = 100 * 11 + 89 * 11 + 2 * 11 * 11 * (1 - Math.PI / 4)
    const A = centroidal(tee({ h: 100, b: 100, tw: 11, tf: 11, r: 11 }, { tol })).A
    expect(A).toBeGreaterThanOrEqual(hand)
    expect(A - hand).toBeLessThanOrEqual(Math.PI * 11 * tol)
  })

  it('a sharp tee has the centroid and Ixx of its flange and stem (parallel axes)', () => {
    const h = 120
    const b = 150
    const tw = 8
    const tf = 12
    const parts = [
      { A: b * tf, y: h - tf / 2, I: (b * tf ** 3) / 12 },
      { A: (h - tf) * tw, y: (h - tf) / 2, I: (tw * (h - tf) ** 3) / 12 },
    ]
    const A = parts.reduce((s, q) => s + q.A, 0)
    const yFromBottom = parts.reduce((s, q) => s + q.A * q.y, 0) / A
    const Ixx = parts.reduce((s, q) => s + q.I + q.A * (q.y - yFromBottom) ** 2, 0)
    const p = centroidal(tee({ h, b, tw, tf, r: 0 }))
    expectClose(p.A, A, 1e-13)
    expectClose(p.yc - p.bounds.minY, yFromBottom, 1e-12)
    expectClose(p.Ixx, Ixx, 1e-12)
    expectClose(p.Iyy, (tf * b ** 3) / 12 + ((h - tf) * tw ** 3) / 12, 1e-12)
  })

  it('tee is bbox-centred, flange on top, CCW, no holes', () => {
    const g = tee({ h: 100, b: 100, tw: 11, tf: 11, r: 11 })
    expect(ringArea(g.outline)).toBeGreaterThan(0)
    const p = centroidal(g)
    expect(p.bounds).toEqual({ minX: -50, maxX: 50, minY: -50, maxY: 50 })
    expect(p.yc).toBeGreaterThan(0)
  })

  it.each<[string, TeeParams, string, RegExp]>([
    ['flange as deep as the tee', { h: 100, b: 100, tw: 10, tf: 100, r: 0 }, 'tf', /Flange thickness tf = 100 mm must be less than the depth h = 100 mm/],
    ['stem as wide as the flange', { h: 100, b: 100, tw: 100, tf: 10, r: 0 }, 'tw', /Stem thickness tw = 100 mm must be less than the flange width b = 100 mm/],
    ['root radius beyond the outstand', { h: 100, b: 100, tw: 10, tf: 10, r: 46 }, 'r', /must be at most \(b - tw\)\/2 = 45 mm/],
    ['root radius beyond the stem', { h: 30, b: 200, tw: 10, tf: 10, r: 25 }, 'r', /at most the stem length h - tf = 20 mm/],
    ['negative stem', { h: 100, b: 100, tw: -10, tf: 10, r: 0 }, 'tw', /positive number/],
  ])('%s throws a ShapeError on the right field', (_name, params, field, message) => {
    const e = thrown(() => tee(params))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
    expect(e.message).toMatch(message)
  })
})

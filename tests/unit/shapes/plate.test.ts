import { describe, expect, it } from 'vitest'
import type { Ring } from '../../../shared/geometry/types'
import { ringArea } from '../../../shared/geometry/moments'
import { ShapeError } from '../../../shared/shapes/common'
import { plate } from '../../../shared/shapes/plate'
import { validateShapeParams } from '../../../shared/shapes/registry'
import { expectClose } from '../../support/expect-close'
import { centroidal } from './centroidal'

const corners = (r: Ring) => r.map((p) => `${p[0]},${p[1]}`)

describe('plate(b, h)', () => {
  it('plate(200, 20) has A = bh and Ixx = bh³/12, Iyy = hb³/12 (closed form, Gere & Goodno appendix)', () => {
    const p = centroidal(plate({ b: 200, h: 20 }))
    expectClose(p.A, 200 * 20, 1e-14)
    expectClose(p.Ixx, (200 * 20 ** 3) / 12, 1e-12)
    expectClose(p.Iyy, (20 * 200 ** 3) / 12, 1e-12)
    expectClose(p.Ixy, 0, 1e-12, 1)
  })

  it('plate(b, h) is centred on the origin, counter-clockwise from the bottom-left corner, four vertices', () => {
    const g = plate({ b: 200, h: 20 })
    expect(corners(g.outline)).toEqual(['-100,-10', '100,-10', '100,10', '-100,10'])
    expect(ringArea(g.outline)).toBeGreaterThan(0)
    expect(g.holes).toEqual([])
  })

  it('plate(b, h, { origin }) moves the centre to the origin offset', () => {
    const p = centroidal(plate({ b: 10, h: 4 }, { origin: { x: 5_000_000, y: -30 } }))
    expectClose(p.xc, 5_000_000, 1e-15)
    expectClose(p.yc, -30, 1e-12)
    expectClose(p.Ixx, (10 * 4 ** 3) / 12, 1e-9)
  })

  it.each([
    [{ b: 0, h: 20 }, 'b'],
    [{ b: 200, h: -1 }, 'h'],
    [{ b: Number.NaN, h: 20 }, 'b'],
    [{ b: 200, h: Number.POSITIVE_INFINITY }, 'h'],
  ])('plate(%o) throws a ShapeError on %s', (params, field) => {
    expect(() => plate(params)).toThrow(ShapeError)
    try {
      plate(params)
    } catch (e) {
      expect((e as ShapeError).field).toBe(field)
      expect((e as ShapeError).message).toMatch(/must be a positive number of mm/)
    }
  })
})

describe('plate orientation', () => {
  it('horizontal by default (width along x); vertical stands it up (width along y), by hand', () => {
    const flat = validateShapeParams('plate', { b: 200, h: 20 })
    const standing = validateShapeParams('plate', { b: 200, h: 20, vertical: 1 })
    if (!flat.ok || !standing.ok) throw new Error('expected valid plates')
    const ys = standing.geometry.outline.map(p => p[1])
    expect(Math.max(...ys) - Math.min(...ys)).toBe(200)
    expect(Math.max(...flat.geometry.outline.map(p => p[0]))).toBe(100)
  })

  it('an orientation other than 0 or 1 is refused with a message naming the choices', () => {
    const bad = validateShapeParams('plate', { b: 200, h: 20, vertical: 2 })
    expect(bad.ok).toBe(false)
    if (!bad.ok) expect(bad.error.message).toBe('Orientation (vertical) is 0 (horizontal) or 1 (vertical).')
  })
})

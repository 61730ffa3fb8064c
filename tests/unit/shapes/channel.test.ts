import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { channel } from '../../../shared/shapes/channel'
import type { ChannelParams } from '../../../shared/shapes/channel'
import { ShapeError, taperFromSlopePercent } from '../../../shared/shapes/common'
import { expectClose } from '../../support/expect-close'
import { centroidal, thrown } from './centroidal'

const BASE: ChannelParams = { h: 200, b: 80, tw: 6, tf: 11, r: 13, r2: 6 }

describe('channel(h, b, tw, tf, r, r2, taper)', () => {
  // Hand value: two flanges b·tf, the web (h - 2tf)·tw, plus the two root fillets r²(1 - π/4),
  // minus the two toe roundings r2²(1 - π/4). The polygon is within (arc lengths) × tol of it.
  it('channel area is 2·b·tf + (h - 2tf)·tw + 2r²(1 - π/4) - 2r2²(1 - π/4) by hand', () => {
    const tol = 0.05
    const { h, b, tw, tf, r } = BASE
    const r2 = BASE.r2!
    const k = 1 - Math.PI / 4
    const hand = 2 * b * tf + (h - 2 * tf) * tw + 2 * r * r * k - 2 * r2 * r2 * k
    const A = centroidal(channel(BASE, { tol })).A
    expect(Math.abs(A - hand)).toBeLessThanOrEqual(Math.PI * (r + r2) * tol)
  })

  it('a sharp channel has the hand area, centroid from the back of the web, and Iyy by parallel axes', () => {
    const h = 200
    const b = 80
    const tw = 6
    const tf = 11
    const p = centroidal(channel({ h, b, tw, tf, r: 0 }))
    const parts = [
      { A: b * tf, x: b / 2, I: (tf * b ** 3) / 12 },
      { A: b * tf, x: b / 2, I: (tf * b ** 3) / 12 },
      { A: (h - 2 * tf) * tw, x: tw / 2, I: ((h - 2 * tf) * tw ** 3) / 12 },
    ]
    const A = parts.reduce((s, q) => s + q.A, 0)
    const xFromBack = parts.reduce((s, q) => s + q.A * q.x, 0) / A
    const Iyy = parts.reduce((s, q) => s + q.I + q.A * (q.x - xFromBack) ** 2, 0)
    expectClose(p.A, A, 1e-13)
    expectClose(p.xc - p.bounds.minX, xFromBack, 1e-12)
    expectClose(p.Iyy, Iyy, 1e-12)
    expectClose(p.Ixx, (b * h ** 3 - (b - tw) * (h - 2 * tf) ** 3) / 12, 1e-12)
  })

  it('channel is bbox-centred with the web on the left, CCW, no holes', () => {
    const g = channel(BASE)
    expect(ringArea(g.outline)).toBeGreaterThan(0)
    expect(g.holes).toEqual([])
    const p = centroidal(g)
    expect(p.bounds).toEqual({ minX: -40, maxX: 40, minY: -100, maxY: 100 })
    expect(p.xc).toBeLessThan(0)
  })

  it('a tapered channel without fillets has A = tw·h + 2(b - tw)·tf (tf at mid-outstand is the mean)', () => {
    const g = channel({ h: 200, b: 75, tw: 8.5, tf: 11.5, r: 0, taper: taperFromSlopePercent(8) })
    expectClose(centroidal(g).A, 8.5 * 200 + 2 * (75 - 8.5) * 11.5, 1e-12)
  })

  // From memory of the published tables (DIN 1026-1 UPN 200: 8 % flange slope, tf given at b/2
  // from the toe, r 11.5, r2 6 mm): A 32.2 cm², Iy 1910 cm⁴, Iz 148 cm⁴. Tolerance 1 %.
  it('UPN 200 (8 % taper, tf 11.5 at b/2 from the toe): A ≈ 32.2 cm², Iy ≈ 1910 cm⁴, Iz ≈ 148 cm⁴ (from memory of the published tables)', () => {
    const p = centroidal(channel({ h: 200, b: 75, tw: 8.5, tf: 11.5, r: 11.5, r2: 6, taper: taperFromSlopePercent(8), tf_at: 75 / 2 }))
    expectClose(p.A / 1e2, 32.2, 0.01)
    expectClose(p.Ixx / 1e4, 1910, 0.01)
    expectClose(p.Iyy / 1e4, 148, 0.01)
  })

  it.each<[string, ChannelParams, string, RegExp]>([
    ['flanges deeper than half the section', { ...BASE, tf: 100 }, 'tf', /Flange thickness tf = 100 mm must be less than half the depth h = 200 mm/],
    ['web as wide as the flange', { ...BASE, tw: 80 }, 'tw', /less than the flange width b = 80 mm/],
    ['root radius beyond the outstand', { ...BASE, r: 70 }, 'r', /at most 68 mm to fit on the flange outstand b - tw = 74 mm beside the toe radius r2 = 6 mm/],
    ['root radius beyond half the web', { h: 60, b: 200, tw: 6, tf: 10, r: 25 }, 'r', /at most 20 mm so that both root fillets fit/],
    ['toe radius thicker than the toe', { ...BASE, r2: 12 }, 'r2', /Toe radius r2 = 12 mm must be at most 11 mm/],
    ['taper too steep', { h: 200, b: 200, tw: 6, tf: 5, r: 0, taper: 30 }, 'taper', /no thickness left/],
    ['NaN width', { ...BASE, b: Number.NaN }, 'b', /got NaN/],
  ])('%s throws a ShapeError on the right field', (_name, params, field, message) => {
    const e = thrown(() => channel(params))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
    expect(e.message).toMatch(message)
  })
})

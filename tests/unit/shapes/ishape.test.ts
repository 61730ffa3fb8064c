import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { ShapeError, taperFromSlopePercent } from '../../../shared/shapes/common'
import { ishape } from '../../../shared/shapes/ishape'
import type { IShapeParams } from '../../../shared/shapes/ishape'
import { expectClose } from '../../support/expect-close'
import { centroidal, thrown } from './centroidal'

const IN = 25.4 // mm per inch, exact (NIST SP 811)
const IPE200: IShapeParams = { h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12 }

describe('ishape: rolled sections against the published tables', () => {
  // From memory of the published tables (European IPE 200): A 28.5 cm², Iy 1943 cm⁴,
  // Wel,y 194 cm³, Iz 142 cm⁴. Tolerance 1 %.
  it('IPE 200 (h 200, b 100, tw 5.6, tf 8.5, r 12 mm): A ≈ 28.5 cm², Iy ≈ 1943 cm⁴, Wel,y ≈ 194 cm³, Iz ≈ 142 cm⁴ (from memory of the published tables)', () => {
    const p = centroidal(ishape(IPE200))
    expectClose(p.A / 1e2, 28.5, 0.01)
    expectClose(p.Ixx / 1e4, 1943, 0.01)
    expectClose(p.Ixx / (200 / 2) / 1e3, 194, 0.01)
    expectClose(p.Iyy / 1e4, 142, 0.01)
    expectClose(p.Ixy, 0, 1e-9, p.Ixx)
  })

  // From memory of the published tables (AISC W8x31): A 9.13 in², Ix 110 in⁴, Iy 37.1 in⁴.
  // Root radius chosen as 0.4 in: the AISC k_des of 0.829 in less tf = 0.435 in is 0.394 in.
  it('W8x31 (d 8.00, bf 8.00, tw 0.285, tf 0.435, r 0.4 in): A ≈ 9.13 in², Ix ≈ 110 in⁴, Iy ≈ 37.1 in⁴ (from memory of the published tables)', () => {
    const p = centroidal(ishape({ h: 8 * IN, b: 8 * IN, tw: 0.285 * IN, tf: 0.435 * IN, r: 0.4 * IN }))
    expectClose(p.A / IN ** 2, 9.13, 0.01)
    expectClose(p.Ixx / IN ** 4, 110, 0.01)
    expectClose(p.Iyy / IN ** 4, 37.1, 0.01)
  })

  // From memory of the published tables (DIN 1025-1 IPN 200: 14 % flange slope, tf given at b/4
  // from the toe, r 7.5, r2 4.5 mm): A 33.4 cm², Iy 2140 cm⁴, Iz 117 cm⁴. Tolerance 1 %.
  it('IPN 200 (tapered 14 %, tf 11.3 at b/4 from the toe, r 7.5, r2 4.5): A ≈ 33.4 cm², Iy ≈ 2140 cm⁴, Iz ≈ 117 cm⁴ (from memory of the published tables)', () => {
    const p = centroidal(ishape({ h: 200, b: 90, tw: 7.5, tf: 11.3, r: 7.5, r2: 4.5, taper: taperFromSlopePercent(14), tf_at: 90 / 4 }))
    expectClose(p.A / 1e2, 33.4, 0.01)
    expectClose(p.Ixx / 1e4, 2140, 0.01)
    expectClose(p.Iyy / 1e4, 117, 0.01)
  })
})

describe('ishape: hand calculations', () => {
  it('IPE 200 area is 2·b·tf + (h - 2tf)·tw + 4·r²(1 - π/4), the polygon within 4 × arc length × tol above it', () => {
    const tol = 0.05
    const hand = 2 * 100 * 8.5 + (200 - 17) * 5.6 + 4 * 144 * (1 - Math.PI / 4)
    const A = centroidal(ishape(IPE200, { tol })).A
    // Root-fillet chords cut into the void, so the polygon carries slightly more than the arcs.
    expect(A).toBeGreaterThanOrEqual(hand)
    expect(A - hand).toBeLessThanOrEqual(4 * (Math.PI / 2) * 12 * tol)
  })

  it('a welded I without fillets matches the parallel-axis sum of its three plates exactly', () => {
    const p = centroidal(ishape({ h: 400, b: 200, tw: 10, tf: 16, r: 0 }))
    const web = 10 * (400 - 32)
    const flanges = 2 * 200 * 16
    expectClose(p.A, web + flanges, 1e-13)
    const Iweb = (10 * 368 ** 3) / 12
    const Iflange = (200 * 16 ** 3) / 12 + 200 * 16 * (200 - 8) ** 2
    expectClose(p.Ixx, Iweb + 2 * Iflange, 1e-12)
    expectClose(p.Iyy, (368 * 10 ** 3) / 12 + (2 * 16 * 200 ** 3) / 12, 1e-12)
  })

  it('a plate girder with unequal flanges (top 300×20, bottom 400×25, web 955×10) matches the parallel-axis sum', () => {
    const g = ishape({ h: 1000, b: 300, tw: 10, tf: 20, r: 0, b_bot: 400, tf_bot: 25 })
    const parts = [
      { A: 300 * 20, y: 500 - 10, I: (300 * 20 ** 3) / 12 },
      { A: 400 * 25, y: -500 + 12.5, I: (400 * 25 ** 3) / 12 },
      { A: 10 * 955, y: (-475 + 480) / 2, I: (10 * 955 ** 3) / 12 },
    ]
    const A = parts.reduce((s, q) => s + q.A, 0)
    const yc = parts.reduce((s, q) => s + q.A * q.y, 0) / A
    const Ixx = parts.reduce((s, q) => s + q.I + q.A * (q.y - yc) ** 2, 0)
    const p = centroidal(g)
    expectClose(p.A, A, 1e-13)
    expectClose(p.yc, yc, 1e-12)
    expectClose(p.Ixx, Ixx, 1e-12)
    expect(p.bounds).toEqual({ minX: -200, maxX: 200, minY: -500, maxY: 500 })
  })

  it('a tapered I without fillets has A = tw·h + 2(b - tw)·tf (tf at mid-outstand is the mean thickness)', () => {
    const g = ishape({ h: 200, b: 90, tw: 7.5, tf: 11.3, r: 0, taper: taperFromSlopePercent(14) })
    expectClose(centroidal(g).A, 7.5 * 200 + 2 * (90 - 7.5) * 11.3, 1e-12)
    // Toe thickness by hand: tf - (outstand/2)·slope = 11.3 - 20.625 · 0.14.
    const toe = g.outline.find((p) => p[0] === 45 && p[1] > 0 && p[1] < 100)!
    expectClose(100 - toe[1], 11.3 - 20.625 * 0.14, 1e-12)
  })

  it('tf_at moves where tf is measured: the mean thickness becomes tf + (outstand/2 - tf_at)·slope', () => {
    const g = ishape({ h: 200, b: 90, tw: 7.5, tf: 11.3, r: 0, taper: taperFromSlopePercent(14), tf_at: 22.5 })
    const mean = 11.3 + (20.625 - 22.5) * 0.14
    expectClose(centroidal(g).A, 7.5 * 200 + 2 * (90 - 7.5) * mean, 1e-12)
  })

  it('ishape is bbox-centred, outline CCW, no holes, and obeys the origin offset', () => {
    const g = ishape(IPE200, { origin: { x: 10, y: 20 } })
    expect(ringArea(g.outline)).toBeGreaterThan(0)
    expect(g.holes).toEqual([])
    expect(centroidal(g).bounds).toEqual({ minX: -40, maxX: 60, minY: -80, maxY: 120 })
  })
})

describe('ishape: invalid parameters', () => {
  it('tf = 120 mm in a 200 mm deep section: "Flange thickness tf = 120 mm must be less than half the depth h = 200 mm"', () => {
    const e = thrown(() => ishape({ ...IPE200, tf: 120 }))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe('tf')
    expect(e.message).toContain('Flange thickness tf = 120 mm must be less than half the depth h = 200 mm')
  })

  it.each<[string, IShapeParams, string, RegExp]>([
    ['root radius wider than the outstand', { ...IPE200, r: 50 }, 'r', /Root radius r = 50 mm must be at most 47.2 mm to fit on the flange outstand \(b - tw\)\/2 = 47.2 mm/],
    ['root radius longer than half the clear web', { h: 60, b: 200, tw: 6, tf: 8.5, r: 30 }, 'r', /at most 21.5 mm so that both root fillets fit/],
    ['web as wide as the flange', { ...IPE200, tw: 100 }, 'tw', /Web thickness tw = 100 mm must be less than the flange width b = 100 mm/],
    ['negative web', { ...IPE200, tw: -5.6 }, 'tw', /positive number of mm; got -5.6/],
    ['NaN depth', { ...IPE200, h: Number.NaN }, 'h', /got NaN/],
    ['negative root radius', { ...IPE200, r: -1 }, 'r', /zero or a positive number/],
    ['taper too steep for the flange', { h: 200, b: 200, tw: 7.5, tf: 5, r: 0, taper: 40 }, 'taper', /no thickness left at the toe/],
    ['taper of 45°', { ...IPE200, taper: 45 }, 'taper', /below 45°/],
    ['toe radius thicker than the toe', { ...IPE200, r2: 10 }, 'r2', /Toe radius r2 = 10 mm must be at most 8.5 mm/],
    ['unequal flanges deeper than the section', { h: 100, b: 100, tw: 5, tf: 10, r: 0, tf_bot: 95 }, 'tf_bot', /tf = 10 mm and tf_bot = 95 mm together must be less than the depth h = 100 mm/],
    ['narrow bottom flange', { ...IPE200, b_bot: 5 }, 'tw', /less than the flange width b_bot = 5 mm/],
    ['negative top flange width', { ...IPE200, b_top: -1 }, 'b_top', /Top flange width b_top/],
    ['tf_at beyond the outstand', { ...IPE200, taper: 5, tf_at: 60 }, 'tf_at', /from 0 to the flange outstand/],
  ])('%s throws a ShapeError on the right field', (_name, params, field, message) => {
    const e = thrown(() => ishape(params))
    expect(e).toBeInstanceOf(ShapeError)
    expect((e as ShapeError).field).toBe(field)
    expect(e.message).toMatch(message)
  })

  it('an invalid chord tolerance is reported on "tol"', () => {
    const e = thrown(() => ishape(IPE200, { tol: -1 }))
    expect((e as ShapeError).field).toBe('tol')
  })
})

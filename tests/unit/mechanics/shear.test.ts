import { describe, expect, it } from 'vitest'
import type { Ring } from '../../../shared/geometry/types'
import { shearFlows } from '../../../shared/mechanics/shear'
import { SectionError } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'
import { composite, rectRing, type Rect } from '../../support/sections'

describe('shearFlows', () => {
  // Built-up I: flange plates 200×20, web plate 10×360, overall depth 400.
  const top: Rect = [0, 380, 200, 400]
  const web: Rect = [95, 20, 105, 380]
  const bottom: Rect = [0, 0, 200, 20]
  const iProps = composite([top, web, bottom])
  const iParts = [
    { index: 0, name: 'top flange', n: 1, polygons: [[rectRing(top)]] },
    { index: 1, name: 'web', n: 1, polygons: [[rectRing(web)]] },
    { index: 2, name: 'bottom flange', n: 1, polygons: [[rectRing(bottom)]] },
  ]

  it.each([1e5, -2.5e5])('built-up I, Vy = %d N: q at each flange-web interface = Vy·A_f·d/Ixx (by hand)', (Vy) => {
    const Af = 200 * 20
    const d = 190 // flange centroid to the section centroid
    const Ixx = 2 * ((200 * 20 ** 3) / 12 + Af * d * d) + (10 * 360 ** 3) / 12 // parallel-axis theorem by hand
    const r = shearFlows(iProps, iParts, 0, Vy)
    expect(r.map((p) => [p.part, p.name])).toEqual([[0, 'top flange'], [1, 'web'], [2, 'bottom flange']])
    expectClose(r[0]!.Qx, Af * d)
    expectClose(r[0]!.q, (Vy * Af * d) / Ixx)
    expectClose(r[2]!.q, (-Vy * Af * d) / Ixx)
    expectClose(r[1]!.q, 0, 1, 1e-9)
  })

  it('a part with n = 2 doubles its equivalent first moment and its shear flow', () => {
    const one = shearFlows(iProps, iParts, 0, 1e5)[0]!
    const two = shearFlows(iProps, [{ ...iParts[0]!, n: 2 }], 0, 1e5)[0]!
    expectClose(two.Qx, 2 * one.Qx)
    expectClose(two.q, 2 * one.q)
  })

  it('back-to-back channel pair, Vx: q between the channels = Vx·Qy/Iyy (by hand)', () => {
    // Channel 300×90, flanges 12 thick, web 8 thick; webs back to back on x = 0.
    const h = 300
    const bf = 90
    const tf = 12
    const tw = 8
    const rightRects: Rect[] = [[0, 0, tw, h], [tw, 0, bf, tf], [tw, h - tf, bf, h]]
    const leftRects: Rect[] = rightRects.map(([x0, y0, x1, y1]) => [-x1, y0, -x0, y1] as const)
    const props = composite([...rightRects, ...leftRects])
    const right: Ring = [[0, 0], [bf, 0], [bf, tf], [tw, tf], [tw, h - tf], [bf, h - tf], [bf, h], [0, h]]
    const left: Ring = [...right].reverse().map(([x, y]) => [-x, y] as const) // mirrored and kept CCW
    const Vx = 4e4
    // By hand: Qy of the right channel = web 300·8 at x = 4, two flanges 82·12 at x = 49.
    const Qy = h * tw * (tw / 2) + 2 * (bf - tw) * tf * ((bf + tw) / 2)
    const Iyy = 2 * ((h * tw ** 3) / 12 + h * tw * (tw / 2) ** 2 + 2 * ((tf * (bf - tw) ** 3) / 12 + (bf - tw) * tf * ((bf + tw) / 2) ** 2))
    expectClose(props.Iyy, Iyy) // the two hand routes agree
    const r = shearFlows(props, [{ index: 0, name: 'right', n: 1, polygons: [[right]] }, { index: 1, name: 'left', n: 1, polygons: [[left]] }], Vx, 0)
    expectClose(r[0]!.Qy, Qy)
    expectClose(r[0]!.q, (Vx * Qy) / Iyy)
    expectClose(r[1]!.q, (-Vx * Qy) / Iyy)
  })

  describe('Z-section (Ixy ≠ 0)', () => {
    // Web 10×300 on x ∈ [0, 10]; top flange to the right, bottom flange to the left, 90×10 each.
    const zTop: Rect = [10, 290, 100, 300]
    const zWeb: Rect = [0, 0, 10, 300]
    const zBottom: Rect = [-90, 0, 0, 10]
    const props = composite([zTop, zWeb, zBottom])
    const parts = [zTop, zWeb, zBottom].map((r, index) => ({ index, name: `plate ${index}`, n: 1, polygons: [[rectRing(r)]] }))

    it('the hand properties are those of a point-symmetric Z: centroid (5, 150), Ixy = 2·900·50·145', () => {
      expectClose(props.centroid.x, 5)
      expectClose(props.centroid.y, 150)
      expectClose(props.Ixy, 2 * 900 * 50 * 145)
    })

    it.each([
      [0, 1e5],
      [3e4, 0],
      [-2e4, 6e4],
    ])('Vx = %d, Vy = %d: top-flange q matches the general formula with hand Qx = 900·145, Qy = 900·50 (notes §8)', (Vx, Vy) => {
      const Qx = 900 * 145
      const Qy = 900 * 50
      const D = props.Ixx * props.Iyy - props.Ixy ** 2
      const expected = ((Vy * props.Iyy - Vx * props.Ixy) * Qx + (Vx * props.Ixx - Vy * props.Ixy) * Qy) / D
      const r = shearFlows(props, parts, Vx, Vy)
      expectClose(r[0]!.Qx, Qx)
      expectClose(r[0]!.Qy, Qy)
      expectClose(r[0]!.q, expected)
      // The parts make up the whole section, so their first moments (and flows) cancel.
      expectClose(r.reduce((s, p) => s + p.q, 0), 0, 1, 1e-9 * Math.abs(expected))
    })

    it('Vy only: the result differs from the symmetric formula Vy·Qx/Ixx (the classic error)', () => {
      const q = shearFlows(props, parts, 0, 1e5)[0]!.q
      const naive = (1e5 * 900 * 145) / props.Ixx
      expect(Math.abs(q - naive) / Math.abs(naive)).toBeGreaterThan(0.05)
    })
  })

  it('zero shear gives zero flow', () => {
    for (const p of shearFlows(iProps, iParts, 0, 0)) expect(p.q).toBe(0)
  })

  it.each([
    ['no area', { ...iProps, area: 0 }],
    ['D = 0', { ...iProps, Ixx: 4, Iyy: 9, Ixy: 6 }],
  ])('shearFlows(%s) throws a SectionError', (_n, bad) => {
    expect(() => shearFlows(bad, iParts, 0, 1)).toThrow(SectionError)
  })

  it('shearFlows(non-finite V) throws a SectionError', () => {
    expect(() => shearFlows(iProps, iParts, Number.NaN, 1)).toThrow(SectionError)
  })
})

import { describe, expect, it } from 'vitest'
import { EULER_RATIO_CAUTION, SLENDERNESS_NOTE_KLR, slenderness } from '../../../shared/mechanics/slenderness'
import { expectClose } from '../../support/expect-close'

describe('slenderness', () => {
  // Rectangle 200×100: I_min = 200·100³/12 about the axis parallel to the long side (closed form).
  const b = 200
  const h = 100
  const rect = { area: b * h, Ixx: (b * h ** 3) / 12, Iyy: (h * b ** 3) / 12, Ixy: 0 }
  const Imin = (b * h ** 3) / 12
  const rMin = h / Math.sqrt(12) // r = h/√12 for a rectangle (closed form)
  const E = 200_000

  it('slenderness(rectangle 200×100, KL = 3 m) gives KL/r = 3000·√12/100 and P_e = π²EI/(KL)² (by hand)', () => {
    const r = slenderness(rect, E, 3000, 1e5)
    expectClose(r.Imin!, Imin)
    expectClose(r.rMin!, rMin)
    expectClose(r.KLr!, (3000 * Math.sqrt(12)) / 100) // 103.9
    expectClose(r.eulerLoad!, (Math.PI ** 2 * E * Imin) / 3000 ** 2) // 3.655e6 N by hand
    expectClose(r.ratio!, 1e5 / ((Math.PI ** 2 * E * Imin) / 3000 ** 2))
  })

  it.each([
    // [KL (mm), P (N), expected caution]
    ['short and lightly loaded', 500, 1e5, null],
    ['slender (KL/r > 50) but lightly loaded', 3000, 1e5, /^Note: KL\/r = 104 exceeds 50/],
    ['loaded above 10 % of Euler', 3000, 1e6, /^Caution: the load is 27 % of the Euler load/],
    ['loaded above the Euler load', 3000, 4e6, /^Caution: the load exceeds the elastic buckling/],
    ['in tension', 3000, -1e6, /^Note: KL\/r/],
  ])('slenderness(%s) gives the matching caution', (_n, KL, P, expected) => {
    const r = slenderness(rect, E, KL, P)
    if (expected === null) expect(r.warning).toBeNull()
    else expect(r.warning).toMatch(expected)
  })

  it('the thresholds are the stated cautions: KL/r 50 and P/Pe 0.1', () => {
    expect(SLENDERNESS_NOTE_KLR).toBe(50)
    expect(EULER_RATIO_CAUTION).toBe(0.1)
  })

  it('an equal angle uses the minor principal moment I - |Ixy| (Mohr circle by hand, Ixx = Iyy)', () => {
    const r = slenderness({ area: 1000, Ixx: 2e6, Iyy: 2e6, Ixy: -1.2e6 }, E, 2000, 0)
    expectClose(r.Imin!, 0.8e6)
    expectClose(r.rMin!, Math.sqrt(0.8e6 / 1000))
    expect(r.ratio).toBeNull() // no compression
  })

  it.each([
    ['zero area', { ...rect, area: 0 }, 3000, E],
    ['no minor stiffness (Ixx·Iyy = Ixy²)', { ...rect, Ixx: 4, Iyy: 9, Ixy: 6 }, 3000, E],
    ['zero effective length', rect, 0, E],
    ['negative effective length', rect, -10, E],
    ['zero modulus', rect, 3000, 0],
    ['NaN modulus', rect, 3000, Number.NaN],
  ])('slenderness(%s) returns nulls and a message, never NaN', (_n, props, KL, modulus) => {
    const r = slenderness(props, modulus, KL, 1e5)
    expect(r.eulerLoad).toBeNull()
    expect(r.ratio).toBeNull()
    expect(r.warning).toMatch(/^Give|^The section/)
    for (const v of [r.Imin, r.rMin, r.KLr]) if (v !== null) expect(Number.isFinite(v)).toBe(true)
  })
})

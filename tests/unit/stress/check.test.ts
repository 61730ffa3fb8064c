import { describe, expect, it } from 'vitest'
import { checkMessage, checkUtilisation } from '../../../shared/stress/check'

// Rectangle 400 × 600, 1000 kN at x = 40 mm: P/A·(1 ± 6e/b) = 4.1667·(1 ± 0.6) = 6.6667 MPa C and
// 1.6667 MPa C (closed form, middle third rule: all in compression).
const rect = [[-200, -300], [200, -300], [200, 300], [-200, 300]] as const
const P = 1e6
const A = 240_000
const Iyy = (600 * 400 ** 3) / 12
const plane = { a: -P / A, b: (-P * 40) / Iyy, c: 0 }
// The same load at x = 100 mm (outside the core, e > b/6): P/A·(1 ± 6·100/400) = 10.417 MPa C at
// x = +200 and 2.0833 MPa T at x = −200 (closed form, linear-elastic, tension allowed).
const outside = { a: -P / A, b: (-P * 100) / Iyy, c: 0 }

describe('checkUtilisation', () => {
  it('checks the compressive point against the allowable compression (hand calculation 6.667 / 10 = 0.667)', () => {
    const [row] = checkUtilisation([{ name: 'Masonry', n: 1, rings: [rect], allowableC: 10, allowableT: 0.1, fy: 355 }], [plane])
    expect(row!.governing).toBe('compression')
    expect(row!.limitKind).toBe('allowable')
    expect(row!.utilisation!).toBeCloseTo(6.6667 / 10, 4)
    expect(row!.worst!.x).toBe(200)
    expect(row!.status).toBe('pass')
    expect(row!.tension.status).toBe('none')       // no tensile point: the tiny allowable tension does not apply
    expect(checkMessage(row!)).toBe('Pass: 67 % of the allowable compression (compression governs).')
  })

  it('checks the tensile point against the allowable tension: 2.0833 / 1.5 = 1.389 governs over 10.417 / 12 = 0.868', () => {
    const [row] = checkUtilisation([{ name: 'Masonry', n: 1, rings: [rect], allowableC: 12, allowableT: 1.5 }], [outside])
    expect(row!.compression.utilisation!).toBeCloseTo(10.4167 / 12, 4)
    expect(row!.tension.utilisation!).toBeCloseTo(2.08333 / 1.5, 4)
    expect(row!.tension.worst!.x).toBe(-200)
    expect(row!.governing).toBe('tension')
    expect(row!.status).toBe('over')
    expect(checkMessage(row!)).toBe('Over: 139 % of the allowable tension (tension governs); the worst point exceeds it.')
  })

  it('falls back to fy on a side without an allowable', () => {
    const [row] = checkUtilisation([{ name: 'Steel', n: 1, rings: [rect], allowableT: 1, fy: 20 }], [outside])
    expect(row!.compression.limitKind).toBe('yield')
    expect(row!.compression.utilisation!).toBeCloseTo(10.4167 / 20, 4)
    expect(row!.tension.limitKind).toBe('allowable')
    expect(row!.governing).toBe('tension') // 2.083 / 1 > 10.417 / 20
  })

  it('reports over and the yield stress, scaled by n', () => {
    const [row] = checkUtilisation([{ name: 'Steel', n: 2, rings: [rect], fy: 10 }], [plane])
    expect(row!.status).toBe('over')
    expect(row!.utilisation!).toBeCloseTo(1.3333, 4)
    expect(checkMessage(row!)).toContain('Over: 133 % of the yield stress fy')
  })

  it('a no-tension view (clamp at 0) has no tensile side', () => {
    const [row] = checkUtilisation([{ name: 'Soil', n: 1, rings: [rect], allowableT: 1, allowableC: 20 }], [outside], 0)
    expect(row!.tension.status).toBe('none')
    expect(row!.governing).toBe('compression')
  })

  it('says when no limit is given, and takes the worst over several planes (envelope)', () => {
    const [row] = checkUtilisation([{ name: 'X', n: 1, rings: [rect] }], [plane, { a: 0, b: 0, c: 0.01 }])
    expect(row!.status).toBe('no-limit')
    expect(row!.worst!.value).toBeCloseTo(-6.6667, 4)
    expect(row!.tension.worst!.value).toBeCloseTo(3, 9) // 0.01 × 300 from the second plane
  })

  it('says there is no load when no point is stressed (issue 17: "Pass 0 %")', () => {
    const [row] = checkUtilisation([{ name: 'X', n: 1, rings: [rect], fy: 355 }], [{ a: 0, b: 0, c: 0 }])
    expect(row!.governing).toBeNull()
    expect(checkMessage(row!)).toContain('no load')
  })
})

describe('checkUtilisation: compression against fc', () => {
  it('a no-tension material with fc and no allowable is checked in compression against fc (|−0.59| / 0.2, by hand)', () => {
    const ring = [[0, 0], [100, 0], [100, 100], [0, 100]] as const
    const rows = checkUtilisation([{ name: 'Soil', n: 1, rings: [ring], fc: 0.2 }], [{ a: -0.59, b: 0, c: 0 }], 0)
    expect(rows[0]!.compression.limitKind).toBe('strength')
    expect(rows[0]!.compression.limit).toBe(0.2)
    expect(rows[0]!.compression.utilisation).toBeCloseTo(0.59 / 0.2, 12)
    expect(rows[0]!.status).toBe('over')
  })
})

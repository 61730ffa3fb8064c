import { describe, expect, it } from 'vitest'
import { checkMessage, checkUtilisation } from '../../../shared/stress/check'

// Rectangle 400 × 600, 1000 kN at x = 40 mm: P/A·(1 + 6e/b) = 4.1667·1.6 = 6.6667 MPa C (closed form, middle third rule).
const rect = [[-200, -300], [200, -300], [200, 300], [-200, 300]] as const
const P = 1e6
const A = 240_000
const Iyy = (600 * 400 ** 3) / 12
const plane = { a: -P / A, b: (-P * 40) / Iyy, c: 0 }

describe('checkUtilisation', () => {
  it('uses the allowable stress when given, else fy (hand calculation 6.667 / 10 = 0.667)', () => {
    const [row] = checkUtilisation([{ name: 'Masonry', n: 1, rings: [rect], allowable: 10, fy: 355 }], [plane])
    expect(row!.limitKind).toBe('allowable')
    expect(row!.utilisation!).toBeCloseTo(6.6667 / 10, 4)
    expect(row!.worst!.x).toBe(200)
    expect(row!.status).toBe('pass')
    expect(checkMessage(row!)).toBe('Pass: 67 % of the allowable stress.')
  })

  it('reports over and the yield stress, scaled by n', () => {
    const [row] = checkUtilisation([{ name: 'Steel', n: 2, rings: [rect], fy: 10 }], [plane])
    expect(row!.status).toBe('over')
    expect(row!.utilisation!).toBeCloseTo(1.3333, 4)
    expect(checkMessage(row!)).toContain('Over: 133 % of the yield stress')
  })

  it('says when no limit is given, and takes the worst over several planes (envelope)', () => {
    const [row] = checkUtilisation([{ name: 'X', n: 1, rings: [rect] }], [plane, { a: 0, b: 0, c: 0.01 }])
    expect(row!.status).toBe('no-limit')
    expect(row!.worst!.value).toBeCloseTo(-6.6667, 4)
  })
})

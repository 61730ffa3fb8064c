import { describe, expect, it } from 'vitest'
import type { Point } from '../../../shared/geometry/types'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { expectClose } from '../../support/expect-close'

// Unequal angle 150 x 90 x 10 drawn without fillets: Ixy != 0.
const angle: Point[] = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]

/** Mx, My (N·mm) whose stress plane is M·v/I1, v the distance from the major axis u (general formula, README "Method", solved by hand). */
function aboutMajor(p: { Ixx: number; Iyy: number; Ixy: number; I1: number; theta: number }, M: number): { Mx: number; My: number } {
  const t = (p.theta * Math.PI) / 180
  const D = p.Ixx * p.Iyy - p.Ixy ** 2
  // sigma = [(Mx·Iyy - My·Ixy)·y + (My·Ixx - Mx·Ixy)·x] / D must equal (M / I1)·(-sin t·x + cos t·y).
  const cy = (M / p.I1) * Math.cos(t) * D
  const cx = (M / p.I1) * -Math.sin(t) * D
  // Mx·Iyy - My·Ixy = cy and -Mx·Ixy + My·Ixx = cx.
  const det = p.Iyy * p.Ixx - p.Ixy * p.Ixy
  return { Mx: (cy * p.Ixx + cx * p.Ixy) / det, My: (p.Iyy * cx + p.Ixy * cy) / det }
}

describe('elastic moduli of an unsymmetric section cannot mislead', () => {
  const base = analyseSection({ parts: [{ outline: angle }] })
  const p = base.properties

  it('M/Su is the extreme stress for a moment about the major principal axis (general formula)', () => {
    const M = 10e6
    const a = analyseSection({ parts: [{ outline: angle }], moments: aboutMajor(p, M) })
    expectClose(a.stress!.max.value, M / p.Su.pos, 1e-9)
    expectClose(-a.stress!.min.value, M / p.Su.neg, 1e-9)
  })

  it('M/S top about x is not the extreme stress: for this angle it is over 20 % low, and a note says so', () => {
    const Mx = 10e6
    const a = analyseSection({ parts: [{ outline: angle }], moments: { Mx, My: 0 } })
    const extreme = Math.max(Math.abs(a.stress!.max.value), Math.abs(a.stress!.min.value))
    const naive = Mx / Math.min(p.S.top, p.S.bottom)
    expect(naive / extreme).toBeLessThan(0.8)
    expect(p.moduliNote).toMatch(/M\/S about x or y is not the extreme stress/)
    expect(a.warnings).toContain(p.moduliNote)
  })

  it('a rectangle b x h turned 30°: Su = bh²/6 each side and Sv = hb²/6 (closed form)', () => {
    const c = Math.cos(Math.PI / 6)
    const s = Math.sin(Math.PI / 6)
    const b = 60
    const h = 150
    const turned: Point[] = ([[-30, -75], [30, -75], [30, 75], [-30, 75]] as Point[]).map(q => [c * q[0] - s * q[1], s * q[0] + c * q[1]])
    const q = analyseSection({ parts: [{ outline: turned }] }).properties
    // Upright, the major axis is x (Ixx = bh³/12 is the larger); turned by 30°, it is at 30°.
    expectClose(q.theta, 30, 1e-9)
    expectClose(q.Su.pos, (b * h ** 2) / 6, 1e-9)
    expectClose(q.Su.neg, (b * h ** 2) / 6, 1e-9)
    expectClose(q.Sv.pos, (h * b ** 2) / 6, 1e-9)
    expectClose(q.Sv.neg, (h * b ** 2) / 6, 1e-9)
  })

  it('the shape factor Z/S of a rectangle is bh²/4 ÷ bh²/6 = 1.5 (closed form); the note is absent when Ixy = 0', () => {
    const rect = analyseSection({ parts: [{ outline: [[0, 0], [60, 0], [60, 150], [0, 150]] }] }).properties
    expectClose(rect.shapeFactor.x!, 1.5, 1e-12)
    expectClose(rect.shapeFactor.y!, 1.5, 1e-12)
    expect(base.properties.moduliNote).not.toBeNull()
    expect(rect.moduliNote).toBeNull()
  })
})

import { describe, expect, it } from 'vitest'
import type { Point } from '../../../../shared/geometry/types'
import { analyseSection } from '../../../../shared/mechanics/analyze'
import type { PartInput } from '../../../../shared/mechanics/types'
import { expectClose } from '../../../support/expect-close'

const rect = (x: number, y: number, w: number, h: number): Point[] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]

/** q (N/mm) of the FE solution across the connection between parts a and b. */
function feFlow(a: ReturnType<typeof analyseSection>, parts: [number, number]) {
  const c = a.torsion!.connections!.find(k => k.parts[0] === parts[0] && k.parts[1] === parts[1])
  expect(c, `connection ${parts.join('-')}`).toBeDefined()
  return c!
}

describe('connection shear flows from the finite element shear solution (torsion.connections)', () => {
  // A box of four welded plates: flanges 200 × 10 over the full width, webs 10 × 280 between them.
  const box: PartInput[] = [
    { name: 'Top flange', outline: rect(-100, 140, 200, 10) },
    { name: 'Right web', outline: rect(90, -140, 10, 280) },
    { name: 'Bottom flange', outline: rect(-100, -150, 200, 10) },
    { name: 'Left web', outline: rect(-100, -140, 10, 280) },
  ]
  // Second moments by parallel axes (by hand): flanges b·t³/12 + A·d², webs t·h³/12 (+ A·d² about y).
  const Ixx = 2 * (200 * 10 ** 3 / 12 + 2000 * 145 ** 2) + 2 * (10 * 280 ** 3 / 12)
  const Iyy = 2 * (10 * 200 ** 3 / 12) + 2 * (280 * 10 ** 3 / 12 + 2800 * 95 ** 2)

  it('a box of four plates under Vy: every weld closes the cell, and each carries Vy·Q/Ixx of half a flange (the symmetry cut at x = 0 has q = 0; thin-walled closed-cell result)', () => {
    const Vy = 100_000
    const a = analyseSection({ parts: box, shear: { Vx: 0, Vy }, torsion: true })
    expectClose(a.properties.Ixx, Ixx, 1e-9)
    expect(a.connections).toHaveLength(4)
    for (const c of a.connections) expect(c.status).toBe('closed-cell')
    // Free body: the half flange x = 0..100 (Q = 100·10·145 mm³), cut at the axis of symmetry (q = 0) and along its weld.
    const expected = (Vy * 100 * 10 * 145) / Ixx
    for (const c of a.connections) {
      const fe = feFlow(a, c.parts)
      expect(Math.abs(fe.q) / expected).toBeGreaterThan(0.99)
      expect(Math.abs(fe.q) / expected).toBeLessThan(1.01)
      expectClose(fe.q, Vy * fe.qVy, 1e-12)
    }
  })

  it('the same box under Vx: each weld carries Vx·Q/Iyy of half a web (the cut at y = 0 has q = 0 by symmetry; thin-walled result)', () => {
    const Vx = 50_000
    const a = analyseSection({ parts: box, shear: { Vx, Vy: 0 }, torsion: true })
    expectClose(a.properties.Iyy, Iyy, 1e-9)
    // Free body: the upper half of a web, y = 0..140 (Q = 140·10·95 mm³), cut at y = 0 and along its weld.
    const expected = (Vx * 140 * 10 * 95) / Iyy
    for (const c of a.connections) {
      const q = Math.abs(feFlow(a, c.parts).q)
      expect(q / expected).toBeGreaterThan(0.99)
      expect(q / expected).toBeLessThan(1.01)
    }
  })

  it('the top flange sheds the same flow into each web: the two top welds carry equal q, both read from the flange into its web (symmetry about x = 0)', () => {
    const a = analyseSection({ parts: box, shear: { Vx: 0, Vy: 100_000 }, torsion: true })
    const right = feFlow(a, [0, 1]).q
    const left = feFlow(a, [0, 3]).q
    // Both lines are directed from the flange into its web: by symmetry the flange sheds the same flow into each.
    expectClose(right, left, 0.01)
  })

  it('a doubly symmetric three-plate I (a tree): the FE flow at each flange weld matches the open-section V·Q/I', () => {
    const parts: PartInput[] = [
      { name: 'Top flange', outline: rect(-100, 130, 200, 20) },
      { name: 'Web', outline: rect(-5, -130, 10, 260) },
      { name: 'Bottom flange', outline: rect(-100, -150, 200, 20) },
    ]
    const Vy = 100_000
    const a = analyseSection({ parts, shear: { Vx: 0, Vy }, torsion: true })
    const Ixx = (200 * 300 ** 3 - 190 * 260 ** 3) / 12 // by hand
    const open = (Vy * 200 * 20 * 140) / Ixx // q = V·Q/I, Q of a flange (closed form)
    for (const c of a.connections) {
      expect(c.status).toBe('tree')
      expectClose(Math.abs(c.q!), open, 1e-9)
      const fe = Math.abs(feFlow(a, c.parts).q)
      expect(fe / open).toBeGreaterThan(0.99)
      expect(fe / open).toBeLessThan(1.01)
    }
  })

  it('without torsion asked there is no FE flow, and the warning says how to have it', () => {
    const a = analyseSection({ parts: box, shear: { Vx: 0, Vy: 1000 } })
    expect(a.torsion).toBeUndefined()
    expect(a.warnings.join(' ')).toContain('ask for torsion')
  })

  it('the contact line is directed so its right-hand normal points from the first part into the second', () => {
    const a = analyseSection({ parts: box, shear: { Vx: 0, Vy: 0 } })
    const c = a.connections.find(k => k.parts[0] === 0 && k.parts[1] === 1)!
    expect(c.line.length).toBeGreaterThan(0)
    for (const [x1, y1, x2, y2] of c.line) {
      const len = Math.hypot(x2 - x1, y2 - y1)
      // The top flange (part 0) lies above the weld line y = 140: the normal points down, into the web.
      expectClose((y2 - y1) / len, 0, 1e-12)
      expectClose(-(x2 - x1) / len, -1, 1e-12)
      expectClose(y1, 140, 1e-12)
    }
  })
})

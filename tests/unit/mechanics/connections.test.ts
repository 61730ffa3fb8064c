import { describe, expect, it } from 'vitest'
import type { Point } from '../../../shared/geometry/types'
import { analyseSection } from '../../../shared/mechanics/analyze'
import type { PartInput } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'

const rect = (x: number, y: number, w: number, h: number): Point[] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]

describe('shear flow per connection (README "Method": q = V·Q/I of the side a cut separates)', () => {
  it('three-plate I: each flange-to-web line carries Vy·Q_flange/Ixx; the web itself is not "zero" (parallel axes by hand)', () => {
    // Flanges 200 x 20 at the top and bottom, web 10 x 260 between them.
    const parts: PartInput[] = [
      { name: 'Top flange', outline: rect(-100, 130, 200, 20) },
      { name: 'Web', outline: rect(-5, -130, 10, 260) },
      { name: 'Bottom flange', outline: rect(-100, -150, 200, 20) },
    ]
    const Vy = 100_000
    const a = analyseSection({ parts, shear: { Vx: 0, Vy } })
    const Ixx = (200 * 300 ** 3 - 190 * 260 ** 3) / 12
    const Qf = 200 * 20 * 140
    expectClose(a.properties.Ixx, Ixx, 1e-12)
    expect(a.connections).toHaveLength(2)
    for (const c of a.connections) {
      expect(c.status).toBe('tree')
      expectClose(c.length, 10, 1e-12)
      expectClose(Math.abs(c.q!), (Vy * Qf) / Ixx, 1e-9)
      expectClose(Math.abs(c.Qx!), Qf, 1e-9)
    }
    expect(a.connections.map(c => c.parts)).toEqual([[0, 1], [1, 2]])
    expect(a.connections.map(c => c.side)).toEqual([[0], [2]]) // the flange is the smaller side
  })

  it.each([
    ['flange drawn first', 0],
    ['web drawn first', 1],
  ])('tee drawn as a flange plus a full-height web overlapping it (%s): Q of the whole flange, contact tw (by hand)', (_name, order) => {
    // Flange 200 x 20 at y 180..200; web 10 x 200 from y 0 drawn through the flange. The tee is
    // flange 4000 mm² + stem 10 x 180.
    const flange: PartInput = { name: 'Flange', outline: rect(-100, 180, 200, 20) }
    const web: PartInput = { name: 'Web', outline: rect(-5, 0, 10, 200) }
    const Vy = 50_000
    const a = analyseSection({ parts: order === 0 ? [flange, web] : [web, flange], shear: { Vx: 0, Vy } })
    const yc = (4000 * 190 + 1800 * 90) / 5800
    const Ixx = (200 * 20 ** 3) / 12 + 4000 * (190 - yc) ** 2 + (10 * 180 ** 3) / 12 + 1800 * (90 - yc) ** 2
    const Qflange = 4000 * (190 - yc) // 20 % more than the overlapping-polygon Q of the old per-part answer
    expectClose(a.properties.area, 5800, 1e-12)
    expect(a.connections).toHaveLength(1)
    const c = a.connections[0]!
    expectClose(c.length, 10, 1e-9)
    expectClose(Math.abs(c.Qx!), Qflange, 1e-9)
    expectClose(Math.abs(c.q!), (Vy * Qflange) / Ixx, 1e-9)
  })

  it('box of four plates closes a cell: every connection is "closed-cell" with no q, and a warning says so', () => {
    const parts: PartInput[] = [
      { name: 'Top', outline: rect(-150, 140, 300, 10) },
      { name: 'Bottom', outline: rect(-150, -150, 300, 10) },
      { name: 'Left', outline: rect(-150, -140, 10, 280) },
      { name: 'Right', outline: rect(140, -140, 10, 280) },
    ]
    const a = analyseSection({ parts, shear: { Vx: 0, Vy: 1e5 } })
    expect(a.connections).toHaveLength(4)
    for (const c of a.connections) {
      expect(c.status).toBe('closed-cell')
      expect(c.q).toBeNull()
      expectClose(c.length, 10, 1e-12)
    }
    expect(a.warnings).toContain('Some connections close a cell: their shear flow is not statically determinate; ask for torsion to have it from the finite element shear solution.')
  })

  it('a part that touches no other part is named in a warning', () => {
    const a = analyseSection({ parts: [{ name: 'Plate', outline: rect(0, 0, 100, 10) }, { name: 'Loose bar', outline: rect(0, 50, 20, 20) }] })
    expect(a.connections).toEqual([])
    expect(a.warnings).toContain('Part 2 (Loose bar) touches no other part: the section properties assume it acts with the rest.')
  })

  it('unsymmetric angle of two plates: the general formula with Ixy (parallel axes and q = [(Vy·Iyy - Vx·Ixy)Qx + (Vx·Ixx - Vy·Ixy)Qy]/D by hand)', () => {
    // Vertical leg 10 x 150 (x 0..10, y 0..150), horizontal leg 80 x 10 (x 10..90, y 0..10).
    const legV = { A: 1500, x: 5, y: 75, Ixx: (10 * 150 ** 3) / 12, Iyy: (150 * 10 ** 3) / 12 }
    const legH = { A: 800, x: 50, y: 5, Ixx: (80 * 10 ** 3) / 12, Iyy: (10 * 80 ** 3) / 12 }
    const A = legV.A + legH.A
    const xc = (legV.A * legV.x + legH.A * legH.x) / A
    const yc = (legV.A * legV.y + legH.A * legH.y) / A
    const Ixx = legV.Ixx + legV.A * (legV.y - yc) ** 2 + legH.Ixx + legH.A * (legH.y - yc) ** 2
    const Iyy = legV.Iyy + legV.A * (legV.x - xc) ** 2 + legH.Iyy + legH.A * (legH.x - xc) ** 2
    const Ixy = legV.A * (legV.x - xc) * (legV.y - yc) + legH.A * (legH.x - xc) * (legH.y - yc)
    const D = Ixx * Iyy - Ixy ** 2
    const Vx = 20_000
    const Vy = 60_000
    const a = analyseSection({ parts: [{ outline: rect(0, 0, 10, 150) }, { outline: rect(10, 0, 80, 10) }], shear: { Vx, Vy } })
    expectClose(a.properties.Ixy, Ixy, 1e-10)
    const c = a.connections[0]!
    expectClose(c.length, 10, 1e-12)
    expect(c.side).toEqual([1]) // the horizontal leg is the smaller side
    const Qx = legH.A * (legH.y - yc)
    const Qy = legH.A * (legH.x - xc)
    expectClose(c.Qx!, Qx, 1e-10)
    expectClose(c.Qy!, Qy, 1e-10)
    expectClose(c.q!, ((Vy * Iyy - Vx * Ixy) * Qx + (Vx * Ixx - Vy * Ixy) * Qy) / D, 1e-9)
  })

  it('edges apart by more than the tolerance do not connect; within it they do', () => {
    const near = analyseSection({ parts: [{ outline: rect(0, 0, 100, 10) }, { outline: rect(0, 10.05, 100, 10) }] })
    expect(near.connections).toHaveLength(1)
    expectClose(near.connections[0]!.length, 100, 1e-9)
    const far = analyseSection({ parts: [{ outline: rect(0, 0, 100, 10) }, { outline: rect(0, 10.5, 100, 10) }] })
    expect(far.connections).toHaveLength(0)
  })
})

import { describe, expect, it } from 'vitest'
import { regionsHull } from '../../../shared/geometry/hull'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { sectionStress } from '../../../shared/mechanics/stress'
import type { LoadSet } from '../../../shared/loads/combine'
import { evaluateFrame, snapLoadPoint, type FrameInput } from '../../../shared/stress/frame'
import { expectClose } from '../../support/expect-close'

function setOf(loads: { P: number; x: number; y: number }[], Mx = 0, My = 0, key = 's'): LoadSet {
  return { key, name: key, ids: loads.map((_, i) => `l${i}`), factors: loads.map(() => 1), loads, moments: { Mx, My } }
}

function inputFor(parts: Parameters<typeof analyseSection>[0]['parts'], sets: LoadSet[], opts: { envelope?: boolean; noTension?: boolean } = {}): FrameInput {
  const a = analyseSection({ parts })
  return {
    props: a.properties,
    hull: regionsHull(a.regions),
    kern: a.kern,
    regions: a.regions.map(r => ({ name: r.name, n: r.n, rings: r.polygons.flat() })),
    sets,
    envelope: opts.envelope ?? false,
    noTension: opts.noTension ?? false,
  }
}

// An unequal angle 150 × 90 × 12 drawn as one outline (Ixy ≠ 0: the general formula matters, README "Method").
const angle = [[0, 0], [90, 0], [90, 12], [12, 12], [12, 150], [0, 150]] as const
const rect = (b: number, h: number) => [[-b / 2, -h / 2], [b / 2, -h / 2], [b / 2, h / 2], [-b / 2, h / 2]] as const

describe('evaluateFrame (client-side stress from the properties alone)', () => {
  it('reuses the engine: the same plane, extremes and core status as sectionStress on an unsymmetric angle', () => {
    const loads = [{ P: 80_000, x: 30, y: 40 }]
    const input = inputFor([{ outline: angle, material: { E: 200_000 } }], [setOf(loads, 2e6, -1e6)])
    const f = evaluateFrame(input)
    const ref = sectionStress(input.props, input.hull, input.regions.map((r, i) => ({ n: r.n, polygons: [r.rings], region: i })), loads, { Mx: 2e6, My: -1e6 })
    expect(f.kind).toBe('plane')
    expectClose(f.planes[0]!.a, ref.plane.a)
    expectClose(f.planes[0]!.b, ref.plane.b)
    expectClose(f.planes[0]!.c, ref.plane.c)
    expectClose(f.min!.value, ref.min.value)
    expectClose(f.max!.value, ref.max.value)
    expect(f.inKern).toBe(ref.inKern)
  })

  it('rectangle b × h with P at e on the x axis: P/A(1 ± 6e/b), core edge at b/6 (closed form, middle third rule)', () => {
    const b = 400
    const h = 600
    const P = 1e6
    for (const [e, inside] of [[50, true], [b / 6 - 1, true], [b / 6 + 1, false], [120, false]] as const) {
      const f = evaluateFrame(inputFor([{ outline: rect(b, h) }], [setOf([{ P, x: e, y: 0 }])]))
      expectClose(f.min!.value, -(P / (b * h)) * (1 + (6 * e) / b), 1e-9)
      expect(f.inKern).toBe(inside)
      // Margin to the core edge along the axis: b/6 − e inside (hand calculation: the rhombus edge is oblique, so less).
      expect(Math.sign(f.margin!)).toBe(inside ? 1 : -1)
    }
  })

  it('where tension first appears: moving out from e = 20 mm, the far corner reaches zero after b/6 − 20 mm (closed form)', () => {
    const f = evaluateFrame(inputFor([{ outline: rect(400, 600) }], [setOf([{ P: 1e6, x: 20, y: 0 }])]))
    expectClose(f.onset!.distance, 400 / 6 - 20, 1e-9)
    expect(f.onset!.x).toBe(-200)
    expect(f.onset!.startsInTension).toBe(false)
  })

  it('no-tension footing B × L, e > L/6: contact 3(L/2 − e) long and q_max = 2P/(3B(L/2 − e)) (closed form README "Method" footing)', () => {
    const B = 600
    const L = 400
    const P = 1e6
    const e = 100
    const f = evaluateFrame(inputFor([{ outline: rect(L, B) }], [setOf([{ P, x: e, y: 0 }])], { noTension: true }))
    expect(f.kind).toBe('contact')
    expect(f.contact!.status).toBe('partial')
    expectClose(f.contact!.area!, B * 3 * (L / 2 - e), 1e-6)
    expectClose(-f.min!.value, (2 * P) / (3 * B * (L / 2 - e)), 1e-6)
    // The lift-off line is x = L/2 − 3(L/2 − e) = −100 mm (hand calculation).
    const n = f.neutral!
    expectClose(-n.a / n.b, L / 2 - 3 * (L / 2 - e), 1e-6)
  })

  it('applied moments enter the contact through the resultant: P at the centroid with My = −P·e gives the same peak (closed form README "Method")', () => {
    const P = 1e6
    const f = evaluateFrame(inputFor([{ outline: rect(400, 600) }], [setOf([{ P, x: 0, y: 0 }], 0, -P * 100)], { noTension: true }))
    expectClose(-f.min!.value, (2 * P) / (3 * 600 * 100), 1e-6)
  })

  it('no-tension with the resultant outside the base says overturning and gives no numbers', () => {
    const f = evaluateFrame(inputFor([{ outline: rect(400, 600) }], [setOf([{ P: 1e6, x: 250, y: 0 }])], { noTension: true }))
    expect(f.contact!.status).toBe('overturning')
    expect(f.min).toBeNull()
  })

  it('the envelope takes the worst compression and tension over the sets (hand calculation: 4.167 ± 4.167 MPa)', () => {
    const sets = [setOf([{ P: 1e6, x: 0, y: 0 }], 1e8, 0, 'up'), setOf([{ P: 1e6, x: 0, y: 0 }], -1e8, 0, 'down')]
    const f = evaluateFrame(inputFor([{ outline: rect(400, 600) }], sets, { envelope: true }))
    expect(f.kind).toBe('envelope')
    expectClose(f.min!.value, -1e6 / 240_000 - (1e8 * 300) / 7.2e9)
    expect(Math.abs(f.max!.value)).toBeLessThan(1e-9)
    expect(f.inKern).toBeNull()
  })
})

describe('snapLoadPoint', () => {
  const t = { centroid: [0, 0] as const, kern: [[66.7, 0], [0, 100], [-66.7, 0], [0, -100]] as const, theta: 0 }
  it('snaps to the centroid, then a core vertex, then a principal axis', () => {
    const out: [number, number] = [0, 0]
    expect(snapLoadPoint(2, -1, t, 5, out)).toBe('centroid')
    expect(out).toEqual([0, 0])
    expect(snapLoadPoint(64, 2, t, 5, out)).toBe('core vertex')
    expect(out).toEqual([66.7, 0])
    expect(snapLoadPoint(40, 3, t, 5, out)).toBe('principal axis 1')
    expect(out[1]).toBeCloseTo(0, 12)
    expect(snapLoadPoint(40, 30, t, 5, out)).toBeNull()
    expect(out).toEqual([40, 30])
  })
})

describe('evaluateFrame without a load', () => {
  it('says there is no load (no 0 MPa extremes, no pass at 0 %); a moment alone is a load', () => {
    const none = evaluateFrame(inputFor([{ outline: rect(200, 100) }], [setOf([])]))
    expect(none.noLoad).toBe(true)
    expect(none.kind).toBe('none')
    expect(none.min).toBeNull()
    const moment = evaluateFrame(inputFor([{ outline: rect(200, 100) }], [setOf([], 1e6, 0)]))
    expect(moment.noLoad).toBe(false)
    expect(moment.kind).toBe('plane')
  })
})

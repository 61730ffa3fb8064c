import { describe, expect, it } from 'vitest'
import { regionsHull } from '../../../shared/geometry/hull'
import type { LoadSet } from '../../../shared/loads/combine'
import { analyseSection, type AnalysisInput } from '../../../shared/mechanics/analyze'
import { evaluateFrame, type FrameInput } from '../../../shared/stress/frame'
import { expectClose } from '../../support/expect-close'

const rect = (b: number, h: number) => [[-b / 2, -h / 2], [b / 2, -h / 2], [b / 2, h / 2], [-b / 2, h / 2]] as [number, number][]
const soil = { E: 50 }

function setOf(loads: { P: number; x: number; y: number }[], Mx = 0, My = 0, key = 's'): LoadSet {
  return { key, name: key, ids: loads.map((_, i) => `l${i}`), factors: loads.map(() => 1), loads, moments: { Mx, My } }
}

/** The editor's input for the same section the server analysed (what useStressView builds from the answer). */
function frameInput(input: AnalysisInput, sets: LoadSet[], envelope = false): FrameInput {
  const a = analyseSection(input)
  return {
    props: a.properties,
    hull: regionsHull(a.regions),
    kern: a.kern,
    regions: a.regions.map(r => ({ name: r.name, n: r.n, rings: r.polygons.flat() })),
    sets,
    envelope,
    noTension: true,
  }
}

describe('no-tension contact includes the applied moments (README "Method": the load point is the resultant of loads and moments)', () => {
  it('footing 1000 x 1000, P = 1000 kN at the centroid, Mx = -300 kN·m: e = 300 mm > L/6, contact 3·(L/2 - e)·B = 0.6 m², q_max = 2P/(3B(L/2 - e)) = 3.33 MPa (standard footing result)', () => {
    const P = 1e6
    const Mx = -300e6
    const a = analyseSection({ parts: [{ outline: rect(1000, 1000), material: soil }], loads: [{ P, x: 0, y: 0 }], moments: { Mx, My: 0 }, noTension: true })
    const e = -Mx / P // y_P = y_c - Mx/P = +300 mm
    expect(a.contact!.status).toBe('partial')
    expectClose(a.contact!.area!, 3 * (500 - e) * 1000, 1e-9)
    expectClose(a.contact!.peak!.value, (2 * P) / (3 * 1000 * (500 - e)), 1e-9)
    expect(a.warnings.some(w => /moments are not included/.test(w))).toBe(false)
  })

  // A fixture set: loads and moments on a 1000 x 1000 pad and an unequal angle, inside and outside the core.
  const angle = [[0, 0], [300, 0], [300, 60], [60, 60], [60, 500], [0, 500]] as [number, number][]
  const fixtures: [string, AnalysisInput][] = [
    ['pad, moment only about x', { parts: [{ outline: rect(1000, 1000), material: soil }], loads: [{ P: 1e6, x: 0, y: 0 }], moments: { Mx: -300e6, My: 0 }, noTension: true }],
    ['pad, biaxial moments and an eccentric load', { parts: [{ outline: rect(1000, 1000), material: soil }], loads: [{ P: 8e5, x: 120, y: -40 }], moments: { Mx: 60e6, My: -90e6 }, noTension: true }],
    ['pad, two loads inside the core', { parts: [{ outline: rect(1000, 1000), material: soil }], loads: [{ P: 5e5, x: 50, y: 20 }, { P: 5e5, x: -20, y: 10 }], moments: { Mx: 5e6, My: 0 }, noTension: true }],
    ['angle, load and moments', { parts: [{ outline: angle, material: soil }], loads: [{ P: 2e6, x: 80, y: 120 }], moments: { Mx: 40e6, My: -25e6 }, noTension: true }],
  ]

  it.each(fixtures)('%s: the server (analyseSection) and the editor (evaluateFrame) agree to 1e-9', (_name, input) => {
    const server = analyseSection(input).contact!
    const client = evaluateFrame(frameInput(input, [setOf([...input.loads!], input.moments!.Mx, input.moments!.My)])).contact!
    expect(client.status).toBe(server.status)
    if (server.status === 'overturning') return
    expectClose(client.area!, server.area!, 1e-9)
    expectClose(client.peak!.value, server.peak!.value, 1e-9)
    for (const k of ['a', 'b', 'c'] as const) expectClose(client.plane![k], server.plane![k], 1e-9, 1e-9)
  })

  it('a pure moment with no net compression overturns on both sides, saying why', () => {
    const input: AnalysisInput = { parts: [{ outline: rect(1000, 1000), material: soil }], loads: [], moments: { Mx: 10e6, My: 0 }, noTension: true }
    expect(analyseSection(input).contact!.status).toBe('overturning')
    expect(analyseSection(input).contact!.message).toMatch(/must be compressive/)
  })
})

describe('the no-tension envelope is of the contact pressures', () => {
  // Pad 1000 x 1000: case A inside the core (uniform 1 MPa), case B at e = 300 mm (partial contact).
  const pad: AnalysisInput = { parts: [{ outline: rect(1000, 1000), material: soil }], noTension: true }
  const inside = setOf([{ P: 1e6, x: 0, y: 0 }], 0, 0, 'A')
  const outside = setOf([{ P: 1e6, x: 0, y: 300 }], 0, 0, 'B')

  it('its peak is the governing case\'s contact peak 2P/(3B(L/2 - e)) = 3.33 MPa, not the linear plane\'s P/A(1 + 6e/L) = 2.8 MPa (standard footing result)', () => {
    const f = evaluateFrame(frameInput(pad, [inside, outside], true))
    expect(f.kind).toBe('envelope')
    expectClose(-f.min!.value, (2 * 1e6) / (3 * 1000 * 200), 1e-9)
    expect(f.governs.min).toBe(1)
  })

  it('never shows tension: no maximum, and values above 0 are held at 0', () => {
    const f = evaluateFrame(frameInput(pad, [inside, outside], true))
    expect(f.max).toBeNull()
    expect(f.clampAbove).toBe(0)
  })

  it('a case that overturns is left out and listed', () => {
    const off = setOf([{ P: 1e6, x: 0, y: 600 }], 0, 0, 'C')
    const f = evaluateFrame(frameInput(pad, [inside, off], true))
    expect(f.overturning).toEqual([1])
    expectClose(-f.min!.value, 1, 1e-9) // P/A = 1 MPa from case A
  })
})

describe('no-tension pressure against the material\'s compression or bearing strength', () => {
  // Pad 1000 x 1000 on soil of bearing strength 0.2 MPa; P = 1000 kN at e = 300 mm: q_max = 3.33 MPa (standard footing result).
  const input: AnalysisInput = { parts: [{ outline: rect(1000, 1000), material: { name: 'Soil', E: 50, fc: 0.2 } }], loads: [{ P: 1e6, x: 0, y: 300 }], noTension: true }

  it('the answer gives the peak against fc and warns when it is exceeded (3.33 / 0.2 = 1667 %)', () => {
    const a = analyseSection(input)
    const b = a.contact!.bearing!
    expect(b).toHaveLength(1)
    expectClose(b[0]!.peak, 2e6 / (3 * 1000 * 200), 1e-9)
    expectClose(b[0]!.ratio, 2e6 / (3 * 1000 * 200) / 0.2, 1e-9)
    expect(a.warnings.some(w => /reaches 3\.33 MPa .* 1667 % of its compression or bearing strength 0\.2 MPa/.test(w))).toBe(true)
  })

  it('the editor\'s frame gives the same check; within strength there is no warning', () => {
    const a = analyseSection(input)
    const f = evaluateFrame({ ...frameInput(input, [setOf(input.loads as { P: number; x: number; y: number }[])]), regions: a.regions.map(r => ({ name: r.name, n: r.n, rings: r.polygons.flat(), fc: r.fc })) })
    expectClose(f.bearing[0]!.ratio, a.contact!.bearing![0]!.ratio, 1e-9)
    const strong = analyseSection({ ...input, parts: [{ outline: rect(1000, 1000), material: { name: 'Rock', E: 50, fc: 10 } }] })
    expect(strong.contact!.bearing![0]!.ratio).toBeLessThan(1)
    expect(strong.warnings.some(w => /bearing strength/.test(w))).toBe(false)
  })
})

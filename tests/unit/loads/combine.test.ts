import { describe, expect, it } from 'vitest'
import {
  caseLoadSet,
  combinationFormula,
  combinationLoadSet,
  envelopeAt,
  envelopeExtremes,
  loadSetsFor,
  showOptions,
  withLoadAt,
} from '../../../shared/loads/combine'
import type { CaseDef, CaseLoad, CombinationDef } from '../../../shared/loads/combine'
import { planeExtremes, resultantActions, stressPlane } from '../../../shared/mechanics/stress'
import type { InertiaLike } from '../../../shared/mechanics/stress'
import { expectClose } from '../../support/expect-close'

// A 400 (x) × 600 (y) mm rectangle centred at the origin. Closed form (README "Method"): A = bh,
// Ixx = b·h³/12 = 7.2e9 mm⁴, Iyy = h·b³/12 = 3.2e9 mm⁴, Ixy = 0.
const b = 400
const h = 600
const props: InertiaLike = { area: b * h, centroid: { x: 0, y: 0 }, Ixx: (b * h ** 3) / 12, Iyy: (h * b ** 3) / 12, Ixy: 0 }
const hull = [[-200, -300], [200, -300], [200, 300], [-200, 300]] as const

const cases: CaseDef[] = [
  { id: 'dead', name: 'Dead', Mx: 0, My: 0 },
  { id: 'wind', name: 'Wind', Mx: 1e8, My: 0 },
  { id: 'imposed', name: 'Imposed', Mx: 0, My: 0 },
]
const loads: CaseLoad[] = [
  { id: 'g', name: 'G', caseId: 'dead', P: 1_000_000, x: 0, y: 0 },
  { id: 'q', name: 'Q', caseId: 'imposed', P: 200_000, x: 50, y: 0 },
]
// Example factors typed by a user (labelled as an example, not any code's values).
const combos: CombinationDef[] = [
  { id: 'c1', name: 'Example 1', factors: { dead: 1.35, imposed: 1.5 } },
  { id: 'c2', name: 'Wind up', factors: { dead: 1, wind: 1 } },
  { id: 'c3', name: 'Wind down', factors: { dead: 1, wind: -1 } },
]

describe('caseLoadSet', () => {
  it('caseLoadSet(loads, cases, id) takes the loads of that case unfactored with its moments', () => {
    const set = caseLoadSet(loads, cases, 'wind')
    expect(set.loads).toEqual([])
    expect(set.moments).toEqual({ Mx: 1e8, My: 0 })
    const dead = caseLoadSet(loads, cases, 'dead')
    expect(dead.ids).toEqual(['g'])
    expect(dead.loads).toEqual([{ P: 1_000_000, x: 0, y: 0 }])
  })
})

describe('combinationLoadSet', () => {
  it('factors every load by its case (hand calculation: 1.35 × 1000 kN and 1.5 × 200 kN)', () => {
    const set = combinationLoadSet(loads, cases, combos[0]!)
    expect(set.ids).toEqual(['g', 'q'])
    expectClose(set.loads[0]!.P, 1_350_000)
    expectClose(set.loads[1]!.P, 300_000)
    // Resultant P = 1650 kN at x = 300 000·50 / 1 650 000 = 9.0909 mm (hand calculation).
    const act = resultantActions(props, set.loads, set.moments)
    expectClose(act.P, 1_650_000)
    expectClose(act.ex!, (300_000 * 50) / 1_650_000)
  })

  it('adds the factored case moments: 1·0 − 1·1e8 N·mm (hand calculation)', () => {
    expect(combinationLoadSet(loads, cases, combos[2]!).moments).toEqual({ Mx: -1e8, My: 0 })
  })

  it('combinationFormula lists the typed factors', () => {
    expect(combinationFormula(cases, combos[0]!)).toBe('1.35 × Dead + 1.5 × Imposed')
  })
})

describe('loadSetsFor and showOptions', () => {
  it('gives one set for a case or combination and every combination for the envelope', () => {
    expect(loadSetsFor({ type: 'case', id: 'dead' }, loads, cases, combos)).toHaveLength(1)
    expect(loadSetsFor({ type: 'combination', id: 'c2' }, loads, cases, combos)[0]!.name).toBe('Wind up')
    expect(loadSetsFor({ type: 'envelope', id: null }, loads, cases, combos)).toHaveLength(3)
    // Without combinations the envelope runs over the cases.
    expect(loadSetsFor({ type: 'envelope', id: null }, loads, cases, [])).toHaveLength(3)
    // An unknown id falls back to the first case.
    expect(loadSetsFor({ type: 'case', id: 'nope' }, loads, cases, combos)[0]!.key).toBe('case:dead')
  })

  it('lists cases, combinations and the envelope', () => {
    const opts = showOptions(cases, combos)
    expect(opts.map(o => o.type)).toEqual(['case', 'case', 'case', 'combination', 'combination', 'combination', 'envelope'])
  })
})

describe('envelope', () => {
  // Dead 1000 kN at the centroid, wind Mx = ±100 kN·m. Hand calculation: P/A = 4.1667 MPa,
  // Mx·y/Ixx at y = 300 is 1e8·300/7.2e9 = 4.1667 MPa.
  const planes = loadSetsFor({ type: 'combination', id: 'c2' }, loads, cases, combos)
    .concat(loadSetsFor({ type: 'combination', id: 'c3' }, loads, cases, combos))
    .map(set => {
      const a = resultantActions(props, set.loads, set.moments)
      return stressPlane(props, a.N, a.Mx, a.My)!
    })

  it('envelopeAt gives the worst compression and worst tension at a point (hand calculation)', () => {
    const [lo, hi] = envelopeAt(planes, 0, 300)
    expectClose(lo, -1_000_000 / 240_000 - 1e8 * 300 / 7.2e9)
    expect(Math.abs(hi)).toBeLessThan(1e-12)
    const [lo2, hi2] = envelopeAt(planes, 0, 0)
    expectClose(lo2, -1_000_000 / 240_000)
    expectClose(hi2, -1_000_000 / 240_000)
  })

  it('envelopeExtremes over the hull picks the governing set and point (hand calculation: −8.333 MPa)', () => {
    const ext = envelopeExtremes(planes, hull)!
    expectClose(ext.min.value, -8.333333333333334)
    expect(Math.abs(ext.min.y)).toBe(300)
    // Each plane's own extremes agree with planeExtremes (reuse of the shared stress core).
    const own = planes.map(p => planeExtremes(p, hull)!.min.value)
    expectClose(ext.min.value, Math.min(...own))
  })

  it('envelopeAt with no planes gives NaN', () => {
    expect(envelopeAt([], 0, 0).every(Number.isNaN)).toBe(true)
  })
})

describe('withLoadAt', () => {
  it('moves one load of a factored set and keeps its factored P', () => {
    const set = combinationLoadSet(loads, cases, combos[0]!)
    const moved = withLoadAt(set, 'q', 120, -30)
    expect(moved.loads[1]).toEqual({ P: 300_000, x: 120, y: -30 })
    expect(moved.loads[0]).toBe(set.loads[0])
    expect(set.loads[1]).toEqual({ P: 300_000, x: 50, y: 0 })
    expect(withLoadAt(set, 'none', 0, 0)).toBe(set)
  })

  it('a dragged single load gives P/A·(1 + 6e/b) at the far edge (closed form, middle third rule)', () => {
    const set = caseLoadSet(loads, cases, 'dead')
    for (const e of [0, 20, b / 6, 100]) {
      const moved = withLoadAt(set, 'g', e, 0)
      const a = resultantActions(props, moved.loads, moved.moments)
      const plane = stressPlane(props, a.N, a.Mx, a.My)!
      const ext = planeExtremes(plane, hull)!
      const P = 1_000_000
      expectClose(ext.min.value, -(P / (b * h)) * (1 + (6 * e) / b))
      expectClose(ext.max.value, -(P / (b * h)) * (1 - (6 * e) / b), 1e-9, 1e-9)
    }
  })
})

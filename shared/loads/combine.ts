import type { AppliedMoments, PointLoad, StressPlane } from '../mechanics/types'
import type { LoadCase, LoadCombination, SketchLoad, SketchSettings } from '../sketch/document'

/** A load as the sketch document stores it: P in N (compression positive) at (x, y) in mm, in one case. */
export type CaseLoad = Readonly<Pick<SketchLoad, 'id' | 'caseId' | 'P' | 'x' | 'y'>> & { readonly name?: string }

/** A load case: applied moments about the centroidal axes in N·mm (Mx varies stress with y, My with x). */
export type CaseDef = Readonly<LoadCase>

/** A combination: a factor per case id, typed by the user (no code's factors are built in). */
export type CombinationDef = Readonly<LoadCombination>

/** What the stress view shows. `id` is a case or combination id; the envelope needs none. */
export type ShowChoice = Readonly<SketchSettings['show']>

/** One set of loads acting together: factored point loads (N, mm), moments (N·mm), and where it came from. */
export interface LoadSet {
  readonly key: string
  readonly name: string
  /** Ids of the loads in `loads`, in order, so a dragged load can be found again. */
  readonly ids: readonly string[]
  /** Factor applied to each load (1 for a case), so a drag position can be factored the same way. */
  readonly factors: readonly number[]
  readonly loads: PointLoad[]
  readonly moments: AppliedMoments
}

/** An option of the case / combination / envelope picker. */
export interface ShowOption {
  readonly type: ShowChoice['type']
  readonly id: string | null
  readonly label: string
}

/**
 * The loads of one case, unfactored: P (N, compression positive) at (x, y) mm, and the case's
 * applied moments (N·mm). Unknown case id: no loads, no moments.
 */
export function caseLoadSet(loads: readonly CaseLoad[], cases: readonly CaseDef[], caseId: string): LoadSet {
  const def = cases.find(c => c.id === caseId)
  return factoredSet(`case:${caseId}`, def?.name ?? caseId, loads, cases, { [caseId]: 1 })
}

/**
 * The factored loads of a combination: every load of case k has P·f_k (N), moments are Σ f_k·M_k
 * (N·mm). Cases absent from the factors count with factor 0 and are left out.
 */
export function combinationLoadSet(loads: readonly CaseLoad[], cases: readonly CaseDef[], combination: CombinationDef): LoadSet {
  return factoredSet(`combination:${combination.id}`, combination.name, loads, cases, combination.factors)
}

function factoredSet(key: string, name: string, loads: readonly CaseLoad[], cases: readonly CaseDef[], factors: Readonly<Record<string, number>>): LoadSet {
  const ids: string[] = []
  const fs: number[] = []
  const out: PointLoad[] = []
  for (const load of loads) {
    const f = factors[load.caseId]
    if (f === undefined || f === 0 || !Number.isFinite(f)) continue
    ids.push(load.id)
    fs.push(f)
    out.push({ P: f * load.P, x: load.x, y: load.y })
  }
  let Mx = 0
  let My = 0
  for (const c of cases) {
    const f = factors[c.id]
    if (f === undefined || !Number.isFinite(f)) continue
    Mx += f * c.Mx
    My += f * c.My
  }
  return { key, name, ids, factors: fs, loads: out, moments: { Mx, My } }
}

/**
 * The load sets the view must evaluate for a choice: one for a case or a combination; for the
 * envelope every combination, or every case when there is no combination. An unknown id falls
 * back to the first case.
 */
export function loadSetsFor(
  show: ShowChoice,
  loads: readonly CaseLoad[],
  cases: readonly CaseDef[],
  combinations: readonly CombinationDef[],
): LoadSet[] {
  if (show.type === 'envelope') {
    if (combinations.length > 0) return combinations.map(c => combinationLoadSet(loads, cases, c))
    return cases.map(c => caseLoadSet(loads, cases, c.id))
  }
  if (show.type === 'combination') {
    const combo = combinations.find(c => c.id === show.id)
    if (combo) return [combinationLoadSet(loads, cases, combo)]
  }
  const def = cases.find(c => c.id === show.id) ?? cases[0]
  return def ? [caseLoadSet(loads, cases, def.id)] : []
}

/** Picker options: every case, every combination, then the envelope (labels in plain words). */
export function showOptions(cases: readonly CaseDef[], combinations: readonly CombinationDef[]): ShowOption[] {
  const out: ShowOption[] = cases.map(c => ({ type: 'case' as const, id: c.id, label: `Case: ${c.name}` }))
  for (const c of combinations) out.push({ type: 'combination', id: c.id, label: `Combination: ${c.name}` })
  out.push({ type: 'envelope', id: null, label: combinations.length > 0 ? 'Envelope of all combinations' : 'Envelope of all cases' })
  return out
}

/** A readable formula of a combination, e.g. "1.35 × Dead + 1.5 × Imposed" (factors as typed). */
export function combinationFormula(cases: readonly CaseDef[], combination: CombinationDef): string {
  const terms = cases
    .filter(c => combination.factors[c.id] !== undefined && combination.factors[c.id] !== 0)
    .map(c => `${combination.factors[c.id]} × ${c.name}`)
  return terms.length > 0 ? terms.join(' + ') : 'no cases'
}

/**
 * The envelope of several stress planes (MPa, tension positive) at (x, y) mm: the most compressive
 * value (minimum, ≤ 0 means compression) and the most tensile (maximum). Writes into `out` to stay
 * allocation-free in loops; returns it. With no planes both are NaN.
 */
export function envelopeAt(planes: readonly StressPlane[], x: number, y: number, out: [number, number] = [0, 0]): [number, number] {
  let lo = Infinity
  let hi = -Infinity
  for (let i = 0; i < planes.length; i++) {
    const p = planes[i]!
    const v = p.a + p.b * x + p.c * y
    if (v < lo) lo = v
    if (v > hi) hi = v
  }
  out[0] = planes.length > 0 ? lo : Number.NaN
  out[1] = planes.length > 0 ? hi : Number.NaN
  return out
}

/** Envelope extreme over points: the worst compression and worst tension (MPa) and which set gives each. */
export interface EnvelopeExtreme {
  readonly value: number
  readonly x: number
  readonly y: number
  /** Index into the planes (the load set) that governs. */
  readonly set: number
}

/**
 * Worst compression (most negative) and worst tension (most positive) of an envelope over a list of
 * points (mm): since each field is a plane, over a section these lie on its convex hull's vertices.
 * `scale` multiplies every value (the modular ratio n of a material region). Null for no points or planes.
 */
export function envelopeExtremes(planes: readonly StressPlane[], points: readonly (readonly [number, number])[], scale = 1): { min: EnvelopeExtreme; max: EnvelopeExtreme } | null {
  if (planes.length === 0 || points.length === 0) return null
  let min = { value: Infinity, x: 0, y: 0, set: 0 }
  let max = { value: -Infinity, x: 0, y: 0, set: 0 }
  for (let k = 0; k < planes.length; k++) {
    const p = planes[k]!
    for (const q of points) {
      const v = scale * (p.a + p.b * q[0] + p.c * q[1])
      if (v < min.value) min = { value: v, x: q[0], y: q[1], set: k }
      if (v > max.value) max = { value: v, x: q[0], y: q[1], set: k }
    }
  }
  return { min, max }
}

/**
 * The set with one load moved to (x, y) mm (a drag in progress): the load keeps its factored P.
 * Writes into `scratch` (reused between frames) and returns a set sharing every other field; the
 * original set is returned unchanged when the load is not in it.
 */
export function withLoadAt(set: LoadSet, loadId: string, x: number, y: number, scratch: PointLoad[] = []): LoadSet {
  const at = set.ids.indexOf(loadId)
  if (at < 0) return set
  scratch.length = set.loads.length
  for (let i = 0; i < set.loads.length; i++) scratch[i] = i === at ? { P: set.loads[i]!.P, x, y } : set.loads[i]!
  return { ...set, loads: scratch }
}

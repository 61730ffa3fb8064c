import { ringExtent } from '../geometry/bounds'
import type { Line, Ring } from '../geometry/types'
import { envelopeExtremes, type LoadSet } from '../loads/combine'
import { bearingChecks, contactUnderActions, type ContactRegion } from '../mechanics/contact'
import { inKern, kernMargin, neutralAxis, planeExtremes, resultantActions, stressPlane, tensionOnset, type InertiaLike, type TensionOnset } from '../mechanics/stress'
import type { BearingCheck, ContactResult, StressPlane, StressPoint } from '../mechanics/types'
import { lineInRings } from './field'

/** A material region as the view draws it: n = E / E_ref and all its rings flattened (mm). */
export interface FrameRegion {
  readonly name: string
  readonly n: number
  readonly rings: readonly Ring[]
  /** Compression or bearing strength (MPa) the no-tension pressure is checked against, if known. */
  readonly fc?: number | null
}

/** What one evaluation needs: properties (mm, mm², mm⁴), hull and core (mm), regions and the load sets. */
export interface FrameInput {
  readonly props: InertiaLike
  readonly hull: Ring
  readonly kern: Ring
  readonly regions: readonly FrameRegion[]
  /** One set for a case or combination; several for the envelope. */
  readonly sets: readonly LoadSet[]
  readonly envelope: boolean
  readonly noTension: boolean
}

/** The resultant of the shown set: P (N, compression +), N (tension +), moments (N·mm), its point (mm) or null. */
export interface FrameResultant {
  P: number
  N: number
  Mx: number
  My: number
  x: number | null
  y: number | null
}

/**
 * The live stress state for one drag frame (MPa tension positive, mm section coordinates). `planes`
 * are the equivalent planes (a region's stress is n × plane). `kind` says how to draw it: one exact
 * plane, an envelope (sampled), or a no-tension contact plane (exact, clamped at 0).
 */
export interface StressFrame {
  kind: 'none' | 'plane' | 'envelope' | 'contact'
  planes: StressPlane[]
  resultant: FrameResultant | null
  /** Most compressive and most tensile point over all regions (n applied). */
  min: StressPoint | null
  max: StressPoint | null
  neutral: Line | null
  neutralInSection: boolean
  inKern: boolean | null
  /** Signed distance (mm) of the resultant to the core's edge: + inside, − outside. */
  margin: number | null
  /** Where tension first appears moving the resultant away from the centroid. */
  onset: TensionOnset | null
  contact: ContactResult | null
  /** Colour scale half-range (MPa). */
  limit: number
  /** No-tension envelope: the load sets (indexes) that overturn and so are left out of it. */
  overturning: number[]
  /** Envelope: the load set (index into the sets) that gives `min` and the one that gives `max`. */
  governs: { min: number | null; max: number | null }
  /** Values above this are held there when drawn and checked: 0 for a no-tension view, else Infinity. */
  clampAbove: number
  /** No-tension: each material's peak pressure against its compression or bearing strength (the worst set in an envelope). */
  bearing: BearingCheck[]
  /** No set carries a load or a moment: nothing to show but "no load". */
  noLoad: boolean
}

const EMPTY: StressFrame = { kind: 'none', planes: [], resultant: null, min: null, max: null, neutral: null, neutralInSection: false, inKern: null, margin: null, onset: null, contact: null, limit: 1, overturning: [], governs: { min: null, max: null }, clampAbove: Infinity, bearing: [], noLoad: false }
const scratchSeg: number[] = []
const scratchT: number[] = []

/**
 * Evaluates the stress view for the given load sets from the section properties alone: no server
 * round trip (the formulas are those of shared/mechanics/stress, contact and kern). `dir` is the
 * direction (dx, dy) used for "where tension first appears" when the resultant sits on the centroid.
 */
export function evaluateFrame(input: FrameInput, dir: readonly [number, number] = [1, 0]): StressFrame {
  const { props, hull, regions, sets } = input
  if (regions.length === 0) return EMPTY
  if (!sets.some(set => set.loads.some(l => l.P !== 0) || set.moments.Mx !== 0 || set.moments.My !== 0)) return { ...EMPTY, noLoad: true }
  const planes: StressPlane[] = []
  let first: ReturnType<typeof resultantActions> | null = null
  for (const set of sets) {
    const act = resultantActions(props, set.loads, set.moments)
    first ??= act
    const plane = stressPlane(props, act.N, act.Mx, act.My)
    if (plane) planes.push(plane)
  }
  if (planes.length === 0 || first === null) return EMPTY
  const xc = props.centroid.x
  const yc = props.centroid.y
  const single = !input.envelope
  const resultant: FrameResultant | null = single
    ? { P: first.P, N: first.N, Mx: first.Mx, My: first.My, x: first.ex === null ? null : xc + first.ex, y: first.ey === null ? null : yc + first.ey }
    : null

  const contactRegions: ContactRegion[] | null = input.noTension ? regions.map(r => ({ n: r.n, polygons: r.rings.map(ring => [ring]) })) : null
  if (single && contactRegions) {
    // The same entry point as the server: the resultant of the loads and the applied moments.
    const contact = contactUnderActions(props, contactRegions, hull, sets[0]!.loads, sets[0]!.moments)
    const q = contact.plane
    const peak = contact.peak
    return {
      ...EMPTY,
      kind: 'contact',
      planes: q ? [{ a: -q.a, b: -q.b, c: -q.c }] : [],
      resultant,
      min: peak ? { value: -peak.value, x: peak.x, y: peak.y } : null,
      max: null,
      neutral: contact.liftOff,
      neutralInSection: contact.liftOff !== null,
      ...kernState(input, first, dir),
      contact,
      limit: peak ? Math.max(peak.value, 1e-9) : 1,
      clampAbove: 0,
      bearing: bearingChecks(contact, regions.map(r => ({ name: r.name, n: r.n, rings: r.rings, fc: r.fc ?? null }))),
    }
  }
  if (contactRegions) return contactEnvelope(input, contactRegions)

  const { min, max, governs } = extremesOver(regions, hull, planes)
  const limit = Math.max(Math.abs(min?.value ?? 0), Math.abs(max?.value ?? 0), 1e-9)
  if (!single) return { ...EMPTY, kind: 'envelope', planes, min, max, limit, governs }

  const plane = planes[0]!
  const neutral = neutralAxis(plane, ringExtent(hull))
  let inside = false
  if (neutral) {
    for (const region of regions) {
      if (lineInRings(region.rings, neutral.a, neutral.b, neutral.c, scratchSeg, scratchT).length > 0) {
        inside = true
        break
      }
    }
  }
  return { ...EMPTY, kind: 'plane', planes, resultant, min, max, neutral, neutralInSection: inside, ...kernState(input, first, dir), limit }
}

/** Most compressive and most tensile point over the regions' vertices for the planes, and which plane gives each. */
function extremesOver(regions: readonly FrameRegion[], hull: Ring, planes: readonly StressPlane[]): { min: StressPoint | null; max: StressPoint | null; governs: StressFrame['governs'] } {
  let min: StressPoint | null = null
  let max: StressPoint | null = null
  const governs: StressFrame['governs'] = { min: null, max: null }
  for (const region of regions) {
    const pts = regions.length === 1 ? hull : region.rings.flat()
    const ext = envelopeExtremes(planes, pts, region.n)
    if (!ext) continue
    if (min === null || ext.min.value < min.value) {
      min = { value: ext.min.value, x: ext.min.x, y: ext.min.y }
      governs.min = ext.min.set
    }
    if (max === null || ext.max.value > max.value) {
      max = { value: ext.max.value, x: ext.max.x, y: ext.max.y }
      governs.max = ext.max.set
    }
  }
  return { min, max, governs }
}

/**
 * The envelope of several load sets on a no-tension material: each set's contact pressure (the
 * same solver as a single set), so the envelope is of the no-tension pressures, never of the linear
 * planes; tension is never shown (max is null, values above 0 are held at 0). Sets that overturn
 * have no pressure and are listed in `overturning`.
 */
function contactEnvelope(input: FrameInput, regions: readonly ContactRegion[]): StressFrame {
  const planes: StressPlane[] = []
  const setOf: number[] = []
  const overturning: number[] = []
  const worst = new Map<string, BearingCheck>()
  const bearingRegions = input.regions.map(r => ({ name: r.name, n: r.n, rings: r.rings, fc: r.fc ?? null }))
  input.sets.forEach((set, k) => {
    const contact = contactUnderActions(input.props, regions, input.hull, set.loads, set.moments)
    const q = contact.plane
    if (q === null) overturning.push(k)
    else {
      planes.push({ a: -q.a, b: -q.b, c: -q.c })
      setOf.push(k)
      for (const check of bearingChecks(contact, bearingRegions)) {
        const previous = worst.get(check.name)
        if (!previous || check.ratio > previous.ratio) worst.set(check.name, check)
      }
    }
  })
  const { min, governs } = extremesOver(input.regions, input.hull, planes)
  const compressive = min !== null && min.value < 0 ? min : null
  const limit = Math.max(Math.abs(compressive?.value ?? 0), 1e-9)
  const governing = compressive && governs.min !== null ? setOf[governs.min]! : null
  return { ...EMPTY, kind: 'envelope', planes, min: compressive, max: null, limit, overturning, governs: { min: governing, max: null }, clampAbove: 0, bearing: [...worst.values()] }
}

function kernState(input: FrameInput, act: ReturnType<typeof resultantActions>, dir: readonly [number, number]): Pick<StressFrame, 'inKern' | 'margin' | 'onset'> {
  if (act.ex === null || act.ey === null || !(act.P > 0)) return { inKern: null, margin: null, onset: null }
  const { props, hull, kern } = input
  const r = Math.hypot(act.ex, act.ey)
  const dx = r > 1e-9 ? act.ex / r : dir[0]
  const dy = r > 1e-9 ? act.ey / r : dir[1]
  return {
    inKern: inKern(props, hull, act.ex, act.ey),
    margin: kernMargin(kern, props.centroid.x + act.ex, props.centroid.y + act.ey),
    onset: tensionOnset(props, hull, act.ex, act.ey, dx, dy),
  }
}


/** Snap targets for a dragged load (mm): the centroid, the core's vertices and the principal axes (theta in degrees). */
export interface LoadSnapTargets {
  readonly centroid: readonly [number, number]
  readonly kern: Ring
  readonly theta: number
}

/** What a dragged load snapped to, for the cue. */
export type LoadSnap = 'centroid' | 'core vertex' | 'principal axis 1' | 'principal axis 2' | null

/**
 * Snaps a load position (mm) within `tol` mm: the centroid first, then a core vertex, then the
 * nearest point on a principal axis. Writes the point into `out` and returns what it snapped to.
 */
export function snapLoadPoint(x: number, y: number, t: LoadSnapTargets, tol: number, out: [number, number]): LoadSnap {
  const [xc, yc] = t.centroid
  out[0] = x
  out[1] = y
  if (Math.hypot(x - xc, y - yc) <= tol) {
    out[0] = xc
    out[1] = yc
    return 'centroid'
  }
  // Squared distances: the core of a round section has thousands of vertices, asked every drag frame.
  const tol2 = tol * tol
  for (const k of t.kern) {
    const dx = x - k[0]
    const dy = y - k[1]
    if (dx * dx + dy * dy <= tol2) {
      out[0] = k[0]
      out[1] = k[1]
      return 'core vertex'
    }
  }
  const th = (t.theta * Math.PI) / 180
  const axes: [number, number, LoadSnap][] = [[Math.cos(th), Math.sin(th), 'principal axis 1'], [-Math.sin(th), Math.cos(th), 'principal axis 2']]
  let best: LoadSnap = null
  let bestD = tol
  for (const [ux, uy, name] of axes) {
    const along = (x - xc) * ux + (y - yc) * uy
    const d = Math.abs((x - xc) * uy - (y - yc) * ux)
    if (d <= bestD) {
      bestD = d
      best = name
      out[0] = xc + along * ux
      out[1] = yc + along * uy
    }
  }
  return best
}

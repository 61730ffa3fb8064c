import { clipRingHalfPlane } from '../geometry/clip'
import { addRingMoments, ringArea, zeroMoments } from '../geometry/moments'
import type { Moments } from '../geometry/moments'
import type { Point, Polygon, Ring } from '../geometry/types'
import type { AppliedMoments, BearingCheck, ContactResult, PointLoad, StressPoint } from './types'
import { inertiaDeterminant, resultantActions, type InertiaLike } from './stress'

/** One material region for {@link solveContact}: n = E / E_ref (1 for a single material) and its polygons (mm). */
export interface ContactRegion {
  readonly n: number
  readonly polygons: readonly Polygon[]
}

/** Solver settings: tol bounds the moment residuals / (P·extent) (the force one is met exactly); maxIter bounds Newton steps. */
export interface ContactOptions {
  readonly tol?: number
  readonly maxIter?: number
}

/** A plane in coordinates local to the resultant: q = a + b·x + c·y, compression-positive (MPa). */
type Theta = readonly [a: number, b: number, c: number]

/** Rings shifted to the resultant, with their weight n. */
type LocalRegions = readonly { readonly n: number; readonly rings: readonly Point[][] }[]

/**
 * A trial lift-off line n·x = s about the resultant (n = (cos φ, sin φ) points to the lifted side,
 * s > 0 mm), with q = k·(s - n·x) scaled to carry P exactly. G is the pressure volume's centroid (mm)
 * in the line's frame (u along the line, v along n); jac = [[dGu/dδ, dGu/ds], [dGv/dδ, dGv/ds]] for a
 * turn φ → φ + δ. norm = |G| / extent (the moment residuals over P·extent). pi = -P²s² / (2∫(s - v)² dA)
 * is the least potential energy over scalings of the line's plane (see {@link better}).
 */
interface Trial {
  phi: number
  s: number
  k: number
  gu: number
  gv: number
  norm: number
  pi: number
  jac: readonly [number, number, number, number]
}

/**
 * No-tension contact under point loads (N, compression-positive, at mm) AND applied moments (N·mm
 * about the centroid, README "Method"): the one entry point the server and the editor both call.
 * The actions are reduced to their resultant: P = ΣP_i at x_P = x_c - My/P, y_P = y_c - Mx/P, with
 * Mx, My the totals (loads' moments plus applied moments, resultantActions); then solveContact.
 * A net pull, or moments with no net compression, is overturning (no equilibrium without tension).
 */
export function contactUnderActions(
  props: InertiaLike,
  regions: readonly ContactRegion[],
  hull: Ring,
  loads: readonly PointLoad[],
  moments: AppliedMoments | undefined,
  options: ContactOptions = {},
): ContactResult {
  const act = resultantActions(props, loads, moments)
  if (!(act.P > 0) || act.ex === null || act.ey === null) {
    return overturning('The total load must be compressive (P > 0): a no-tension base cannot resist a net pull or a pure moment.')
  }
  return solveContact(props, regions, hull, [{ P: act.P, x: props.centroid.x + act.ex, y: props.centroid.y + act.ey }], options)
}

/** The resultant must lie this far (relative to the hull's size) inside every hull edge to count as inside. */
const INSIDE_TOL = 1e-7
/** Once the residual is below tol, keep taking full Newton steps while it falls, down to POLISH·tol. */
const POLISH = 1e-3

/**
 * No-tension contact (README "Method") under compressive point loads (N, compression-positive, at mm in
 * SECTION coordinates): the compressed plane q = a + b·x + c·y (MPa, compression-positive, section
 * coordinates) over the region where q > 0, in equilibrium with the loads. Status 'full' when the
 * resultant is inside the core, 'partial' when part lifts off, 'overturning' (all numbers null) when the
 * resultant is on or outside the convex hull or the total load is not compressive. Pressures in a
 * region are n × q; the area is the physical contact area (mm²). `hull` is the convex hull, CCW or CW.
 */
export function solveContact(
  props: InertiaLike,
  regions: readonly ContactRegion[],
  hull: Ring,
  loads: readonly PointLoad[],
  options: ContactOptions = {},
): ContactResult {
  const tol = options.tol ?? 1e-9
  const maxIter = options.maxIter ?? 100
  let P = 0
  let Px = 0
  let Py = 0
  for (const load of loads) {
    P += load.P
    Px += load.P * (load.x - props.centroid.x)
    Py += load.P * (load.y - props.centroid.y)
  }
  if (!Number.isFinite(P + Px + Py)) return overturning('A load is not a finite number.')
  if (!(P > 0)) return overturning('The total load must be compressive (P > 0): a no-tension base cannot resist a net pull or a pure moment.')
  if (hull.length < 3 || !(props.area > 0)) return overturning('The section has no area, so no contact can form.')
  // Work about the resultant: it always lies inside the contact zone, so even a tiny zone near the hull
  // keeps full precision in its moments, and the moment equations become ∫q·x = ∫q·y = 0.
  const ox = props.centroid.x + Px / P
  const oy = props.centroid.y + Py / P
  const extent = Math.max(hullRadius(hull, ox, oy), Number.MIN_VALUE)
  const edge = nearestEdge(hull, ox, oy)
  if (edge === null || !(edge.distance > INSIDE_TOL * extent)) {
    return overturning('Overturning: the resultant lies on or outside the base (its convex hull), so no equilibrium exists without tension.')
  }
  const local: LocalRegions = regions.map((r) => ({ n: r.n, rings: r.polygons.flatMap((polygon) => polygon.map((ring) => shift(ring, ox, oy))) }))

  // Uncracked start: the full section's moments about the resultant give the elastic plane.
  const full = zeroMoments()
  for (const region of local) for (const ring of region.rings) addRingMoments(full, ring, [0, 0], region.n)
  const start = solve3(full, [P, 0, 0])
  if (start === null) return overturning('The section has no bending stiffness, so no contact can be computed.')
  if (allCompressed(start, hull, ox, oy, tol)) {
    return finish(true, start, local, ox, oy, 0, true, 'Full contact: the load is inside the core, so the whole section is in compression.')
  }

  // Newton on the three equilibrium equations, written for the lift-off line (φ, s) with the scale k of
  // (a, b, c) = k·(s, -cos φ, -sin φ) eliminated by the force equation. The moment equations then say
  // "the pressure volume's centroid is at the load", which moves almost linearly with s even while the
  // zone is far too large (Newton on (a, b, c) only shrinks a small zone by about 2/3 a step). The
  // Jacobian comes from the zone's moments [[A,Qy,Qx],[Qy,Jyy,Jxy],[Qx,Jxy,Jxx]] (q = 0 on the line, so
  // the moving boundary adds nothing), taken in the line's frame so that a sliver-thin zone keeps its digits.
  const g0 = Math.hypot(start[1], start[2])
  let current: Trial | null = null
  for (const [phi, s] of [[Math.atan2(-start[2], -start[1]), start[0] / g0] as const, ...nearEdgeLines(hull, edge.index, edge.distance, ox, oy)]) {
    const trial = evaluateLine(local, phi, s, P, extent)
    if (trial !== null && (current === null || trial.pi < current.pi)) current = trial
  }
  if (current === null) return overturning('The section has no bending stiffness, so no contact can be computed.')
  let iterations = 0
  while (current.norm > POLISH * tol && iterations < maxIter) {
    // Past tol, extra full steps are cheap digits (Newton converges quadratically), never a search.
    const polishing = current.norm <= tol
    iterations++
    const [j11, j12, j21, j22] = current.jac
    const det = j11 * j22 - j12 * j21
    const dDelta = (-current.gu * j22 + current.gv * j12) / det
    const dS = (-current.gv * j11 + current.gu * j21) / det
    if (!Number.isFinite(dDelta) || !Number.isFinite(dS)) break
    // Far away Newton's model of a turn is poor: turn at most one radian, then halve until better.
    let lambda = Math.min(1, 1 / Math.abs(dDelta))
    let accepted: Trial | null = null
    for (let k = 0; k < (polishing ? 1 : 40) && accepted === null; k++) {
      const trial = evaluateLine(local, current.phi + lambda * dDelta, current.s + lambda * dS, P, extent)
      if (trial !== null && better(trial, current)) accepted = trial
      else lambda /= 2
    }
    if (accepted === null || (polishing && !(accepted.norm < current.norm))) break
    current = accepted
  }
  const converged = current.norm <= tol
  const plane: Theta = [current.k * current.s, -current.k * Math.cos(current.phi), -current.k * Math.sin(current.phi)]
  const message = converged
    ? 'Partial contact: the load is outside the core, so part of the base lifts off beyond the line shown.'
    : `Partial contact did not converge after ${iterations} iterations (relative residual ${current.norm.toExponential(2)}): ` +
      'the load is probably extremely close to the edge of the base; treat these numbers with caution.'
  return finish(false, plane, local, ox, oy, iterations, converged, message)
}

/** Evaluates a trial line (see {@link Trial}); null when no load-bearing area is left. */
function evaluateLine(local: LocalRegions, phi: number, s: number, P: number, extent: number): Trial | null {
  if (!(s > 0) || !Number.isFinite(phi)) return null
  const c = Math.cos(phi)
  const sn = Math.sin(phi)
  // Moments in the right-handed frame u = (n turned -90°)·x, v = n·x: Qx and Jxx hold v.
  const m = zeroMoments()
  for (const region of local) {
    for (const ring of region.rings) {
      const kept = clipRingHalfPlane(ring, s, -c, -sn)
      if (kept.length >= 3) addRingMoments(m, kept.map((p) => [sn * p[0] - c * p[1], c * p[0] + sn * p[1]] as const), [0, 0], region.n)
    }
  }
  const { A, Qx: Qv, Qy: Qu, Jxx: Jvv, Jyy: Juu, Jxy: Juv } = m
  const V = s * A - Qv
  if (!(A > 0) || !(V > 0)) return null
  const Mu = s * Qu - Juv
  const Mv = s * Qv - Jvv
  const V2 = V * V
  // d/dδ of (V, Mu, Mv) is (Qu, Juu, Juv) since dq/dδ = u; d/ds is (A, Qu, Qv).
  const jac = [(Juu * V - Mu * Qu) / V2, (Qu * V - Mu * A) / V2, (Juv * V - Mv * Qu) / V2, (Qv * V - Mv * A) / V2] as const
  const trial = { phi, s, k: P / V, gu: Mu / V, gv: Mv / V, norm: Math.hypot(Mu, Mv) / (V * extent), pi: (-0.5 * P * P * s * s) / (s * s * A - 2 * s * Qv + Jvv), jac }
  return Number.isFinite(trial.norm) && Number.isFinite(trial.pi) && jac.every(Number.isFinite) ? trial : null
}

/**
 * Step acceptance. Contact is the minimum of the convex potential Π(θ) = ½∫ max(q, 0)² dA - P·q(load)
 * (gradient: the equilibrium residual; Hessian: the zone's moments), so a fall in Π (at each line's best
 * scale) is real progress even where the residual has to grow for a while. Near the answer Π is flat to
 * round-off, so a fall in the residual also counts.
 */
function better(trial: Trial, current: Trial): boolean {
  return trial.pi < current.pi - 1e-12 * Math.abs(current.pi) || trial.norm < current.norm
}

function overturning(message: string): ContactResult {
  return { status: 'overturning', area: null, peak: null, liftOff: null, plane: null, iterations: 0, converged: true, message }
}

/** Builds the result in section coordinates from a plane θ local to (ox, oy). */
function finish(whole: boolean, theta: Theta, local: LocalRegions, ox: number, oy: number, iterations: number, converged: boolean, message: string): ContactResult {
  const [a, b, c] = theta
  let area = 0
  let peak: StressPoint | null = null
  for (const region of local) {
    for (const ring of region.rings) {
      const kept = whole ? ring : clipRingHalfPlane(ring, a, b, c)
      area += ringArea(kept)
      for (const p of kept) {
        const q = region.n * (a + b * p[0] + c * p[1])
        if (peak === null || q > peak.value) peak = { value: q, x: p[0] + ox, y: p[1] + oy }
      }
    }
  }
  const g = Math.hypot(b, c)
  const aSection = a - b * ox - c * oy
  const liftOff = !whole && g > 0 ? { a: aSection / g, b: b / g, c: c / g } : null
  return { status: whole ? 'full' : 'partial', area, peak, liftOff, plane: { a: aSection, b, c }, iterations, converged, message }
}

/**
 * Solves [[A,Qy,Qx],[Qy,Jyy,Jxy],[Qx,Jxy,Jxx]]·θ = r; null when (nearly) singular. Reduced to the
 * region's own centroid first, where the bending block Iyy·b + Ixy·c = m1, Ixy·b + Ixx·c = m2 is well conditioned.
 */
function solve3(m: Moments, r: Theta): Theta | null {
  const { A, Qx, Qy, Jxx, Jyy, Jxy } = m
  if (!(A > 0)) return null
  const xc = Qy / A
  const yc = Qx / A
  const Iyy = Jyy - Qy * xc
  const Ixx = Jxx - Qx * yc
  const Ixy = Jxy - Qy * yc
  const D = inertiaDeterminant({ area: A, centroid: { x: xc, y: yc }, Ixx, Iyy, Ixy })
  if (D === null) return null
  const m1 = r[1] - xc * r[0]
  const m2 = r[2] - yc * r[0]
  const b = (Ixx * m1 - Ixy * m2) / D
  const c = (Iyy * m2 - Ixy * m1) / D
  const theta: Theta = [r[0] / A - b * xc - c * yc, b, c]
  return theta.every(Number.isFinite) ? theta : null
}

/** The hull edge nearest to (ox, oy) and the signed distance (mm) to its line, positive inside. */
function nearestEdge(hull: Ring, ox: number, oy: number): { index: number; distance: number } | null {
  const n = hull.length
  const sign = ringArea(hull) >= 0 ? 1 : -1
  let index = -1
  let distance = Infinity
  for (let i = 0; i < n; i++) {
    const p = hull[i]!
    const q = hull[(i + 1) % n]!
    const L = Math.hypot(q[0] - p[0], q[1] - p[1])
    const d = (sign * ((q[0] - p[0]) * (oy - p[1]) - (q[1] - p[1]) * (ox - p[0]))) / L
    if (L > 0 && d < distance) {
      distance = d
      index = i
    }
  }
  return index < 0 ? null : { index, distance }
}

/**
 * Extra starting lines (φ, s) about the resultant (ox, oy) for a load near the hull, where the uncracked
 * plane is a poor guess: parallel to the nearest edge at twice the load's distance d (the 1-D footing
 * wedge, contact depth 3d), and across each end of that edge with legs 4× the load's oblique offsets
 * along the corner's edges (a tetrahedral pressure volume has its centroid at a quarter of its legs).
 */
function nearEdgeLines(hull: Ring, edge: number, d: number, ox: number, oy: number): (readonly [number, number])[] {
  const n = hull.length
  const p = hull[edge]!
  const q = hull[(edge + 1) % n]!
  // The lift-off side of a line parallel to the edge points inward, against the edge's outward normal.
  const sign = ringArea(hull) >= 0 ? 1 : -1
  const lines: (readonly [number, number])[] = [[Math.atan2(sign * (q[0] - p[0]), -sign * (q[1] - p[1])), 2 * d]]
  for (const k of [edge, (edge + 1) % n]) {
    const o = hull[k]!
    const e1 = [hull[(k + 1) % n]![0] - o[0], hull[(k + 1) % n]![1] - o[1]] as const
    const e2 = [hull[(k + n - 1) % n]![0] - o[0], hull[(k + n - 1) % n]![1] - o[1]] as const
    // Resultant - corner = α·e1 + β·e2; the contact triangle has its far corners at 4α·e1 and 4β·e2.
    const det = e1[0] * e2[1] - e1[1] * e2[0]
    const alpha = ((ox - o[0]) * e2[1] - (oy - o[1]) * e2[0]) / det
    const beta = (e1[0] * (oy - o[1]) - e1[1] * (ox - o[0])) / det
    if (!(alpha > 0) || !(beta > 0) || !Number.isFinite(alpha + beta)) continue
    const ax = o[0] + 4 * alpha * e1[0] - ox
    const ay = o[1] + 4 * alpha * e1[1] - oy
    const bx = o[0] + 4 * beta * e2[0] - ox
    const by = o[1] + 4 * beta * e2[1] - oy
    const len = Math.hypot(by - ay, bx - ax)
    // Unit normal of the line AB, turned to point away from the corner (towards the lifted side).
    const flip = (by - ay) * (o[0] - ox - ax) - (bx - ax) * (o[1] - oy - ay) > 0 ? -1 : 1
    const mx = (flip * (by - ay)) / len
    const my = (-flip * (bx - ax)) / len
    const offset = mx * ax + my * ay
    if (offset > 0 && Number.isFinite(offset)) lines.push([Math.atan2(my, mx), offset])
  }
  return lines
}

/** q >= -tol·q(load) at every hull vertex (plane θ local to (ox, oy), hull in section coordinates). */
function allCompressed(t: Theta, hull: Ring, ox: number, oy: number, tol: number): boolean {
  const slack = tol * Math.abs(t[0])
  for (const p of hull) if (t[0] + t[1] * (p[0] - ox) + t[2] * (p[1] - oy) < -slack) return false
  return true
}

/** Largest distance (mm) from (ox, oy) to a hull vertex. */
function hullRadius(hull: Ring, ox: number, oy: number): number {
  let r = 0
  for (const p of hull) r = Math.max(r, Math.hypot(p[0] - ox, p[1] - oy))
  return r
}

function shift(ring: Ring, ox: number, oy: number): Point[] {
  return ring.map((p) => [p[0] - ox, p[1] - oy] as const)
}

/** A region for {@link bearingChecks}: its name, n = E / E_ref, rings (mm) and compression or bearing strength fc (MPa) or null. */
export interface BearingRegion {
  readonly name: string
  readonly n: number
  readonly rings: readonly Ring[]
  readonly fc: number | null
}

/**
 * The no-tension pressure of each material with a compression or bearing strength fc, against it:
 * n·q at its most pressed vertex (README "Method", no-tension contact). Empty for no contact or no fc.
 */
export function bearingChecks(contact: ContactResult, regions: readonly BearingRegion[]): BearingCheck[] {
  const q = contact.plane
  if (!q) return []
  const out: BearingCheck[] = []
  for (const region of regions) {
    if (typeof region.fc !== 'number' || !(region.fc > 0)) continue
    let peak = 0
    let at: Point = [0, 0]
    for (const ring of region.rings) {
      for (const p of ring) {
        const v = region.n * (q.a + q.b * p[0] + q.c * p[1])
        if (v > peak) {
          peak = v
          at = p
        }
      }
    }
    out.push({ name: region.name, peak, x: at[0], y: at[1], strength: region.fc, ratio: peak / region.fc })
  }
  return out
}

/** The warning for a material pressed past its strength, or null. */
export function bearingWarning(check: BearingCheck): string | null {
  if (!(check.ratio > 1)) return null
  return `The contact pressure on ${check.name} reaches ${Number(check.peak.toPrecision(3))} MPa at (${Number(check.x.toPrecision(6))}, ${Number(check.y.toPrecision(6))}) mm, ${Math.round(check.ratio * 100)} % of its compression or bearing strength ${check.strength} MPa.`
}

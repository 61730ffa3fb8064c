import { ringExtent } from '../geometry/bounds'
import type { Line, Polygon, Ring } from '../geometry/types'
import { SectionError } from './types'
import type { AppliedMoments, PointLoad, SectionProperties, StressPlane, StressPoint, StressResult } from './types'

/** The properties the stress formulas need: area (mm²), centroid (mm), centroidal Ixx, Iyy, Ixy (mm⁴). */
export type InertiaLike = Pick<SectionProperties, 'area' | 'centroid' | 'Ixx' | 'Iyy' | 'Ixy'>

/**
 * Resultant actions of point loads and applied moments about the centroid.
 * N is tension-positive (N = -P), Mx = Σ N_i·(y_i - y_c) + applied Mx, My = Σ N_i·(x_i - x_c) + applied My (N·mm).
 * P = ΣP_i is the total compression (N). ex, ey (mm from the centroid) place the single load P that
 * produces the same N, Mx, My (ex = -My/P, ey = -Mx/P, so applied moments are included); null when P ≈ 0.
 */
export interface ResultantActions {
  N: number
  Mx: number
  My: number
  P: number
  ex: number | null
  ey: number | null
}

/** Relative size below which a total load counts as zero against the sum of |P_i|. */
const ZERO_LOAD = 1e-12
/** Dimensionless tolerance of the core inequality: a vertex exactly on the boundary counts as in. */
const KERN_TOL = 1e-9

/** Sums the loads (N, compression-positive, at mm) and applied moments (N·mm) into N (tension-positive), Mx, My about the centroid; see {@link ResultantActions}. Throws SectionError for non-finite input. */
export function resultantActions(props: Pick<InertiaLike, 'centroid'>, loads: readonly PointLoad[], moments?: AppliedMoments): ResultantActions {
  const xc = props.centroid.x
  const yc = props.centroid.y
  let P = 0
  let absP = 0
  let Mx = moments?.Mx ?? 0
  let My = moments?.My ?? 0
  for (const load of loads) {
    P += load.P
    absP += Math.abs(load.P)
    Mx -= load.P * (load.y - yc)
    My -= load.P * (load.x - xc)
  }
  // Written so that no load gives +0, not -0.
  const N = P === 0 ? 0 : -P
  if (!Number.isFinite(P) || !Number.isFinite(Mx) || !Number.isFinite(My)) {
    throw new SectionError('A load or moment is not a finite number.')
  }
  const hasP = P !== 0 && Math.abs(P) > ZERO_LOAD * absP
  return { N, Mx, My, P, ex: hasP ? -My / P : null, ey: hasP ? -Mx / P : null }
}

/**
 * D = Ixx·Iyy - Ixy² (mm⁸), or null when the section has no area or no bending stiffness (D at or
 * below 1e-12 · Ixx·Iyy: the principal moments are that far apart in scale). The one guard every
 * solve with the inertia matrix goes through.
 */
export function inertiaDeterminant(props: InertiaLike): number | null {
  const { area, Ixx, Iyy, Ixy } = props
  if (!(area > 0) || !(Ixx > 0) || !(Iyy > 0) || !Number.isFinite(Ixy)) return null
  const D = Ixx * Iyy - Ixy * Ixy
  return D > 1e-12 * Ixx * Iyy ? D : null
}

/**
 * The stress plane sigma(x, y) = a + b·x + c·y (MPa, tension-positive, x and y in SECTION coordinates, mm)
 * for N (N, tension-positive) and centroidal moments Mx, My (N·mm), by the general unsymmetric formula
 * (README "Method"). Null when the properties are degenerate (no area, D = Ixx·Iyy - Ixy² ≈ 0, non-finite).
 */
export function stressPlane(props: InertiaLike, N: number, Mx: number, My: number): StressPlane | null {
  const D = inertiaDeterminant(props)
  if (D === null || !Number.isFinite(N) || !Number.isFinite(Mx) || !Number.isFinite(My)) return null
  const b = (My * props.Ixx - Mx * props.Ixy) / D
  const c = (Mx * props.Iyy - My * props.Ixy) / D
  const a = N / props.area - b * props.centroid.x - c * props.centroid.y
  return { a, b, c }
}

/** Largest (most tensile) and smallest (most compressive) value of a plane (MPa) over the hull vertices (mm); null for an empty hull. */
export function planeExtremes(plane: StressPlane, hull: Ring): { max: StressPoint; min: StressPoint } | null {
  if (hull.length === 0) return null
  let iMax = 0
  let iMin = 0
  let vMax = -Infinity
  let vMin = Infinity
  for (let i = 0; i < hull.length; i++) {
    const p = hull[i]!
    const v = plane.a + plane.b * p[0] + plane.c * p[1]
    if (v > vMax) {
      vMax = v
      iMax = i
    }
    if (v < vMin) {
      vMin = v
      iMin = i
    }
  }
  const pMax = hull[iMax]!
  const pMin = hull[iMin]!
  return { max: { value: vMax, x: pMax[0], y: pMax[1] }, min: { value: vMin, x: pMin[0], y: pMin[1] } }
}

/**
 * The neutral line sigma = 0 of a plane, normalised so sqrt(b² + c²) = 1 (a is then the signed distance
 * in mm from the section origin; the normal (b, c) points towards tension). Null when the stress is
 * uniform: |grad|·extent <= 1e-12·|a|, with extent (mm) a typical size of the section.
 */
export function neutralAxis(plane: StressPlane, extent = 1): Line | null {
  const g = Math.hypot(plane.b, plane.c)
  if (!(g > 0) || !Number.isFinite(g) || g * Math.abs(extent) <= 1e-12 * Math.abs(plane.a)) return null
  const line = { a: plane.a / g, b: plane.b / g, c: plane.c / g }
  return Number.isFinite(line.a) ? line : null
}

/**
 * True when a compressive load at eccentricity (ex, ey) (mm from the centroid) keeps every hull vertex
 * in compression: README "Method", 1 + A·[(Ixx·x_i - Ixy·y_i)·ex + (Iyy·y_i - Ixy·x_i)·ey]/D >= 0 with x_i, y_i
 * from the centroid. A vertex on the boundary (within 1e-9) counts as in. False for degenerate properties.
 */
export function inKern(props: InertiaLike, hull: Ring, ex: number, ey: number): boolean {
  const D = inertiaDeterminant(props)
  if (D === null || hull.length === 0 || !Number.isFinite(ex) || !Number.isFinite(ey)) return false
  const k = props.area / D
  // f_i = 1 + u·x_i + v·y_i with (u, v) fixed by the load: one multiply-add pair per vertex.
  const u = k * (props.Ixx * ex - props.Ixy * ey)
  const v = k * (props.Iyy * ey - props.Ixy * ex)
  const xc = props.centroid.x
  const yc = props.centroid.y
  for (let i = 0; i < hull.length; i++) {
    const p = hull[i]!
    if (1 + u * (p[0] - xc) + v * (p[1] - yc) < -KERN_TOL) return false
  }
  return true
}

/** Where tension first appears as a load moves: see {@link tensionOnset}. */
export interface TensionOnset {
  /** Distance (mm) the load may travel along the direction before the vertex reaches zero stress; 0 if it already is in tension. */
  distance: number
  /** Index in the hull and section coordinates (mm) of the vertex that goes into tension first. */
  index: number
  x: number
  y: number
  /** True when the start point is already outside the core (that vertex is the most tensile one). */
  startsInTension: boolean
}

/**
 * For a compressive load starting at eccentricity (ex, ey) (mm from the centroid) and moving along the
 * direction (dirX, dirY) (normalised here), the distance (mm) before the first hull vertex goes into
 * tension and which vertex. Null for a zero direction, an empty hull or degenerate properties.
 */
export function tensionOnset(props: InertiaLike, hull: Ring, ex: number, ey: number, dirX: number, dirY: number): TensionOnset | null {
  const D = inertiaDeterminant(props)
  const len = Math.hypot(dirX, dirY)
  if (D === null || hull.length === 0 || !(len > 0) || !Number.isFinite(len)) return null
  const dx = dirX / len
  const dy = dirY / len
  const k = props.area / D
  const u0 = k * (props.Ixx * ex - props.Ixy * ey)
  const v0 = k * (props.Iyy * ey - props.Ixy * ex)
  const du = k * (props.Ixx * dx - props.Ixy * dy)
  const dv = k * (props.Iyy * dy - props.Ixy * dx)
  const xc = props.centroid.x
  const yc = props.centroid.y
  let worst = 0
  let fWorst = Infinity
  let best = -1
  let tBest = Infinity
  for (let i = 0; i < hull.length; i++) {
    const p = hull[i]!
    const x = p[0] - xc
    const y = p[1] - yc
    const f = 1 + u0 * x + v0 * y
    if (f < fWorst) {
      fWorst = f
      worst = i
    }
    const slope = du * x + dv * y
    if (slope < 0) {
      const t = -f / slope
      if (t < tBest) {
        tBest = t
        best = i
      }
    }
  }
  if (!Number.isFinite(fWorst)) return null
  const startsInTension = fWorst < -KERN_TOL
  const index = startsInTension ? worst : best
  if (index < 0) return null
  const p = hull[index]!
  return { distance: startsInTension ? 0 : Math.max(0, tBest), index, x: p[0], y: p[1], startsInTension }
}

/**
 * Signed distance (mm) from a point (x, y) to the boundary of a convex CCW core polygon given in the
 * same coordinates (section coordinates for {@link kernPolygon}'s output): positive inside, negative
 * outside (the true distance to the polygon). Null for a polygon with fewer than 3 vertices.
 */
export function kernMargin(kern: Ring, x: number, y: number): number | null {
  const n = kern.length
  if (n < 3 || !Number.isFinite(x) || !Number.isFinite(y)) return null
  let inside = Infinity
  // The nearest squared distance to an edge: one square root at the end (a load drag asks every frame).
  let outside2 = Infinity
  let isOutside = false
  let p = kern[n - 1]!
  for (let i = 0; i < n; i++) {
    const q = kern[i]!
    const ux = q[0] - p[0]
    const uy = q[1] - p[1]
    const L2 = ux * ux + uy * uy
    if (L2 > 0) {
      const wx = x - p[0]
      const wy = y - p[1]
      // Left of a CCW edge is inside.
      const side = (ux * wy - uy * wx) / Math.sqrt(L2)
      if (side < 0) isOutside = true
      if (side < inside) inside = side
      const t = Math.min(1, Math.max(0, (ux * wx + uy * wy) / L2))
      const dx = wx - t * ux
      const dy = wy - t * uy
      const d2 = dx * dx + dy * dy
      if (d2 < outside2) outside2 = d2
    }
    p = q
  }
  if (!Number.isFinite(inside)) return null
  return isOutside ? -Math.sqrt(outside2) : inside
}

/** One material region for {@link sectionStress}: n = E / E_ref, its polygons (mm), and the index reported as `region`. */
export interface StressRegion {
  readonly n: number
  readonly polygons: readonly Polygon[]
  readonly region: number
}

/**
 * Full stress result (MPa, tension-positive; N in N, moments in N·mm about the centroid) for point loads
 * (compression-positive P) and applied moments. Vertex values are n × the equivalent plane, one
 * list per ring in the ring's vertex order (`polygon` and `ring` index the region's polygons, ring 0
 * the outline, then its holes), so they pair with the region's own coordinates. inKern is true when the
 * total load is compressive and every hull vertex stays in compression. Throws SectionError for degenerate properties.
 */
export function sectionStress(
  props: InertiaLike,
  hull: Ring,
  regions: readonly StressRegion[],
  loads: readonly PointLoad[],
  moments?: AppliedMoments,
): StressResult {
  const actions = resultantActions(props, loads, moments)
  const plane = stressPlane(props, actions.N, actions.Mx, actions.My)
  if (plane === null) throw new SectionError('The section has no area or no bending stiffness, so no stress can be computed.')
  const vertices: StressResult['vertices'] = []
  const nValues = new Set<number>()
  let max: StressPoint | null = null
  let min: StressPoint | null = null
  for (const region of regions) {
    nValues.add(region.n)
    for (let pi = 0; pi < region.polygons.length; pi++) {
      const polygon = region.polygons[pi]!
      for (let ri = 0; ri < polygon.length; ri++) {
        const ring = polygon[ri]!
        const values = new Array<number>(ring.length)
        let hi = 0
        let lo = 0
        for (let i = 0; i < ring.length; i++) {
          const p = ring[i]!
          const value = region.n * (plane.a + plane.b * p[0] + plane.c * p[1])
          values[i] = value
          if (value > values[hi]!) hi = i
          if (value < values[lo]!) lo = i
        }
        vertices.push({ region: region.region, polygon: pi, ring: ri, values })
        if (ring.length === 0) continue
        if (max === null || values[hi]! > max.value) max = { value: values[hi]!, x: ring[hi]![0], y: ring[hi]![1] }
        if (min === null || values[lo]! < min.value) min = { value: values[lo]!, x: ring[lo]![0], y: ring[lo]![1] }
      }
    }
  }
  if (nValues.size <= 1) {
    // One material: the plane's extremes are on the hull, scaled by that material's n.
    const n = nValues.size === 1 ? [...nValues][0]! : 1
    const ext = planeExtremes({ a: n * plane.a, b: n * plane.b, c: n * plane.c }, hull)
    if (ext !== null) {
      max = ext.max
      min = ext.min
    }
  }
  if (max === null || min === null) throw new SectionError('The section has no vertices to evaluate the stress at.')
  const extent = ringExtent(hull)
  const kern = actions.P > 0 && actions.ex !== null && actions.ey !== null && inKern(props, hull, actions.ex, actions.ey)
  return { N: actions.N, Mx: actions.Mx, My: actions.My, plane, max, min, neutralAxis: neutralAxis(plane, extent), inKern: kern, vertices }
}

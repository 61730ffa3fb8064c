import type { Material, PreparedSection } from './types'

/** One plastic neutral axis: offset d0 (mm) of the PNA along the axis normal, Z and Mp for either sense. */
export interface PlasticAxis {
  /** The PNA is the line nx·x + ny·y = offset in section coordinates (mm), n the unit normal of the axis. */
  offset: number
  /** Plastic moment (N·mm) with the side n·p < PNA in compression, and with it in tension; null without strengths. */
  Mp: number | null
  MpNeg: number | null
  /** Plastic modulus (mm³): geometric for one material, else Mp / fy_ref ("equivalent"); null when unknown. */
  Z: number | null
}

/**
 * How the plastic values were found: 'geometric' (one material: the PNA halves the area, independent
 * of E), 'force' (several materials: the PNA balances the yield forces, each material with its own
 * strength), or 'unavailable' (a material lacks a strength; `note` says which).
 */
export type PlasticMethod = 'geometric' | 'force' | 'unavailable'

/**
 * Plastic capacity of a section about x (horizontal PNA), y (vertical PNA), and the principal axes
 * u (major, PNA parallel to u) and v (minor). Never weighted by E (README "Method", plastic).
 */
export interface PlasticResult {
  method: PlasticMethod
  note: string
  /** fy of the reference material (MPa) that an equivalent Z refers to, or null. */
  fyRef: number | null
  x: PlasticAxis
  y: PlasticAxis
  u: PlasticAxis
  v: PlasticAxis
  /** y of the horizontal PNA and x of the vertical one (mm, section coordinates). */
  pnaY: number
  pnaX: number
}

/** The PNA offset is converged to this fraction of the section's extent. */
const OFFSET_TOLERANCE = 1e-12
const MAX_ITERATIONS = 200
/** Stress-block factor on fc when the material gives none (common practice for a rectangular block). */
export const DEFAULT_STRESS_BLOCK = 0.85

interface WeightedRing {
  /** Vertex coordinates shifted to the section's origin (mm). */
  readonly xs: Float64Array
  readonly ys: Float64Array
  /** Strengths (MPa, or 1 for the geometric method) on the compressed and on the tensile side. */
  readonly wc: number
  readonly wt: number
  /** Signed area and first moments Qx = ∫y, Qy = ∫x of the whole ring about the origin. */
  readonly A: number
  readonly Qx: number
  readonly Qy: number
}

/** Compression and tension strengths (MPa) of a material for plastic capacity, or a reason there are none. */
function strengths(material: Material): { c: number; t: number } | string {
  const label = material.name ?? `E = ${material.E} MPa`
  if (material.noTension) {
    if (typeof material.fc !== 'number') return `${label} carries no tension and has no compression strength fc`
    return { c: (material.stressBlock ?? DEFAULT_STRESS_BLOCK) * material.fc, t: 0 }
  }
  if (typeof material.fy !== 'number') return `${label} has no yield strength fy`
  return { c: material.fy, t: material.fy }
}

/**
 * Plastic neutral axes, plastic moments (N·mm) and plastic moduli (mm³) of a prepared section. One
 * material: each PNA splits the AREA into equal halves (purely geometric, independent of E), Z is
 * geometric and Mp = fy·Z when fy is known. Several materials: each PNA balances the yield forces
 * ∫ f dA (steel-like f = fy both sides; a no-tension material f = stressBlock·fc in compression, 0 in
 * tension), Mp = Σ|∫ f·d dA| for both senses, and Z = Mp / fy_ref as the equivalent for the reference
 * material (E = E_ref). The offsets come from a bracketing root search (regula falsi, Illinois step,
 * bisection safeguard) clipping every ring by the half-plane, to 1e-12 of the extent.
 */
export function plasticModuli(prepared: PreparedSection, theta = 0): PlasticResult {
  const { regions, referenceE, origin, bounds } = prepared
  const single = regions.length === 1
  const reasons: string[] = []
  const rings: WeightedRing[] = []
  for (const region of regions) {
    const f = strengths(region.material)
    if (typeof f === 'string') reasons.push(f)
    const [wc, wt] = single ? [1, 1] : typeof f === 'string' ? [1, 1] : [f.c, f.t]
    for (const polygon of region.polygons) for (const ring of polygon) rings.push(weighted(ring, origin, wc, wt))
  }
  const reference = regions.find((region) => region.material.E === referenceE) ?? regions[0]!
  const fyRef = typeof reference.material.fy === 'number' && !reference.material.noTension ? reference.material.fy : null
  const method: PlasticMethod = single ? 'geometric' : reasons.length > 0 ? 'unavailable' : 'force'
  const xc = origin[0]
  const yc = origin[1]
  const ext = Math.max(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY)
  // One material: Mp = fy·Z with its own fy (none for a no-tension material).
  const fy = typeof regions[0]!.material.fy === 'number' && !regions[0]!.material.noTension ? regions[0]!.material.fy : null
  const axis = (nx: number, ny: number): { t: number; result: PlasticAxis } => {
    const found = plasticAxis(rings, nx, ny, ext)
    const { Mp, MpNeg } = found
    const t = found.t + nx * xc + ny * yc
    if (method === 'geometric') return { t, result: { offset: t, Mp: fy === null ? null : fy * Mp, MpNeg: fy === null ? null : fy * MpNeg, Z: Mp } }
    if (method === 'unavailable') return { t, result: { offset: t, Mp: null, MpNeg: null, Z: null } }
    return { t, result: { offset: t, Mp, MpNeg, Z: fyRef === null ? null : Math.min(Mp, MpNeg) / fyRef } }
  }
  const x = axis(0, 1)
  const y = axis(1, 0)
  // About the principal axes: the normal of u is (-sin θ, cos θ); of v, (cos θ, sin θ). Within 1e-9 rad
  // of x and y (θ ≈ 0 or ±90°) they are those axes, so their answers are reused (a turned normal swaps the senses).
  const rad = (theta * Math.PI) / 180
  const flip = (a: { t: number; result: PlasticAxis }) => ({ t: -a.t, result: { offset: -a.result.offset, Mp: a.result.MpNeg, MpNeg: a.result.Mp, Z: a.result.Z } })
  const nearX = Math.abs(Math.sin(rad)) < 1e-9
  const nearY = Math.abs(Math.cos(rad)) < 1e-9
  const u = nearX ? (Math.cos(rad) > 0 ? x : flip(x)) : nearY ? (Math.sin(rad) > 0 ? flip(y) : y) : axis(-Math.sin(rad), Math.cos(rad))
  const v = nearX ? (Math.cos(rad) > 0 ? y : flip(y)) : nearY ? (Math.sin(rad) > 0 ? x : flip(x)) : axis(Math.cos(rad), Math.sin(rad))
  const note = method === 'geometric'
    ? 'One material: the plastic neutral axes halve the area (geometric, independent of E).'
    : method === 'force'
      ? `Several materials: the plastic neutral axes balance the yield forces of each material; Z is equivalent, for fy of the reference material${fyRef === null ? ' (which has none, so Z is not given)' : ` (${fyRef} MPa)`}.`
      : `Plastic capacity needs a strength for every material: ${reasons.join('; ')}.`
  return { method, note, fyRef, x: x.result, y: y.result, u: u.result, v: v.result, pnaY: x.t, pnaX: y.t }
}

function weighted(ring: readonly (readonly [number, number])[], origin: readonly [number, number], wc: number, wt: number): WeightedRing {
  const n = ring.length
  const xs = new Float64Array(n)
  const ys = new Float64Array(n)
  for (let i = 0; i < n; i++) {
    xs[i] = ring[i]![0] - origin[0]
    ys[i] = ring[i]![1] - origin[1]
  }
  let A = 0
  let Qx = 0
  let Qy = 0
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const cross = xs[j]! * ys[i]! - xs[i]! * ys[j]!
    A += cross
    Qx += (ys[j]! + ys[i]!) * cross
    Qy += (xs[j]! + xs[i]!) * cross
  }
  return { xs, ys, wc, wt, A: A / 2, Qx: Qx / 6, Qy: Qy / 6 }
}

/**
 * The PNA normal to (nx, ny) (unit): the offset t (shifted coordinates, mm) at which the side d < t,
 * d = nx·x + ny·y, in compression balances the other side in tension, Σ (wc + wt)·A_below = Σ wt·A;
 * Mp = Σ wc·(t·A_b - Q_b) + Σ wt·((Q - Q_b) - t·(A - A_b)) there, and MpNeg likewise with the sides'
 * strengths swapped (the same when every material is equally strong both ways).
 */
function plasticAxis(rings: readonly WeightedRing[], nx: number, ny: number, extent: number): { t: number; Mp: number; MpNeg: number } {
  const side = new Float64Array(4) // [A, Qx, Qy, chord] of one clipped ring
  const solve = (swap: boolean): { t: number; Mp: number } => {
    let total = 0
    let weighted = 0
    let first = 0
    let low = Infinity
    let high = -Infinity
    for (const r of rings) {
      total += (swap ? r.wc : r.wt) * r.A
      weighted += (r.wc + r.wt) * r.A
      first += (r.wc + r.wt) * (nx * r.Qy + ny * r.Qx)
      for (let i = 0; i < r.xs.length; i++) {
        const d = nx * r.xs[i]! + ny * r.ys[i]!
        if (d < low) low = d
        if (d > high) high = d
      }
    }
    // f(t) = Σ (wc + wt)·A_below(t) - Σ wt·A rises with t at the rate Σ (wc + wt)·chord(t).
    const balance = (t: number): [number, number] => {
      let f = 0
      let slope = 0
      for (const r of rings) {
        clippedMoments(r.xs, r.ys, t, -nx, -ny, side)
        f += (r.wc + r.wt) * side[0]!
        slope += (r.wc + r.wt) * side[3]!
      }
      return [f - total, slope]
    }
    // Start at the weighted centroid: for a symmetric section that is the PNA itself.
    const start = weighted > 0 ? first / weighted : (low + high) / 2
    const t = safeNewton(balance, low, high, -total, weighted - total, start, OFFSET_TOLERANCE * extent, OFFSET_TOLERANCE * weighted)
    let Mp = 0
    for (const r of rings) {
      clippedMoments(r.xs, r.ys, t, -nx, -ny, side)
      const Ab = side[0]!
      const Qb = nx * side[2]! + ny * side[1]!
      const Q = nx * r.Qy + ny * r.Qx
      const [wc, wt] = swap ? [r.wt, r.wc] : [r.wc, r.wt]
      Mp += wc * (t * Ab - Qb) + wt * (Q - Qb - t * (r.A - Ab))
    }
    return { t, Mp }
  }
  const pos = solve(false)
  const symmetric = rings.every((r) => r.wc === r.wt)
  return { t: pos.t, Mp: pos.Mp, MpNeg: symmetric ? pos.Mp : solve(true).Mp }
}

/**
 * Root of an increasing function f on [low, high] (f(low) = fLow < 0 < fHigh = f(high)) by Newton's
 * method with its slope, kept inside the bracket: a step that leaves it, or a flat stretch (a gap
 * between parts), falls back to regula falsi with the Illinois step, and to bisection when that
 * fails to halve the bracket. Stops when a step or the bracket is below `tolerance`, or |f| below `fTolerance`.
 * Newton from the centroid takes a few passes where the bracketing search alone took many.
 */
function safeNewton(f: (t: number) => [number, number], low: number, high: number, fLow: number, fHigh: number, start: number, tolerance: number, fTolerance: number): number {
  let lo = low
  let hi = high
  let fLo = fLow
  let fHi = fHigh
  let t = start > lo && start < hi ? start : (lo + hi) / 2
  let lastMoved = 0
  let previousWidth = Infinity
  for (let i = 0; i < MAX_ITERATIONS && hi - lo > tolerance; i++) {
    const [ft, slope] = f(t)
    if (Math.abs(ft) <= fTolerance) return t
    if (ft < 0) {
      lo = t
      fLo = ft
      if (lastMoved === -1) fHi /= 2 // the Illinois step: hi stayed twice, so halve its weight
      lastMoved = -1
    } else {
      hi = t
      fHi = ft
      if (lastMoved === 1) fLo /= 2
      lastMoved = 1
    }
    let next = slope > 0 ? t - ft / slope : NaN
    if (!(next > lo && next < hi)) {
      const width = hi - lo
      next = width > previousWidth / 2 ? (lo + hi) / 2 : (lo * fHi - hi * fLo) / (fHi - fLo)
      if (!(next > lo && next < hi)) next = (lo + hi) / 2
      previousWidth = width
    }
    if (Math.abs(next - t) <= tolerance) return next
    t = next
  }
  return (lo + hi) / 2
}

/**
 * Writes into out the signed area A (mm²) and the first moments Qx = ∫y dA, Qy = ∫x dA (mm³, about
 * the shifted origin) of the ring (xs, ys) clipped by a + b·x + c·y >= 0, and (for a unit (b, c)) the
 * signed length of the line a + b·x + c·y = 0 inside the ring, dA/da (mm). It is the Sutherland–Hodgman
 * walk of clipRingHalfPlane with Green's-theorem sums taken as the output is produced, not stored:
 * the root search calls it many times on rings of up to millions of vertices.
 */
function clippedMoments(xs: Float64Array, ys: Float64Array, a: number, b: number, c: number, out: Float64Array): void {
  const n = xs.length
  let area = 0
  let momentX = 0
  let momentY = 0
  let chord = 0
  // The output polygon is walked as it is produced: (lastX, lastY) is its latest vertex.
  let firstX = NaN
  let firstY = NaN
  let lastX = NaN
  let lastY = NaN
  let px = xs[n - 1]!
  let py = ys[n - 1]!
  let fp = a + b * px + c * py
  for (let i = 0; i < n; i++) {
    const qx = xs[i]!
    const qy = ys[i]!
    const fq = a + b * qx + c * qy
    const keep = fq >= 0
    // Up to two output vertices per edge: the crossing, if the edge crosses the line, then q if kept.
    for (let k = (keep !== fp >= 0) ? 0 : 1; k < (keep ? 2 : 1); k++) {
      let x = qx
      let y = qy
      if (k === 0) {
        const t = fp / (fp - fq)
        x = px + t * (qx - px)
        y = py + t * (qy - py)
        // Along the line (s = -c·x + b·y): the kept boundary on it runs between crossings out and in.
        chord += (keep ? 1 : -1) * (b * y - c * x)
      }
      if (firstX !== firstX) {
        firstX = x
        firstY = y
      } else {
        const cross = lastX * y - x * lastY
        area += cross
        momentX += (lastY + y) * cross
        momentY += (lastX + x) * cross
      }
      lastX = x
      lastY = y
    }
    px = qx
    py = qy
    fp = fq
  }
  if (firstX === firstX) {
    const cross = lastX * firstY - firstX * lastY
    area += cross
    momentX += (lastY + firstY) * cross
    momentY += (lastX + firstX) * cross
  }
  out[0] = area / 2
  out[1] = momentX / 6
  out[2] = momentY / 6
  out[3] = -chord
}

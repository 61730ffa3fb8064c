import { addRingMoments, zeroMoments, type Moments } from '../geometry/moments'
import type { PreparedSection } from './types'

/**
 * Plastic section moduli (mm³) and plastic neutral axes (mm, section coordinates).
 * `basis` says what the PNA halves: 'force' when every region has fy and one region has
 * E = E_ref (each region weighted by fy / fy_ref, so the plastic moment is Mp = fy_ref·Z);
 * 'area' otherwise (each region weighted by n = E / E_ref: the transformed area; for a single
 * material this is the plain geometric Z).
 */
export interface PlasticModuli {
  /** About a horizontal PNA y = pnaY: Zx = Σ w·|∫(y - pnaY) dA|. */
  Zx: number
  /** About a vertical PNA x = pnaX: Zy = Σ w·|∫(x - pnaX) dA|. */
  Zy: number
  pnaY: number
  pnaX: number
  basis: 'force' | 'area'
}

/** The PNA offset is converged to this fraction of the section's extent. */
const OFFSET_TOLERANCE = 1e-12
const MAX_ITERATIONS = 200

interface WeightedRing {
  /** Vertex coordinates shifted to the section's origin (mm). */
  readonly xs: Float64Array
  readonly ys: Float64Array
  readonly weight: number
}

/**
 * Plastic moduli Zx (horizontal PNA) and Zy (vertical PNA) of a prepared section. Each PNA is the
 * line that splits the weighted area into equal halves (see PlasticModuli.basis), found by a
 * bracketing root search on the offset (regula falsi with the Illinois step, bisection as a
 * safeguard), clipping every ring by the half-plane and converging to 1e-12 of the extent.
 * Coordinates are shifted to prepared.origin first. If the PNA falls in a gap between parts,
 * any line in the gap is equally valid and gives the same Z.
 */
export function plasticModuli(prepared: PreparedSection): PlasticModuli {
  const { regions, referenceE, origin, bounds } = prepared
  const reference = regions.find((region) => region.material.E === referenceE)
  const hasFy = (fy: number | undefined): fy is number => typeof fy === 'number'
  const byForce = hasFy(reference?.material.fy) && regions.every((region) => hasFy(region.material.fy))
  const rings: WeightedRing[] = []
  const whole = zeroMoments()
  for (const region of regions) {
    const weight = byForce ? region.material.fy! / reference!.material.fy! : region.n
    for (const polygon of region.polygons) {
      for (const ring of polygon) {
        const xs = new Float64Array(ring.length)
        const ys = new Float64Array(ring.length)
        ring.forEach((p, i) => {
          xs[i] = p[0] - origin[0]
          ys[i] = p[1] - origin[1]
        })
        rings.push({ xs, ys, weight })
        addRingMoments(whole, ring, origin, weight)
      }
    }
  }
  // Half-plane t + b·x + c·y >= 0 with (b, c) = (0, -1) is y <= t; with (-1, 0) it is x <= t.
  const alongY = plasticAxis(rings, whole, 0, -1, bounds.minY - origin[1], bounds.maxY - origin[1])
  const alongX = plasticAxis(rings, whole, -1, 0, bounds.minX - origin[0], bounds.maxX - origin[0])
  return {
    Zx: alongY.Z,
    Zy: alongX.Z,
    pnaY: origin[1] + alongY.offset,
    pnaX: origin[0] + alongX.offset,
    basis: byForce ? 'force' : 'area',
  }
}

/**
 * The offset t (shifted coordinates, mm) at which the half-plane t + b·x + c·y >= 0 (the side
 * below or left of the PNA) holds half the weighted area, and Z = Q_above - Q_below about the PNA,
 * taken as Q_all - 2·Q_below with `whole` the weighted moments of the whole section.
 */
function plasticAxis(rings: readonly WeightedRing[], whole: Moments, b: number, c: number, low: number, high: number): { offset: number; Z: number } {
  const alongY = b === 0
  const side = new Float64Array(2) // [A, Q] of one clipped ring
  const below = (t: number): { A: number; Q: number } => {
    let A = 0
    let Q = 0
    for (const { xs, ys, weight } of rings) {
      clippedMoments(xs, ys, t, b, c, alongY, side)
      A += weight * side[0]!
      Q += weight * side[1]!
    }
    return { A, Q }
  }
  const total = whole.A
  const offset = bracketedRoot((t) => below(t).A - total / 2, low, high, -total / 2, total / 2, OFFSET_TOLERANCE * (high - low))
  const part = below(offset)
  const Qall = (alongY ? whole.Qx : whole.Qy) - total * offset
  const Z = Qall - 2 * (part.Q - part.A * offset)
  return { offset, Z }
}

/**
 * Root of an increasing function f on [low, high] with f(low) = fLow < 0 < fHigh = f(high):
 * regula falsi with the Illinois modification, falling back to bisection whenever a step fails
 * to halve the bracket; stops when the bracket is narrower than `tolerance`.
 */
function bracketedRoot(f: (t: number) => number, low: number, high: number, fLow: number, fHigh: number, tolerance: number): number {
  let lo = low
  let hi = high
  let fLo = fLow
  let fHi = fHigh
  let lastMoved = 0
  let previousWidth = Infinity
  for (let i = 0; i < MAX_ITERATIONS && hi - lo > tolerance; i++) {
    const width = hi - lo
    let t = width > previousWidth / 2 ? (lo + hi) / 2 : (lo * fHi - hi * fLo) / (fHi - fLo)
    if (!(t > lo && t < hi)) t = (lo + hi) / 2
    previousWidth = width
    const ft = f(t)
    if (ft === 0) return t
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
  }
  return (lo + hi) / 2
}

/**
 * Writes into out the signed area A (mm²) and first moment Q (mm³; ∫y dA if alongY, else ∫x dA,
 * about the shifted origin) of the ring (xs, ys) clipped by a + b·x + c·y >= 0. It is the Sutherland–Hodgman
 * walk of clipRingHalfPlane with Green's-theorem sums taken as the output is produced, not stored:
 * the root search calls it many times on rings of up to millions of vertices.
 */
function clippedMoments(xs: Float64Array, ys: Float64Array, a: number, b: number, c: number, alongY: boolean, out: Float64Array): void {
  const n = xs.length
  let area = 0
  let momentX = 0
  let momentY = 0
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
  out[1] = (alongY ? momentX : momentY) / 6
}

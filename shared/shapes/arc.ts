import type { Point } from '../geometry/types'
import { ShapeError, fmt } from './common'

/** Default chord tolerance (mm): the largest sagitta allowed between an arc and its chords. */
export const DEFAULT_CHORD_TOLERANCE = 0.05

/** Most segments one arc may be cut into; a finer tolerance is refused rather than silently capped. */
export const MAX_ARC_SEGMENTS = 10_000

/** Sagitta (mm) of a chord spanning `angle` radians of a circle of radius `radius` mm: r·(1 - cos(angle/2)). */
export function sagitta(radius: number, angle: number): number {
  return radius * (1 - Math.cos(angle / 2))
}

/** Checks a chord tolerance (mm): a positive finite number. Throws ShapeError on field 'tol'. */
export function requireTolerance(tol: unknown): number {
  if (typeof tol !== 'number' || !Number.isFinite(tol) || tol <= 0) {
    throw new ShapeError('tol', `The chord tolerance tol must be a positive number of mm (e.g. ${DEFAULT_CHORD_TOLERANCE}); got ${String(tol)}.`)
  }
  return tol
}

/**
 * Number of equal chords for an arc of `radius` mm sweeping `sweep` radians (sign ignored) so
 * that every chord's sagitta r·(1 - cos(Δ/2)) is at most `tol` mm. No chord turns more than 90°,
 * so a full circle gets at least 4. Returns 0 for a zero radius or sweep.
 */
export function arcSegmentCount(radius: number, sweep: number, tol: number = DEFAULT_CHORD_TOLERANCE): number {
  requireTolerance(tol)
  const angle = Math.abs(sweep)
  if (!(radius > 0) || !(angle > 0)) return 0
  const ratio = Math.min(tol / radius, 1)
  const step = Math.min(Math.PI / 2, 2 * Math.acos(1 - ratio))
  // The small relief keeps an exact fit (a quarter arc in one chord) from rounding up.
  const n = Math.max(1, Math.ceil(angle / step - 1e-9))
  if (n > MAX_ARC_SEGMENTS) {
    const finest = sagitta(radius, angle / MAX_ARC_SEGMENTS)
    throw new ShapeError(
      'tol',
      `The chord tolerance tol = ${fmt(tol)} mm is too fine for a radius of ${fmt(radius)} mm (${n} segments); use at least ${fmt(finest)} mm.`,
    )
  }
  return n
}

/**
 * Points along an arc centred at `centre` (mm) of radius `radius` mm, from angle `start` through
 * `sweep` radians (positive counter-clockwise), both ends included, cut by the chord tolerance.
 */
export function arcPoints(centre: Point, radius: number, start: number, sweep: number, tol: number = DEFAULT_CHORD_TOLERANCE): Point[] {
  const n = arcSegmentCount(radius, sweep, tol)
  const out: Point[] = []
  for (let k = 0; k <= n; k++) {
    const a = start + (sweep * k) / Math.max(n, 1)
    out.push([centre[0] + radius * Math.cos(a), centre[1] + radius * Math.sin(a)])
  }
  return out
}

/**
 * For a full round the sagitta is also held to this fraction of the radius, so that its polygon keeps
 * the area within 0.05 % of the circle's at any size: the inscribed n-gon falls short by about
 * (4/3)·(sagitta / r) (from A_n / A = sin(2π/n) / (2π/n) with sagitta = r·(1 - cos(π/n))), and
 * (4/3)·3.6e-4 = 0.048 %. README "Method", arcs.
 */
export const ROUND_RELATIVE_SAGITTA = 3.6e-4

/**
 * A circle of `radius` mm about `centre` (mm) as a counter-clockwise ring inscribed in the circle,
 * first vertex on +x. The chords meet the tolerance `tol` and ROUND_RELATIVE_SAGITTA·radius,
 * whichever is finer; the count is rounded up to a multiple of 4 and the quadrants are exact 90°
 * copies, so the ring is symmetric about both axes through the centre and reaches ±radius on each.
 */
export function circleRing(centre: Point, radius: number, tol: number = DEFAULT_CHORD_TOLERANCE): Point[] {
  const quarter = Math.ceil(arcSegmentCount(radius, 2 * Math.PI, radius > 0 ? Math.min(requireTolerance(tol), ROUND_RELATIVE_SAGITTA * radius) : tol) / 4)
  const n = 4 * quarter
  const base: (readonly [number, number])[] = []
  for (let j = 0; j < quarter; j++) {
    const a = (2 * Math.PI * j) / n
    base.push([radius * Math.cos(a), radius * Math.sin(a)])
  }
  const [cx, cy] = centre
  const out: Point[] = []
  for (const [c, s] of base) out.push([cx + c, cy + s])
  for (const [c, s] of base) out.push([cx - s, cy + c])
  for (const [c, s] of base) out.push([cx - c, cy - s])
  for (const [c, s] of base) out.push([cx + s, cy - c])
  return out
}

/**
 * A polygon corner to round: vertex `p` (mm) with fillet radius `r` (mm, 0 for a sharp corner).
 * `field` names the parameter the radius comes from, for error messages.
 */
export interface Corner {
  readonly p: Point
  readonly r: number
  readonly field?: string
}

interface Fillet {
  readonly length: number
  readonly points: Point[]
}

/**
 * Replaces each corner of a closed polygon (vertices in order, either orientation) by a
 * circular arc of its radius tangent to both edges, cut by the chord tolerance `tol` (mm).
 * Works for convex corners (material rounded off) and re-entrant ones (root fillets adding
 * material) alike. Throws ShapeError when the fillets at the two ends of an edge overlap.
 */
export function roundCorners(corners: readonly Corner[], tol: number = DEFAULT_CHORD_TOLERANCE): Point[] {
  const n = corners.length
  const fillets: Fillet[] = corners.map((c, i) => fillet(corners[(i + n - 1) % n]!.p, c, corners[(i + 1) % n]!.p, tol))
  for (let i = 0; i < n; i++) {
    const a = corners[i]!
    const b = corners[(i + 1) % n]!
    const edge = Math.hypot(b.p[0] - a.p[0], b.p[1] - a.p[1])
    const need = fillets[i]!.length + fillets[(i + 1) % n]!.length
    if (need > edge * (1 + 1e-9) + 1e-12) {
      const names = [a, b].filter((c) => c.r > 0).map((c) => `${c.field ?? 'r'} = ${fmt(c.r)} mm`)
      throw new ShapeError(
        (a.r >= b.r ? a.field : b.field) ?? 'r',
        `The corner radii (${names.join(', ')}) do not fit: they need ${fmt(need)} mm along an edge only ${fmt(edge)} mm long.`,
      )
    }
  }
  return fillets.flatMap((f) => f.points)
}

function fillet(prev: Point, corner: Corner, next: Point, tol: number): Fillet {
  const p = corner.p
  const u1 = unit(prev[0] - p[0], prev[1] - p[1])
  const u2 = unit(next[0] - p[0], next[1] - p[1])
  const turn = (p[0] - prev[0]) * (next[1] - p[1]) - (p[1] - prev[1]) * (next[0] - p[0])
  const theta = Math.acos(Math.max(-1, Math.min(1, u1[0] * u2[0] + u1[1] * u2[1])))
  // A straight-through vertex (theta ≈ π) has nothing to round.
  if (!(corner.r > 0) || Math.PI - theta < 1e-12 || theta < 1e-12) return { length: 0, points: [p] }
  const half = theta / 2
  const length = corner.r / Math.tan(half)
  const bis = unit(u1[0] + u2[0], u1[1] + u2[1])
  const dist = corner.r / Math.sin(half)
  const centre: Point = [p[0] + bis[0] * dist, p[1] + bis[1] * dist]
  const t1: Point = [p[0] + u1[0] * length, p[1] + u1[1] * length]
  const t2: Point = [p[0] + u2[0] * length, p[1] + u2[1] * length]
  const start = Math.atan2(t1[1] - centre[1], t1[0] - centre[0])
  const sweep = Math.sign(turn) * (Math.PI - theta)
  const points = arcPoints(centre, corner.r, start, sweep, tol)
  // Exact tangent points at the ends keep the straight edges exactly straight.
  points[0] = t1
  points[points.length - 1] = t2
  return { length, points }
}

function unit(x: number, y: number): Point {
  const l = Math.hypot(x, y)
  return l > 0 ? [x / l, y / l] : [0, 0]
}

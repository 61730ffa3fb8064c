import type { Point, Ring } from '../geometry/types'
import { SectionError } from './types'
import { inertiaDeterminant, type InertiaLike } from './stress'

/** Relative tolerance (of the core's size) under which two core vertices are the same point. */
const SAME_POINT = 1e-9
/** Relative tolerance (of the hull's size squared) under which a hull turn counts as straight. */
const STRAIGHT_TURN = 1e-12

/**
 * The core (kern) of a section as a convex counter-clockwise ring in SECTION coordinates (mm): the set
 * of compressive load points that keep every hull vertex in compression (README "Method"). One core vertex per
 * hull edge, the polar reciprocal of the edge with respect to the ellipse of inertia: the load point
 * whose neutral line is that edge's line. `hull` is the convex hull of the section (either orientation;
 * straight runs allowed). Returns [] for degenerate properties or a hull of fewer than 3 points.
 * Throws SectionError when the hull is not convex or does not contain the centroid.
 */
export function kernPolygon(props: InertiaLike, hull: Ring): Point[] {
  const { area, Ixx, Iyy, Ixy } = props
  const D = inertiaDeterminant(props)
  if (D === null || hull.length < 3) return []
  const xc = props.centroid.x
  const yc = props.centroid.y
  const n = hull.length
  const ccw = signedArea(hull, xc, yc) > 0
  const at = (k: number): Point => hull[ccw ? k : n - 1 - k]!
  const size = hullSize(hull, xc, yc)
  const out: Point[] = []
  let scale = 0
  for (let k = 0; k < n; k++) {
    const p = at(k)
    const q = at((k + 1) % n)
    const r = at((k + 2) % n)
    const px = p[0] - xc
    const py = p[1] - yc
    const dx = q[0] - p[0]
    const dy = q[1] - p[1]
    const turn = dx * (r[1] - q[1]) - dy * (r[0] - q[0])
    if (turn < -STRAIGHT_TURN * size * size) {
      throw new SectionError(`The core needs the convex hull of the section, but the ring turns clockwise at vertex ${(k + 1) % n}.`)
    }
    if (dx === 0 && dy === 0) continue
    // Outward normal of a CCW edge is (dy, -dx); the edge line is nx·x + ny·y = h in centroidal coordinates.
    const h = dy * px - dx * py
    if (!(h > 0)) {
      throw new SectionError(`The centroid is not strictly inside the hull (at edge ${k}), so the section has no core.`)
    }
    // Neutral line 1 + u·x + v·y = 0 coincides with the edge line; invert README "Method" for (ex, ey).
    const u = -dy / h
    const v = dx / h
    const ex = (Iyy * u + Ixy * v) / area
    const ey = (Ixy * u + Ixx * v) / area
    scale = Math.max(scale, Math.abs(ex), Math.abs(ey))
    out.push([ex, ey])
  }
  return dedupe(out, SAME_POINT * scale).map(([ex, ey]) => [ex + xc, ey + yc] as const)
}

/** Twice the signed area of a ring, measured from (ox, oy) for precision. */
function signedArea(ring: Ring, ox: number, oy: number): number {
  let s = 0
  let prev = ring[ring.length - 1]!
  for (const p of ring) {
    s += (prev[0] - ox) * (p[1] - oy) - (p[0] - ox) * (prev[1] - oy)
    prev = p
  }
  return s
}

/** Largest distance (mm) of a hull vertex from (ox, oy). */
function hullSize(ring: Ring, ox: number, oy: number): number {
  let s = 0
  for (const p of ring) s = Math.max(s, Math.hypot(p[0] - ox, p[1] - oy))
  return s
}

/** Drops consecutive (cyclically) points closer than tol: collinear hull edges give the same core vertex. */
function dedupe(points: Point[], tol: number): Point[] {
  const out: Point[] = []
  for (const p of points) {
    const last = out[out.length - 1]
    if (last === undefined || Math.hypot(p[0] - last[0], p[1] - last[1]) > tol) out.push(p)
  }
  while (out.length > 1 && Math.hypot(out[0]![0] - out[out.length - 1]![0], out[0]![1] - out[out.length - 1]![1]) <= tol) out.pop()
  return out
}

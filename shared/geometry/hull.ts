import { orient2d } from './orient'
import type { Point, Polygon, Ring } from './types'

/**
 * Convex hull of a point set (mm) by Andrew's monotone chain: counter-clockwise (y up), starting
 * at the lowest-x (then lowest-y) point, without collinear or repeated points and without a
 * closing vertex. Fewer than 3 non-collinear points give their 0, 1 or 2 extreme points.
 * Exact orientation tests; O(n log n).
 */
export function convexHull(points: readonly Point[]): Point[] {
  const sorted = points.slice().sort((p, q) => p[0] - q[0] || p[1] - q[1])
  const unique: Point[] = []
  for (const p of sorted) {
    const last = unique[unique.length - 1]
    if (!last || last[0] !== p[0] || last[1] !== p[1]) unique.push(p)
  }
  if (unique.length < 3) return unique
  const lower = halfHull(unique)
  const upper = halfHull(unique.slice().reverse())
  lower.pop()
  upper.pop()
  const hull = lower.concat(upper)
  return hull.length >= 3 ? hull : [unique[0]!, unique[unique.length - 1]!]
}

/** One chain of the monotone-chain hull: keeps strict left turns only. */
function halfHull(sorted: readonly Point[]): Point[] {
  const chain: Point[] = []
  for (const p of sorted) {
    while (chain.length >= 2 && orient2d(chain[chain.length - 2]!, chain[chain.length - 1]!, p) <= 0) chain.pop()
    chain.push(p)
  }
  return chain
}

/**
 * Convex hull (CCW, no collinear points, no closing vertex) of the vertices of simple rings (mm),
 * such as the outlines of a prepared section. Each simple ring is reduced in O(n) by Melkman's
 * algorithm and the hulls are merged by the monotone chain, so a single large outline costs O(n).
 * The rings must be simple (as prepareSection guarantees); for loose points use convexHull.
 */
export function ringsHull(rings: readonly Ring[]): Point[] {
  const candidates: Point[] = []
  for (const ring of rings) {
    const reduced = melkmanHull(ring) ?? convexHull(ring)
    for (const p of reduced) candidates.push(p)
  }
  if (rings.length === 1) return startAtLowest(candidates)
  return convexHull(candidates)
}

/**
 * Convex hull of a prepared section's material regions (the outlines of their polygons; holes lie
 * inside them). The client derives it from an analysis answer's `regions` with the same function
 * the server uses, so it need not travel with every answer.
 */
export function regionsHull(regions: readonly { readonly polygons: readonly Polygon[] }[]): Point[] {
  const outlines: Ring[] = []
  for (const region of regions) for (const polygon of region.polygons) if (polygon[0]) outlines.push(polygon[0])
  return outlines.length ? ringsHull(outlines) : []
}

/**
 * Melkman's O(n) hull of a simple polygon (either orientation), CCW; null when no three
 * consecutive vertices turn (a degenerate ring).
 */
function melkmanHull(ring: Ring): Point[] | null {
  const n = ring.length
  let start = -1
  for (let k = 0; k < n && start < 0; k++) {
    if (orient2d(ring[k]!, ring[(k + 1) % n]!, ring[(k + 2) % n]!) !== 0) start = k
  }
  if (start < 0) return null
  const at = (i: number): Point => ring[(start + i) % n]!
  // Deque stored in a buffer of size 2n + 1, bottom index b and top index t; D[b] = D[t].
  const deque: Point[] = new Array<Point>(2 * n + 1)
  let b = n
  let t = n + 3
  const [a, c] = orient2d(at(0), at(1), at(2)) > 0 ? [at(0), at(1)] : [at(1), at(0)]
  deque[b] = at(2)
  deque[b + 1] = a
  deque[b + 2] = c
  deque[t] = at(2)
  for (let i = 3; i < n; i++) {
    const v = at(i)
    if (insideOrOn(deque[b]!, deque[b + 1]!, v) && insideOrOn(deque[t - 1]!, deque[t]!, v)) continue
    while (t - b >= 2 && orient2d(deque[b]!, deque[b + 1]!, v) <= 0) b++
    deque[--b] = v
    while (t - b >= 2 && orient2d(deque[t - 1]!, deque[t]!, v) <= 0) t--
    deque[++t] = v
  }
  const hull = deque.slice(b, t)
  return hull.length >= 3 ? hull : null
}

/** For the hull edge p→q (CCW): v is strictly to its left, or on the closed segment itself. */
function insideOrOn(p: Point, q: Point, v: Point): boolean {
  const o = orient2d(p, q, v)
  if (o !== 0) return o > 0
  return Math.min(p[0], q[0]) <= v[0] && v[0] <= Math.max(p[0], q[0])
    && Math.min(p[1], q[1]) <= v[1] && v[1] <= Math.max(p[1], q[1])
}

/** Rotates a CCW hull to start at its lowest-x (then lowest-y) vertex, as convexHull does. */
function startAtLowest(hull: Point[]): Point[] {
  let k = 0
  hull.forEach((p, i) => {
    const q = hull[k]!
    if (p[0] < q[0] || (p[0] === q[0] && p[1] < q[1])) k = i
  })
  return hull.slice(k).concat(hull.slice(0, k))
}

import type { Point, Polygon, Ring } from '../../geometry/types'
import type { TorsionRegion } from './types'

/**
 * For the mesh only: the rings of a one-material section with runs of short edges (arcs drawn at
 * a fine chord tolerance) thinned by Douglas-Peucker to a deviation of `tol` mm and edges no
 * longer than `maxEdge` mm, so a 2 000-vertex round bar is not meshed with 2 000 boundary nodes.
 * Regions of several materials touch along shared edges and are returned as they are.
 */
export function simplifyForMesh(regions: readonly TorsionRegion[], tol: number, maxEdge: number): TorsionRegion[] {
  if (regions.length !== 1) return regions as TorsionRegion[]
  const r = regions[0]!
  const polygons: Polygon[] = r.polygons.map(poly => poly.map(ring => simplifyRing(ring, tol, maxEdge)))
  return [{ ...r, polygons }]
}

/** One closed ring thinned (orientation kept); the ring itself when fewer than 3 vertices would be left. */
export function simplifyRing(ring: Ring, tol: number, maxEdge: number): Ring {
  const n = ring.length
  if (n <= 4) return ring
  // Anchor at vertex 0 and at the vertex farthest from it; thin both chains between them.
  let far = 1; let best = -1
  for (let i = 1; i < n; i++) {
    const d = (ring[i]![0] - ring[0]![0]) ** 2 + (ring[i]![1] - ring[0]![1]) ** 2
    if (d > best) { best = d; far = i }
  }
  const keep = new Uint8Array(n)
  keep[0] = 1; keep[far] = 1
  thin(ring, 0, far, tol, maxEdge, keep)
  thin(ring, far, n, tol, maxEdge, keep)
  const out: Point[] = []
  for (let i = 0; i < n; i++) if (keep[i]) out.push(ring[i]!)
  return out.length >= 3 ? out : ring
}

/** Douglas-Peucker between vertices a and b (b may be n, meaning vertex 0 again). */
function thin(ring: Ring, a: number, b: number, tol: number, maxEdge: number, keep: Uint8Array): void {
  const stack: [number, number][] = [[a, b]]
  const n = ring.length
  while (stack.length > 0) {
    const [i, j] = stack.pop()!
    if (j - i < 2) continue
    const [ax, ay] = ring[i]!; const [bx, by] = ring[j % n]!
    const dx = bx - ax; const dy = by - ay
    const len = Math.hypot(dx, dy)
    let worst = -1; let at = -1
    for (let k = i + 1; k < j; k++) {
      const [px, py] = ring[k]!
      const d = len > 0 ? Math.abs((px - ax) * dy - (py - ay) * dx) / len : Math.hypot(px - ax, py - ay)
      if (d > worst) { worst = d; at = k }
    }
    if (worst > tol || len > maxEdge) {
      const split = worst > tol ? at : (i + j) >> 1
      keep[split] = 1
      stack.push([i, split], [split, j])
    }
  }
}

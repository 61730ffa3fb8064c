import type { Point, Ring } from '../geometry/types'
import { pointInRing } from '../geometry/ring'

/** Squared distance (mm²) from `p` to the segment a–b, and the parameter t in [0, 1] of the nearest point. */
export function segmentDistance2(p: Point, a: Point, b: Point): { d2: number; t: number } {
  const dx = b[0] - a[0]
  const dy = b[1] - a[1]
  const len2 = dx * dx + dy * dy
  let t = len2 === 0 ? 0 : ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2
  t = Math.max(0, Math.min(1, t))
  const ex = a[0] + t * dx - p[0]
  const ey = a[1] + t * dy - p[1]
  return { d2: ex * ex + ey * ey, t }
}

/** A hit on a ring of a part: ring 0 is the outline, k is hole k-1. */
export interface RingRef {
  part: string
  ring: number
}

/** Minimal part shape the hit tests need: an id, an outline and hole rings (mm). */
export interface HitPart {
  id: string
  outline: Ring
  holes: readonly { ring: Ring }[]
}

/** The rings of a part in hit-test order: outline first, then the holes. */
export function partRings(part: HitPart): Ring[] {
  return [part.outline, ...part.holes.map(h => h.ring)]
}

/**
 * The nearest vertex of the given parts within `tol` mm of `p`, or null. Searches the parts in
 * order, so pass the selected part first when its vertices should win ties.
 */
export function hitVertex(parts: readonly HitPart[], p: Point, tol: number): (RingRef & { index: number }) | null {
  let best: (RingRef & { index: number }) | null = null
  let bestD2 = tol * tol
  for (const part of parts) {
    partRings(part).forEach((ring, r) => {
      for (let i = 0; i < ring.length; i++) {
        const q = ring[i]!
        const d2 = (q[0] - p[0]) ** 2 + (q[1] - p[1]) ** 2
        if (d2 <= bestD2) { bestD2 = d2; best = { part: part.id, ring: r, index: i } }
      }
    })
  }
  return best
}

/** The nearest edge within `tol` mm of `p`: the edge from vertex `index` to index+1, and the nearest point on it. */
export function hitEdge(parts: readonly HitPart[], p: Point, tol: number): (RingRef & { index: number; point: [number, number] }) | null {
  let best: (RingRef & { index: number; point: [number, number] }) | null = null
  let bestD2 = tol * tol
  for (const part of parts) {
    partRings(part).forEach((ring, r) => {
      for (let i = 0; i < ring.length; i++) {
        const a = ring[i]!
        const b = ring[(i + 1) % ring.length]!
        const { d2, t } = segmentDistance2(p, a, b)
        if (d2 <= bestD2) {
          bestD2 = d2
          best = { part: part.id, ring: r, index: i, point: [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])] }
        }
      }
    })
  }
  return best
}

/**
 * The id of the part under `p` (inside its outline and not inside one of its holes), or, failing
 * that, the part with an edge within `tol` mm. Later parts are drawn on top, so they win.
 */
export function hitPart(parts: readonly HitPart[], p: Point, tol: number): string | null {
  for (let k = parts.length - 1; k >= 0; k--) {
    const part = parts[k]!
    if (pointInRing(p, part.outline) && !part.holes.some(h => pointInRing(p, h.ring))) return part.id
  }
  return hitEdge(parts, p, tol)?.part ?? null
}

/** The id of the nearest point (a load handle) within `tol` mm of `p`, or null. */
export function hitPoint(points: readonly { id: string; x: number; y: number }[], p: Point, tol: number): string | null {
  let best: string | null = null
  let bestD2 = tol * tol
  for (const q of points) {
    const d2 = (q.x - p[0]) ** 2 + (q.y - p[1]) ** 2
    if (d2 <= bestD2) { bestD2 = d2; best = q.id }
  }
  return best
}

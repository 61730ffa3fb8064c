import type { Bounds, Point, Ring } from '../geometry/types'
import { ringArea } from '../geometry/moments'

/** A mutable-free ring type for the editor (document rings are plain `[x, y]` arrays in mm). */

/** The rings moved by (dx, dy) mm. */
export function translateRing(ring: Ring, dx: number, dy: number): Point[] {
  return ring.map(p => [p[0] + dx, p[1] + dy])
}

/** The ring rotated counter-clockwise (y up) by `deg` degrees about `centre` (mm). */
export function rotateRing(ring: Ring, deg: number, centre: Point): Point[] {
  // Exact quarter turns keep integer coordinates integer (no 6.1e-17 residue).
  const q = ((deg % 360) + 360) % 360
  const c = q === 90 || q === 270 ? 0 : q === 180 ? -1 : q === 0 ? 1 : Math.cos((deg * Math.PI) / 180)
  const s = q === 0 || q === 180 ? 0 : q === 90 ? 1 : q === 270 ? -1 : Math.sin((deg * Math.PI) / 180)
  const [cx, cy] = centre
  return ring.map(([x, y]) => {
    const u = x - cx
    const v = y - cy
    return [cx + u * c - v * s, cy + u * s + v * c]
  })
}

/**
 * The ring mirrored across the line through `centre`: axis 'x' flips x (a mirror in the vertical
 * line), 'y' flips y. The vertex order is reversed so that the orientation (CCW outline, CW hole)
 * is kept.
 */
export function mirrorRing(ring: Ring, axis: 'x' | 'y', centre: Point): Point[] {
  const out: Point[] = ring.map(([x, y]) => (axis === 'x' ? [2 * centre[0] - x, y] : [x, 2 * centre[1] - y]))
  return out.reverse()
}


export { ringsBounds } from '../geometry/bounds'

/** Centre (mm) of a bounds box. */
export function boundsCentre(b: Bounds): Point {
  return [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2]
}

/** The ring with `point` inserted after vertex `edge` (on the edge from vertex edge to edge+1). */
export function insertVertex(ring: Ring, edge: number, point: Point): Point[] {
  const out: Point[] = ring.map(p => [p[0], p[1]])
  out.splice(edge + 1, 0, [point[0], point[1]])
  return out
}

/** The ring without vertex `index`; throws when fewer than 3 vertices would remain. */
export function deleteVertex(ring: Ring, index: number): Point[] {
  if (ring.length <= 3) throw new Error('A ring needs at least 3 vertices; this one has only 3 left.')
  return ring.filter((_, i) => i !== index).map(p => [p[0], p[1]])
}

/** The ring with vertex `index` moved to `point` (mm). */
export function setVertex(ring: Ring, index: number, point: Point): Point[] {
  return ring.map((p, i) => (i === index ? [point[0], point[1]] : [p[0], p[1]]))
}

/** A rectangle (mm) spanned by two opposite corners, counter-clockwise from the lower left. */
export function rectangleRing(a: Point, b: Point): Point[] {
  const x0 = Math.min(a[0], b[0])
  const x1 = Math.max(a[0], b[0])
  const y0 = Math.min(a[1], b[1])
  const y1 = Math.max(a[1], b[1])
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]]
}

/** What Fit shows (mm): the parts' bounds grown to take in every load point; null when there is nothing. */
export function fitBounds(parts: Bounds | null, loads: readonly { x: number; y: number }[]): Bounds | null {
  let b = parts
  for (const l of loads) {
    b = b
      ? { minX: Math.min(b.minX, l.x), minY: Math.min(b.minY, l.y), maxX: Math.max(b.maxX, l.x), maxY: Math.max(b.maxY, l.y) }
      : { minX: l.x, minY: l.y, maxX: l.x, maxY: l.y }
  }
  return b
}

import { ringArea } from './moments'
import type { Point, Ring } from './types'

/** True when `p` lies inside the ring (even-odd rule, mm); a point on an edge may go either way. */
export function pointInRing(p: Point, ring: Ring): boolean {
  const [x, y] = p
  let inside = false
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i]!
    const [xj, yj] = ring[j]!
    if ((yi > y) !== (yj > y) && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside
  }
  return inside
}

/**
 * A copy of the ring (fresh vertex pairs) oriented counter-clockwise (positive area, y up) when
 * `ccw` is true, clockwise otherwise. The input is not changed.
 */
export function orientRing(ring: Ring, ccw: boolean): Point[] {
  const out: Point[] = ring.map(p => [p[0], p[1]] as const)
  return (ringArea(out) > 0) === ccw ? out : out.reverse()
}

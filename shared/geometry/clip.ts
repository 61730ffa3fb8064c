import type { Point, Ring } from './types'

/**
 * Clips a ring by the half-plane a + b·x + c·y >= 0 (Sutherland–Hodgman).
 * The result may hold zero-width slivers along the cut line; its Green's-theorem integrals are
 * nonetheless exact, so it is meant for integration (contact, plastic axes), not for display.
 * Orientation is kept. Returns an empty ring when nothing is on the kept side.
 */
export function clipRingHalfPlane(ring: Ring, a: number, b: number, c: number): Point[] {
  const n = ring.length
  const out: Point[] = []
  if (n === 0) return out
  let prev = ring[n - 1]!
  let fPrev = a + b * prev[0] + c * prev[1]
  for (let i = 0; i < n; i++) {
    const cur = ring[i]!
    const fCur = a + b * cur[0] + c * cur[1]
    if (fCur >= 0) {
      if (fPrev < 0) out.push(intersect(prev, cur, fPrev, fCur))
      out.push(cur)
    } else if (fPrev >= 0) {
      out.push(intersect(prev, cur, fPrev, fCur))
    }
    prev = cur
    fPrev = fCur
  }
  return out
}

function intersect(p: Point, q: Point, fp: number, fq: number): Point {
  const t = fp / (fp - fq)
  return [p[0] + t * (q[0] - p[0]), p[1] + t * (q[1] - p[1])]
}

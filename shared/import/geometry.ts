import { arcPoints } from '../shapes/arc'
import type { Point } from '../geometry/types'

type P = [number, number]

/**
 * The points of a DXF bulge segment from `a` to `b` (bulge = tan(sweep/4), positive
 * counter-clockwise), excluding `b`, with chords within the tolerance `tol` (same unit as a, b).
 * A zero bulge is the straight segment: just `a`.
 */
export function bulgePoints(a: P, b: P, bulge: number, tol: number): P[] {
  if (!bulge || !Number.isFinite(bulge)) return [a]
  const sweep = 4 * Math.atan(bulge)
  const dx = b[0] - a[0]
  const dy = b[1] - a[1]
  const chord = Math.hypot(dx, dy)
  if (chord === 0) return [a]
  const r = chord / (2 * Math.sin(Math.abs(sweep) / 2))
  // Centre: from the chord's midpoint along its left normal by the signed apothem r·cos(sweep/2)·sign.
  const h = (chord / 2) / Math.tan(sweep / 2)
  const cx = (a[0] + b[0]) / 2 - (dy / chord) * h
  const cy = (a[1] + b[1]) / 2 + (dx / chord) * h
  const start = Math.atan2(a[1] - cy, a[0] - cx)
  const pts = arcPoints([cx, cy], r, start, sweep, tol)
  return [a, ...pts.slice(1, -1).map(q => [q[0], q[1]] as P)]
}

/** Drops a repeated closing vertex and consecutive duplicates (within `eps`). */
export function cleanRing(ring: P[], eps: number): P[] {
  const out: P[] = []
  for (const p of ring) {
    const q = out[out.length - 1]
    if (!q || Math.hypot(p[0] - q[0], p[1] - q[1]) > eps) out.push(p)
  }
  while (out.length > 1 && Math.hypot(out[0]![0] - out[out.length - 1]![0], out[0]![1] - out[out.length - 1]![1]) <= eps) out.pop()
  return out
}

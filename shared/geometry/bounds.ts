import type { Bounds, Ring } from './types'

/** Axis-aligned bounds (mm) of some rings, or null when they hold no vertex. */
export function ringsBounds(rings: readonly Ring[]): Bounds | null {
  let minX = Infinity
  let minY = Infinity
  let maxX = -Infinity
  let maxY = -Infinity
  for (const ring of rings) {
    for (const p of ring) {
      if (p[0] < minX) minX = p[0]
      if (p[0] > maxX) maxX = p[0]
      if (p[1] < minY) minY = p[1]
      if (p[1] > maxY) maxY = p[1]
    }
  }
  return minX <= maxX ? { minX, minY, maxX, maxY } : null
}

/** Whether two boxes overlap or come within `gap` mm of each other (touching counts). */
export function boxesNear(a: Bounds, b: Bounds, gap = 0): boolean {
  return a.minX <= b.maxX + gap && b.minX <= a.maxX + gap && a.minY <= b.maxY + gap && b.minY <= a.maxY + gap
}

/** Diagonal (mm) of the bounding box of a ring: a length scale for tolerances; at least 1 (also when empty or degenerate). */
export function ringExtent(ring: Ring): number {
  const b = ringsBounds([ring])
  const d = b ? Math.hypot(b.maxX - b.minX, b.maxY - b.minY) : 0
  return Number.isFinite(d) && d > 0 ? d : 1
}

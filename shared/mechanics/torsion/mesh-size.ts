import type { BoundaryGraph } from './boundary'
import type { TorsionMeshDensity } from './types'

/** Elements through the thinnest wall, the fewest and the most elements, per mesh density. */
const DENSITY: Record<TorsionMeshDensity, { through: number; minElements: number; maxElements: number }> = {
  coarse: { through: 2, minElements: 200, maxElements: 4000 },
  normal: { through: 4, minElements: 800, maxElements: 12000 },
  fine: { through: 8, minElements: 3200, maxElements: 40000 },
}

/** Samples along the perimeter for the thickness estimate. */
const SAMPLES = 600

/**
 * Wall thickness (mm) of the thinnest part of a section: from points spread evenly along every
 * ring, a ray along the inward normal to the first boundary it meets; the 2nd percentile of those
 * lengths, so a sharp corner or a sliver tip does not set the mesh alone.
 */
export function thinnestWall(graph: BoundaryGraph): number {
  const { xy, seg, rings } = graph
  let perimeter = 0
  for (const ids of rings) for (let k = 0; k < ids.length; k++) perimeter += edgeLength(xy, ids[k]!, ids[(k + 1) % ids.length]!)
  const step = perimeter / SAMPLES
  const lengths: number[] = []
  for (const ids of rings) {
    for (let k = 0; k < ids.length; k++) {
      const a = ids[k]!; const b = ids[(k + 1) % ids.length]!
      const len = edgeLength(xy, a, b)
      if (len === 0) continue
      const ax = xy[2 * a]!; const ay = xy[2 * a + 1]!
      const ux = (xy[2 * b]! - ax) / len; const uy = (xy[2 * b + 1]! - ay) / len
      const count = Math.max(1, Math.round(len / step))
      for (let s = 0; s < count; s++) {
        const t = ((s + 0.5) / count) * len
        // Material lies to the left of every normalised ring (CCW outlines, CW holes).
        const hit = rayHit(xy, seg, ax + ux * t, ay + uy * t, -uy, ux, len * 1e-9)
        if (Number.isFinite(hit)) lengths.push(hit)
      }
    }
  }
  if (lengths.length === 0) return graph.size
  lengths.sort((u, v) => u - v)
  return lengths[Math.floor(lengths.length * 0.02)]!
}

/** Target element edge length (mm) for a section of area `area` (mm²) and thinnest wall `wall` (mm). */
export function meshSize(area: number, wall: number, density: TorsionMeshDensity): number {
  const d = DENSITY[density]
  // An equilateral triangle of edge h has area (√3/4)·h².
  const perElement = (h: number) => (Math.sqrt(3) / 4) * h * h
  let h = Math.min(wall / d.through, Math.sqrt(area / (d.minElements * Math.sqrt(3) / 4)))
  if (area / perElement(h) > d.maxElements) h = Math.sqrt(area / (d.maxElements * Math.sqrt(3) / 4))
  return h
}

function edgeLength(xy: readonly number[], a: number, b: number): number {
  return Math.hypot(xy[2 * b]! - xy[2 * a]!, xy[2 * b + 1]! - xy[2 * a + 1]!)
}

/** Distance (mm) along the ray p + t·d (|d| = 1) to the nearest segment beyond `eps`, or Infinity. */
function rayHit(xy: readonly number[], seg: readonly number[], px: number, py: number, dx: number, dy: number, eps: number): number {
  let best = Infinity
  for (let s = 0; s < seg.length; s += 2) {
    const ax = xy[2 * seg[s]!]!; const ay = xy[2 * seg[s]! + 1]!
    const ex = xy[2 * seg[s + 1]!]! - ax; const ey = xy[2 * seg[s + 1]! + 1]! - ay
    const den = dx * ey - dy * ex
    if (den === 0) continue
    const wx = ax - px; const wy = ay - py
    const t = (wx * ey - wy * ex) / den
    if (t <= eps || t >= best) continue
    const u = (wx * dy - wy * dx) / den
    if (u >= 0 && u <= 1) best = t
  }
  return best
}

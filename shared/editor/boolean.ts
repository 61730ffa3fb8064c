import polygonClipping from 'polygon-clipping'
import type { Ring } from '../geometry/types'
import { ringArea } from '../geometry/moments'
import type { Point } from '../geometry/types'
import { orientRing } from '../geometry/ring'

/** A polygon for the Booleans: a CCW outline and CW holes (mm). */
export interface PolygonRings {
  outline: Point[]
  holes: Point[][]
}

type PcRing = [number, number][]

// polygon-clipping wants closed rings; ours are open (no repeated first vertex).
function toPc(p: { outline: Ring; holes: readonly Ring[] }): PcRing[] {
  return [p.outline, ...p.holes].map(r => r.map(q => [q[0], q[1]] as [number, number]))
}

function fromPc(multi: PcRing[][]): PolygonRings[] {
  return multi.map((poly) => {
    const rings = poly.map((r) => {
      const open = r.slice(0, r.length > 1 && r[0]![0] === r[r.length - 1]![0] && r[0]![1] === r[r.length - 1]![1] ? -1 : undefined)
      return open.map(q => [q[0], q[1]] as Point)
    })
    return { outline: orientRing(rings[0]!, true), holes: rings.slice(1).map(h => orientRing(h, false)) }
  }).filter(p => Math.abs(ringArea(p.outline)) > 0)
}

/** The union of polygons (mm): one or more polygons, outlines CCW, holes CW. */
export function unionPolygons(polys: readonly { outline: Ring; holes: readonly Ring[] }[]): PolygonRings[] {
  if (polys.length === 0) return []
  const [first, ...rest] = polys.map(toPc)
  return fromPc(polygonClipping.union(first!, ...rest))
}

/** `subject` minus every polygon of `clips` (mm): zero, one or several polygons. */
export function subtractPolygons(subject: { outline: Ring; holes: readonly Ring[] }, clips: readonly { outline: Ring; holes: readonly Ring[] }[]): PolygonRings[] {
  return fromPc(polygonClipping.difference(toPc(subject), ...clips.map(toPc)))
}

/** Area (mm²) where a ring overlaps a polygon, 0 when they are apart. */
export function overlapArea(ring: Ring, poly: { outline: Ring; holes: readonly Ring[] }): number {
  const out = polygonClipping.intersection([ring.map(q => [q[0], q[1]] as [number, number])], toPc(poly))
  let a = 0
  for (const p of out) for (const [k, r] of p.entries()) a += (k === 0 ? 1 : -1) * Math.abs(ringArea(r))
  return a
}

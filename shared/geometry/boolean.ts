import polygonClipping from 'polygon-clipping'
import type { MultiPolygon as ClipMultiPolygon, Polygon as ClipPolygon } from 'polygon-clipping'
import { SectionError } from '../mechanics/types'
import { ringArea } from './moments'
import { orientRing } from './ring'
import type { Point, Polygon } from './types'

/** The polygon-clipping operations the mechanics use. */
export type BooleanOperation = 'union' | 'difference' | 'intersection'

/**
 * A polygon-clipping operation on polygons of open rings (mm): the first set against the rest.
 * Returns polygons with CCW outlines and CW holes, dropping rings that enclose nothing. Throws a
 * SectionError when the library fails, so the user is told to simplify the drawing.
 */
export function polygonBoolean(operation: BooleanOperation, geoms: readonly (readonly Polygon[])[]): Polygon[] {
  const [first, ...rest] = geoms.map((geom) => geom.map(toClip))
  let result: ClipMultiPolygon
  try {
    result = polygonClipping[operation](first!, ...rest)
  } catch (error) {
    throw new SectionError(`The ${operation} of the section's parts failed (${(error as Error).message}); simplify the drawing.`)
  }
  return result.map(fromClip).filter((polygon) => polygon.length > 0)
}

/** Signed area (mm²) of a set of polygons: outlines add, holes subtract. */
export function polygonsArea(polygons: readonly Polygon[]): number {
  return polygons.reduce((sum, polygon) => sum + polygon.reduce((s, ring) => s + ringArea(ring), 0), 0)
}

function toClip(polygon: Polygon): ClipPolygon {
  return polygon.map((ring) => [...ring.map((p): [number, number] => [p[0], p[1]]), [ring[0]![0], ring[0]![1]]])
}

/** Drops the closing vertex and re-orients; drops holes that enclose nothing ([] if the outline does not). */
function fromClip(polygon: ClipPolygon): Polygon {
  const rings = polygon.map((ring) => ring.slice(0, ring.length - 1) as Point[])
  const valid = (ring: Point[]): boolean => ring.length >= 3 && ringArea(ring) !== 0
  if (!rings[0] || !valid(rings[0])) return []
  return [orientRing(rings[0], true), ...rings.slice(1).filter(valid).map((ring) => orientRing(ring, false))]
}

import { circleRing, DEFAULT_CHORD_TOLERANCE, requireTolerance } from './arc'
import { finishShape, requireDimension } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/** Parameters of a round bar (mm): diameter d. */
export interface CircleParams {
  readonly d: number
}

/**
 * A solid round bar of diameter d (mm) centred on the origin (or `options.origin`): a
 * counter-clockwise polygon inscribed in the circle, vertex count a multiple of 4 chosen so
 * that no chord's sagitta exceeds `options.tol` (mm, default 0.05), first vertex on +x.
 */
export function circle(params: CircleParams, options: ShapeOptions = {}): ShapeGeometry {
  const d = requireDimension('d', 'Diameter', params.d)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  return finishShape(circleRing([0, 0], d / 2, tol), [], options.origin)
}

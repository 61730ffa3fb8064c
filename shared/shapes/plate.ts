import { finishShape, requireDimension } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/** Parameters of a rectangular plate (mm): width b along x, depth h along y. */
export interface PlateParams {
  readonly b: number
  readonly h: number
}

/**
 * A solid rectangle b × h (mm), sides parallel to the axes, centred on the origin (or on
 * `options.origin`). Outline counter-clockwise from the bottom-left corner; no holes.
 */
export function plate(params: PlateParams, options: ShapeOptions = {}): ShapeGeometry {
  const b = requireDimension('b', 'Width', params.b)
  const h = requireDimension('h', 'Depth', params.h)
  const x = b / 2
  const y = h / 2
  return finishShape([[-x, -y], [x, -y], [x, y], [-x, y]], [], options.origin)
}

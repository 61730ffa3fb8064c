import { finishShape, requireDimension } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/** Parameters of a rectangular plate (mm): width b and thickness h; `vertical` 1 stands it up (b along y). */
export interface PlateParams {
  readonly b: number
  readonly h: number
  readonly vertical?: number | null
}

/**
 * A solid rectangle of width b and thickness h (mm), sides parallel to the axes: b along x when
 * horizontal (the default), along y when `vertical` is 1; centred on the origin (or on
 * `options.origin`). Outline counter-clockwise from the bottom-left corner; no holes.
 */
export function plate(params: PlateParams, options: ShapeOptions = {}): ShapeGeometry {
  const b = requireDimension('b', 'Width', params.b)
  const h = requireDimension('h', 'Thickness', params.h)
  const standing = params.vertical === 1
  const x = (standing ? h : b) / 2
  const y = (standing ? b : h) / 2
  return finishShape([[-x, -y], [x, -y], [x, y], [-x, y]], [], options.origin)
}

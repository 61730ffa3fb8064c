import { DEFAULT_CHORD_TOLERANCE, requireTolerance, roundCorners } from './arc'
import { finishShape, fmt, requireDimension, requireRadius, ShapeError } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/** Parameters of a tee (mm): overall depth h, flange width b, stem tw, flange tf, root fillet r. */
export interface TeeParams {
  readonly h: number
  readonly b: number
  readonly tw: number
  readonly tf: number
  readonly r: number
}

/**
 * A tee (mm) with the flange on top and the stem pointing down (-y), centred on the origin by
 * its bounding box (not its centroid), or on `options.origin`. Outline counter-clockwise, no
 * holes; root fillets cut by the chord tolerance `options.tol` (mm, default 0.05).
 */
export function tee(params: TeeParams, options: ShapeOptions = {}): ShapeGeometry {
  const h = requireDimension('h', 'Depth', params.h)
  const b = requireDimension('b', 'Flange width', params.b)
  const tw = requireDimension('tw', 'Stem thickness', params.tw)
  const tf = requireDimension('tf', 'Flange thickness', params.tf)
  const r = requireRadius('r', 'Root radius', params.r)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  if (tw >= b) {
    throw new ShapeError('tw', `Stem thickness tw = ${fmt(tw)} mm must be less than the flange width b = ${fmt(b)} mm.`)
  }
  if (tf >= h) {
    throw new ShapeError('tf', `Flange thickness tf = ${fmt(tf)} mm must be less than the depth h = ${fmt(h)} mm.`)
  }
  const outstand = (b - tw) / 2
  if (r > outstand) {
    throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most (b - tw)/2 = ${fmt(outstand)} mm.`)
  }
  if (r > h - tf) {
    throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most the stem length h - tf = ${fmt(h - tf)} mm.`)
  }
  const x = tw / 2
  const y = h / 2
  const yUnder = y - tf
  const outline = roundCorners(
    [
      { p: [-x, -y], r: 0 },
      { p: [x, -y], r: 0 },
      { p: [x, yUnder], r, field: 'r' },
      { p: [b / 2, yUnder], r: 0 },
      { p: [b / 2, y], r: 0 },
      { p: [-b / 2, y], r: 0 },
      { p: [-b / 2, yUnder], r: 0 },
      { p: [-x, yUnder], r, field: 'r' },
    ],
    tol,
  )
  return finishShape(outline, [], options.origin)
}

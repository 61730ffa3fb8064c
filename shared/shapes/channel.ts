import { DEFAULT_CHORD_TOLERANCE, requireTolerance, roundCorners } from './arc'
import { finishShape, fmt, requireDimension, requireRadius, requireTaper, requireTfAt, ShapeError, taperedFlange } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/**
 * Parameters of a channel (mm, taper in degrees): depth h, flange width b (back of web to toe),
 * web tw, flange tf, root fillet r; optional toe radius r2 (default 0), flange taper (default 0)
 * and tf_at, the distance from the toe at which a tapered flange's tf is given (default
 * mid-outstand, (b - tw)/2; European UPN tables give tf at b/2).
 */
export interface ChannelParams {
  readonly h: number
  readonly b: number
  readonly tw: number
  readonly tf: number
  readonly r: number
  readonly r2?: number
  readonly taper?: number
  readonly tf_at?: number
}

/**
 * A channel (mm) with the back of the web on the left (x = -b/2) and the flanges pointing to +x,
 * centred on the origin by its bounding box (not its centroid), or on `options.origin`.
 * Outline counter-clockwise, no holes; fillets cut by the chord tolerance `options.tol` (mm).
 */
export function channel(params: ChannelParams, options: ShapeOptions = {}): ShapeGeometry {
  const h = requireDimension('h', 'Depth', params.h)
  const b = requireDimension('b', 'Flange width', params.b)
  const tw = requireDimension('tw', 'Web thickness', params.tw)
  const tf = requireDimension('tf', 'Flange thickness', params.tf)
  const r = requireRadius('r', 'Root radius', params.r)
  const r2 = requireRadius('r2', 'Toe radius', params.r2 ?? 0)
  const taper = requireTaper('taper', params.taper ?? 0)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  if (tw >= b) {
    throw new ShapeError('tw', `Web thickness tw = ${fmt(tw)} mm must be less than the flange width b = ${fmt(b)} mm.`)
  }
  if (2 * tf >= h) {
    throw new ShapeError('tf', `Flange thickness tf = ${fmt(tf)} mm must be less than half the depth h = ${fmt(h)} mm (below ${fmt(h / 2)} mm).`)
  }
  const outstand = b - tw
  const f = taperedFlange(outstand, tf, taper, requireTfAt(params.tf_at, outstand, 'b - tw'))
  if (f.atToe <= 0) {
    throw new ShapeError('taper', `Flange taper ${fmt(taper)}° is too steep for tf = ${fmt(tf)} mm where it is measured: the flange would have no thickness left at the toe.`)
  }
  const clear = h - 2 * f.atWeb
  if (clear <= 0) {
    throw new ShapeError('taper', `Flange taper ${fmt(taper)}° makes the flanges meet at the web: reduce the taper or the flange thickness.`)
  }
  const r2Max = f.atToe / f.tangent
  if (r2 > r2Max) {
    throw new ShapeError('r2', `Toe radius r2 = ${fmt(r2)} mm must be at most ${fmt(r2Max)} mm, the flange thickness at the toe.`)
  }
  const rFlange = f.face / f.tangent - r2
  if (r > rFlange) {
    const beside = r2 > 0 ? ` beside the toe radius r2 = ${fmt(r2)} mm` : ''
    throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most ${fmt(rFlange)} mm to fit on the flange outstand b - tw = ${fmt(outstand)} mm${beside}.`)
  }
  const rWeb = clear / (2 * f.tangent)
  if (r > rWeb) {
    throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most ${fmt(rWeb)} mm so that both root fillets fit on the ${fmt(clear)} mm of web between the flanges (h/2 - tf without taper).`)
  }

  const xBack = -b / 2
  const xWeb = xBack + tw
  const xToe = b / 2
  const y = h / 2
  const outline = roundCorners(
    [
      { p: [xBack, -y], r: 0 },
      { p: [xToe, -y], r: 0 },
      { p: [xToe, -y + f.atToe], r: r2, field: 'r2' },
      { p: [xWeb, -y + f.atWeb], r, field: 'r' },
      { p: [xWeb, y - f.atWeb], r, field: 'r' },
      { p: [xToe, y - f.atToe], r: r2, field: 'r2' },
      { p: [xToe, y], r: 0 },
      { p: [xBack, y], r: 0 },
    ],
    tol,
  )
  return finishShape(outline, [], options.origin)
}

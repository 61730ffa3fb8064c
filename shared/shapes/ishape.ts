import { DEFAULT_CHORD_TOLERANCE, requireTolerance, roundCorners } from './arc'
import { finishShape, fmt, requireDimension, requireRadius, requireTaper, requireTfAt, ShapeError, taperedFlange } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/**
 * Parameters of an I or H section (mm, taper in degrees): depth h, flange width b, web tw,
 * flange tf, root fillet r; optional toe radius r2 (default 0), flange taper (default 0), tf_at
 * the distance from the toe at which a tapered flange's tf is given (default mid-outstand,
 * (b - tw)/4; European IPN tables give tf at b/4), and, for plate girders, b_top/tf_top and
 * b_bot/tf_bot overriding b and tf for one flange.
 */
export interface IShapeParams {
  readonly h: number
  readonly b: number
  readonly tw: number
  readonly tf: number
  readonly r: number
  readonly r2?: number
  readonly taper?: number
  readonly tf_at?: number
  readonly b_top?: number
  readonly tf_top?: number
  readonly b_bot?: number
  readonly tf_bot?: number
}

interface Flange {
  readonly b: number
  readonly tf: number
  readonly bField: string
  readonly tfField: string
  readonly atWeb: number
  readonly atToe: number
  readonly tangent: number
  readonly face: number
  readonly outstand: number
}

function flange(p: IShapeParams, which: 'top' | 'bot', tw: number, taper: number): Flange {
  const bKey = `b_${which}` as const
  const tfKey = `tf_${which}` as const
  const bField = p[bKey] === undefined ? 'b' : bKey
  const tfField = p[tfKey] === undefined ? 'tf' : tfKey
  const b = p[bKey] === undefined ? p.b : requireDimension(bKey, `${which === 'top' ? 'Top' : 'Bottom'} flange width`, p[bKey])
  const tf = p[tfKey] === undefined ? p.tf : requireDimension(tfKey, `${which === 'top' ? 'Top' : 'Bottom'} flange thickness`, p[tfKey])
  if (tw >= b) {
    throw new ShapeError('tw', `Web thickness tw = ${fmt(tw)} mm must be less than the flange width ${bField} = ${fmt(b)} mm.`)
  }
  const outstand = (b - tw) / 2
  const fromToe = requireTfAt(p.tf_at, outstand, `(${bField} - tw)/2`)
  return { b, tf, bField, tfField, outstand, ...taperedFlange(outstand, tf, taper, fromToe) }
}

/**
 * An I or H section (mm), web along y, centred on the origin by its bounding box (web centre
 * line on x = 0, mid-depth on y = 0), or on `options.origin`. Outline counter-clockwise, no
 * holes; root fillets and toe radii cut by the chord tolerance `options.tol` (mm, default 0.05).
 */
export function ishape(params: IShapeParams, options: ShapeOptions = {}): ShapeGeometry {
  const h = requireDimension('h', 'Depth', params.h)
  requireDimension('b', 'Flange width', params.b)
  const tw = requireDimension('tw', 'Web thickness', params.tw)
  requireDimension('tf', 'Flange thickness', params.tf)
  const r = requireRadius('r', 'Root radius', params.r)
  const r2 = requireRadius('r2', 'Toe radius', params.r2 ?? 0)
  const taper = requireTaper('taper', params.taper ?? 0)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  const top = flange(params, 'top', tw, taper)
  const bot = flange(params, 'bot', tw, taper)

  if (top.tf + bot.tf >= h) {
    if (top.tfField === 'tf' && bot.tfField === 'tf') {
      throw new ShapeError('tf', `Flange thickness tf = ${fmt(top.tf)} mm must be less than half the depth h = ${fmt(h)} mm (below ${fmt(h / 2)} mm).`)
    }
    const field = bot.tfField !== 'tf' ? bot.tfField : top.tfField
    throw new ShapeError(field, `Flange thicknesses ${top.tfField} = ${fmt(top.tf)} mm and ${bot.tfField} = ${fmt(bot.tf)} mm together must be less than the depth h = ${fmt(h)} mm.`)
  }
  for (const f of [top, bot]) {
    if (f.atToe <= 0) {
      throw new ShapeError('taper', `Flange taper ${fmt(taper)}° is too steep for ${f.tfField} = ${fmt(f.tf)} mm where it is measured: the flange would have no thickness left at the toe.`)
    }
  }
  const clear = h - top.atWeb - bot.atWeb
  if (clear <= 0) {
    throw new ShapeError('taper', `Flange taper ${fmt(taper)}° makes the flanges meet at the web: reduce the taper or the flange thickness.`)
  }
  for (const f of [top, bot]) {
    const r2Max = f.atToe / f.tangent
    if (r2 > r2Max) {
      throw new ShapeError('r2', `Toe radius r2 = ${fmt(r2)} mm must be at most ${fmt(r2Max)} mm, the flange thickness at the toe (${f.tfField}).`)
    }
    const rMax = f.face / f.tangent - r2
    if (r > rMax) {
      const beside = r2 > 0 ? ` beside the toe radius r2 = ${fmt(r2)} mm` : ''
      throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most ${fmt(rMax)} mm to fit on the flange outstand (${f.bField} - tw)/2 = ${fmt(f.outstand)} mm${beside}.`)
    }
  }
  const rWeb = clear / (2 * top.tangent)
  if (r > rWeb) {
    throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most ${fmt(rWeb)} mm so that both root fillets fit on the ${fmt(clear)} mm of web between the flanges (h/2 - tf for equal flanges).`)
  }

  const x = tw / 2
  const yTop = h / 2
  const yBot = -h / 2
  const outline = roundCorners(
    [
      { p: [-bot.b / 2, yBot], r: 0 },
      { p: [bot.b / 2, yBot], r: 0 },
      { p: [bot.b / 2, yBot + bot.atToe], r: r2, field: 'r2' },
      { p: [x, yBot + bot.atWeb], r, field: 'r' },
      { p: [x, yTop - top.atWeb], r, field: 'r' },
      { p: [top.b / 2, yTop - top.atToe], r: r2, field: 'r2' },
      { p: [top.b / 2, yTop], r: 0 },
      { p: [-top.b / 2, yTop], r: 0 },
      { p: [-top.b / 2, yTop - top.atToe], r: r2, field: 'r2' },
      { p: [-x, yTop - top.atWeb], r, field: 'r' },
      { p: [-x, yBot + bot.atWeb], r, field: 'r' },
      { p: [-bot.b / 2, yBot + bot.atToe], r: r2, field: 'r2' },
    ],
    tol,
  )
  return finishShape(outline, [], options.origin)
}

import { DEFAULT_CHORD_TOLERANCE, requireTolerance, roundCorners } from './arc'
import { finishShape, fmt, requireDimension, requireRadius, ShapeError } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/**
 * Parameters of an angle, equal or unequal (mm): leg h along y, leg b along x, thickness t of
 * both legs, root fillet r, toe radius r2 (default 0) at both toes.
 */
export interface AngleParams {
  readonly h: number
  readonly b: number
  readonly t: number
  readonly r: number
  readonly r2?: number
}

/** Options of the angle builder: as for every shape, plus the reference point `anchor`. */
export interface AngleOptions extends ShapeOptions {
  /** 'centre' (default): bounding-box centre at the origin; 'heel': the outer corner at the origin. */
  readonly anchor?: 'centre' | 'heel'
}

/**
 * An angle (mm) with the heel (outer corner) at bottom left, leg h up the y axis and leg b
 * along the x axis, both legs on the +x/+y side of the heel. Placed with its bounding-box centre
 * at the origin (default) or the heel at the origin (`anchor: 'heel'`), then moved to
 * `options.origin`. Outline counter-clockwise, no holes; fillets cut by `options.tol` (mm).
 */
export function angle(params: AngleParams, options: AngleOptions = {}): ShapeGeometry {
  const h = requireDimension('h', 'Leg', params.h)
  const b = requireDimension('b', 'Leg', params.b)
  const t = requireDimension('t', 'Thickness', params.t)
  const r = requireRadius('r', 'Root radius', params.r)
  const r2 = requireRadius('r2', 'Toe radius', params.r2 ?? 0)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  const shortLeg = Math.min(b, h)
  if (t >= shortLeg) {
    const key = b <= h ? 'b' : 'h'
    throw new ShapeError('t', `Thickness t = ${fmt(t)} mm must be less than the shorter leg ${key} = ${fmt(shortLeg)} mm.`)
  }
  if (r2 > t) {
    throw new ShapeError('r2', `Toe radius r2 = ${fmt(r2)} mm must be at most the thickness t = ${fmt(t)} mm.`)
  }
  const outstand = shortLeg - t
  if (r + r2 > outstand) {
    const beside = r2 > 0 ? ` beside the toe radius r2 = ${fmt(r2)} mm` : ''
    throw new ShapeError('r', `Root radius r = ${fmt(r)} mm must be at most ${fmt(outstand - r2)} mm to fit on the shorter leg's outstand ${b <= h ? 'b' : 'h'} - t = ${fmt(outstand)} mm${beside}.`)
  }
  const outline = roundCorners(
    [
      { p: [0, 0], r: 0 },
      { p: [b, 0], r: 0 },
      { p: [b, t], r: r2, field: 'r2' },
      { p: [t, t], r, field: 'r' },
      { p: [t, h], r: r2, field: 'r2' },
      { p: [0, h], r: 0 },
    ],
    tol,
  )
  const heel = options.anchor === 'heel'
  const ox = (options.origin?.x ?? 0) - (heel ? 0 : b / 2)
  const oy = (options.origin?.y ?? 0) - (heel ? 0 : h / 2)
  return finishShape(outline, [], { x: ox, y: oy })
}

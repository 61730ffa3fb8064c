import type { Point } from '../geometry/types'
import { circleRing, DEFAULT_CHORD_TOLERANCE, requireTolerance, roundCorners } from './arc'
import { finishShape, fmt, requireDimension, requireRadius, ShapeError } from './common'
import type { ShapeGeometry, ShapeOptions } from './common'

/** Parameters of a circular tube (mm): outside diameter d, wall thickness t. */
export interface TubeParams {
  readonly d: number
  readonly t: number
}

/**
 * A circular hollow section, outside diameter d and wall t (mm), centred on the origin (or
 * `options.origin`). Both circles are inscribed polygons cut by the chord tolerance
 * `options.tol` (mm, default 0.05); the outline is counter-clockwise, the one hole clockwise.
 */
export function tube(params: TubeParams, options: ShapeOptions = {}): ShapeGeometry {
  const d = requireDimension('d', 'Outside diameter', params.d)
  const t = requireDimension('t', 'Wall thickness', params.t)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  if (t >= d / 2) {
    throw new ShapeError('t', `Wall thickness t = ${fmt(t)} mm must be less than half the outside diameter d = ${fmt(d)} mm (at most ${fmt(d / 2)} mm, which would be a solid bar).`)
  }
  return finishShape(circleRing([0, 0], d / 2, tol), [circleRing([0, 0], d / 2 - t, tol)], options.origin)
}

/**
 * Parameters of a rectangular hollow section (mm): width b along x, depth h along y, wall t,
 * outer corner radius ro, inner corner radius ri (when omitted, max(ro - t, 0), which keeps the
 * corner wall at t).
 */
export interface RhsParams {
  readonly b: number
  readonly h: number
  readonly t: number
  readonly ro: number
  readonly ri?: number
}

/**
 * A rectangular (or square) hollow section b × h with wall t and rounded corners (mm), centred
 * on the origin (or `options.origin`). Outline counter-clockwise, the one hole clockwise; the
 * corner arcs are cut by the chord tolerance `options.tol` (mm, default 0.05).
 */
export function rhs(params: RhsParams, options: ShapeOptions = {}): ShapeGeometry {
  const b = requireDimension('b', 'Width', params.b)
  const h = requireDimension('h', 'Depth', params.h)
  const t = requireDimension('t', 'Wall thickness', params.t)
  const ro = requireRadius('ro', 'Outer corner radius', params.ro)
  const ri = params.ri === undefined ? Math.max(ro - t, 0) : requireRadius('ri', 'Inner corner radius', params.ri)
  const tol = requireTolerance(options.tol ?? DEFAULT_CHORD_TOLERANCE)
  const side = Math.min(b, h)
  if (2 * t >= side) {
    throw new ShapeError('t', `Wall thickness t = ${fmt(t)} mm must be less than half the smaller side, ${fmt(side)} mm (below ${fmt(side / 2)} mm).`)
  }
  if (ro > side / 2) {
    throw new ShapeError('ro', `Outer corner radius ro = ${fmt(ro)} mm must be at most half the smaller side, ${fmt(side / 2)} mm.`)
  }
  const inner = side - 2 * t
  if (ri > inner / 2) {
    throw new ShapeError('ri', `Inner corner radius ri = ${fmt(ri)} mm must be at most half the smaller inside dimension, ${fmt(inner / 2)} mm.`)
  }
  // Wall across the corner, along the diagonal between the two corner arcs.
  const cornerWall = Math.SQRT2 * (t + ri - ro) + ro - ri
  if (cornerWall <= 0) {
    throw new ShapeError('ri', `With ro = ${fmt(ro)} mm and ri = ${fmt(ri)} mm the inner corner breaks through the outer one; use ri of at least ${fmt(Math.max(ro - t, 0))} mm or a smaller ro.`)
  }
  const outer = roundedRectangle(b / 2, h / 2, ro, 'ro', tol)
  const hole = roundedRectangle(b / 2 - t, h / 2 - t, ri, 'ri', tol)
  return finishShape(outer, [hole], options.origin)
}

function roundedRectangle(x: number, y: number, r: number, field: string, tol: number): Point[] {
  return roundCorners(
    [
      { p: [-x, -y], r, field },
      { p: [x, -y], r, field },
      { p: [x, y], r, field },
      { p: [-x, y], r, field },
    ],
    tol,
  )
}

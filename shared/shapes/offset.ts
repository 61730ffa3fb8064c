// @ts-ignore -- clipper-lib ships no type declarations; ClipperApi below types the part used here.
import ClipperModule from 'clipper-lib'
import type { Point, Ring } from '../geometry/types'
import { ringArea } from '../geometry/moments'
import { DEFAULT_CHORD_TOLERANCE, requireTolerance } from './arc'
import { fmt, ShapeError } from './common'
import type { ShapeGeometry } from './common'

interface IntPoint {
  X: number
  Y: number
}

interface ClipperApi {
  ClipperOffset: new (miterLimit?: number, arcTolerance?: number) => {
    AddPath(path: IntPoint[], joinType: number, endType: number): void
    Execute(solution: IntPoint[][], delta: number): void
  }
  JoinType: { jtSquare: number; jtRound: number; jtMiter: number }
  EndType: { etClosedPolygon: number }
  ClipperBase: { loRange: number }
}

// clipper-lib is CommonJS (module.exports = ClipperLib). Node ESM and Vite give it as the default
// export; some bundler interop layers wrap it once more in { default }.
const Clipper: ClipperApi = ((ClipperModule as { default?: ClipperApi }).default ?? ClipperModule) as ClipperApi

/** How an offset joins the edges at a convex corner: 'miter' extends them, 'round' adds an arc of radius |delta|. */
export type OffsetJoin = 'miter' | 'round'

/** Finest integer grid used for clipper (1e4 per mm, i.e. 1e-4 mm); coarsened only for very large rings. */
export const OFFSET_SCALE = 1e4

/**
 * Offsets a closed ring by `delta` mm: outwards when positive, inwards when negative, whatever
 * the ring's orientation. Corners are joined by `join` ('miter', limited to `miterLimit` × |delta|
 * beyond which the corner is squared off, or 'round', arcs cut by the chord tolerance `tol` mm).
 * Returns the resulting rings: outlines counter-clockwise, holes clockwise (an inward offset may
 * split the ring into several outlines, or leave none). Coordinates are exact to about 1e-4 mm
 * for rings within ±2 m of their bounding-box centre, and coarser beyond.
 */
export function offsetRing(ring: Ring, delta: number, join: OffsetJoin = 'miter', miterLimit = 2, tol: number = DEFAULT_CHORD_TOLERANCE): Ring[] {
  if (!Number.isFinite(delta)) throw new ShapeError('delta', `The offset distance must be a finite number of mm; got ${fmt(delta)}.`)
  if (!(miterLimit >= 1) || !Number.isFinite(miterLimit)) {
    throw new ShapeError('miterLimit', `The miter limit must be a finite number of at least 1 (a multiple of the offset); got ${fmt(miterLimit)}.`)
  }
  requireTolerance(tol)
  const clean = checkRing(ring)
  if (delta === 0) return [clean]
  let minX = Infinity
  let minY = Infinity
  let maxX = -Infinity
  let maxY = -Infinity
  for (const [x, y] of clean) {
    minX = Math.min(minX, x)
    minY = Math.min(minY, y)
    maxX = Math.max(maxX, x)
    maxY = Math.max(maxY, y)
  }
  // Work about the bounding-box centre, and pick the scale so that the farthest point of the
  // result stays inside clipper's fast exact-integer range.
  const cx = (minX + maxX) / 2
  const cy = (minY + maxY) / 2
  const reach = Math.max(maxX - cx, maxY - cy) + Math.max(miterLimit, 2) * Math.abs(delta) + 1
  const scale = Math.min(OFFSET_SCALE, (0.5 * Clipper.ClipperBase.loRange) / reach)
  const path: IntPoint[] = clean.map(([x, y]) => ({ X: Math.round((x - cx) * scale), Y: Math.round((y - cy) * scale) }))
  const offsetter = new Clipper.ClipperOffset(miterLimit, tol * scale)
  offsetter.AddPath(path, join === 'round' ? Clipper.JoinType.jtRound : Clipper.JoinType.jtMiter, Clipper.EndType.etClosedPolygon)
  const solution: IntPoint[][] = []
  offsetter.Execute(solution, delta * scale)
  const out: Ring[] = []
  for (const p of solution) {
    const r: Point[] = p.map((q) => [q.X / scale + cx, q.Y / scale + cy])
    if (r.length >= 3 && ringArea(r) !== 0) out.push(r)
  }
  return out
}

/** Options of makeHollow: the corner join and miter limit of the inward offset, and the chord tolerance (mm). */
export interface HollowOptions {
  readonly join?: OffsetJoin
  readonly miterLimit?: number
  readonly tol?: number
}

/**
 * Makes a hollow section of wall `t` mm from a closed outline (mm, either orientation): the
 * outline, counter-clockwise, with the outline offset inwards by t as its hole(s), clockwise.
 * With the default miter join the hole has sharp corners where the outline's corners are
 * re-entrant; a round join gives them radius t, keeping the wall exactly t all round.
 * Throws ShapeError on field 't' when the wall is so thick that nothing is left inside.
 */
export function makeHollow(outline: Ring, t: number, options: HollowOptions = {}): ShapeGeometry {
  if (typeof t !== 'number' || !Number.isFinite(t) || t <= 0) {
    throw new ShapeError('t', `Wall thickness t must be a positive number of mm; got ${fmt(t)}.`)
  }
  const ring = checkRing(outline)
  const holes = offsetRing(ring, -t, options.join ?? 'miter', options.miterLimit ?? 2, options.tol ?? DEFAULT_CHORD_TOLERANCE)
  if (holes.length === 0) {
    throw new ShapeError('t', `Wall thickness t = ${fmt(t)} mm is too thick for this outline: offsetting it inwards by ${fmt(t)} mm leaves nothing, so the section would be solid. Use a thinner wall.`)
  }
  return { outline: ring, holes: holes.map((h) => (ringArea(h) < 0 ? h : [...h].reverse())) }
}

function checkRing(ring: Ring): Ring {
  const out: Point[] = []
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i]!
    if (!Number.isFinite(p[0]) || !Number.isFinite(p[1])) {
      throw new ShapeError('ring', `Vertex ${i} of the ring is not a pair of finite numbers (mm).`)
    }
    const last = out[out.length - 1]
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p)
  }
  const first = out[0]
  const last = out[out.length - 1]
  if (out.length > 1 && first && last && first[0] === last[0] && first[1] === last[1]) out.pop()
  const area = ringArea(out)
  if (out.length < 3 || area === 0) throw new ShapeError('ring', 'The ring needs at least 3 distinct vertices enclosing some area.')
  return area > 0 ? out : out.reverse()
}

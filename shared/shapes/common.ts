import type { Point, Ring } from '../geometry/types'
import { ringArea } from '../geometry/moments'

/**
 * The geometry of a parametric shape in mm (x right, y up): the outline counter-clockwise,
 * the holes clockwise, no ring repeating its first vertex at the end.
 */
export interface ShapeGeometry {
  readonly outline: Ring
  readonly holes: Ring[]
}

/** Where a built shape's reference point lands, in mm (default: the origin). */
export interface ShapeOrigin {
  readonly x: number
  readonly y: number
}

/**
 * Options common to every shape builder: the chord tolerance `tol` (mm, maximum sagitta of
 * any arc segment, default 0.05 mm) and an `origin` (mm) to which the reference point is moved.
 */
export interface ShapeOptions {
  readonly tol?: number
  readonly origin?: ShapeOrigin
}

/**
 * An invalid shape parameter. `field` names the parameter (its key in the registry, e.g. 'tf',
 * or 'tol' for the chord tolerance, 'kind' for an unknown shape); the message says what to change.
 */
export class ShapeError extends Error {
  readonly field: string
  constructor(field: string, message: string) {
    super(message)
    this.name = 'ShapeError'
    this.field = field
  }
}

/** Formats a length (mm) or angle for a message: at most six significant digits, no trailing zeros. */
export function fmt(value: number): string {
  if (!Number.isFinite(value)) return String(value)
  return String(Number(value.toPrecision(6)))
}

function describe(value: unknown): string {
  if (value === undefined) return 'nothing'
  if (typeof value === 'number') return fmt(value)
  return JSON.stringify(value) ?? String(value)
}

/** Checks that a dimension (mm) is a positive finite number and returns it; throws ShapeError otherwise. */
export function requireDimension(field: string, label: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new ShapeError(field, `${label} ${field} must be a positive number of mm; got ${describe(value)}.`)
  }
  return value
}

/** Checks that a radius (mm) is zero or a positive finite number and returns it; throws ShapeError otherwise. */
export function requireRadius(field: string, label: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new ShapeError(field, `${label} ${field} must be zero or a positive number of mm; got ${describe(value)}.`)
  }
  return value
}

/**
 * Checks a flange taper in degrees (angle of the inner flange face to the flange's outer face):
 * 0 for parallel flanges, below 45°. Returns it; throws ShapeError otherwise.
 */
export function requireTaper(field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value >= 45) {
    throw new ShapeError(field, `Flange taper ${field} must be an angle from 0° (parallel flanges) to below 45°; got ${describe(value)}.`)
  }
  return value
}

/**
 * Converts a flange slope given in percent (e.g. 14 % for IPN, 8 % for UPN) to the taper angle
 * in degrees that the I and channel builders take.
 */
export function taperFromSlopePercent(percent: number): number {
  return (Math.atan(percent / 100) * 180) / Math.PI
}

/**
 * Finishes a shape: moves every vertex by `origin` (mm), drops vertices that repeat their
 * predecessor (including a closing vertex), and orients the outline counter-clockwise and the
 * holes clockwise.
 */
export function finishShape(outline: readonly Point[], holes: readonly (readonly Point[])[], origin?: ShapeOrigin): ShapeGeometry {
  const dx = origin?.x ?? 0
  const dy = origin?.y ?? 0
  if (!Number.isFinite(dx) || !Number.isFinite(dy)) {
    throw new ShapeError('origin', `The origin offset must be two finite numbers of mm; got (${fmt(dx)}, ${fmt(dy)}).`)
  }
  const size = extent(outline)
  const eps = Math.max(size, 1) * 1e-12
  const ring = orient(dedupe(outline, dx, dy, eps), true)
  return { outline: ring, holes: holes.map((h) => orient(dedupe(h, dx, dy, eps), false)) }
}

function extent(ring: readonly Point[]): number {
  let m = 0
  for (const p of ring) m = Math.max(m, Math.abs(p[0]), Math.abs(p[1]))
  return m
}

function dedupe(ring: readonly Point[], dx: number, dy: number, eps: number): Point[] {
  const out: Point[] = []
  for (const p of ring) {
    const last = out[out.length - 1]
    if (last && Math.abs(last[0] - p[0] - dx) <= eps && Math.abs(last[1] - p[1] - dy) <= eps) continue
    out.push([p[0] + dx, p[1] + dy])
  }
  const first = out[0]
  const last = out[out.length - 1]
  if (out.length > 1 && first && last && Math.abs(first[0] - last[0]) <= eps && Math.abs(first[1] - last[1]) <= eps) out.pop()
  return out
}

function orient(ring: Point[], ccw: boolean): Point[] {
  const area = ringArea(ring)
  return (area > 0) === ccw ? ring : ring.reverse()
}

/**
 * Thicknesses (mm) of a flange of outstand `outstand` mm (web face to toe) whose inner face is
 * tapered by `taperDeg` degrees, `tf` being the thickness at `fromToe` mm from the toe (default
 * mid-outstand, where it equals the mean thickness): `atWeb` at the web face, `atToe` at the toe.
 * `tangent` is the tangent length per mm of radius of a fillet at the root or the toe,
 * tan(45° - taper/2), and `face` the length of the inner face (mm).
 */
export function taperedFlange(
  outstand: number,
  tf: number,
  taperDeg: number,
  fromToe: number = outstand / 2,
): { atWeb: number; atToe: number; tangent: number; face: number } {
  const a = (taperDeg * Math.PI) / 180
  const slope = Math.tan(a)
  return { atWeb: tf + (outstand - fromToe) * slope, atToe: tf - fromToe * slope, tangent: Math.tan(Math.PI / 4 - a / 2), face: outstand / Math.cos(a) }
}

/**
 * Checks `tf_at`, the distance (mm) from the toe at which a tapered flange's tf is given: omitted
 * means mid-outstand; otherwise from 0 to the outstand. Returns the distance; throws ShapeError.
 */
export function requireTfAt(value: unknown, outstand: number, outstandText: string): number {
  if (value === undefined) return outstand / 2
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > outstand) {
    throw new ShapeError('tf_at', `The distance tf_at from the toe at which tf is measured must be from 0 to the flange outstand ${outstandText} = ${fmt(outstand)} mm; got ${describe(value)}.`)
  }
  return value
}

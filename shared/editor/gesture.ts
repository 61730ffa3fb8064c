import type { Point } from '../geometry/types'
import { hitPart, hitVertex } from './hit'
import type { SnapCue } from './snap'

/**
 * What the pointer is doing on the canvas (mm). Drawn by the handles layer while it lasts;
 * written to the document only when it ends.
 */
export type Gesture =
  | { kind: 'none' }
  | { kind: 'pan'; last: Point }
  | { kind: 'move'; ids: string[]; start: Point; delta: Point; moved: boolean }
  | { kind: 'vertex'; part: string; ring: number; index: number; prev: Point; next: Point; point: Point; moved: boolean }
  | { kind: 'rotate'; ids: string[]; centre: Point; start: number; angle: number }
  | { kind: 'box'; a: Point; b: Point }
  | { kind: 'round'; centre: Point; r: number; tube: boolean }
  | { kind: 'outline'; points: Point[]; hover: Point | null }
  /** A load of the stress view dragged to a new point (the view shows it; the store gets it at the end). */
  | { kind: 'load'; id: string }
  /** The stress view's cut line being drawn from p0. */
  | { kind: 'cut'; p0: Point }

/** The snap cue beside the gesture (null when nothing snapped). */
export type Cue = SnapCue | null

/** Angle (degrees, counter-clockwise from +x) of the vector from `c` to `p`. */
export function angleDeg(c: Point, p: Point): number {
  return (Math.atan2(p[1] - c[1], p[0] - c[0]) * 180) / Math.PI
}

/** A rotation angle (degrees) rounded to `step` degrees and normalised to (-180, 180]. */
export function roundAngle(deg: number, step: number): number {
  let a = Math.round(deg / step) * step
  a = ((a + 180) % 360 + 360) % 360 - 180
  return a === -180 ? 180 : Number(a.toPrecision(12))
}

/** A new part (mm) that a finished box or round gesture draws, or null when it is degenerate. */
export interface DraftPart {
  outline: Point[]
  holes: { ring: Point[] }[]
  name: string
  shape: { kind: string; params: Record<string, number> } | null
  label: string
}

/**
 * The part a finished box/round/tube gesture makes: a rectangle, a round bar or a tube (wall
 * `tubeWall` mm, at most 90 % of the radius) built by `build` (the shapes registry) at its centre.
 */
export function draftPart(
  g: Gesture,
  tubeWall: number,
  build: { circle: (d: number) => { outline: readonly (readonly [number, number])[]; holes: readonly (readonly (readonly [number, number])[])[] }; tube: (d: number, t: number) => { outline: readonly (readonly [number, number])[]; holes: readonly (readonly (readonly [number, number])[])[] } },
  count: number,
): DraftPart | null {
  if (g.kind === 'box') {
    const x0 = Math.min(g.a[0], g.b[0])
    const x1 = Math.max(g.a[0], g.b[0])
    const y0 = Math.min(g.a[1], g.b[1])
    const y1 = Math.max(g.a[1], g.b[1])
    if (!(x1 > x0 && y1 > y0)) return null
    return { outline: [[x0, y0], [x1, y0], [x1, y1], [x0, y1]], holes: [], name: `Box ${count + 1}`, shape: null, label: 'Draw box' }
  }
  if (g.kind === 'round' && g.r > 0) {
    const d = 2 * g.r
    const t = Math.min(tubeWall, g.r * 0.9)
    const geo = g.tube ? build.tube(d, t) : build.circle(d)
    const [cx, cy] = g.centre
    const move = (r: readonly (readonly [number, number])[]): Point[] => r.map(p => [p[0] + cx, p[1] + cy])
    return {
      outline: move(geo.outline),
      holes: geo.holes.map(h => ({ ring: move(h) })),
      name: g.tube ? 'Tube' : 'Round',
      shape: g.tube ? { kind: 'tube', params: { d, t } } : { kind: 'circle', params: { d } },
      label: g.tube ? 'Draw tube' : 'Draw round',
    }
  }
  return null
}

/** What a wheel event asks for: a touchpad pinch (ctrl+wheel) or a mouse notch zooms, two fingers pan. */
export function wheelAction(e: { deltaX: number; deltaY: number; deltaMode: number; ctrlKey: boolean; metaKey: boolean }): { kind: 'zoom'; factor: number } | { kind: 'pan'; dx: number; dy: number } {
  if (e.ctrlKey || e.metaKey) return { kind: 'zoom', factor: Math.exp(-e.deltaY * 0.01) }
  // A mouse wheel moves in whole notches (lines, or >= 50 px with no sideways part); a touchpad does not.
  const mouseWheel = e.deltaMode === 1 || (e.deltaX === 0 && Math.abs(e.deltaY) >= 50 && Number.isInteger(e.deltaY))
  if (mouseWheel) return { kind: 'zoom', factor: e.deltaY < 0 ? 1.2 : 1 / 1.2 }
  return { kind: 'pan', dx: -e.deltaX, dy: -e.deltaY }
}

/** A part as the pick needs it (mm). */
interface PickPart {
  id: string
  outline: readonly (readonly [number, number])[]
  holes: readonly { ring: readonly (readonly [number, number])[] }[]
}

/** What a Pick-tool press at `w` (mm) grabs: the rotation handle, a vertex of the selection, a part, or nothing. */
export type PickHit =
  | { kind: 'rotate'; gesture: Extract<Gesture, { kind: 'rotate' }> }
  | { kind: 'vertex'; vertex: { part: string; ring: number; index: number }; gesture: Extract<Gesture, { kind: 'vertex' }> }
  | { kind: 'part'; id: string }
  | { kind: 'none' }

/**
 * Hit-tests a press of the Pick tool (mm, `tol` the capture radius in mm): the rotation handle
 * first, then the vertices of the selected parts, then any part (top-most first).
 */
export function pickAt(parts: readonly PickPart[], selected: readonly string[], w: Point, tol: number, handle: Point | null, centre: Point | null): PickHit {
  if (handle && centre && Math.hypot(handle[0] - w[0], handle[1] - w[1]) <= tol) {
    return { kind: 'rotate', gesture: { kind: 'rotate', ids: [...selected], centre, start: angleDeg(centre, w), angle: 0 } }
  }
  const v = hitVertex(parts.filter(p => selected.includes(p.id)), w, tol)
  if (v) {
    const part = parts.find(p => p.id === v.part)!
    const ring = v.ring === 0 ? part.outline : part.holes[v.ring - 1]!.ring
    const at = (i: number): Point => { const q = ring[(i + ring.length) % ring.length]!; return [q[0], q[1]] }
    return { kind: 'vertex', vertex: v, gesture: { kind: 'vertex', ...v, prev: at(v.index - 1), next: at(v.index + 1), point: at(v.index), moved: false } }
  }
  const id = hitPart(parts, w, tol)
  return id ? { kind: 'part', id } : { kind: 'none' }
}

/** Every ring of the parts (mm), leaving out vertex `index` of ring `ring` of part `part` (a dragged vertex must not snap to itself). */
export function ringsExcept(parts: readonly PickPart[], part: string, ring: number, index: number): (readonly (readonly [number, number])[])[] {
  return parts.flatMap(p => [p.outline, ...p.holes.map(h => h.ring)].map((r, k) => (p.id === part && k === ring ? r.filter((_, i) => i !== index) : r)))
}

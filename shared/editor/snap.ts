import type { Point, Ring } from '../geometry/types'

/** What a snapped point was caught by, for the on-canvas cue. */
export type SnapCue =
  | { kind: 'vertex'; at: [number, number] }
  | { kind: 'midpoint'; at: [number, number] }
  | { kind: 'align'; at: [number, number]; from: { x?: [number, number]; y?: [number, number] } }
  | { kind: 'grid'; at: [number, number] }
  | { kind: 'none'; at: [number, number] }

/** What to snap to: grid spacing (mm, 0 for none), rings whose vertices and midpoints attract, and the capture radius (mm). */
export interface SnapContext {
  grid: number
  rings: readonly Ring[]
  tol: number
  /** Vertices to ignore (the one being dragged), as "ringIndex:vertexIndex" in `rings`. */
  skip?: ReadonlySet<string>
}

/** `v` rounded to the nearest multiple of `step` (step > 0). */
export function snapToGrid(v: number, step: number): number {
  const r = Math.round(v / step) * step
  // Clean binary residue: 0.1 * 3 = 0.30000000000000004.
  return Number(r.toPrecision(12))
}

/**
 * Snaps `p` (mm). Priority: a vertex within tol, an edge midpoint within tol, then per axis the
 * x or y of any vertex within tol (horizontal/vertical alignment), and the grid for an axis not
 * aligned. Returns the point and the cue to draw.
 */
export function snapPoint(p: Point, ctx: SnapContext): { point: [number, number]; cue: SnapCue } {
  const tol2 = ctx.tol * ctx.tol
  let vBest: [number, number] | null = null
  let vD2 = tol2
  let mBest: [number, number] | null = null
  let mD2 = tol2
  let ax: [number, number] | null = null
  let axD = ctx.tol
  let ay: [number, number] | null = null
  let ayD = ctx.tol
  ctx.rings.forEach((ring, r) => {
    const n = ring.length
    for (let i = 0; i < n; i++) {
      if (ctx.skip?.has(`${r}:${i}`)) continue
      const q = ring[i]!
      const dx = q[0] - p[0]
      const dy = q[1] - p[1]
      const d2 = dx * dx + dy * dy
      if (d2 <= vD2) { vD2 = d2; vBest = [q[0], q[1]] }
      // Ties go to the vertex nearest along the other axis, which draws the shortest guide.
      if (Math.abs(dx) < axD || (Math.abs(dx) === axD && ax && Math.abs(dy) < Math.abs((ax as [number, number])[1] - p[1]))) { axD = Math.abs(dx); ax = [q[0], q[1]] }
      else if (Math.abs(dx) === axD && !ax) { ax = [q[0], q[1]] }
      if (Math.abs(dy) < ayD || (Math.abs(dy) === ayD && ay && Math.abs(dx) < Math.abs((ay as [number, number])[0] - p[0]))) { ayD = Math.abs(dy); ay = [q[0], q[1]] }
      else if (Math.abs(dy) === ayD && !ay) { ay = [q[0], q[1]] }
      const j = (i + 1) % n
      if (ctx.skip?.has(`${r}:${j}`)) continue
      const s = ring[j]!
      const mx = (q[0] + s[0]) / 2
      const my = (q[1] + s[1]) / 2
      const md2 = (mx - p[0]) ** 2 + (my - p[1]) ** 2
      if (md2 <= mD2) { mD2 = md2; mBest = [mx, my] }
    }
  })
  if (vBest) return { point: vBest, cue: { kind: 'vertex', at: vBest } }
  if (mBest) return { point: mBest, cue: { kind: 'midpoint', at: mBest } }
  const gx = ctx.grid > 0 ? snapToGrid(p[0], ctx.grid) : p[0]
  const gy = ctx.grid > 0 ? snapToGrid(p[1], ctx.grid) : p[1]
  const alignX = ax as [number, number] | null
  const alignY = ay as [number, number] | null
  if (alignX || alignY) {
    const at: [number, number] = [alignX ? alignX[0] : gx, alignY ? alignY[1] : gy]
    return { point: at, cue: { kind: 'align', at, from: { ...(alignX ? { x: alignX } : {}), ...(alignY ? { y: alignY } : {}) } } }
  }
  if (ctx.grid > 0) return { point: [gx, gy], cue: { kind: 'grid', at: [gx, gy] } }
  return { point: [p[0], p[1]], cue: { kind: 'none', at: [p[0], p[1]] } }
}


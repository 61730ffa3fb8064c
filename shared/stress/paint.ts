import type { Ring } from '../geometry/types'
import type { FieldGradient } from './field'

/**
 * The 2D drawing calls the stress overlay makes: a browser canvas context and Konva's context
 * wrapper (what a Konva sceneFunc receives) both provide them.
 */
export type Paint2D = Pick<CanvasRenderingContext2D, 'arc' | 'beginPath' | 'clip' | 'closePath' | 'createLinearGradient' | 'fill' | 'fillStyle' | 'fillText' | 'font' | 'lineJoin' | 'lineTo' | 'lineWidth' | 'moveTo' | 'restore' | 'save' | 'setLineDash' | 'setTransform' | 'stroke' | 'strokeStyle' | 'strokeText' | 'textAlign'>

/** Ink colour of the stress overlay's lines and labels (Tailwind ink-900). */
export const STRESS_INK = '#161b23'

/** A label at a model point (mm) moved by (dx, dy) screen px (y down), upright at a fixed size. */
export interface SceneLabel {
  x: number
  y: number
  text: string
  dx: number
  dy: number
  colour?: string
  weight?: 'normal' | 'bold' | 'italic'
  size?: number
  align?: CanvasTextAlign
}

/** A marker at a model point: radius in px, optional fill, stroke and dash (px). */
export interface SceneDot {
  x: number
  y: number
  r: number
  fill?: string
  stroke?: string
  width?: number
  dash?: number[]
}

/**
 * Everything the stress overlay draws in one frame, in model coordinates (mm). Painted by one Konva
 * shape so a drag frame costs one canvas pass and no per-node bookkeeping.
 */
export interface StressScene {
  fields: { rings: readonly Ring[]; gradient: FieldGradient | null; fill: string }[]
  envelope: { rings: readonly Ring[]; base: string; bands: { flat: number[][]; fill: string }[] }[]
  outlines: (readonly Ring[])[]
  /** Flat segments [x1, y1, x2, y2, ...] of the isolines. */
  iso: number[]
  core: Ring | null
  coreDots: Ring
  neutral: readonly number[] | null
  /** Dashed guide segments (principal axes while dragging). */
  guides: number[]
  cut: readonly number[] | null
  dots: SceneDot[]
  labels: SceneLabel[]
}

/** An empty scene. */
export function emptyScene(): StressScene {
  return { fields: [], envelope: [], outlines: [], iso: [], core: null, coreDots: [], neutral: null, guides: [], cut: null, dots: [], labels: [] }
}

/** The world→screen affine map [a, b, c, d, e, f] of Konva (sx = a·x + c·y + e, sy = b·x + d·y + f). */
type Matrix = readonly number[]

function path(ctx: Paint2D | Path2D, m: Matrix, rings: readonly Ring[]): void {
  const [a, b, c, d, e, f] = m as [number, number, number, number, number, number]
  for (const ring of rings) {
    if (ring.length === 0) continue
    let p = ring[0]!
    ctx.moveTo(a * p[0] + c * p[1] + e, b * p[0] + d * p[1] + f)
    for (let i = 1; i < ring.length; i++) {
      p = ring[i]!
      ctx.lineTo(a * p[0] + c * p[1] + e, b * p[0] + d * p[1] + f)
    }
    ctx.closePath()
  }
}

/**
 * The rings as a screen-space Path2D, cached per rings array and view matrix: during a drag the
 * section and the view do not change, so its thousands of vertices are mapped once, not per frame.
 */
const pathCache = new WeakMap<object, { key: string; path: Path2D }>()
function cachedPath(m: Matrix, rings: readonly Ring[], owner: object = rings): Path2D {
  const key = m.join(',')
  const hit = pathCache.get(owner)
  if (hit && hit.key === key) return hit.path
  const p = new Path2D()
  path(p, m, rings)
  pathCache.set(owner, { key, path: p })
  return p
}

function flatPath(ctx: Paint2D, m: Matrix, rings: readonly number[][]): void {
  const [a, b, c, d, e, f] = m as [number, number, number, number, number, number]
  for (const r of rings) {
    ctx.moveTo(a * r[0]! + c * r[1]! + e, b * r[0]! + d * r[1]! + f)
    for (let i = 2; i < r.length; i += 2) ctx.lineTo(a * r[i]! + c * r[i + 1]! + e, b * r[i]! + d * r[i + 1]! + f)
    ctx.closePath()
  }
}

function segments(ctx: Paint2D, m: Matrix, segs: readonly number[]): void {
  const [a, b, c, d, e, f] = m as [number, number, number, number, number, number]
  for (let i = 0; i + 3 < segs.length; i += 4) {
    ctx.moveTo(a * segs[i]! + c * segs[i + 1]! + e, b * segs[i]! + d * segs[i + 1]! + f)
    ctx.lineTo(a * segs[i + 2]! + c * segs[i + 3]! + e, b * segs[i + 2]! + d * segs[i + 3]! + f)
  }
}

/**
 * Paints a scene on a native 2D context whose transform is the device pixel ratio only, mapping
 * model points with the stage matrix `m`: lines keep their pixel width and text stays upright.
 */
export function paintScene(ctx: Paint2D, m: Matrix, s: StressScene): void {
  const [a, b, c, d, e, f] = m as [number, number, number, number, number, number]
  const X = (x: number, y: number) => a * x + c * y + e
  const Y = (x: number, y: number) => b * x + d * y + f
  ctx.lineJoin = 'round'
  for (const field of s.fields) {
    const p = cachedPath(m, field.rings)
    const g = field.gradient
    if (g && !g.uniform) {
      const grad = ctx.createLinearGradient(X(g.start.x, g.start.y), Y(g.start.x, g.start.y), X(g.end.x, g.end.y), Y(g.end.x, g.end.y))
      for (let i = 0; i + 1 < g.stops.length; i += 2) grad.addColorStop(g.stops[i] as number, g.stops[i + 1] as string)
      ctx.fillStyle = grad
    } else {
      ctx.fillStyle = g?.uniform ?? field.fill
    }
    ctx.fill(p, 'evenodd')
  }
  for (const env of s.envelope) {
    ctx.save()
    const p = cachedPath(m, env.rings)
    ctx.fillStyle = env.base
    ctx.fill(p, 'evenodd')
    ctx.clip(p, 'evenodd')
    ctx.strokeStyle = 'rgba(22,27,35,0.35)'
    ctx.lineWidth = 0.75
    for (const band of env.bands) {
      ctx.beginPath()
      flatPath(ctx, m, band.flat)
      ctx.fillStyle = band.fill
      ctx.fill('evenodd')
      ctx.stroke()
    }
    ctx.restore()
  }
  ctx.strokeStyle = STRESS_INK
  ctx.lineWidth = 1
  for (const rings of s.outlines) ctx.stroke(cachedPath(m, rings))
  if (s.iso.length) {
    ctx.beginPath()
    segments(ctx, m, s.iso)
    ctx.strokeStyle = 'rgba(22,27,35,0.55)'
    ctx.setLineDash([5, 3])
    ctx.stroke()
    ctx.setLineDash([])
  }
  if (s.core) {
    const p = cachedPath(m, [s.core], s.core)
    ctx.fillStyle = 'rgba(31, 158, 126, 0.16)'
    ctx.fill(p)
    ctx.strokeStyle = '#116652'
    ctx.lineWidth = 1.5
    ctx.stroke(p)
    ctx.beginPath()
    for (const p of s.coreDots) {
      const x = X(p[0], p[1])
      const y = Y(p[0], p[1])
      ctx.moveTo(x + 3, y)
      ctx.arc(x, y, 3, 0, 2 * Math.PI)
    }
    ctx.fillStyle = '#116652'
    ctx.fill()
  }
  if (s.guides.length) {
    ctx.beginPath()
    segments(ctx, m, s.guides)
    ctx.strokeStyle = '#7c899b'
    ctx.lineWidth = 1
    ctx.setLineDash([2, 4])
    ctx.stroke()
    ctx.setLineDash([])
  }
  if (s.neutral) {
    ctx.beginPath()
    segments(ctx, m, s.neutral)
    ctx.strokeStyle = STRESS_INK
    ctx.lineWidth = 2
    ctx.setLineDash([10, 5])
    ctx.stroke()
    ctx.setLineDash([])
  }
  if (s.cut) {
    ctx.beginPath()
    segments(ctx, m, s.cut)
    ctx.strokeStyle = '#c8323a'
    ctx.lineWidth = 2
    ctx.stroke()
  }
  for (const dot of s.dots) {
    ctx.beginPath()
    ctx.arc(X(dot.x, dot.y), Y(dot.x, dot.y), dot.r, 0, 2 * Math.PI)
    if (dot.fill) {
      ctx.fillStyle = dot.fill
      ctx.fill()
    }
    if (dot.stroke) {
      ctx.strokeStyle = dot.stroke
      ctx.lineWidth = dot.width ?? 1.5
      ctx.setLineDash(dot.dash ?? [])
      ctx.stroke()
      ctx.setLineDash([])
    }
  }
  ctx.lineWidth = 3
  ctx.strokeStyle = '#ffffff'
  for (const l of s.labels) {
    ctx.font = `${l.weight === 'bold' ? '600 ' : l.weight === 'italic' ? 'italic ' : ''}${l.size ?? 11}px "IBM Plex Sans", sans-serif`
    ctx.textAlign = l.align ?? 'left'
    const x = X(l.x, l.y) + l.dx
    const y = Y(l.x, l.y) + l.dy
    ctx.strokeText(l.text, x, y)
    ctx.fillStyle = l.colour ?? STRESS_INK
    ctx.fillText(l.text, x, y)
  }
}

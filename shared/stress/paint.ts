import type { Ring } from '../geometry/types'
import type { FieldGradient } from './field'
import type { CanvasPalette } from '../canvas/palette'
import type { Box } from '../canvas/labels'
import { paintLabels, type Paint2D, type PlacedLabel, type SceneLabel } from '../canvas/paint-labels'

export type { Paint2D } from '../canvas/paint-labels'

export type { LabelTone, PlacedLabel, SceneLabel } from '../canvas/paint-labels'

/** A marker at a model point: radius in px, optional fill, stroke and dash (px). */
export interface SceneDot {
  x: number
  y: number
  r: number
  fill?: DotTone
  stroke?: DotTone
  width?: number
  dash?: number[]
}

/** Palette roles of a marker's fill and stroke; 'compression' and 'tension' are the field's ends. */
export type DotTone = 'compression' | 'compressionLight' | 'tension' | 'halo' | 'resultantIn' | 'resultantOut' | 'loadFill' | 'loadStroke'

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
  /** Screen boxes (CSS px) no label may cover: the legend, the dimension lines. */
  keepOut: Box[]
}

/** An empty scene. */
export function emptyScene(): StressScene {
  return { fields: [], envelope: [], outlines: [], iso: [], core: null, coreDots: [], neutral: null, guides: [], cut: null, dots: [], labels: [], keepOut: [] }
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

function dotColour(t: DotTone, pal: CanvasPalette): string {
  if (t === 'compression' || t === 'compressionLight' || t === 'tension') return pal.field[t]
  return pal[t]
}

/**
 * Paints a scene on a native 2D context whose transform is the device pixel ratio only, mapping
 * model points with the stage matrix `m`: lines keep their pixel width and text stays upright.
 * Colours come from `pal`. Labels are placed by placeLabels inside `area` (the canvas, CSS px),
 * clear of each other, the scene's keep-out boxes and the markers; a label moved away from its
 * point gets a thin leader line. Returns the labels as painted.
 */
export function paintScene(ctx: Paint2D, m: Matrix, s: StressScene, pal: CanvasPalette, area: Box): PlacedLabel[] {
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
    ctx.strokeStyle = pal.bandEdge
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
  ctx.strokeStyle = pal.ink
  ctx.lineWidth = 1
  for (const rings of s.outlines) ctx.stroke(cachedPath(m, rings))
  if (s.iso.length) {
    ctx.beginPath()
    segments(ctx, m, s.iso)
    ctx.strokeStyle = pal.isoline
    ctx.setLineDash([5, 3])
    ctx.stroke()
    ctx.setLineDash([])
  }
  if (s.core) {
    const p = cachedPath(m, [s.core], s.core)
    ctx.fillStyle = pal.coreFill
    ctx.fill(p)
    ctx.strokeStyle = pal.core
    ctx.lineWidth = 1.5
    ctx.stroke(p)
    ctx.beginPath()
    for (const p of s.coreDots) {
      const x = X(p[0], p[1])
      const y = Y(p[0], p[1])
      ctx.moveTo(x + 3, y)
      ctx.arc(x, y, 3, 0, 2 * Math.PI)
    }
    ctx.fillStyle = pal.core
    ctx.fill()
  }
  if (s.guides.length) {
    ctx.beginPath()
    segments(ctx, m, s.guides)
    ctx.strokeStyle = pal.helper
    ctx.lineWidth = 1
    ctx.setLineDash([2, 4])
    ctx.stroke()
    ctx.setLineDash([])
  }
  if (s.neutral) {
    ctx.beginPath()
    segments(ctx, m, s.neutral)
    ctx.strokeStyle = pal.ink
    ctx.lineWidth = 2
    ctx.setLineDash([10, 5])
    ctx.stroke()
    ctx.setLineDash([])
  }
  if (s.cut) {
    ctx.beginPath()
    segments(ctx, m, s.cut)
    ctx.strokeStyle = pal.resultantOut
    ctx.lineWidth = 2
    ctx.stroke()
  }
  const keepOut: Box[] = [...s.keepOut]
  for (const dot of s.dots) {
    const x = X(dot.x, dot.y)
    const y = Y(dot.x, dot.y)
    keepOut.push({ x: x - dot.r, y: y - dot.r, w: 2 * dot.r, h: 2 * dot.r })
    ctx.beginPath()
    ctx.arc(x, y, dot.r, 0, 2 * Math.PI)
    if (dot.fill) {
      ctx.fillStyle = dotColour(dot.fill, pal)
      ctx.fill()
    }
    if (dot.stroke) {
      ctx.strokeStyle = dotColour(dot.stroke, pal)
      ctx.lineWidth = dot.width ?? 1.5
      ctx.setLineDash(dot.dash ?? [])
      ctx.stroke()
      ctx.setLineDash([])
    }
  }
  return paintLabels(ctx, s.labels, X, Y, pal, area, keepOut)
}

import type { CanvasPalette } from './palette'
import { placeLabels, type Box, type LabelRequest } from './labels'

/**
 * The 2D drawing calls the canvas painters make: a browser canvas context and Konva's context
 * wrapper (what a Konva sceneFunc receives) both provide them.
 */
export type Paint2D = Pick<CanvasRenderingContext2D, 'arc' | 'beginPath' | 'clip' | 'closePath' | 'createLinearGradient' | 'fill' | 'fillStyle' | 'fillText' | 'font' | 'lineJoin' | 'lineTo' | 'lineWidth' | 'measureText' | 'moveTo' | 'restore' | 'save' | 'setLineDash' | 'setTransform' | 'stroke' | 'strokeStyle' | 'strokeText' | 'textAlign' | 'textBaseline'>

/** Palette roles a label may be drawn in (looked up when painting, so the theme can change). */
export type LabelTone = 'ink' | 'alarm' | 'core' | 'onset' | 'lifted' | 'resultantIn' | 'resultantOut'

/** A label at a model point (mm) moved by (dx, dy) screen px (y down), upright at a fixed size. */
export interface SceneLabel {
  x: number
  y: number
  text: string
  dx: number
  dy: number
  tone?: LabelTone
  weight?: 'normal' | 'bold' | 'italic'
  size?: number
  align?: CanvasTextAlign
  /** Placement order (higher first): 3 the extremes and the neutral line, 2 (default) markers and loads, 1 isoline values. */
  priority?: number
}

/** A label as painted: its text and its box on the screen (CSS px from the canvas's top left). */
export interface PlacedLabel extends Box {
  text: string
}

const FONT = '"IBM Plex Sans", sans-serif'
/**
 * Text widths for placing labels, as the sum of each character's width in its font: a drag
 * repaints labels whose numbers change every frame, and each character is measured once (kerning
 * is left out: a fraction of a pixel on these short labels, inside the box's 2 px margin).
 */
const widths = new Map<string, Map<string, number>>()
// A web font that arrives after the first paint changes every width: measure again.
if (typeof document !== 'undefined') document.fonts?.addEventListener('loadingdone', () => widths.clear())
function widthOf(ctx: Paint2D, f: string, text: string): number {
  let chars = widths.get(f)
  if (!chars) widths.set(f, (chars = new Map()))
  let w = 0
  let fontSet = false
  for (const ch of text) {
    let cw = chars.get(ch)
    if (cw === undefined) {
      if (chars.size > 2000) chars.clear()
      if (!fontSet) { ctx.font = f; fontSet = true }
      cw = ctx.measureText(ch).width
      chars.set(ch, cw)
    }
    w += cw
  }
  return w
}
function font(l: SceneLabel): string {
  return `${l.weight === 'bold' ? '600 ' : l.weight === 'italic' ? 'italic ' : ''}${l.size ?? 11}px ${FONT}`
}

/**
 * Measures, places and draws the labels: text upright, with a halo in the background colour. X and
 * Y map a model point to the screen; `area` is the canvas (CSS px).
 */
export function paintLabels(ctx: Paint2D, labels: readonly SceneLabel[], X: (x: number, y: number) => number, Y: (x: number, y: number) => number, pal: CanvasPalette, area: Box, keepOut: readonly Box[]): PlacedLabel[] {
  const requests: LabelRequest[] = []
  const anchors: [number, number][] = []
  for (const l of labels) {
    const size = l.size ?? 11
    const w = widthOf(ctx, font(l), l.text) + 2
    const h = Math.round(size * 1.3)
    const ax = X(l.x, l.y)
    const ay = Y(l.x, l.y)
    const x = ax + l.dx
    const left = l.align === 'right' || l.align === 'end' ? x - w : l.align === 'center' ? x - w / 2 : x
    // dy puts the baseline; the box starts an ascent above it.
    const top = ay + l.dy - size
    const priority = l.priority ?? 2
    requests.push({ x: left, y: top, w, h, priority, reach: priority >= 2 ? 84 : 18 })
    anchors.push([ax, ay])
  }
  const boxes = placeLabels(requests, area, keepOut)
  const out: PlacedLabel[] = []
  ctx.textAlign = 'left'
  ctx.textBaseline = 'alphabetic'
  ctx.lineWidth = 1
  ctx.strokeStyle = pal.helper
  ctx.beginPath()
  boxes.forEach((bx, i) => {
    const r = requests[i]!
    if (!bx || Math.hypot(bx.x - r.x, bx.y - r.y) < 16) return
    // A leader from the point to the nearer side of the moved box.
    const [ax, ay] = anchors[i]!
    ctx.moveTo(ax, ay)
    ctx.lineTo(Math.max(bx.x, Math.min(ax, bx.x + bx.w)), Math.max(bx.y, Math.min(ay, bx.y + bx.h)))
  })
  ctx.stroke()
  ctx.lineWidth = 3
  ctx.strokeStyle = pal.halo
  boxes.forEach((bx, i) => {
    if (!bx) return
    const l = labels[i]!
    ctx.font = font(l)
    const baseline = bx.y + (l.size ?? 11)
    ctx.strokeText(l.text, bx.x + 1, baseline)
    ctx.fillStyle = pal[l.tone ?? 'ink']
    ctx.fillText(l.text, bx.x + 1, baseline)
    out.push({ text: l.text, ...bx })
  })
  return out
}

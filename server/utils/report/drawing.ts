import type PDFDocument from 'pdfkit'
import type { Units } from '../../../shared/editor/units'
import type { AnalysisOutput } from '../../../shared/mechanics/analyze'
import { q } from './text'

type Doc = InstanceType<typeof PDFDocument>
type Ring = readonly (readonly [number, number])[]

const PT_PER_MM = 72 / 25.4

/** The drawing scale 1:n: the smallest n of the series 1, 2, 5 × 10^k at which `extent` mm fits `room` pt. */
export function drawingScale(extent: number, room: number): number {
  const need = extent * PT_PER_MM / Math.max(room, 1)
  for (let k = -3; k < 9; k++) {
    for (const m of [1, 2, 5]) {
      const n = m * 10 ** k
      if (n >= need) return n
    }
  }
  return 1e9
}

/**
 * The section drawn to scale 1:n in a box at (x, y) of w × h pt: the material regions (holes cut),
 * overall dimensions, the centroid, the principal axes, the core, the neutral line and the load
 * points, with the scale stated. y runs up in the section and down on the page.
 */
export function drawSection(doc: Doc, a: AnalysisOutput, loads: { P: number; x: number; y: number; name: string }[], box: { x: number; y: number; w: number; h: number }, system: Units, paper: string): void {
  const b = a.properties.bounds
  const pad = 46
  const n = drawingScale(Math.max(b.maxX - b.minX, (b.maxY - b.minY) * (box.w - 2 * pad) / (box.h - 2 * pad)), box.w - 2 * pad)
  const s = PT_PER_MM / n
  const cx = box.x + box.w / 2 - s * (b.minX + b.maxX) / 2
  const cy = box.y + box.h / 2 + s * (b.minY + b.maxY) / 2
  const X = (x: number) => cx + s * x
  const Y = (y: number) => cy - s * y
  const ring = (r: Ring) => {
    r.forEach((p, i) => (i === 0 ? doc.moveTo(X(p[0]), Y(p[1])) : doc.lineTo(X(p[0]), Y(p[1]))))
    doc.closePath()
  }
  doc.save()
  doc.rect(box.x, box.y, box.w, box.h).lineWidth(0.4).strokeColor('#999').stroke()
  doc.rect(box.x, box.y, box.w, box.h).clip()
  for (const region of a.regions) {
    for (const poly of region.polygons) {
      poly.forEach(r => ring(r))
      doc.lineWidth(0.8).fillColor('#d9e7e4').strokeColor('#1f4e47').fillAndStroke('#d9e7e4', '#1f4e47')
    }
  }
  const widen = Math.max(b.maxX - b.minX, b.maxY - b.minY) * 0.35
  const line = (A: number, B: number, C: number, colour: string, dash: [number, number] | null, width = 0.6) => {
    const seg = lineInBox(A, B, C, b.minX - widen, b.minY - widen, b.maxX + widen, b.maxY + widen)
    if (!seg) return
    doc.moveTo(X(seg[0][0]), Y(seg[0][1])).lineTo(X(seg[1][0]), Y(seg[1][1]))
    if (dash) doc.dash(dash[0], { space: dash[1] })
    doc.lineWidth(width).strokeColor(colour).stroke()
    doc.undash()
  }
  const p = a.properties
  const t = (p.theta * Math.PI) / 180
  // Major axis u through the centroid: −sin·(x − xc) + cos·(y − yc) = 0; minor v: cos·(x − xc) + sin·(y − yc) = 0.
  line(Math.sin(t) * p.centroid.x - Math.cos(t) * p.centroid.y, -Math.sin(t), Math.cos(t), '#6b5ca5', [6, 3])
  line(-Math.cos(t) * p.centroid.x - Math.sin(t) * p.centroid.y, Math.cos(t), Math.sin(t), '#6b5ca5', [2, 2])
  if (a.kern.length >= 3) {
    ring(a.kern)
    doc.lineWidth(0.9).strokeColor('#c26a00').stroke()
  }
  const na = a.stress?.neutralAxis
  if (na) line(na.a, na.b, na.c, '#b3261e', null, 1)
  // Centroid.
  doc.circle(X(p.centroid.x), Y(p.centroid.y), 3).lineWidth(0.8).strokeColor('#111').stroke()
  doc.moveTo(X(p.centroid.x) - 6, Y(p.centroid.y)).lineTo(X(p.centroid.x) + 6, Y(p.centroid.y)).moveTo(X(p.centroid.x), Y(p.centroid.y) - 6).lineTo(X(p.centroid.x), Y(p.centroid.y) + 6).stroke()
  // Loads.
  for (const l of loads) {
    doc.circle(X(l.x), Y(l.y), 2.6).fillColor(l.P >= 0 ? '#1a56db' : '#b3261e').fill()
    doc.font('regular').fontSize(6.5).fillColor('#1a3a8a').text(`${l.name} ${q(l.P, 'force', system)}`, X(l.x) + 4, Y(l.y) - 9, { lineBreak: false })
  }
  // Overall dimensions below and left of the section.
  doc.lineWidth(0.4).strokeColor('#333').fillColor('#333')
  const dimY = Y(b.minY) + 16
  doc.moveTo(X(b.minX), Y(b.minY) + 3).lineTo(X(b.minX), dimY + 3).moveTo(X(b.maxX), Y(b.minY) + 3).lineTo(X(b.maxX), dimY + 3).stroke()
  doc.moveTo(X(b.minX), dimY).lineTo(X(b.maxX), dimY).stroke()
  doc.font('regular').fontSize(7).text(q(b.maxX - b.minX, 'length', system), X(b.minX), dimY + 2, { width: X(b.maxX) - X(b.minX), align: 'center', lineBreak: false })
  const dimX = X(b.minX) - 16
  doc.moveTo(X(b.minX) - 3, Y(b.minY)).lineTo(dimX - 3, Y(b.minY)).moveTo(X(b.minX) - 3, Y(b.maxY)).lineTo(dimX - 3, Y(b.maxY)).stroke()
  doc.moveTo(dimX, Y(b.minY)).lineTo(dimX, Y(b.maxY)).stroke()
  doc.save().rotate(-90, { origin: [dimX - 3, (Y(b.minY) + Y(b.maxY)) / 2] })
  doc.text(q(b.maxY - b.minY, 'length', system), dimX - 3 - 60, (Y(b.minY) + Y(b.maxY)) / 2 - 11, { width: 120, align: 'center', lineBreak: false })
  doc.restore()
  doc.restore()
  // Scale and key under the box.
  const keyY = box.y + box.h + 4
  doc.font('regular').fontSize(7).fillColor('#333')
      .text(`Scale ${n >= 1 ? `1:${n}` : `${Math.round(1 / n)}:1`} on ${paper === 'LETTER' ? 'US Letter' : 'A4'} · centroid (circle and cross) · principal axes u (long dashes) and v (short dashes) · core (orange) · neutral line (red) · loads (blue: compression)`, box.x, keyY, { width: box.w })
}

/** The segment of the line A + B·x + C·y = 0 inside the box [x0, x1] × [y0, y1] (mm), or null when it misses. */
export function lineInBox(A: number, B: number, C: number, x0: number, y0: number, x1: number, y1: number): [[number, number], [number, number]] | null {
  const pts: [number, number][] = []
  if (Math.abs(C) > 1e-15) for (const x of [x0, x1]) { const y = -(A + B * x) / C; if (y >= y0 && y <= y1) pts.push([x, y]) }
  if (Math.abs(B) > 1e-15) for (const y of [y0, y1]) { const x = -(A + C * y) / B; if (x >= x0 && x <= x1) pts.push([x, y]) }
  if (pts.length < 2) return null
  // The two points farthest apart (corners may repeat).
  let best: [[number, number], [number, number]] = [pts[0]!, pts[1]!]
  let d = -1
  for (const p of pts) for (const r of pts) { const e = Math.hypot(p[0] - r[0], p[1] - r[1]); if (e > d) { d = e; best = [p, r] } }
  return d > 0 ? best : null
}

import { formatNumber, toDisplay, unitLabel, type Units } from '../editor/units'
import type { AnalysisOutput } from '../mechanics/analyze'

/** Colours of the exported stress field: compression, zero, tension. */
export const EXPORT_COLOURS = { compression: '#2f5fa7', zero: '#f4f4f1', tension: '#c2413a', outline: '#1f2a2a' } as const

type Answer = Pick<AnalysisOutput, 'properties' | 'regions' | 'stress' | 'kern'> & { contact?: AnalysisOutput['contact'] }

/**
 * The view on screen: the canvas transform screen = (panX + zoom·x, panY − zoom·y) (px, y down; zoom
 * in px per mm, as stores/viewport.ts keeps it) and the canvas size in px.
 */
export interface ExportView {
  zoom: number
  panX: number
  panY: number
  width: number
  height: number
}

/** Width (px) of the legend column to the right of the drawing. */
export const LEGEND_WIDTH = 200

/**
 * The section as a standalone SVG: each material region filled with its
 * stress field (the field is a plane, so a linear gradient along its slope is exact; colours run
 * from compression through zero to tension, symmetric about zero), holes cut, the centroid, the
 * neutral line, the core, a legend of the extremes and a scale bar, in the units of `system`.
 * A no-tension answer (with `contact`) shows the contact pressure instead: compression only, held at
 * zero where the section lifts off, or a plain overturning note.
 * Without `view` the whole section is fitted into `width` × `height` px (the legend column
 * included); with it the image is the view on screen, drawn at its zoom and pan and clipped to
 * it, `view.width + LEGEND_WIDTH` × `view.height` px, the legend to its right.
 */
export function exportSvg(a: Answer, title: string, system: Units, width = 1200, height = 800, view?: ExportView): string {
  const b = a.properties.bounds
  const pad = 60
  const legendW = LEGEND_WIDTH
  if (view) {
    width = Math.round(view.width) + legendW
    height = Math.round(view.height)
  }
  const drawW = width - legendW
  const s = view ? view.zoom : Math.min((drawW - 2 * pad) / Math.max(b.maxX - b.minX, 1e-9), (height - 2 * pad) / Math.max(b.maxY - b.minY, 1e-9))
  const ox = view ? view.panX : pad + ((drawW - 2 * pad) - s * (b.maxX - b.minX)) / 2 - s * b.minX
  const oy = view ? view.panY : height - pad - ((height - 2 * pad) - s * (b.maxY - b.minY)) / 2 + s * b.minY
  const X = (x: number) => +(ox + s * x).toFixed(2)
  const Y = (y: number) => +(oy - s * y).toFixed(2)
  const path = (rings: readonly (readonly (readonly [number, number])[])[]) => rings.map(r => `M${r.map(p => `${X(p[0])},${Y(p[1])}`).join('L')}Z`).join('')
  // No tension: the field is the contact pressure q (compression-positive), as sigma = -q held at 0.
  const contact = a.contact
  const lifted = contact !== undefined
  const cq = contact?.plane ?? null
  const st = lifted
    ? (cq && contact!.peak ? { plane: { a: -cq.a, b: -cq.b, c: -cq.c }, max: { value: 0 }, min: { value: -contact!.peak.value } } : null)
    : a.stress
  const peak = st ? (lifted ? Math.abs(st.min.value) : Math.max(...a.regions.map(r => r.n)) * Math.max(Math.abs(st.max.value), Math.abs(st.min.value))) : 0
  const tensionColour = lifted ? EXPORT_COLOURS.zero : EXPORT_COLOURS.tension
  const defs: string[] = []
  const shapes: string[] = []
  a.regions.forEach((r, i) => {
    let fill = '#cfe0dc'
    if (st && peak > 0) {
      // Along the slope (b, c) of n·plane: the stress at t is known, so stops at -peak, 0, +peak are placed exactly.
      const { a: pa, b: pb, c: pc } = st.plane
      const g = Math.hypot(pb, pc)
      if (g > 0) {
        const ux = pb / g; const uy = pc / g
        // Points where n·sigma = ±peak along the line through the origin in the slope direction.
        const t = (target: number) => (target / r.n - pa) / g
        const p0 = [ux * t(-peak), uy * t(-peak)]; const p1 = [ux * t(peak), uy * t(peak)]
        defs.push(`<linearGradient id="g${i}" gradientUnits="userSpaceOnUse" x1="${X(p0[0]!)}" y1="${Y(p0[1]!)}" x2="${X(p1[0]!)}" y2="${Y(p1[1]!)}"><stop offset="0" stop-color="${EXPORT_COLOURS.compression}"/><stop offset="0.5" stop-color="${EXPORT_COLOURS.zero}"/><stop offset="1" stop-color="${tensionColour}"/></linearGradient>`)
        fill = `url(#g${i})`
      } else {
        fill = pa * r.n < 0 ? EXPORT_COLOURS.compression : tensionColour
      }
    }
    for (const poly of r.polygons) shapes.push(`<path d="${path(poly)}" fill="${fill}" fill-rule="evenodd" stroke="${EXPORT_COLOURS.outline}" stroke-width="1.2"/>`)
  })
  if (a.kern.length >= 3) shapes.push(`<path d="${path([a.kern])}" fill="none" stroke="#c26a00" stroke-width="1.2"/>`)
  const c = a.properties.centroid
  shapes.push(`<circle cx="${X(c.x)}" cy="${Y(c.y)}" r="4" fill="none" stroke="#111"/><path d="M${X(c.x) - 8},${Y(c.y)}h16M${X(c.x)},${Y(c.y) - 8}v16" stroke="#111"/>`)
  // Scale bar: a round length near a quarter of the drawing's width.
  const target = drawW / 4 / s
  const step = 10 ** Math.floor(Math.log10(target))
  const barMm = [5, 2, 1].map(m => m * step).find(v => v <= target) ?? step
  const L = unitLabel('length', system)
  const S = unitLabel('stress', system)
  const legendX = drawW + 10
  const fmt = (v: number) => `${formatNumber(Math.abs(toDisplay(v, 'stress', system)))} ${S}${v < 0 ? ' C' : v > 0 ? ' T' : ''}`
  const legend = lifted && !st
    ? `<text x="${legendX}" y="${pad + 10}">Overturning: no equilibrium</text><text x="${legendX}" y="${pad + 30}">without tension</text>`
    : lifted && st
      ? `<defs><linearGradient id="lg" x1="0" y1="1" x2="0" y2="0"><stop offset="0" stop-color="${EXPORT_COLOURS.compression}"/><stop offset="1" stop-color="${EXPORT_COLOURS.zero}"/></linearGradient></defs>
<text x="${legendX}" y="${pad - 30}">Contact pressure</text><text x="${legendX}" y="${pad - 12}">(no tension)</text>
<rect x="${legendX}" y="${pad}" width="24" height="240" fill="url(#lg)" stroke="#555"/>
<text x="${legendX + 32}" y="${pad + 10}">0</text><text x="${legendX + 32}" y="${pad + 240}">${fmt(-peak)}</text>
<text x="${legendX}" y="${pad + 270}">peak ${fmt(-peak)}</text><text x="${legendX}" y="${pad + 290}">contact ${formatNumber(100 * (contact!.area ?? 0) / a.properties.area, 3)} % of the base</text>`
      : st
        ? `<defs><linearGradient id="lg" x1="0" y1="1" x2="0" y2="0"><stop offset="0" stop-color="${EXPORT_COLOURS.compression}"/><stop offset="0.5" stop-color="${EXPORT_COLOURS.zero}"/><stop offset="1" stop-color="${EXPORT_COLOURS.tension}"/></linearGradient></defs>
<rect x="${legendX}" y="${pad}" width="24" height="240" fill="url(#lg)" stroke="#555"/>
<text x="${legendX + 32}" y="${pad + 10}">${fmt(peak)}</text><text x="${legendX + 32}" y="${pad + 124}">0</text><text x="${legendX + 32}" y="${pad + 240}">${fmt(-peak)}</text>
<text x="${legendX}" y="${pad + 270}">max ${fmt(st.max.value)}</text><text x="${legendX}" y="${pad + 290}">min ${fmt(st.min.value)}</text>`
        : `<text x="${legendX}" y="${pad + 10}">No load: unstressed</text>`
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="IBM Plex Sans, sans-serif" font-size="14">
<rect width="${width}" height="${height}" fill="#ffffff"/>
<defs>${defs.join('')}<clipPath id="drawing"><rect width="${drawW}" height="${height}"/></clipPath></defs>
<g data-role="drawing" data-mode="${view ? 'view' : 'section'}" clip-path="url(#drawing)">${shapes.join('\n')}</g>
<path d="M${drawW}.5,0v${height}" stroke="#d5dada"/>
<g data-role="legend">${legend}</g>
<g data-role="scale-bar" data-mm="${barMm}" data-px="${(barMm * s).toFixed(2)}"><rect x="${pad - 8}" y="${height - 50}" width="${Math.max(barMm * s, 60) + 16}" height="38" fill="#ffffff" fill-opacity="0.85"/><path d="M${pad},${height - 24}h${(barMm * s).toFixed(2)}" stroke="#111" stroke-width="3"/><text x="${pad}" y="${height - 32}">${formatNumber(toDisplay(barMm, 'length', system))} ${L}</text></g>
<text x="${pad}" y="30" font-size="16" font-weight="600">${escapeXml(title)}</text>
</svg>
`
}

function escapeXml(s: string): string {
  return s.replace(/[<>&"']/g, c => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!)
}

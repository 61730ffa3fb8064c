import type { SketchDocument } from '../sketch/document'

/** The thumbnail's colours: mid-tones that read on a light and a dark dashboard alike. */
export const THUMBNAIL_COLOURS = { fill: 'rgba(93,106,124,0.30)', stroke: '#5d6a7c', cut: '#b46f12' } as const

/**
 * A small drawing of the section as a standalone SVG (`size` px square): each solid part filled
 * with its holes cut (even-odd), openings through several parts dashed, fitted with `pad` px
 * round it, y up as in the editor. No stresses and no text: it is for finding a section by eye.
 * An empty sketch gives an empty frame.
 */
export function thumbnailSvg(doc: Pick<SketchDocument, 'parts'>, size = 96, pad = 6): string {
  let minX = Infinity; let minY = Infinity; let maxX = -Infinity; let maxY = -Infinity
  for (const p of doc.parts) {
    for (const q of p.outline) {
      minX = Math.min(minX, q[0]); maxX = Math.max(maxX, q[0])
      minY = Math.min(minY, q[1]); maxY = Math.max(maxY, q[1])
    }
  }
  const shapes: string[] = []
  if (Number.isFinite(minX)) {
    const s = (size - 2 * pad) / Math.max(maxX - minX, maxY - minY, 1e-9)
    const ox = (size - s * (maxX - minX)) / 2 - s * minX
    const oy = (size + s * (maxY - minY)) / 2 + s * minY
    const ring = (r: readonly (readonly [number, number])[]) => `M${r.map(q => `${(ox + s * q[0]).toFixed(1)},${(oy - s * q[1]).toFixed(1)}`).join('L')}Z`
    // The stroke stays about 1 px however large the section.
    for (const p of doc.parts.filter(x => x.kind !== 'cut')) {
      shapes.push(`<path d="${[p.outline, ...p.holes.map(h => h.ring)].map(ring).join('')}" fill="${THUMBNAIL_COLOURS.fill}" fill-rule="evenodd" stroke="${THUMBNAIL_COLOURS.stroke}" stroke-width="1"/>`)
    }
    for (const p of doc.parts.filter(x => x.kind === 'cut')) {
      shapes.push(`<path d="${ring(p.outline)}" fill="none" stroke="${THUMBNAIL_COLOURS.cut}" stroke-width="1" stroke-dasharray="3 2"/>`)
    }
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}" viewBox="0 0 ${size} ${size}">${shapes.join('')}</svg>\n`
}

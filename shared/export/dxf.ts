import type { SketchDocument } from '../sketch/document'

/** The layers of a Kernwise DXF export. */
export const DXF_LAYERS = { parts: 'KW-PARTS', holes: 'KW-HOLES', cuts: 'KW-CUTS' } as const

/**
 * The outlines and holes of a sketch as an ASCII DXF (AutoCAD R2000 group codes, $INSUNITS 4 =
 * millimetres): one closed LWPOLYLINE per ring, outlines on KW-PARTS, holes (voids and notches)
 * on KW-HOLES, parts of kind cut on KW-CUTS. Coordinates in mm, full precision.
 */
export function exportDxf(doc: SketchDocument): string {
  const out: (string | number)[] = [0, 'SECTION', 2, 'HEADER', 9, '$ACADVER', 1, 'AC1015', 9, '$INSUNITS', 70, 4, 0, 'ENDSEC']
  out.push(0, 'SECTION', 2, 'TABLES', 0, 'TABLE', 2, 'LAYER', 70, 3)
  Object.values(DXF_LAYERS).forEach((name, i) => out.push(0, 'LAYER', 2, name, 70, 0, 62, [7, 1, 3][i]!, 6, 'CONTINUOUS'))
  out.push(0, 'ENDTAB', 0, 'ENDSEC', 0, 'SECTION', 2, 'ENTITIES')
  let handle = 0x100
  const ring = (layer: string, pts: readonly (readonly [number, number])[]) => {
    out.push(0, 'LWPOLYLINE', 5, (handle++).toString(16).toUpperCase(), 100, 'AcDbEntity', 8, layer, 100, 'AcDbPolyline', 90, pts.length, 70, 1)
    for (const [x, y] of pts) out.push(10, x, 20, y)
  }
  for (const p of doc.parts) {
    ring(p.kind === 'cut' ? DXF_LAYERS.cuts : DXF_LAYERS.parts, p.outline)
    if (p.kind !== 'cut') for (const h of p.holes) ring(DXF_LAYERS.holes, h.ring)
  }
  out.push(0, 'ENDSEC', 0, 'EOF')
  const lines: string[] = []
  for (let i = 0; i < out.length; i += 2) lines.push(String(out[i]), String(out[i + 1]))
  return `${lines.join('\n')}\n`
}

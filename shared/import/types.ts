/** A closed loop found in an imported file, in mm, with the layer (DXF) or block (CSV) it came from. */
export interface ImportedLoop {
  ring: [number, number][]
  layer: string
  /** What it was drawn with: 'LWPOLYLINE', 'CIRCLE', 'LINE/ARC', 'CSV'… */
  source: string
}

/** One part the import proposes: an outline with the holes nested in it (mm). */
export interface ImportedPart {
  outline: [number, number][]
  holes: [number, number][][]
  layer: string
}

/** Something in the file that does not become a loop, and why (open loops give their end points in mm). */
export interface SkippedItem {
  kind: 'open-loop' | 'unsupported' | 'duplicate' | 'degenerate' | 'orphan-hole'
  layer: string
  entity: string
  message: string
  ends?: [[number, number], [number, number]]
}

/** What a layer's loops become: nested parts and holes, holes only, or nothing. */
export type LayerRole = 'part' | 'hole' | 'skip'

/** The answer of POST /api/imports: parts nested with every layer as 'part', plus what the preview needs to re-nest. */
export interface ImportResult {
  format: 'dxf' | 'csv'
  /** Length unit of the file's numbers (converted to mm here). */
  units: LengthUnit
  /** Where the unit came from: the request, the file's $INSUNITS, or the mm default. */
  unitsFrom: 'request' | 'file' | 'default'
  layers: { name: string; loops: number }[]
  loops: ImportedLoop[]
  parts: ImportedPart[]
  skipped: SkippedItem[]
  file?: { hash: string; name: string; size: number }
}

/** Length units a file's coordinates may be in. */
export type LengthUnit = 'mm' | 'cm' | 'm' | 'in' | 'ft'

/** A file the importer refuses, with the line (1-based) or entity at fault; the route answers 400. */
export class ImportError extends Error {
  constructor(message: string, readonly line: number | null = null, readonly entity: string | null = null, readonly status: 400 | 413 = 400) {
    super(message)
    this.name = 'ImportError'
  }
}

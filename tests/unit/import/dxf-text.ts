/** Writes DXF text for tests: group-code/value pairs, an optional header, blocks and entities. */
export type Pair = [number, string | number]

/** One entity as its group pairs after `0 TYPE`. */
export function entity(type: string, pairs: Pair[]): Pair[] {
  return [[0, type], ...pairs]
}

/** A closed LWPOLYLINE on `layer` through `pts` ([x, y, bulge?]). */
export function lwpolyline(layer: string, pts: [number, number, number?][], closed = true): Pair[] {
  const pairs: Pair[] = [[8, layer], [90, pts.length], [70, closed ? 1 : 0]]
  for (const [x, y, b] of pts) {
    pairs.push([10, x], [20, y])
    if (b) pairs.push([42, b])
  }
  return entity('LWPOLYLINE', pairs)
}

/** A CIRCLE of radius r at (x, y). */
export const circle = (layer: string, x: number, y: number, r: number): Pair[] => entity('CIRCLE', [[8, layer], [10, x], [20, y], [40, r]])
/** A LINE from (x1, y1) to (x2, y2). */
export const line = (layer: string, x1: number, y1: number, x2: number, y2: number): Pair[] => entity('LINE', [[8, layer], [10, x1], [20, y1], [11, x2], [21, y2]])
/** An ARC centred at (x, y), radius r, from a0 to a1 degrees counter-clockwise. */
export const arc = (layer: string, x: number, y: number, r: number, a0: number, a1: number): Pair[] => entity('ARC', [[8, layer], [10, x], [20, y], [40, r], [50, a0], [51, a1]])

/** The DXF file: header variables, blocks {name: entities} and the entities. */
export function dxf(entities: Pair[][], { insunits, blocks = {} }: { insunits?: number; blocks?: Record<string, Pair[][]> } = {}): string {
  const out: Pair[] = []
  if (insunits !== undefined) out.push([0, 'SECTION'], [2, 'HEADER'], [9, '$INSUNITS'], [70, insunits], [0, 'ENDSEC'])
  if (Object.keys(blocks).length) {
    out.push([0, 'SECTION'], [2, 'BLOCKS'])
    for (const [name, ents] of Object.entries(blocks)) {
      out.push([0, 'BLOCK'], [8, '0'], [2, name], [70, 0], [10, 0], [20, 0], [3, name])
      for (const e of ents) out.push(...e)
      out.push([0, 'ENDBLK'], [8, '0'])
    }
    out.push([0, 'ENDSEC'])
  }
  out.push([0, 'SECTION'], [2, 'ENTITIES'])
  for (const e of entities) out.push(...e)
  out.push([0, 'ENDSEC'], [0, 'EOF'])
  return out.map(([c, v]) => `${c}\n${v}`).join('\n') + '\n'
}

import { toDisplay, unitLabel, type Quantity, type Units } from '../editor/units'
import type { AnalysisOutput } from '../mechanics/analyze'
import type { SectionProperties } from '../mechanics/types'

/** A CSV field, quoted when it holds a comma, quote or line break (RFC 4180). */
export function csvField(v: string | number | null): string {
  const s = v === null ? '' : String(v)
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s
}

const row = (cells: (string | number | null)[]) => cells.map(csvField).join(',')
const num = (v: number | null, q: Quantity, system: Units) => (v === null || !Number.isFinite(v) ? null : Number(toDisplay(v, q, system).toPrecision(10)))

/** The section properties as CSV rows "property, value, unit" in the display units of `system` (mm, MPa… inside). */
export function propertiesCsv(p: SectionProperties, system: Units): string {
  const rows: [string, number | null, Quantity][] = [
    ['A', p.area, 'area'], ['xc', p.centroid.x, 'length'], ['yc', p.centroid.y, 'length'],
    ['Ixx', p.Ixx, 'inertia'], ['Iyy', p.Iyy, 'inertia'], ['Ixy', p.Ixy, 'inertia'], ['I1', p.I1, 'inertia'], ['I2', p.I2, 'inertia'],
    ['theta', p.theta, 'angle'], ['rx', p.rx, 'length'], ['ry', p.ry, 'length'], ['r1', p.r1, 'length'], ['r2', p.r2, 'length'],
    ['S top', p.S.top, 'modulus'], ['S bottom', p.S.bottom, 'modulus'], ['S left', p.S.left, 'modulus'], ['S right', p.S.right, 'modulus'],
    ['Su +v', p.Su.pos, 'modulus'], ['Su -v', p.Su.neg, 'modulus'], ['Sv +u', p.Sv.pos, 'modulus'], ['Sv -u', p.Sv.neg, 'modulus'],
    ['Zx', p.Z.x, 'modulus'], ['Zy', p.Z.y, 'modulus'], ['Ip', p.Ip, 'inertia'], ['perimeter', p.perimeter, 'length'], ['mass per length', p.massPerMetre, 'massPerLength'],
  ]
  return `${[row(['Property', 'Value', 'Unit']), ...rows.map(([name, v, q]) => row([name, num(v, q, system), unitLabel(q, system)]))].join('\n')}\n`
}

/** The stress at every vertex as CSV: material, polygon, ring, vertex, x, y, stress (tension-positive) in the display units of `system`. */
export function vertexStressCsv(a: Pick<AnalysisOutput, 'regions' | 'stress'>, system: Units): string {
  const L = unitLabel('length', system)
  const S = unitLabel('stress', system)
  const lines = [row(['Material', 'Polygon', 'Ring', 'Vertex', `x (${L})`, `y (${L})`, `Stress (${S}; tension +)`])]
  for (const vs of a.stress?.vertices ?? []) {
    const region = a.regions[vs.region]
    const pts = region?.polygons[vs.polygon]?.[vs.ring] ?? []
    vs.values.forEach((value, i) => {
      const p = pts[i]
      lines.push(row([region?.name ?? '', vs.polygon + 1, vs.ring === 0 ? 'outline' : `hole ${vs.ring}`, i + 1, p ? num(p[0], 'length', system) : null, p ? num(p[1], 'length', system) : null, num(value, 'stress', system)]))
    })
  }
  return `${lines.join('\n')}\n`
}

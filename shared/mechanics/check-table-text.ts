import type { CheckTable } from './check-table'

/** The columns of the check table, in order: header (with the unit's power of mm) and the value of a row. */
export const CHECK_COLUMNS = [
  ['Row', 'name'], ['Sign', 'sign'], ['n', 'n'], ['A (mm²)', 'A'], ['n·A (mm²)', 'nA'], ['x (mm)', 'x'], ['y (mm)', 'y'],
  ['A·x (mm³)', 'Ax'], ['A·y (mm³)', 'Ay'], ['Ixx,own (mm⁴)', 'Ixx0'], ['Iyy,own (mm⁴)', 'Iyy0'], ['Ixy,own (mm⁴)', 'Ixy0'],
  ['dx (mm)', 'dx'], ['dy (mm)', 'dy'], ['A·dy² (mm⁴)', 'Ady2'], ['A·dx² (mm⁴)', 'Adx2'], ['A·dx·dy (mm⁴)', 'Adxdy'],
] as const

/**
 * The check table as CSV (RFC 4180: comma-separated, quoted where needed) or tab-separated text, in
 * model units (mm, mm², mm³, mm⁴) with full precision so a spreadsheet can redo the sums; the last
 * lines carry the sums and the centroid and second moments that follow from them.
 */
export function checkTableText(table: CheckTable, separator: ',' | '\t' = ','): string {
  const cell = (v: unknown): string => {
    const s = typeof v === 'number' ? String(v) : String(v ?? '')
    return separator === ',' && /[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s.replace(/\t/g, ' ')
  }
  const lines = [CHECK_COLUMNS.map(([h]) => cell(h)).join(separator)]
  for (const row of table.rows) lines.push(CHECK_COLUMNS.map(([, k]) => cell(row[k])).join(separator))
  const s = table.sums
  lines.push(['Sum', '', '', '', s.A, '', '', s.Ax, s.Ay].map(cell).join(separator))
  lines.push(['Centroid x̄ = ΣA·x/ΣA (mm)', s.x].map(cell).join(separator))
  lines.push(['Centroid ȳ = ΣA·y/ΣA (mm)', s.y].map(cell).join(separator))
  lines.push(['Ixx = Σ(Ixx,own + A·dy²) (mm⁴)', s.Ixx].map(cell).join(separator))
  lines.push(['Iyy = Σ(Iyy,own + A·dx²) (mm⁴)', s.Iyy].map(cell).join(separator))
  lines.push(['Ixy = Σ(Ixy,own + A·dx·dy) (mm⁴)', s.Ixy].map(cell).join(separator))
  return `${lines.join('\n')}\n`
}

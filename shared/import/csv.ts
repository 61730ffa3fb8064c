import Papa from 'papaparse'
import { MAX_VERTICES } from '../sketch/document'
import { cleanRing } from './geometry'
import { dropDuplicates } from './loops'
import { nestLoops } from './nest'
import { ImportError, type ImportResult, type ImportedLoop, type LengthUnit } from './types'
import { MM_PER_UNIT } from './units'

const NUMBER = /^[-+]?(\d+([.,]\d*)?|[.,]\d+)([eE][-+]?\d+)?$/

/**
 * Reads coordinates from CSV or pasted text into loops (mm) and nests them into parts. Columns
 * x, y (a ring per block, blocks split by a blank line) or ring, x, y (a ring per value of the
 * first column); a header row is optional (its `x`, `y`, `ring` names pick the columns);
 * delimiters comma, semicolon, tab or spaces; with semicolon, tab or space delimiters a decimal
 * comma is read as a point. Numbers are in `units` (default mm). Throws ImportError naming the line.
 */
export function importCsv(text: string, units: LengthUnit = 'mm'): ImportResult {
  const k = MM_PER_UNIT[units]
  const delimiter = guessDelimiter(text)
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false })
  const rows = parsed.data.map(r => r.map(c => c.trim())).map(r => (delimiter === ' ' ? r.filter(c => c !== '') : r))
  let first = rows.findIndex(r => r.some(c => c !== ''))
  if (first < 0) throw new ImportError('The coordinates are empty.')
  let xCol = 0; let yCol = 1; let ringCol = -1
  const head = rows[first]!
  if (!head.every(c => c === '' || NUMBER.test(c))) {
    const names = head.map(c => c.toLowerCase())
    xCol = names.indexOf('x'); yCol = names.indexOf('y')
    ringCol = names.findIndex(n => ['ring', 'loop', 'part', 'id'].includes(n))
    if (xCol < 0 || yCol < 0) throw new ImportError(`Line ${first + 1}: the header "${head.join(delimiter)}" needs columns named x and y.`, first + 1)
    first++
  } else if (head.filter(c => c !== '').length >= 3) {
    ringCol = 0; xCol = 1; yCol = 2
  }
  const rings = new Map<string, [number, number][]>()
  let block = 0
  let count = 0
  for (let i = first; i < rows.length; i++) {
    const r = rows[i]!
    if (r.every(c => c === '')) { block++; continue }
    const key = ringCol >= 0 ? `ring ${r[ringCol]}` : `block ${block + 1}`
    const x = toNumber(r[xCol], delimiter, i + 1)
    const y = toNumber(r[yCol], delimiter, i + 1)
    if (++count > MAX_VERTICES) throw new ImportError(`The coordinates hold over ${MAX_VERTICES} vertices; the limit is ${MAX_VERTICES}.`, i + 1, null, 413)
    const ring = rings.get(key) ?? []
    ring.push([x * k, y * k])
    rings.set(key, ring)
  }
  const loops: ImportedLoop[] = []
  for (const [key, ring] of rings) {
    const clean = cleanRing(ring, 0)
    if (clean.length < 3) throw new ImportError(`The ${key} has ${clean.length} distinct point${clean.length === 1 ? '' : 's'}; a ring needs at least 3.`)
    loops.push({ ring: clean, layer: 'CSV', source: key })
  }
  const unique = dropDuplicates(loops)
  const nested = nestLoops(unique.loops)
  return {
    format: 'csv', units, unitsFrom: 'request',
    layers: [{ name: 'CSV', loops: unique.loops.length }],
    loops: unique.loops, parts: nested.parts, skipped: [...unique.skipped, ...nested.skipped],
  }
}

/** The delimiter of the first data lines: semicolon or tab when present, else comma when present, else spaces. */
function guessDelimiter(text: string): string {
  const sample = text.split(/\r?\n/).slice(0, 20).join('\n')
  if (sample.includes(';')) return ';'
  if (sample.includes('\t')) return '\t'
  if (sample.includes(',')) return ','
  return ' '
}

function toNumber(cell: string | undefined, delimiter: string, line: number): number {
  const c = (cell ?? '').trim()
  if (!NUMBER.test(c) || (delimiter === ',' && c.includes(','))) throw new ImportError(`Line ${line}: "${c}" is not a number.`, line)
  const v = Number(c.replace(',', '.'))
  if (!Number.isFinite(v)) throw new ImportError(`Line ${line}: "${c}" is not a number.`, line)
  return v
}

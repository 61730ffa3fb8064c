import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { AnalysisRequest } from '../../../shared/analysis/contract'
import { analysisRequestFor } from '../../../shared/editor/analysis-request'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { SketchDocumentSchema } from '../../../shared/sketch/document'
import { drawingScale, lineInBox } from '../../../server/utils/report/drawing'
import { renderCalculationSheet } from '../../../server/utils/report/sheet'
import { pdfText } from '../../../server/utils/report/text'
import type { ReportInput } from '../../../server/utils/report/types'

const fonts = {
  regular: readFileSync(new URL('../../../fonts/ibm-plex-sans-latin-400-normal.woff', import.meta.url)),
  bold: readFileSync(new URL('../../../fonts/ibm-plex-sans-latin-600-normal.woff', import.meta.url)),
}
const doc = SketchDocumentSchema.parse({
  schema: 'kernwise.sketch/2',
  parts: [{ id: 'p', name: 'Plate', outline: [[0, 0], [100, 0], [100, 10], [0, 10]], material: { name: 'Steel', E: 200000 }, shape: null }],
  cases: [{ id: 'c', name: 'Dead', Mx: 0, My: 0 }],
  loads: [],
  settings: {},
})
const base: ReportInput = {
  paper: 'A4', workspace: 'Test works', project: 'P', title: 'Strip', engineer: 'E. Ngineer', checker: null, approval: null,
  date: new Date('2026-12-02T10:00:00Z'), doc, analysis: analyseSection({ ...AnalysisRequest.parse(analysisRequestFor(doc)), checkTable: true }), analysisError: null, fonts,
}
const dir = mkdtempSync(join(tmpdir(), 'kw-sheet-'))
async function text(input: ReportInput): Promise<string> {
  const file = join(dir, `${Math.random().toString(36).slice(2)}.pdf`)
  writeFileSync(file, await renderCalculationSheet(input))
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }) // Debian poppler-utils
}

describe('renderCalculationSheet', () => {
  it('an approved revision names who approved it and when, and is not marked "not checked"', async () => {
    const t = await text({ ...base, checker: 'C. Hecker', approval: { revision: 4, approvedBy: 'C. Hecker', approvedAt: new Date('2026-11-30T12:00:00Z') } })
    expect(t).toContain('Approved by C. Hecker on 2026-11-30')
    expect(t).not.toContain('NOT CHECKED')
    expect(t).toMatch(/REVISION[\s\S]*4/)
  })
  it('tabulates the check table: the strip row and the sums A = 100·10 and Ixx = 100·10³/12 (closed form b·h³/12)', async () => {
    const t = await text(base)
    expect(t).toContain('Check table')
    expect(t).toMatch(/Sums\s+1000\s/)
    expect(t).toContain('Ixx 8333')
  })
  it('a section that cannot be analysed still gets a sheet that says why', async () => {
    const t = await text({ ...base, analysis: null, analysisError: 'Part 1 crosses itself at vertex 3' })
    expect(t).toContain('could not be analysed: Part 1 crosses itself at vertex 3')
    expect(t).toContain('NOT CHECKED')
  })
})

describe('report helpers', () => {
  it('drawingScale picks the smallest 1, 2, 5 × 10^k that fits', () => {
    // 500 mm across 400 pt: 500 · 72/25.4 / 400 = 3.54 → 1:5.
    expect(drawingScale(500, 400)).toBe(5)
    expect(drawingScale(10, 400)).toBe(0.1) // enlarged 10:1 for a small section
  })
  it('lineInBox clips y = x to the unit box corner to corner', () => {
    expect(lineInBox(0, 1, -1, 0, 0, 1, 1)).toEqual([[0, 0], [1, 1]])
    expect(lineInBox(5, 0, 1, 0, 0, 1, 1)).toBeNull() // y = −5 misses
  })
  it('pdfText spells exponents and Greek letters the Latin font lacks, and keeps ² and ³', () => {
    expect(pdfText('1.2 × 10⁻¹⁴ mm⁴, 3 mm², σ')).toBe('1.2 × 10^-14 mm^4, 3 mm², sigma')
  })
})

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
  it('a submitted revision prints its number and its checker, and is "not checked"', async () => {
    const t = await text({ ...base, checker: 'C. Hecker', revision: { number: 3, status: 'submitted' } })
    expect(t).toContain('NOT CHECKED (revision 3, submitted)')
    expect(t).toContain('C. Hecker')
    expect(t).toMatch(/REVISION[\s\S]*3/)
    expect(t).not.toContain('working state')
  })
  it('the working state is "not checked (working state)"', async () => {
    const t = await text(base)
    expect(t).toContain('NOT CHECKED (working state)')
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

describe('the torsion page', () => {
  const r = 50
  // A 256-gon inscribed in a circle of radius 50 mm: its J is within 0.03 % of the circle's.
  const circle = SketchDocumentSchema.parse({
    schema: 'kernwise.sketch/2',
    parts: [{ id: 'c', name: 'Bar', outline: Array.from({ length: 256 }, (_, i) => [r * Math.cos((2 * Math.PI * i) / 256), r * Math.sin((2 * Math.PI * i) / 256)]), material: { name: 'Steel', E: 200000 }, shape: null }],
    cases: [{ id: 'c', name: 'Dead', Mx: 0, My: 0 }],
    loads: [],
    settings: {},
  })
  const analysis = analyseSection({ ...AnalysisRequest.parse(analysisRequestFor(circle)), checkTable: true, torsion: true, torsionStudy: true })
  const input: ReportInput = { ...base, title: 'Round bar', doc: circle, analysis }
  /** The number printed after a row label on the sheet ("9.816 × 10^6 mm^4" is 9.816e6 in mm^4). */
  const number = (t: string, label: string) => {
    const m = t.match(new RegExp(`${label}\\s+(−?[0-9.]+)(?: × 10\\^(-?[0-9]+))?(?:\\s+(\\S+))?`))
    if (!m) throw new Error(`no "${label}" on the sheet`)
    return { value: Number(m[1]!.replace('−', '-')) * 10 ** Number(m[2] ?? 0), unit: m[3] ?? '' }
  }

  it('prints J of a solid circle: the analysis value, and pi·r⁴/2 within 1 % (closed form, J = Ip for a circle)', async () => {
    const t = await text(input)
    expect(t).toContain('Torsion and shear (finite elements on the section)')
    const J = number(t, 'J torsion constant')
    expect(J.unit).toBe('mm^4')
    const fe = analysis.torsion!.J
    expect(Math.abs(J.value - fe) / fe).toBeLessThan(5e-4) // four significant digits of the analysis
    expect(Math.abs(J.value - (Math.PI * r ** 4) / 2) / ((Math.PI * r ** 4) / 2)).toBeLessThan(0.01)
  })
  it('prints tau_max per unit torque of the circle: 2/(pi·r³) within 2 % (closed form tau = T·r/J), the shear centre at the centre and the shear areas of the analysis', async () => {
    const t = await text(input)
    const tau = number(t, 'Max torsional shear stress per unit torque')
    expect(tau.unit).toBe('MPa')
    // MPa per kN·m: 1 kN·m = 10⁶ N·mm.
    const expected = (2 / (Math.PI * r ** 3)) * 1e6
    expect(Math.abs(tau.value - expected) / expected).toBeLessThan(0.02)
    expect(t).toMatch(/MPa per kN·m/)
    expect(t).toMatch(/Shear centre from the centroid \(under 10\^-4 of the size: 0\)\s+0 mm, 0 mm/)
    // The shear areas as the analysis gives them (their closed forms are checked in tests/unit/mechanics/torsion).
    const ratio = t.match(/Shear area \/ A along x, along y\s+([0-9.]+), ([0-9.]+)/)
    expect(ratio).not.toBeNull()
    expect(Number(ratio![1])).toBeCloseTo(analysis.torsion!.shearAreas.x / analysis.properties.area, 3)
    expect(Number(ratio![2])).toBeCloseTo(analysis.torsion!.shearAreas.y / analysis.properties.area, 3)
  })
  it('prints the mesh (section vertices, nodes, elements) and the mesh study with its difference', async () => {
    const t = await text(input)
    expect(number(t, 'Section vertices').value).toBe(256)
    expect(number(t, 'Nodes \\(six-node triangles\\)').value).toBe(analysis.torsion!.mesh.nodes)
    expect(number(t, 'Elements').value).toBe(analysis.torsion!.mesh.elements)
    expect(t).toContain('Mesh study: density')
    const study = analysis.torsion!.study!
    expect(t).toMatch(new RegExp(`coarse\\s+${study.rows[0]!.nodes}\\s+${study.rows[0]!.elements}`))
    expect(t).toMatch(/Mesh study: J differs by [0-9.]+ %/)
  })
  it('states the method and what it neglects, with the cautions', async () => {
    const t = (await text(input)).replace(/\s+/g, ' ')
    expect(t).toContain('Elastic, uniform (Saint-Venant) torsion')
    expect(t).toContain('finite element method on the section')
    expect(t).toContain('Neglected: warping torsion along the member')
    expect(t).toContain('buckling of any kind')
    expect(t).toContain('Cautions for torsion')
  })
  it('a section the torsion solve refused says why on the torsion page and keeps the rest', async () => {
    const t = await text({ ...base, torsionError: 'Torsion takes at most 20000 vertices (this section has 20004).' })
    expect(t).toContain('Torsion was not computed: Torsion takes at most 20000 vertices')
    expect(t).toContain('Check table')
  })
  it('a sheet without torsion asked has no torsion page', async () => {
    expect(await text(base)).not.toContain('Torsion and shear (finite elements')
  })
})

describe('the torsion page: shear flow per connection', () => {
  const plate = (id: string, name: string, x: number, y: number, w: number, h: number) => ({ id, name, outline: [[x, y], [x + w, y], [x + w, y + h], [x, y + h]], material: { name: 'Steel', E: 200000 }, shape: null })
  const box = SketchDocumentSchema.parse({
    schema: 'kernwise.sketch/2',
    parts: [plate('t', 'Top', -100, 140, 200, 10), plate('r', 'Right', 90, -140, 10, 280), plate('b', 'Bottom', -100, -150, 200, 10), plate('l', 'Left', -100, -140, 10, 280)],
    cases: [{ id: 'c', name: 'Dead', Mx: 0, My: 0 }],
    loads: [],
    settings: { shear: { Vx: 0, Vy: 100000 } },
  })
  it('a box of four plates lists each weld with |q| from the FE solution, Vy·Q/Ixx of half a flange within 1 % (thin-walled closed-cell result)', async () => {
    const analysis = analyseSection({ ...AnalysisRequest.parse(analysisRequestFor(box)), checkTable: true, torsion: true })
    const t = await text({ ...base, doc: box, analysis })
    const Ixx = 2 * (200 * 10 ** 3 / 12 + 2000 * 145 ** 2) + 2 * (10 * 280 ** 3 / 12) // parallel axes by hand
    const expected = (100000 * 100 * 10 * 145) / Ixx
    const rows = [...t.matchAll(/Top – Right\s+10\s+([0-9.]+)\s+finite element shear solution \(closed cell\)/g)]
    expect(rows).toHaveLength(1)
    expect(Math.abs(Number(rows[0]![1]) - expected) / expected).toBeLessThan(0.01)
    expect(t.match(/finite element shear solution \(closed cell\)/g)).toHaveLength(4)
  })
})

describe('the torsion page of a channel', () => {
  // Thin channel: web mid-line on x = 0, flange mid-lines at y = ±h/2, tips at x = b, all t thick.
  const h = 200; const b = 100; const t = 4
  const channel = SketchDocumentSchema.parse({
    schema: 'kernwise.sketch/2',
    parts: [{ id: 'c', name: 'Channel', outline: [[-t / 2, -h / 2 - t / 2], [b, -h / 2 - t / 2], [b, -h / 2 + t / 2], [t / 2, -h / 2 + t / 2], [t / 2, h / 2 - t / 2], [b, h / 2 - t / 2], [b, h / 2 + t / 2], [-t / 2, h / 2 + t / 2]], material: { name: 'Steel', E: 200000 }, shape: null }],
    cases: [{ id: 'c', name: 'Dead', Mx: 0, My: 0 }],
    loads: [],
    settings: {},
  })
  it('prints the shear centre e = 3b²/(h + 6b) behind the web within 3 % (thin-walled closed form, equal thicknesses)', async () => {
    const analysis = analyseSection({ ...AnalysisRequest.parse(analysisRequestFor(channel)), checkTable: true, torsion: true })
    const sheet = await text({ ...base, doc: channel, analysis })
    const m = sheet.match(/Shear centre xs, ys\s+(−?[0-9.]+) mm, (−?[0-9.]+) mm/)
    expect(m).not.toBeNull()
    const e = (3 * b * b) / (h + 6 * b)
    expect(Math.abs(-Number(m![1]!.replace('−', '-')) - e) / e).toBeLessThan(0.03)
    expect(Number(m![2]!.replace('−', '-'))).toBe(0) // on the axis of symmetry
  })
})

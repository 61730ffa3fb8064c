// Calculation-sheet benchmark: renders the PDF of a section whose vertex table runs to about
// 20 pages (and a one-page-table demo plate), and prints the time per render. Figures, not a test.
// Usage: npm run bench:report   (BENCH_PDF=path also writes the 20-page PDF there)
import { readFileSync, writeFileSync } from 'node:fs'
import { AnalysisRequest } from '../shared/analysis/contract'
import { analysisRequestFor } from '../shared/editor/analysis-request'
import { analyseSection } from '../shared/mechanics/analyze'
import { SketchDocumentSchema } from '../shared/sketch/document'
import { renderCalculationSheet } from '../server/utils/report/sheet'

const fonts = {
  regular: readFileSync(new URL('../fonts/ibm-plex-sans-latin-400-normal.woff', import.meta.url)),
  bold: readFileSync(new URL('../fonts/ibm-plex-sans-latin-600-normal.woff', import.meta.url)),
}

function docWith(vertices: number) {
  // A round pier with a box void: the vertex table holds vertices + 4 rows.
  const outline = Array.from({ length: vertices }, (_, i) => [400 * Math.cos((2 * Math.PI * i) / vertices), 400 * Math.sin((2 * Math.PI * i) / vertices)])
  return SketchDocumentSchema.parse({
    schema: 'kernwise.sketch/2',
    parts: [{ id: 'p', name: 'Pier', outline, holes: [{ id: 'h', ring: [[-100, -100], [-100, 100], [100, 100], [100, -100]] }], material: { name: 'Concrete', E: 30000, fc: 30 }, shape: null }],
    cases: [{ id: 'c', name: 'Dead', Mx: 2e7, My: 0 }],
    loads: [{ id: 'l', name: 'Column', caseId: 'c', P: 500000, x: 60, y: 30 }],
    settings: {},
  })
}

async function bench(label: string, vertices: number, runs: number): Promise<Buffer> {
  const doc = docWith(vertices)
  let pdf = Buffer.alloc(0)
  const times: number[] = []
  const analysisTimes: number[] = []
  for (let r = 0; r < runs; r++) {
    const t0 = performance.now()
    // As the report route asks: the check table and torsion with its mesh study (the torsion page).
    const analysis = analyseSection({ ...AnalysisRequest.parse(analysisRequestFor(doc)), checkTable: true, torsion: true, torsionStudy: true })
    analysisTimes.push(performance.now() - t0)
    pdf = await renderCalculationSheet({ paper: 'A4', workspace: 'Bench', project: 'Bench', title: label, engineer: 'Bench', checker: null, approval: null, date: new Date(), doc, analysis, analysisError: null, fonts })
    times.push(performance.now() - t0)
  }
  const pages = (pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length
  times.sort((a, b) => a - b)
  analysisTimes.sort((a, b) => a - b)
  console.log(`${label}: ${vertices} vertices, ${pages} pages, ${(pdf.length / 1024).toFixed(0)} KB; analysis + PDF median ${times[Math.floor(runs / 2)]!.toFixed(0)} ms, best ${times[0]!.toFixed(0)} ms over ${runs} runs (analysis alone median ${analysisTimes[Math.floor(runs / 2)]!.toFixed(0)} ms)`)
  return pdf
}

await bench('warm-up', 40, 2)
await bench('short sheet', 40, 5)
const big = await bench('20-page sheet', 1030, 5)
if (process.env.BENCH_PDF) writeFileSync(process.env.BENCH_PDF, big)

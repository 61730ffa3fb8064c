import { IdParams } from '../../../../shared/auth/schemas'
import { AnalysisRequest } from '../../../../shared/analysis/contract'
import { analysisRequestFor } from '../../../../shared/editor/analysis-request'
import { ReportQuery } from '../../../../shared/export/report-query'
import type { AnalysisOutput } from '../../../../shared/mechanics/analyze'
import { renderCalculationSheet } from '../../../utils/report/sheet'

/**
 * The calculation sheet of a sketch I can read as a PDF (A4 or US Letter): the working state,
 * marked "not checked" on every page, or with `?revision=N` that revision (an approved one names
 * who approved it and when; any other is "not checked").
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const query = await queryAs(event, ReportQuery)
  const revision = query.revision ? await findRevision(sketch.id, Number(query.revision)) : null
  const people = await peopleById([sketch.ownerId, revision?.checkerId, revision?.approvedBy])
  const doc = readDocument(revision ? revision.document : sketch.document)
  let analysis: AnalysisOutput | null = null
  let analysisError: string | null = null
  let torsionError: string | null = null
  const request = analysisRequestFor(doc)
  if (request) {
    const body = { ...AnalysisRequest.parse(request), checkTable: true }
    // The torsion page's finite element solve (with its mesh study) runs in the analysis pool, off
    // the event loop; a section the torsion solve refuses still gets the rest of the sheet.
    try {
      analysis = await analyse(event, { ...body, torsion: true, torsionStudy: true })
    } catch (error) {
      if (!isGeometryError(error)) throw error
      try {
        analysis = await analyse(event, body)
        torsionError = (error as { message: string }).message
      } catch (again) {
        if (!isGeometryError(again)) throw again
        analysisError = (again as { message: string }).message
      }
    }
  }
  const fonts = useStorage('assets:fonts')
  const [regular, bold] = await Promise.all([
    fonts.getItemRaw('ibm-plex-sans-latin-400-normal.woff'),
    fonts.getItemRaw('ibm-plex-sans-latin-600-normal.woff'),
  ])
  const pdf = await renderCalculationSheet({
    paper: query.paper,
    workspace: await workspaceName(),
    project: sketch.project,
    title: revision ? revision.title : sketch.title,
    engineer: people.get(sketch.ownerId)?.name ?? '',
    checker: revision?.checkerId ? people.get(revision.checkerId)?.name ?? null : null,
    approval: revision?.status === 'approved'
      ? { revision: revision.number, approvedBy: people.get(revision.approvedBy!)?.name ?? 'a former member', approvedAt: revision.approvedAt! }
      : null,
    revision: revision ? { number: revision.number, status: revision.status } : null,
    date: new Date(),
    doc,
    analysis,
    analysisError,
    torsionError,
    fonts: { regular: toBytes(regular), bold: toBytes(bold) },
  })
  const file = `${sketch.title.replace(/[^\w.-]+/g, '-').slice(0, 60) || 'sketch'}-calculation.pdf`
  setResponseHeaders(event, {
    'content-type': 'application/pdf',
    'content-disposition': `${query.download === '1' ? 'attachment' : 'inline'}; filename="${file}"`,
    'cache-control': 'private, no-store',
  })
  return pdf
})

function toBytes(raw: unknown): Uint8Array {
  if (raw instanceof Uint8Array) return raw
  if (raw instanceof ArrayBuffer) return new Uint8Array(raw)
  throw createError({ statusCode: 500, message: 'The report fonts are missing from the server build.' })
}

/** The analysis of a sheet: in a pool worker when it is heavy (torsion), else in-line; bad geometry throws a 422. */
async function analyse(event: Parameters<typeof analyseInPool>[0], input: Parameters<typeof analyseInPool>[1]): Promise<AnalysisOutput> {
  const result = await analyseInPool(event, input, JSON.stringify(input))
  return 'json' in result ? (JSON.parse(result.json.toString('utf8')) as AnalysisOutput) : result
}

/** A 422 from the analysis (bad geometry, a section torsion refuses, a solve over its time limit). */
function isGeometryError(error: unknown): boolean {
  return (error as { statusCode?: number } | null)?.statusCode === 422
}

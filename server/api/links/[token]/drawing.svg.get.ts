import { AnalysisRequest } from '../../../../shared/analysis/contract'
import { analysisRequestFor } from '../../../../shared/editor/analysis-request'
import { exportSvg } from '../../../../shared/export/svg'
import { analyseSection } from '../../../../shared/mechanics/analyze'
import { SectionError } from '../../../../shared/mechanics/types'

/** The drawing of a link's revision as SVG (the stress field, neutral line and core), as the SVG export draws it. */
export default defineEventHandler(async (event) => {
  const { revision } = await resolveLink(event)
  const document = readDocument(revision.document)
  const request = analysisRequestFor(document)
  if (!request) throw createError({ statusCode: 422, message: 'This revision has no parts to draw.' })
  try {
    const svg = exportSvg(analyseSection(AnalysisRequest.parse(request)), `${revision.title} · revision ${revision.number}`, document.settings.units)
    setResponseHeader(event, 'content-type', 'image/svg+xml; charset=utf-8')
    return svg
  } catch (error) {
    if (error instanceof SectionError) throw createError({ statusCode: 422, message: error.message })
    throw error
  }
})

import { AnalysisRequest } from '../../../shared/analysis/contract'
import { analysisAnswer } from '../../../shared/analysis/answer'
import { analysisRequestFor } from '../../../shared/editor/analysis-request'
import { analyseSection } from '../../../shared/mechanics/analyze'
import { SectionError } from '../../../shared/mechanics/types'

/**
 * What a read-only link shows, without signing in: the revision it was made for (title,
 * project, number, note, status, approval date), its document and its analysis. No account
 * data: no names, no e-mails, no ids of people.
 */
export default defineEventHandler(async (event) => {
  const { sketch, revision } = await resolveLink(event)
  const document = readDocument(revision.document)
  let analysis = null
  let analysisError: string | null = null
  const request = analysisRequestFor(document)
  if (request) {
    try {
      analysis = analysisAnswer(analyseSection(AnalysisRequest.parse(request)), ['vertexStresses'])
      if (!analysis) analysisError = 'The section could not be analysed (a result was not finite).'
    } catch (error) {
      if (!(error instanceof SectionError)) throw error
      analysisError = error.message
    }
  }
  return {
    title: revision.title,
    project: sketch.project,
    revision: { number: revision.number, note: revision.note, status: revision.status, createdAt: revision.createdAt.toISOString(), approvedAt: revision.approvedAt?.toISOString() ?? null },
    document,
    analysis,
    analysisError,
  }
})

import { analysisAnswer, NOT_FINITE_MESSAGE, requestVertices } from '../../shared/analysis/answer'
import { AnalysisRequest } from '../../shared/analysis/contract'
import { MAX_VERTICES } from '../../shared/sketch/document'

/**
 * Section analysis (mm, N, MPa; P > 0 compression, stresses tension-positive): properties, core,
 * stress, no-tension contact, shear flow, slenderness, torsion when asked. Bad geometry answers 422
 * naming the part and vertex; the answer never holds NaN or Infinity. A large body is read,
 * checked and analysed in a worker thread (the same checks and messages), off the event loop.
 */
export default defineEventHandler(async (event) => {
  const t0 = performance.now()
  await requireRole(event, 'analyse')
  const timing = () => setResponseHeader(event, 'Server-Timing', `analysis;dur=${(performance.now() - t0).toFixed(2)}`)
  const text = (await readRawBody(event, 'utf8')) ?? ''
  if (text.length > WORKER_BODY_BYTES) {
    const answered = await analyseTextInPool(event, text)
    if (answered) {
      timing()
      setResponseHeader(event, 'Content-Type', 'application/json')
      return answered.json
    }
  }
  const body = await readBodyAs(event, AnalysisRequest)
  const vertices = requestVertices(body)
  if (vertices > MAX_VERTICES) {
    throw createError({ statusCode: 413, message: `The section has ${vertices} vertices; the limit is ${MAX_VERTICES}. Use a coarser chord tolerance for arcs.` })
  }
  // Torsion goes to a worker with the body's text and comes back as the answer's text.
  const result = await analyseInPool(event, body, text)
  if ('json' in result) {
    timing()
    setResponseHeader(event, 'Content-Type', 'application/json')
    return result.json
  }
  const answer = analysisAnswer(result, body.omit)
  // A degenerate case slipped through the engine's own checks: say so instead of sending NaN.
  if (!answer) throw createError({ statusCode: 422, message: NOT_FINITE_MESSAGE })
  // Sign-in, parse, checks and the analysis (not the JSON encoding of the answer), for clients' timing.
  timing()
  return answer
})

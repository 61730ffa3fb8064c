import type { H3Event } from 'h3'
import { analysisAnswer, NOT_FINITE_MESSAGE, requestVertices } from '../../shared/analysis/answer'
import { AnalysisRequest } from '../../shared/analysis/contract'
import { MAX_VERTICES } from '../../shared/sketch/document'

/**
 * Section analysis (mm, N, MPa; P > 0 compression, stresses tension-positive): properties, core,
 * stress, no-tension contact, shear flow, slenderness, torsion when asked. Bad geometry answers 422
 * naming the part and vertex; the answer never holds NaN or Infinity. While other analyses are in
 * progress, and for any large body, the body is read, checked, analysed and encoded in a worker
 * thread (the same checks and messages), off the event loop; a lone small analysis runs here,
 * as does everything without the worker bundle (nuxt dev).
 */
export default defineEventHandler(event => countedAnalysis(event, () => analyse(event)))

async function analyse(event: H3Event) {
  const t0 = performance.now()
  await requireRole(event, 'analyse')
  const timing = () => setResponseHeader(event, 'Server-Timing', `analysis;dur=${(performance.now() - t0).toFixed(2)}`)
  const raw = (await readRawBody(event, false)) ?? Buffer.alloc(0)
  if (raw.byteLength > WORKER_BODY_BYTES || !aloneInFlight(event)) {
    const answered = await analyseBodyInPool(event, raw)
    if (answered) {
      timing()
      setResponseHeader(event, 'Content-Type', 'application/json')
      return answered.json
    }
  }
  const text = raw.toString('utf8')
  const body = await readBodyAs(event, AnalysisRequest)
  const vertices = requestVertices(body)
  if (vertices > MAX_VERTICES) {
    throw createError({ statusCode: 413, message: `The section has ${vertices} vertices; the limit is ${MAX_VERTICES}. Use a coarser chord tolerance for arcs.` })
  }
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
}

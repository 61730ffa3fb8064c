import { AnalysisRequest, type AnalysisResponse } from '../../shared/analysis/contract'
import { analyseSection } from '../../shared/mechanics/analyze'
import { MAX_VERTICES } from '../../shared/sketch/document'

/**
 * Section analysis (mm, N, MPa; P > 0 compression, stresses tension-positive): properties, core,
 * stress, no-tension contact, shear flow, slenderness. Bad geometry answers 422 naming the part
 * and vertex; the answer never holds NaN or Infinity.
 */
export default defineEventHandler(async (event) => {
  const t0 = performance.now()
  await requireRole(event, 'analyse')
  const body = await readBodyAs(event, AnalysisRequest)
  let vertices = 0
  for (const part of body.parts) vertices += part.outline.length + part.holes.reduce((n, h) => n + h.length, 0)
  if (vertices > MAX_VERTICES) {
    throw createError({ statusCode: 413, message: `The section has ${vertices} vertices; the limit is ${MAX_VERTICES}. Use a coarser chord tolerance for arcs.` })
  }
  const result = await analyseInPool(event, body)
  // The regions are the validated input rings (or Boolean results of them), so the walk skips
  // them; the vertex stresses are checked with a flat loop.
  const { regions: _regions, stress, ...rest } = result
  const finite = allFinite(rest) && (stress === null || (allFinite({ ...stress, vertices: [] }) && stress.vertices.every(v => v.values.every(Number.isFinite))))
  if (!finite) {
    // A degenerate case slipped through the engine's own checks: say so instead of sending NaN.
    throw createError({ statusCode: 422, message: 'The section is too degenerate to analyse (a result was not finite). Check for sliver parts or zero-thickness walls.' })
  }
  // Sign-in, parse, checks and the analysis (not the JSON encoding of the answer), for clients' timing.
  setResponseHeader(event, 'Server-Timing', `analysis;dur=${(performance.now() - t0).toFixed(2)}`)
  const answer: AnalysisResponse = result
  if (body.omit.includes('kern')) delete answer.kern
  if (body.omit.includes('vertexStresses') && answer.stress) delete answer.stress.vertices
  return answer
})

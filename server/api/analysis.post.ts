import { AnalysisRequest } from '../../shared/analysis/contract'
import { analyseSection } from '../../shared/mechanics/analyze'
import { MAX_VERTICES } from '../../shared/sketch/document'

/**
 * Section analysis (mm, N, MPa; P > 0 compression, stresses tension-positive): properties, core,
 * stress, no-tension contact, shear flow, slenderness. Bad geometry answers 422 naming the part
 * and vertex; the answer never holds NaN or Infinity.
 */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'analyse')
  const body = await readBodyAs(event, AnalysisRequest)
  let vertices = 0
  for (const part of body.parts) vertices += part.outline.length + part.holes.reduce((n, h) => n + h.length, 0)
  if (vertices > MAX_VERTICES) {
    throw createError({ statusCode: 413, message: `The section has ${vertices} vertices; the limit is ${MAX_VERTICES}. Use a coarser chord tolerance for arcs.` })
  }
  const result = withSectionErrors(() => analyseSection(body))
  // Vertex coordinates come from the (finite) input and vertex stresses are n times a plane whose
  // coefficients are checked here, so the walk can skip the two large arrays.
  const { regions: _regions, stress, ...rest } = result
  const summary = stress ? { ...stress, vertices: [] } : null
  if (!allFinite(rest) || !allFinite(summary)) {
    // A degenerate case slipped through the engine's own checks: say so instead of sending NaN.
    throw createError({ statusCode: 422, message: 'The section is too degenerate to analyse (a result was not finite). Check for sliver parts or zero-thickness walls.' })
  }
  return result
})

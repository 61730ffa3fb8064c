import { SectionError } from '../../shared/mechanics/types'

/**
 * Runs a mechanics computation and turns a SectionError (bad geometry, degenerate section) into a
 * 422 naming the part, ring and vertex, so the editor can point at them.
 */
export function withSectionErrors<T>(compute: () => T): T {
  try {
    return compute()
  } catch (error) {
    if (error instanceof SectionError) {
      throw createError({
        statusCode: 422,
        statusMessage: 'Unprocessable Geometry',
        message: error.message,
        data: { part: error.part, ring: error.ring, vertex: error.vertex, cut: error.cut },
      })
    }
    throw error
  }
}

/** True when every number in a JSON-able value is finite: shared with the analysis worker. */
export { allFinite } from '../../shared/analysis/answer'

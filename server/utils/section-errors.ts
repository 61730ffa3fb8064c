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
        data: { part: error.part, ring: error.ring, vertex: error.vertex },
      })
    }
    throw error
  }
}

/** True when every number in a JSON-able value is finite (nothing NaN or Infinity may go out). */
export function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value)
  if (Array.isArray(value)) return value.every(allFinite)
  if (value && typeof value === 'object') return Object.values(value).every(allFinite)
  return true
}

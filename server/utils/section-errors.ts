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

/** True when every number in a JSON-able value is finite (nothing NaN or Infinity may go out). */
export function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value)
  if (value === null || typeof value !== 'object') return true
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const v = value[i]
      if (typeof v === 'number' ? !Number.isFinite(v) : !allFinite(v)) return false
    }
    return true
  }
  for (const key in value) {
    const v = (value as Record<string, unknown>)[key]
    if (typeof v === 'number' ? !Number.isFinite(v) : !allFinite(v)) return false
  }
  return true
}

import type { AnalysisOutput } from '../mechanics/analyze'
import type { AnalysisResponse } from './contract'

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

/**
 * The answer of POST /api/analysis from an analysis: null when a number is not finite (the caller
 * answers 422), else the result less what `omit` names. The regions are the validated input rings
 * (or Boolean results of them), so the walk skips them; the vertex stresses are checked flat.
 * Used in-line and in the analysis worker, so both answer alike.
 */
export function analysisAnswer(result: AnalysisOutput, omit: readonly string[]): AnalysisResponse | null {
  const { regions: _regions, stress, ...rest } = result
  const finite = allFinite(rest) && (stress === null || (allFinite({ ...stress, vertices: [] }) && stress.vertices.every(v => v.values.every(Number.isFinite))))
  if (!finite) return null
  const answer: AnalysisResponse = result
  if (omit.includes('kern')) delete answer.kern
  if (omit.includes('vertexStresses') && answer.stress) delete answer.stress.vertices
  return answer
}

/** The 422 message when a result was not finite. */
export const NOT_FINITE_MESSAGE = 'The section is too degenerate to analyse (a result was not finite). Check for sliver parts or zero-thickness walls.'

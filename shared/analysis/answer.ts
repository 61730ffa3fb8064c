import type { AnalysisOutput } from '../mechanics/analyze'
import { MAX_VERTICES } from '../sketch/document'
import { describeIssues } from '../text/issues'
import { findUnsafeText } from '../text/safe-text'
import { AnalysisRequest, type AnalysisResponse } from './contract'

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

/** A request body that cannot be analysed: the HTTP status and the message (as the route answers it). */
export interface BodyProblem {
  status: 400 | 413
  message: string
  data?: unknown
}

/** Vertices (outlines and holes) of a validated request. */
export function requestVertices(body: { parts: readonly { outline: readonly unknown[]; holes: readonly (readonly unknown[])[] }[] }): number {
  let vertices = 0
  for (const part of body.parts) vertices += part.outline.length + part.holes.reduce((n, h) => n + h.length, 0)
  return vertices
}

/**
 * Reads an analysis request from its JSON text exactly as the route does (not JSON, a control
 * character, a field zod refuses: 400; over MAX_VERTICES: 413), for the worker that takes a large
 * body without the event loop parsing it first.
 */
export function readAnalysisText(text: string): { ok: true; body: ReturnType<typeof AnalysisRequest.parse> } | { ok: false; problem: BodyProblem } {
  let value: unknown = {}
  if (text.trim()) {
    try {
      value = JSON.parse(text)
    } catch (error) {
      const detail = error instanceof SyntaxError ? ` (${error.message})` : ''
      return { ok: false, problem: { status: 400, message: `The request body is not valid JSON${detail}.` } }
    }
  }
  const unsafe = findUnsafeText(value)
  if (unsafe) return { ok: false, problem: { status: 400, message: `${unsafe.path || 'The body'}: ${unsafe.problem}.`, data: { path: unsafe.path } } }
  const parsed = AnalysisRequest.safeParse(value ?? {})
  if (!parsed.success) return { ok: false, problem: { status: 400, message: describeIssues(parsed.error) } }
  const vertices = requestVertices(parsed.data)
  if (vertices > MAX_VERTICES) {
    return { ok: false, problem: { status: 413, message: `The section has ${vertices} vertices; the limit is ${MAX_VERTICES}. Use a coarser chord tolerance for arcs.` } }
  }
  return { ok: true, body: parsed.data }
}

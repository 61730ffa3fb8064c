import type { AnalysisRequestBody, AnalysisResponse } from '#shared/analysis/contract'
import { analysisRequestFor, locateError, type ErrorLocation } from '#shared/editor/analysis-request'
import type { SketchDocument } from '#shared/sketch/document'

/** The live analysis of the open sketch, shared by every reader (properties panel, canvas, stress view). */
export interface AnalysisState {
  result: AnalysisResponse | null
  pending: boolean
  error: string | null
  /** Where a geometry error (422) points, when it names a part. */
  errorAt: ErrorLocation | null
  /** The document revision the result belongs to. */
  revision: number
  /** Round-trip time of the last answer (ms). */
  ms: number
}

/**
 * The live analysis state (read-only for readers). The editor page starts it once with
 * `useLiveAnalysis()`; everyone else just reads `useAnalysis()`.
 */
export function useAnalysis() {
  return useState<AnalysisState>('kw-analysis', () => ({ result: null, pending: false, error: null, errorAt: null, revision: -1, ms: 0 }))
}

/**
 * Posts the sketch to /api/analysis whenever the document changes, at most one request in
 * flight, and the latest geometry wins (a change made while a request runs is sent as soon as it
 * returns; intermediate states are skipped). With no debounce (the default) the request starts
 * synchronously with the change, so the server's work overlaps the re-render the change causes.
 */
export function useLiveAnalysis(debounceMs = 0) {
  const state = useAnalysis()
  const sketch = useSketchStore()
  let inFlight = false
  let queued: { doc: SketchDocument; revision: number } | null = null
  let timer: ReturnType<typeof setTimeout> | null = null

  async function send(doc: SketchDocument, revision: number): Promise<void> {
    const request: AnalysisRequestBody | null = analysisRequestFor(doc)
    if (!request) {
      state.value = { ...state.value, result: null, error: null, errorAt: null, pending: false, revision }
      return
    }
    inFlight = true
    const t0 = performance.now()
    // fetch itself, not $fetch: the request leaves now, before Vue re-renders the edit, instead of
    // after $fetch's own awaits have let the whole re-render run first.
    // The editor derives the core and the vertex stresses from the properties (useStressView), so
    // the answer leaves them out: for thousands of vertices they are most of its size.
    const body: AnalysisRequestBody = { ...request, omit: ['kern', 'vertexStresses'] }
    const response = fetch('/api/analysis', { method: 'POST', headers: { 'content-type': 'application/json', accept: 'application/json' }, body: JSON.stringify(body) })
    state.value = { ...state.value, pending: true }
    try {
      const result = await answerOf<AnalysisResponse>(await response)
      const t1 = performance.now()
      state.value = { ...state.value, result, error: null, errorAt: null, revision, ms: t1 - t0 }
      // For npm run bench:ui: how long the page takes to take in a new answer (Vue's update of every reader).
      void nextTick(() => performance.measure('analysis-apply', { start: t1 }))
    } catch (e) {
      const status = errorStatus(e)
      const data = (e as { data?: { data?: unknown } })?.data?.data as Parameters<typeof locateError>[1]
      // Keep the last good result on screen so the drawing does not flicker while a vertex is wrong.
      state.value = { ...state.value, error: errorMessage(e), errorAt: status === 422 ? locateError(doc, data) : null, revision }
    } finally {
      inFlight = false
      state.value = { ...state.value, pending: queued !== null }
      const next = queued
      queued = null
      if (next) void send(next.doc, next.revision)
    }
  }

  function dispatch(): void {
    const job = { doc: sketch.doc, revision: sketch.revision }
    if (inFlight) queued = job
    else void send(job.doc, job.revision)
  }

  function schedule(): void {
    if (timer) clearTimeout(timer)
    // At once, inside the store action (it counts the revision before it replaces the document):
    // the request is on its way before Vue re-renders the edit.
    if (debounceMs <= 0) return dispatch()
    timer = setTimeout(() => {
      timer = null
      dispatch()
    }, debounceMs)
  }

  /** The parsed answer, or an error shaped like $fetch's (statusCode, data) for errorMessage and locateError. */
  async function answerOf<T>(res: Response): Promise<T> {
    const data = await res.json().catch(() => null)
    if (res.ok && data !== null) return data as T
    const message = (data as { message?: string } | null)?.message ?? `The analysis failed (HTTP ${res.status}).`
    throw Object.assign(new Error(message), { statusCode: res.status, data })
  }

  // Another sketch opened: forget the last one's result rather than show it as this one's.
  const stopId = watch(() => sketch.meta?.id, () => {
    state.value = { result: null, pending: false, error: null, errorAt: null, revision: -1, ms: 0 }
  })
  const stop = watch(() => sketch.doc, schedule, { immediate: true, flush: 'sync' })
  onScopeDispose(() => {
    stop()
    stopId()
    if (timer) clearTimeout(timer)
  })
  return state
}

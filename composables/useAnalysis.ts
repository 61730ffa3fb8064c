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
 * synchronously with the change, so the network round trip overlaps the re-render it causes.
 */
export function useLiveAnalysis(debounceMs = 0) {
  const state = useAnalysis()
  const sketch = useSketchStore()
  let inFlight = false
  let queued: { doc: SketchDocument; revision: number } | null = null
  let timer: ReturnType<typeof setTimeout> | null = null

  async function send(doc: SketchDocument, revision: number): Promise<void> {
    const body: AnalysisRequestBody | null = analysisRequestFor(doc)
    if (!body) {
      state.value = { ...state.value, result: null, error: null, errorAt: null, pending: false, revision }
      return
    }
    inFlight = true
    state.value = { ...state.value, pending: true }
    const t0 = performance.now()
    try {
      const result = await $fetch<AnalysisResponse>('/api/analysis', { method: 'POST', body })
      state.value = { ...state.value, result, error: null, errorAt: null, revision, ms: performance.now() - t0 }
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
    // A microtask: the store action that changed the document has finished (its revision is
    // counted) but the re-render it causes has not run yet.
    if (debounceMs <= 0) return queueMicrotask(dispatch)
    timer = setTimeout(() => {
      timer = null
      dispatch()
    }, debounceMs)
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

import type { AnalysisRequestBody, AnalysisResponse } from '#shared/analysis/contract'
import { analysisRequestFor, locateError, type ErrorLocation } from '#shared/editor/analysis-request'
import type { SketchDocument } from '#shared/sketch/document'
import type { Hold } from '~~/stores/sketch'

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

/** An answer as it came back: the result and its round trip, or the error. */
type Outcome = { ok: true; result: AnalysisResponse; ms: number } | { ok: false; error: unknown }

/** A document to analyse: of a committed revision, or (revision null) of a change a gesture holds. */
interface Job {
  doc: SketchDocument
  revision: number | null
  settle?: () => void
}

/**
 * The body the editor posts for a document, or null when it has no part. The editor derives the
 * core and the vertex stresses from the properties (useStressView), so the answer leaves them out:
 * for thousands of vertices they are most of its size.
 */
function bodyFor(doc: SketchDocument): string | null {
  const request = analysisRequestFor(doc)
  return request ? JSON.stringify({ ...request, omit: ['kern', 'vertexStresses'] } satisfies AnalysisRequestBody) : null
}

/**
 * Posts the sketch to /api/analysis whenever the document changes, at most one request in
 * flight, and the latest geometry wins (a change made while a request runs is sent as soon as it
 * returns; intermediate states are skipped). With no debounce (the default) the request starts
 * synchronously with the change, so the server's work overlaps the re-render the change causes.
 * A gesture's held change (see `useAnalysisHold`) is analysed before it is committed; its answer
 * is kept and shown the moment the change is committed, without a second request.
 */
export function useLiveAnalysis(debounceMs = 0) {
  const state = useAnalysis()
  const sketch = useSketchStore()
  let inFlight = false
  let queued: Job | null = null
  let timer: ReturnType<typeof setTimeout> | null = null
  /** The answer for a held change's document, until that document is committed. */
  let held: { text: string; outcome: Outcome } | null = null

  function show(outcome: Outcome, doc: SketchDocument, revision: number): void {
    if (outcome.ok) {
      const t1 = performance.now()
      state.value = { ...state.value, result: outcome.result, error: null, errorAt: null, revision, ms: outcome.ms }
      // For npm run bench:ui: how long the page takes to take in a new answer (Vue's update of every reader).
      void nextTick(() => performance.measure('analysis-apply', { start: t1 }))
      return
    }
    const e = outcome.error
    const data = (e as { data?: { data?: unknown } })?.data?.data as Parameters<typeof locateError>[1]
    // Keep the last good result on screen so the drawing does not flicker while a vertex is wrong.
    state.value = { ...state.value, error: errorMessage(e), errorAt: errorStatus(e) === 422 ? locateError(doc, data) : null, revision }
  }

  async function send(job: Job): Promise<void> {
    const text = bodyFor(job.doc)
    if (text === null) {
      if (job.revision !== null) state.value = { ...state.value, result: null, error: null, errorAt: null, pending: false, revision: job.revision }
      job.settle?.()
      return
    }
    if (job.revision !== null && held?.text === text) {
      // The held change is committed and its answer is already here: both show in one update.
      const { outcome } = held
      held = null
      show(outcome, job.doc, job.revision)
      state.value = { ...state.value, pending: false }
      return
    }
    held = null
    inFlight = true
    if (job.revision !== null) state.value = { ...state.value, pending: true }
    const t0 = performance.now()
    let outcome: Outcome
    try {
      // fetch itself, not $fetch: the request leaves now, before Vue re-renders the edit, instead of
      // after $fetch's own awaits have let the whole re-render run first.
      const response = await fetch('/api/analysis', { method: 'POST', headers: { 'content-type': 'application/json', accept: 'application/json' }, body: text })
      outcome = { ok: true, result: await answerOf<AnalysisResponse>(response), ms: performance.now() - t0 }
    } catch (error) {
      outcome = { ok: false, error }
    }
    inFlight = false
    const next = queued
    queued = null
    if (job.revision === null) {
      held = { text, outcome }
      job.settle?.()
    } else {
      show(outcome, job.doc, job.revision)
    }
    state.value = { ...state.value, pending: next !== null && next.revision !== null }
    if (next) void send(next)
  }

  function enqueue(job: Job): void {
    if (inFlight) queued = job
    else void send(job)
  }

  function dispatch(): void {
    enqueue({ doc: sketch.doc, revision: sketch.revision })
  }

  /** Starts the analysis of a change a gesture holds; settles when its answer is in (see the sketch store's stageParts). */
  function hold(next: SketchDocument): Promise<void> | null {
    // A document with no part has no analysis to wait for (analysisRequestFor gives null).
    if (next.parts.length === 0) return null
    return new Promise<void>(resolve => enqueue({ doc: next, revision: null, settle: resolve }))
  }
  const app = holdRegistry()
  app._kwAnalysisHold = hold

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
    held = null
    state.value = { result: null, pending: false, error: null, errorAt: null, revision: -1, ms: 0 }
  })
  const stop = watch(() => sketch.doc, schedule, { immediate: true, flush: 'sync' })
  onScopeDispose(() => {
    if (app._kwAnalysisHold === hold) delete app._kwAnalysisHold
    stop()
    stopId()
    if (timer) clearTimeout(timer)
  })
  return state
}

/**
 * For a gesture that ends in a parts change (the canvas): a Hold that analyses the changed
 * document before the change is committed, through the page's live analysis; null (commit at
 * once) where no live analysis runs.
 */
export function useAnalysisHold(): Hold {
  const app = holdRegistry()
  return next => app._kwAnalysisHold?.(next) ?? null
}

/** Where the page's live analysis leaves its Hold for the canvas: the Nuxt app, one per page view. */
function holdRegistry(): { _kwAnalysisHold?: Hold } {
  return useNuxtApp() as unknown as { _kwAnalysisHold?: Hold }
}

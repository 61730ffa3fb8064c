import { defineStore } from 'pinia'
import { nextTick, ref, shallowRef, watch } from 'vue'
import type { AnalysisRequestBody, AnalysisResponse } from '#shared/analysis/contract'
import { analysisRequestFor, locateError, type ErrorLocation } from '#shared/editor/analysis-request'
import type { SketchDocument } from '#shared/sketch/document'
import { errorMessage, errorStatus } from '#shared/utils/errors'
import { useSketchStore } from './sketch'

/** The answer for one document revision: the result, or the error (the last good result is kept by the reader). */
export interface AnalysisAnswer {
  revision: number
  result: AnalysisResponse | null
  error: string | null
  /** Where a geometry error (422) points, when it names a part. */
  errorAt: ErrorLocation | null
  /** Round trip (ms). */
  ms: number
}

/** What a request settles with: its answer, or null when a newer revision replaced it before it left. */
export type AnalysisOutcome = AnalysisAnswer | null

interface Job {
  doc: SketchDocument
  revision: number
  settle: (outcome: AnalysisOutcome) => void
}

/**
 * The body the editor posts for a document, or null when it has no solid part. The editor derives
 * the core and the vertex stresses from the properties (stores/stress-view.ts), so the answer
 * leaves them out: for thousands of vertices they are most of its size.
 */
export function liveBodyFor(doc: SketchDocument): string | null {
  const request = analysisRequestFor(doc)
  return request ? JSON.stringify({ ...request, omit: ['kern', 'vertexStresses'] } satisfies AnalysisRequestBody) : null
}

/**
 * The live analysis of the open sketch: while `start()`ed (the editor page), every document change
 * is posted to /api/analysis, at most one request in flight, the latest revision winning (a
 * revision replaced in the queue settles with null). The request leaves synchronously with the
 * change (the sketch store counts the revision before it replaces the document), so the server
 * works while the browser renders the edit. Readers do not read this store: they read what is on
 * screen from stores/display.ts, which takes each answer in.
 */
export const useAnalysisStore = defineStore('analysis', () => {
  const sketch = useSketchStore()
  /** The newest answer received (revision -1: none yet for this sketch). */
  const latest = shallowRef<AnalysisAnswer>(none())
  /** A request is in flight or queued. */
  const busy = ref(false)
  const running = ref(false)
  let inFlight = false
  let queued: Job | null = null
  /** Counts sketch openings: an answer for a sketch that was closed meanwhile is dropped. */
  let epoch = 0

  function none(): AnalysisAnswer {
    return { revision: -1, result: null, error: null, errorAt: null, ms: 0 }
  }

  /** Analyses `doc` as revision `revision`; settles with the answer, or null when replaced. */
  function request(doc: SketchDocument, revision: number): Promise<AnalysisOutcome> {
    return new Promise((settle) => {
      const job = { doc, revision, settle }
      if (!inFlight) return void send(job)
      queued?.settle(null)
      queued = job
      busy.value = true
    })
  }

  async function send(job: Job): Promise<void> {
    const text = liveBodyFor(job.doc)
    const mine = epoch
    if (text === null) {
      take({ ...none(), revision: job.revision }, job)
      return next()
    }
    inFlight = true
    busy.value = true
    const t0 = performance.now()
    let answer: AnalysisAnswer
    try {
      // fetch itself, not $fetch: the request leaves now, before Vue re-renders the edit.
      const res = await fetch('/api/analysis', { method: 'POST', headers: { 'content-type': 'application/json', accept: 'application/json' }, body: text })
      const data = await res.json().catch(() => null)
      if (!res.ok || data === null) throw Object.assign(new Error((data as { message?: string } | null)?.message ?? `The analysis failed (HTTP ${res.status}).`), { statusCode: res.status, data })
      answer = { revision: job.revision, result: data as AnalysisResponse, error: null, errorAt: null, ms: performance.now() - t0 }
    } catch (e) {
      const data = (e as { data?: { data?: unknown } })?.data?.data as Parameters<typeof locateError>[1]
      answer = { revision: job.revision, result: null, error: errorMessage(e), errorAt: errorStatus(e) === 422 ? locateError(job.doc, data) : null, ms: performance.now() - t0 }
    }
    inFlight = false
    if (mine === epoch) take(answer, job)
    else job.settle(null)
    next()
  }

  function take(answer: AnalysisAnswer, job: Job): void {
    const t1 = performance.now()
    latest.value = answer
    job.settle(answer)
    // For npm run bench:ui: from the parsed answer to the end of Vue's update of every reader.
    void nextTick(() => performance.measure('analysis-apply', { start: t1 }))
  }

  function next(): void {
    const job = queued
    queued = null
    busy.value = job !== null
    if (job) void send(job)
  }

  /** Starts posting every change of the open sketch (and its current state now). */
  function start(): void {
    running.value = true
    void request(sketch.doc, sketch.revision)
  }

  /** Stops posting changes; an answer under way still arrives. */
  function stop(): void {
    running.value = false
  }

  // Synchronous: inside the store action that changed the document, before Vue renders it.
  watch(() => sketch.doc, (doc) => {
    if (running.value) void request(doc, sketch.revision)
  }, { flush: 'sync' })

  // Another sketch opened: forget the last one's answers rather than show them as this one's.
  watch(() => sketch.meta?.id, () => {
    epoch++
    queued?.settle(null)
    queued = null
    busy.value = inFlight
    latest.value = none()
  }, { flush: 'sync' })

  return { latest, busy, running, request, start, stop }
})

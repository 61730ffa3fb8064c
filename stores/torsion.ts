import { defineStore } from 'pinia'
import { ref, watch } from 'vue'
import type { AnalysisRequestBody } from '#shared/analysis/contract'
import { analysisRequestFor } from '#shared/editor/analysis-request'
import type { TorsionResult } from '#shared/mechanics/torsion/analysis'
import type { TorsionMeshDensity } from '#shared/mechanics/torsion/types'
import { errorMessage } from '#shared/utils/errors'
import { useDisplayStore } from './display'
import { useSketchStore } from './sketch'

/** Torsion of the open sketch: the answer, what was asked, and whether a solve is running. */
export interface TorsionState {
  result: TorsionResult | null
  pending: boolean
  error: string | null
  /** Document revision of `result`. */
  revision: number
  /** Round-trip time of the last answer (ms). */
  ms: number
  mesh: TorsionMeshDensity
  study: boolean
  /** Draw the shear stress field over the section (asks the server for τ). */
  showField: boolean
  /** Torque about the shear centre for the field (N·mm); Vx, Vy come from the sketch's shear setting. */
  T: number
}


/**
 * Quiet time after the last bending answer before torsion is asked for, so a burst of edits asks
 * once: the server solves on the same thread as the live analysis and the autosave.
 */
const SETTLE_MS = 500

/**
 * Asks POST /api/analysis for torsion in a request of its own, after the live (bending) answer
 * for the same revision is in, so it never delays the live properties. At most one torsion
 * request is in flight (an aborted fetch would not stop the server's solve): a change made
 * meanwhile is asked for when it returns, and only the answer for the current revision is shown.
 */
export const useTorsionStore = defineStore('torsion', () => {
  const state = ref<TorsionState>({ result: null, pending: false, error: null, revision: -1, ms: 0, mesh: 'normal', study: false, showField: false, T: 0 })
  const running = ref(false)
  const display = useDisplayStore()
  const sketch = useSketchStore()
  let timer: ReturnType<typeof setTimeout> | null = null
  let controller: AbortController | null = null
  let again = false

  async function run(): Promise<void> {
    if (controller) { again = true; return }
    const revision = sketch.revision
    const request = analysisRequestFor(sketch.doc)
    if (!request) { state.value = { ...state.value, result: null, pending: false, error: null, revision }; return }
    const s = state.value
    const body: AnalysisRequestBody = {
      ...request,
      omit: ['kern', 'vertexStresses'],
      torsion: true,
      torsionMesh: s.mesh,
      torsionStudy: s.study,
      ...(s.showField ? { torsionLoads: { Vx: sketch.settings.shear.Vx, Vy: sketch.settings.shear.Vy, T: s.T } } : {}),
    }
    const mine = new AbortController()
    controller = mine
    state.value = { ...state.value, pending: true }
    const t0 = performance.now()
    try {
      const res = await fetch('/api/analysis', { method: 'POST', headers: { 'content-type': 'application/json', accept: 'application/json' }, body: JSON.stringify(body), signal: mine.signal })
      const data = await res.json().catch(() => null)
      if (controller !== mine) return
      if (!res.ok || !data?.torsion) throw new Error((data as { message?: string } | null)?.message ?? `Torsion failed (HTTP ${res.status}).`)
      state.value = { ...state.value, result: data.torsion as TorsionResult, error: null, revision, ms: performance.now() - t0 }
    } catch (e) {
      if (controller !== mine || (e as Error).name === 'AbortError') return
      state.value = { ...state.value, error: errorMessage(e), revision }
    } finally {
      if (controller === mine) {
        controller = null
        state.value = { ...state.value, pending: false }
        if (again) { again = false; schedule() }
      }
    }
  }

  function schedule(): void {
    if (timer) clearTimeout(timer)
    timer = null
    // Only once the bending answer for the committed revision is in.
    if (!running.value || display.pending) return
    timer = setTimeout(() => { timer = null; void run() }, SETTLE_MS)
  }

  watch(() => [display.shown, display.pending] as const, schedule)
  watch(() => [state.value.mesh, state.value.study, state.value.showField, state.value.showField ? state.value.T : 0] as const, schedule)
  watch(() => sketch.meta?.id, () => {
    controller?.abort()
    controller = null
    again = false
    state.value = { ...state.value, result: null, pending: false, error: null, revision: -1, T: 0, study: false, showField: false, mesh: state.value.mesh }
  })
  /** Starts asking for torsion after each live answer (the editor page). */
  function start(): void {
    running.value = true
    schedule()
  }

  /** Stops asking; a solve under way is abandoned. */
  function stop(): void {
    running.value = false
    if (timer) clearTimeout(timer)
    timer = null
    controller?.abort()
    controller = null
  }

  return { state, running, start, stop }
})

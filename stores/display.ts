import { defineStore } from 'pinia'
import { computed, shallowRef, watch } from 'vue'
import type { SketchPart } from '#shared/sketch/document'
import { partsBounds } from '#shared/editor/parts'
import { useAnalysisStore, type AnalysisAnswer } from './analysis'
import { useSketchStore } from './sketch'

/** How long a held gesture's change waits for its analysis at most (ms) before it is drawn anyway. */
export const HOLD_MS = 120

/** The analysis on screen: the last good result, and the error of the last answer if it failed. */
export type ShownAnalysis = AnalysisAnswer

/**
 * What is on screen: the pair {parts drawn, analysis shown}. The sketch store commits every edit at
 * once; this store decides when the drawing shows it. An ordinary edit is drawn at once and its
 * numbers follow when the answer is in. A gesture that ends in a parts change (a dragged vertex, a
 * move, a rotation) calls `hold()` before committing: the drawing then keeps the parts as they
 * were (the canvas keeps the gesture's ghost) until the answer for that revision arrives, or
 * HOLD_MS at most, and the parts and their numbers change in one step.
 */
export const useDisplayStore = defineStore('display', () => {
  const sketch = useSketchStore()
  const analysis = useAnalysisStore()
  const parts = shallowRef<readonly SketchPart[]>(sketch.parts)
  /** The revision the drawn parts belong to. */
  const partsRevision = shallowRef(sketch.revision)
  const shown = shallowRef<ShownAnalysis>({ ...analysis.latest })
  /** The revision a gesture holds the drawing for, or null. */
  const holding = shallowRef<number | null>(null)
  let armed = false
  let timer: ReturnType<typeof setTimeout> | null = null

  const bounds = computed(() => partsBounds(parts.value))
  /**
   * The numbers on screen are not those of the committed document yet. While a gesture's change is
   * held, the drawing and the numbers on screen are still the same state (the one before it), so
   * nothing on screen changes until the pair advances.
   */
  const pending = computed(() => holding.value === null && (shown.value.revision !== sketch.revision || analysis.busy))

  /** The next committed change is a gesture's: hold its drawing for its analysis (see above). */
  function hold(): void {
    armed = true
  }

  /** Draws the committed parts now (a held change's deadline, or any other change). */
  function settle(): void {
    if (timer) clearTimeout(timer)
    timer = null
    holding.value = null
    parts.value = sketch.parts
    partsRevision.value = sketch.revision
  }

  // On the parts, not the revision: the sketch store counts the revision before it replaces the document.
  watch(() => sketch.parts, (next) => {
    if (armed && next !== parts.value) {
      armed = false
      if (timer) clearTimeout(timer)
      holding.value = sketch.revision
      timer = setTimeout(settle, HOLD_MS)
      return
    }
    armed = false
    settle()
  }, { flush: 'sync' })

  watch(() => analysis.latest, (answer) => {
    if (answer.revision < 0) {
      shown.value = { ...answer }
      return
    }
    // Keep the last good result on screen while the geometry is wrong, so the drawing does not flicker.
    shown.value = answer.error ? { ...answer, result: shown.value.result } : { ...answer }
    if (holding.value !== null && answer.revision >= holding.value) settle()
  }, { flush: 'sync' })

  // Another sketch opened: nothing held over from the last one.
  watch(() => sketch.meta?.id, () => {
    armed = false
    settle()
  }, { flush: 'sync' })

  return { parts, partsRevision, bounds, shown, holding, pending, hold, settle }
})

import { defineStore } from 'pinia'
import { computed, shallowRef } from 'vue'
import type { LoadCase, LoadCombination, SketchLoad, SketchPart, SketchSettings } from '#shared/sketch/document'

/** The loading of a sketch, changed together because removing a case removes its loads and factors. */
export interface Loading {
  loads: SketchLoad[]
  cases: LoadCase[]
  combinations: LoadCombination[]
}

/**
 * One undoable document change, pushed at the end of a gesture. Each kind carries the slice of
 * the document it changed, before and after; documents are immutable, so unchanged parts are
 * shared between snapshots and a change costs an array of references, not a deep copy.
 */
export type Change =
  | { kind: 'parts'; label: string; before: SketchPart[]; after: SketchPart[] }
  | { kind: 'loading'; label: string; before: Loading; after: Loading }
  | { kind: 'settings'; label: string; before: SketchSettings; after: SketchSettings }

/** Most changes kept; older ones fall off the bottom of the undo stack. */
export const HISTORY_LIMIT = 500

/** Undo and redo stacks of typed changes. A new change truncates the redo stack. */
export const useHistoryStore = defineStore('history', () => {
  const undoStack = shallowRef<Change[]>([])
  const redoStack = shallowRef<Change[]>([])

  const canUndo = computed(() => undoStack.value.length > 0)
  const canRedo = computed(() => redoStack.value.length > 0)
  const undoLabel = computed(() => undoStack.value.at(-1)?.label ?? null)
  const redoLabel = computed(() => redoStack.value.at(-1)?.label ?? null)

  /** Records a change; drops the redo stack. */
  function push(change: Change): void {
    undoStack.value = [...undoStack.value, change].slice(-HISTORY_LIMIT)
    redoStack.value = []
  }

  /** Takes the change to undo (moving it to the redo stack), or null. */
  function takeUndo(): Change | null {
    const change = undoStack.value.at(-1)
    if (!change) return null
    undoStack.value = undoStack.value.slice(0, -1)
    redoStack.value = [...redoStack.value, change]
    return change
  }

  /** Takes the change to redo (moving it back to the undo stack), or null. */
  function takeRedo(): Change | null {
    const change = redoStack.value.at(-1)
    if (!change) return null
    redoStack.value = redoStack.value.slice(0, -1)
    undoStack.value = [...undoStack.value, change]
    return change
  }

  /** Forgets every change (a freshly loaded document). */
  function clear(): void {
    undoStack.value = []
    redoStack.value = []
  }

  return { undoStack, redoStack, canUndo, canRedo, undoLabel, redoLabel, push, takeUndo, takeRedo, clear }
})

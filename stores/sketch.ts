import { defineStore } from 'pinia'
import { computed, ref, shallowRef } from 'vue'
import { emptyDocument, type SketchDocument, type SketchPart } from '#shared/sketch/document'
import type { SketchFull, SketchSummary } from '#shared/sketch/api'
import * as ops from '#shared/editor/parts'
import { useHistoryStore, type Change, type Loading } from './history'
import { partActions } from './sketch-parts'
import { loadingActions } from './sketch-loading'


/** The sketch's identity and save state beside the document. */
export type SketchMeta = Pick<SketchSummary, 'id' | 'title' | 'project' | 'description' | 'status' | 'version'>

/**
 * The open sketch: its document (immutable; every change replaces a slice and pushes a typed
 * Change to the history store) and its meta. `revision` counts document changes (autosave, the live
 * analysis). A plain document store: every action commits at once; when the drawing shows a change
 * is up to stores/display.ts.
 */
export const useSketchStore = defineStore('sketch', () => {
  const history = useHistoryStore()
  const doc = shallowRef<SketchDocument>(emptyDocument())
  const meta = ref<SketchMeta | null>(null)
  const revision = ref(0)

  // Each slice is its own computed: an edit replaces only what it changes, so a reader of the
  // loads or the settings is not re-run (nor its component re-rendered) when a vertex moves.
  const parts = computed(() => doc.value.parts)
  const settings = computed(() => doc.value.settings)
  const loads = computed(() => doc.value.loads)
  const cases = computed(() => doc.value.cases)
  const combinations = computed(() => doc.value.combinations)
  const bounds = computed(() => ops.partsBounds(doc.value.parts))
  const canUndo = computed(() => history.canUndo)
  const canRedo = computed(() => history.canRedo)

  function loading(): Loading {
    return { loads: doc.value.loads, cases: doc.value.cases, combinations: doc.value.combinations }
  }

  function apply(change: Change, side: 'before' | 'after'): void {
    // The revision first: synchronous watchers of `doc` (the live analysis) read the new one.
    revision.value++
    if (change.kind === 'parts') doc.value = { ...doc.value, parts: change[side] }
    else if (change.kind === 'loading') doc.value = { ...doc.value, ...change[side] }
    else doc.value = { ...doc.value, settings: change[side] }
  }

  function commit(change: Change): void {
    apply(change, 'after')
    history.push(change)
  }

  function commitParts(label: string, after: SketchPart[]): void {
    commit({ kind: 'parts', label, before: doc.value.parts, after })
  }

  function commitLoading(label: string, after: Partial<Loading>): void {
    commit({ kind: 'loading', label, before: loading(), after: { ...loading(), ...after } })
  }

  /** Opens a sketch from the server; clears the history. */
  function load(sketch: SketchFull): void {
    revision.value = 0
    // The meta first: readers keyed on the sketch's id reset before they see its document.
    meta.value = { id: sketch.id, title: sketch.title, project: sketch.project, description: sketch.description, status: sketch.status, version: sketch.version }
    doc.value = sketch.document
    history.clear()
  }

  /** Changes title/project/description/version (not undoable: they are not the document). */
  function setMeta(patch: Partial<SketchMeta>): void {
    if (meta.value) meta.value = { ...meta.value, ...patch }
  }

  /** The part with this id, or undefined. */
  function partById(id: string): SketchPart | undefined {
    return doc.value.parts.find(p => p.id === id)
  }

  /** Undoes the last change; returns its label or null. */
  function undo(): string | null {
    const c = history.takeUndo()
    if (c) apply(c, 'before')
    return c?.label ?? null
  }

  /** Redoes the last undone change; returns its label or null. */
  function redo(): string | null {
    const c = history.takeRedo()
    if (c) apply(c, 'after')
    return c?.label ?? null
  }

  return {
    doc, meta, revision, parts, settings, loads, cases, combinations, bounds, canUndo, canRedo,
    load, setMeta, partById, undo, redo,
    ...partActions({ doc, commitParts }),
    ...loadingActions({ doc, commit, commitLoading }),
  }
})

import { defineStore } from 'pinia'
import { ref, shallowRef } from 'vue'
import type { ShapeGeometry } from '#shared/shapes/common'

/** The drawing tools of the toolbar. */
export type Tool = 'pick' | 'outline' | 'box' | 'round' | 'tube'

/** A vertex of a part: ring 0 is the outline, k the hole k-1. */
export interface VertexRef {
  part: string
  ring: number
  index: number
}

/**
 * What the editor is pointing at: the active tool, the selected parts (in click order, which
 * subtract uses), the selected vertex, and the preview of a shape about to be inserted (mm).
 * Transient: none of it is saved or undone.
 */
export const useSelectionStore = defineStore('selection', () => {
  const tool = ref<Tool>('pick')
  const partIds = ref<string[]>([])
  const vertex = ref<VertexRef | null>(null)
  const preview = shallowRef<ShapeGeometry | null>(null)
  /** Wall thickness (mm) the tube tool gives a dragged tube. */
  const tubeWall = ref(8)

  /** Selects a part; with `additive` (shift-click) toggles it in the selection. */
  function select(id: string, additive = false): void {
    vertex.value = null
    if (!additive) { partIds.value = [id]; return }
    partIds.value = partIds.value.includes(id) ? partIds.value.filter(p => p !== id) : [...partIds.value, id]
  }

  /** Selects exactly these parts. */
  function selectMany(ids: string[]): void {
    partIds.value = [...ids]
    vertex.value = null
  }

  /** Selects one vertex (and its part). */
  function selectVertex(v: VertexRef | null): void {
    vertex.value = v
    if (v && !partIds.value.includes(v.part)) partIds.value = [v.part]
  }

  /** Clears the selection. */
  function clear(): void {
    partIds.value = []
    vertex.value = null
  }

  /** Drops ids that no longer exist (after undo, delete, union...). */
  function prune(existing: ReadonlySet<string>, ringCount: (part: string, ring: number) => number): void {
    if (partIds.value.some(id => !existing.has(id))) partIds.value = partIds.value.filter(id => existing.has(id))
    const v = vertex.value
    if (v && (!existing.has(v.part) || v.index >= ringCount(v.part, v.ring))) vertex.value = null
  }

  /** Switches tool; any selection stays. */
  function setTool(t: Tool): void {
    tool.value = t
  }

  /** Shows (or, with null, hides) the shape-insert preview. */
  function setPreview(g: ShapeGeometry | null): void {
    preview.value = g
  }

  return { tool, partIds, vertex, preview, tubeWall, select, selectMany, selectVertex, clear, prune, setTool, setPreview }
})

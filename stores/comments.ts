import { defineStore } from 'pinia'
import { computed, ref } from 'vue'

/** A comment as GET /api/sketches/:id/comments lists it (`at` in section coordinates, mm). */
export interface TeamComment {
  id: string
  parentId: string | null
  author: string
  authorId: string | null
  body: string
  at: { x: number; y: number } | null
  resolved: boolean
  resolvedBy: string | null
  resolvedAt: string | null
  createdAt: string
}

/**
 * The comments of the open sketch, the thread in focus and the "pin a comment" mode (the next
 * click on the drawing places the pending comment there). Reset when another sketch opens.
 */
export const useCommentsStore = defineStore('comments', () => {
  const sketchId = ref<string | null>(null)
  const list = ref<TeamComment[]>([])
  const focused = ref<string | null>(null)
  const pinning = ref(false)
  /** The point picked on the drawing for the comment being written, or null (on the whole sketch). */
  const pendingAt = ref<{ x: number; y: number } | null>(null)

  const threads = computed(() => list.value.filter(c => !c.parentId).map(c => ({ ...c, replies: list.value.filter(r => r.parentId === c.id) })))
  /** Pinned, top-level threads in list order with their marker number (1, 2, …), as the canvas shows them. */
  const markers = computed(() => threads.value.filter(t => t.at).map((t, i) => ({ id: t.id, n: i + 1, x: t.at!.x, y: t.at!.y, resolved: t.resolved })))

  async function load(id: string): Promise<void> {
    if (sketchId.value !== id) reset()
    sketchId.value = id
    const r = await $fetch<{ comments: TeamComment[] }>(`/api/sketches/${id}/comments`)
    if (sketchId.value === id) list.value = r.comments
  }

  function reset(): void {
    list.value = []
    focused.value = null
    pinning.value = false
    pendingAt.value = null
  }

  /** Places the pending comment at (x, y) mm and leaves pin mode. */
  function pickPoint(x: number, y: number): void {
    pendingAt.value = { x, y }
    pinning.value = false
  }

  return { sketchId, list, focused, pinning, pendingAt, threads, markers, load, reset, pickPoint }
})

import { defineStore } from 'pinia'
import { ref, shallowRef, watch } from 'vue'
import type { Box } from '#shared/canvas/labels'
import { readWorkspacePrefs, workspaceKey, type WorkspacePrefs } from '#shared/editor/workspace-prefs'

/**
 * How the signed-in user has arranged the editor: the panel group open, the legend collapsed or
 * where it was moved. Kept in the browser per user id (`remember`); `legendBox` is where the
 * legend is on the canvas now (CSS px from the canvas's top left), for label placement.
 */
export const useWorkspaceStore = defineStore('workspace', () => {
  const group = ref('section')
  const legendCollapsed = ref(false)
  const legendAt = ref<WorkspacePrefs['legendAt']>({ right: 12, top: 12 })
  const legendBox = shallowRef<Box | null>(null)
  /** Phone layout: whether the panel sheet below the drawing is open. */
  const sheetOpen = ref(false)
  let key: string | null = null

  /** Loads the prefs of `userId` and saves every later change under that user. */
  function remember(userId: string): void {
    if (typeof localStorage === 'undefined' || key === workspaceKey(userId)) return
    key = workspaceKey(userId)
    const prefs = readWorkspacePrefs(localStorage.getItem(key))
    group.value = prefs.group
    legendCollapsed.value = prefs.legendCollapsed
    legendAt.value = prefs.legendAt
  }
  watch([group, legendCollapsed, legendAt], () => {
    if (!key) return
    const prefs: WorkspacePrefs = { group: group.value, legendCollapsed: legendCollapsed.value, legendAt: legendAt.value }
    try { localStorage.setItem(key, JSON.stringify(prefs)) } catch { /* storage full or blocked: the arrangement is not remembered */ }
  }, { deep: true })

  return { group, legendCollapsed, legendAt, legendBox, sheetOpen, remember }
})

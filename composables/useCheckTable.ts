import type { AnalysisResponse } from '#shared/analysis/contract'
import { analysisRequestFor } from '#shared/editor/analysis-request'
import type { CheckTable } from '#shared/mechanics/check-table'

/**
 * The check table of the open sketch, asked of the server (`checkTable: true`) while a caller is
 * mounted: again 300 ms after the document's last change; the answer for an older revision is
 * dropped. Returns the table (or null) and the error message of the last attempt.
 */
export function useCheckTable() {
  const sketch = useSketchStore()
  const table = shallowRef<CheckTable | null>(null)
  const error = ref<string | null>(null)
  const pending = ref(false)
  let timer: ReturnType<typeof setTimeout> | null = null
  let asked = 0

  async function refresh(): Promise<void> {
    const body = analysisRequestFor(sketch.doc)
    const mine = ++asked
    if (!body) {
      table.value = null
      error.value = null
      return
    }
    pending.value = true
    try {
      const answer = await $fetch<AnalysisResponse>('/api/analysis', { method: 'POST', body: { ...body, checkTable: true, omit: ['kern', 'vertexStresses'] } })
      if (mine !== asked) return
      table.value = answer.checkTable ?? null
      error.value = null
    } catch (e) {
      if (mine !== asked) return
      table.value = null
      error.value = errorMessage(e)
    } finally {
      if (mine === asked) pending.value = false
    }
  }

  watch(() => sketch.revision, () => {
    if (timer) clearTimeout(timer)
    timer = setTimeout(() => { timer = null; void refresh() }, 300)
  })
  onMounted(() => { void refresh() })
  onBeforeUnmount(() => { if (timer) clearTimeout(timer) })
  return { table, error, pending, refresh }
}

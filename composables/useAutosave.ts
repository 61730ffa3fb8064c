import type { SketchFull } from '#shared/sketch/api'

/** Save state shown by the indicator. */
export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'error'

/**
 * Autosaves the open sketch: a debounced PATCH carrying the version it edited, with the document
 * and any changed title. On 409 (saved elsewhere meanwhile) it stops and offers `reloadTheirs()`
 * or `keepMineAsCopy()`; nothing is overwritten or dropped silently.
 */
export function useAutosave(delayMs = 800) {
  const sketch = useSketchStore()
  const status = ref<SaveStatus>('saved')
  const message = ref<string | null>(null)
  const savedRevision = ref(sketch.revision)
  const savedTitle = ref(sketch.meta?.title ?? '')
  let timer: ReturnType<typeof setTimeout> | null = null
  let saving: Promise<void> | null = null

  const dirty = computed(() => sketch.revision !== savedRevision.value || (sketch.meta?.title ?? '') !== savedTitle.value)

  async function save(): Promise<void> {
    const meta = sketch.meta
    if (!meta || status.value === 'conflict' || !dirty.value) return
    if (saving) { await saving; return save() }
    const revision = sketch.revision
    const title = meta.title
    status.value = 'saving'
    saving = (async () => {
      try {
        const body: Record<string, unknown> = { version: meta.version, document: sketch.doc }
        if (title !== savedTitle.value && title.trim()) body.title = title
        const saved = await $fetch<SketchFull>(`/api/sketches/${meta.id}`, { method: 'PATCH', body })
        sketch.setMeta({ version: saved.version, status: saved.status })
        savedRevision.value = revision
        savedTitle.value = title
        message.value = null
        status.value = dirty.value ? 'unsaved' : 'saved'
      } catch (e) {
        if (errorStatus(e) === 409) {
          status.value = 'conflict'
          message.value = errorMessage(e)
        } else {
          status.value = 'error'
          message.value = errorMessage(e)
        }
      } finally {
        saving = null
      }
    })()
    await saving
    if (status.value === 'unsaved') schedule()
  }

  function schedule(): void {
    if (status.value === 'conflict') return
    status.value = dirty.value ? 'unsaved' : 'saved'
    if (timer) clearTimeout(timer)
    if (dirty.value) timer = setTimeout(() => { timer = null; void save() }, delayMs)
  }

  /** Drops my unsaved changes and opens the version saved elsewhere. */
  async function reloadTheirs(): Promise<void> {
    const meta = sketch.meta
    if (!meta) return
    const fresh = await $fetch<SketchFull>(`/api/sketches/${meta.id}`)
    sketch.load(fresh)
    savedRevision.value = sketch.revision
    savedTitle.value = fresh.title
    status.value = 'saved'
    message.value = null
  }

  /** Saves my version as a new sketch and opens it; the other version stays as it was saved. */
  async function keepMineAsCopy(): Promise<void> {
    const meta = sketch.meta
    if (!meta) return
    const copy = await $fetch<SketchFull>('/api/sketches', {
      method: 'POST',
      body: { title: `${meta.title} (my copy)`.slice(0, 160), project: meta.project, description: meta.description, document: sketch.doc },
    })
    status.value = 'saved'
    await navigateTo(`/sketches/${copy.id}`)
  }

  /** Called after `sketch.load()`: the loaded state counts as saved. */
  function markLoaded(): void {
    savedRevision.value = sketch.revision
    savedTitle.value = sketch.meta?.title ?? ''
    status.value = 'saved'
    message.value = null
  }

  watch(() => [sketch.revision, sketch.meta?.title], schedule)

  function beforeUnload(e: BeforeUnloadEvent): void {
    if (dirty.value) e.preventDefault()
  }
  onMounted(() => window.addEventListener('beforeunload', beforeUnload))
  onBeforeUnmount(() => {
    window.removeEventListener('beforeunload', beforeUnload)
    // Leaving the editor flushes a pending save rather than dropping it.
    if (timer) { clearTimeout(timer); timer = null; void save() }
  })

  return { status, message, dirty, save, reloadTheirs, keepMineAsCopy, markLoaded }
}

/** The open sketch's autosave, as the editor page and the save indicator share it. */
export type Autosave = ReturnType<typeof useAutosave>

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
  // A reader (view or comment share) explores without saving.
  const access = useAccessStore()
  const status = ref<SaveStatus>('saved')
  const message = ref<string | null>(null)
  const savedRevision = ref(sketch.revision)
  const savedTitle = ref(sketch.meta?.title ?? '')
  let timer: ReturnType<typeof setTimeout> | null = null
  let saving: Promise<void> | null = null
  /**
   * The sketch this autosave writes and the version it last saw, kept here and not read back from
   * the store: a save still under way when the editor is left (or another sketch is opened) must
   * finish against its own sketch, and must not give the next sketch its version.
   */
  const target = { id: sketch.meta?.id ?? '', version: sketch.meta?.version ?? 0 }

  const dirty = computed(() => sketch.revision !== savedRevision.value || (sketch.meta?.title ?? '') !== savedTitle.value)

  /** The state to save, taken at once (the store replaces the document on every edit, so this is a snapshot). */
  function snapshot() {
    return { doc: sketch.doc, title: sketch.meta?.title ?? '', revision: sketch.revision, mine: sketch.meta?.id === target.id }
  }

  async function save(): Promise<void> {
    if (!sketch.meta || status.value === 'conflict' || !dirty.value) return
    return send(snapshot())
  }

  /** Saves one snapshot after any save under way (one PATCH at a time, each with the version the last one got). */
  async function send(snap: ReturnType<typeof snapshot>): Promise<void> {
    if (!snap.mine || !target.id || !access.canEdit) return
    while (saving) await saving
    if (status.value === 'conflict') return
    status.value = 'saving'
    saving = (async () => {
      try {
        const body: Record<string, unknown> = { version: target.version, document: snap.doc }
        if (snap.title !== savedTitle.value && snap.title.trim()) body.title = snap.title
        const saved = await $fetch<SketchFull>(`/api/sketches/${target.id}`, { method: 'PATCH', body })
        target.version = saved.version
        savedRevision.value = snap.revision
        savedTitle.value = snap.title
        if (sketch.meta?.id === target.id) sketch.setMeta({ version: saved.version, status: saved.status })
        message.value = null
        status.value = dirty.value ? 'unsaved' : 'saved'
      } catch (e) {
        status.value = errorStatus(e) === 409 ? 'conflict' : 'error'
        message.value = errorMessage(e)
      } finally {
        saving = null
      }
    })()
    await saving
    if (status.value === 'unsaved' && sketch.meta?.id === target.id) schedule()
  }

  function schedule(): void {
    if (status.value === 'conflict' || !access.canEdit) return
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
    target.version = fresh.version
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
    target.id = sketch.meta?.id ?? ''
    target.version = sketch.meta?.version ?? 0
    savedRevision.value = sketch.revision
    savedTitle.value = sketch.meta?.title ?? ''
    status.value = 'saved'
    message.value = null
  }

  watch(() => [sketch.revision, sketch.meta?.title], schedule)

  function beforeUnload(e: BeforeUnloadEvent): void {
    if (dirty.value && access.canEdit) e.preventDefault()
  }
  onMounted(() => window.addEventListener('beforeunload', beforeUnload))
  onBeforeUnmount(() => {
    window.removeEventListener('beforeunload', beforeUnload)
    // Leaving the editor saves what is not saved yet, now, as a snapshot: not only when a save was
    // scheduled (a change committed while leaving has no timer yet) and after any save under way.
    if (timer) { clearTimeout(timer); timer = null }
    if (dirty.value && status.value !== 'conflict') void send(snapshot())
  })

  return { status, message, dirty, save, reloadTheirs, keepMineAsCopy, markLoaded }
}

/** The open sketch's autosave, as the editor page and the save indicator share it. */
export type Autosave = ReturnType<typeof useAutosave>

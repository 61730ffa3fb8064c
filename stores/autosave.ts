import { defineStore } from 'pinia'
import { computed, ref, watch } from 'vue'
import type { SketchFull } from '#shared/sketch/api'
import { errorMessage, errorStatus } from '#shared/utils/errors'
import { useAccessStore } from './access'
import { useDisplayStore } from './display'
import { useSketchStore } from './sketch'

/** Save state shown by the indicator. */
export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'conflict' | 'error'

/**
 * Autosaves the open sketch: a debounced PATCH carrying the version it edited, with the document
 * and any changed title. On 409 (saved elsewhere meanwhile) it stops and offers `reloadTheirs()`
 * or `keepMineAsCopy()`; nothing is overwritten or dropped silently. The editor page `start()`s it
 * when it opens and `stop()`s it when it leaves, which saves what is not saved yet.
 */
export const useAutosaveStore = defineStore('autosave', () => {
  const delayMs = 800
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
   * The sketch this autosave writes now, and the version last seen of every sketch it wrote, kept
   * here and not read back from the sketch store: a save still under way when the editor is left
   * (or another sketch is opened) finishes against its own sketch and its own version, and does not
   * give the next sketch its version or its save state.
   */
  const target = { id: sketch.meta?.id ?? '' }
  const versions = new Map<string, number>()
  if (sketch.meta) versions.set(sketch.meta.id, sketch.meta.version)

  const dirty = computed(() => sketch.revision !== savedRevision.value || (sketch.meta?.title ?? '') !== savedTitle.value)

  /** The state to save, taken at once (the store replaces the document on every edit, so this is a snapshot). */
  function snapshot() {
    return { id: target.id, doc: sketch.doc, title: sketch.meta?.title ?? '', savedTitle: savedTitle.value, revision: sketch.revision, mine: sketch.meta?.id === target.id }
  }

  async function save(): Promise<void> {
    if (!sketch.meta || status.value === 'conflict' || !dirty.value) return
    return send(snapshot())
  }

  /** Saves one snapshot after any save under way (one PATCH at a time, each with the version the last one got). */
  async function send(snap: ReturnType<typeof snapshot>): Promise<void> {
    if (!snap.mine || !snap.id || access.readOnly) return
    while (saving) await saving
    const current = () => target.id === snap.id
    if (current() && status.value === 'conflict') return
    if (current()) status.value = 'saving'
    saving = (async () => {
      try {
        const body: Record<string, unknown> = { version: versions.get(snap.id) ?? 0, document: snap.doc }
        if (snap.title !== snap.savedTitle && snap.title.trim()) body.title = snap.title
        const saved = await $fetch<SketchFull>(`/api/sketches/${snap.id}`, { method: 'PATCH', body })
        versions.set(snap.id, saved.version)
        if (!current()) return
        savedRevision.value = snap.revision
        savedTitle.value = snap.title
        if (sketch.meta?.id === snap.id) sketch.setMeta({ version: saved.version, status: saved.status })
        message.value = null
        status.value = dirty.value ? 'unsaved' : 'saved'
      } catch (e) {
        if (!current()) return
        status.value = errorStatus(e) === 409 ? 'conflict' : 'error'
        message.value = errorMessage(e)
      } finally {
        saving = null
      }
    })()
    await saving
    if (current() && status.value === 'unsaved' && running.value && sketch.meta?.id === snap.id) schedule()
  }

  function schedule(): void {
    if (status.value === 'conflict' || access.readOnly) return
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
    versions.set(fresh.id, fresh.version)
    savedRevision.value = sketch.revision
    savedTitle.value = fresh.title
    status.value = 'saved'
    message.value = null
  }

  /** Saves my version as a new sketch; returns its id for the page to open (the other version stays as it was saved). */
  async function keepMineAsCopy(): Promise<string | null> {
    const meta = sketch.meta
    if (!meta) return null
    const copy = await $fetch<SketchFull>('/api/sketches', {
      method: 'POST',
      body: { title: `${meta.title} (my copy)`.slice(0, 160), project: meta.project, description: meta.description, document: sketch.doc },
    })
    status.value = 'saved'
    return copy.id
  }

  /** Called after `sketch.load()`: the loaded state counts as saved. */
  function markLoaded(): void {
    target.id = sketch.meta?.id ?? ''
    // The newer of the version loaded and the one a save of this sketch already got.
    if (sketch.meta) versions.set(sketch.meta.id, Math.max(sketch.meta.version, versions.get(sketch.meta.id) ?? 0))
    savedRevision.value = sketch.revision
    savedTitle.value = sketch.meta?.title ?? ''
    status.value = 'saved'
    message.value = null
  }

  const running = ref(false)
  // A gesture's change held for its analysis (stores/display.ts) shows as unsaved when it is drawn,
  // with its numbers, not a frame before them.
  const display = useDisplayStore()
  watch(() => [sketch.revision, sketch.meta?.title, display.holding], () => { if (running.value && display.holding === null) schedule() })

  function beforeUnload(e: BeforeUnloadEvent): void {
    if (dirty.value && !access.readOnly) e.preventDefault()
  }

  /** Starts saving the open sketch's changes (the editor page, once mounted). */
  function start(): void {
    running.value = true
    window.addEventListener('beforeunload', beforeUnload)
  }

  /**
   * Stops, saving what is not saved yet, now, as a snapshot: not only when a save was scheduled (a
   * change committed while leaving has no timer yet), and after any save under way.
   */
  function stop(): Promise<void> {
    running.value = false
    window.removeEventListener('beforeunload', beforeUnload)
    if (timer) { clearTimeout(timer); timer = null }
    return dirty.value && status.value !== 'conflict' ? send(snapshot()) : Promise.resolve()
  }

  return { status, message, dirty, running, save, reloadTheirs, keepMineAsCopy, markLoaded, start, stop }
})

/** The open sketch's autosave, as the editor page and the save indicator share it. */
export type Autosave = ReturnType<typeof useAutosaveStore>

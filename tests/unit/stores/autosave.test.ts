import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { emptyDocument } from '#shared/sketch/document'
import { rectangleRing } from '#shared/editor/transform'
import { useSketchStore } from '../../../stores/sketch'
import { useAutosaveStore } from '../../../stores/autosave'

/** $fetch replaced by a server that keeps a version per sketch (compare-and-set, 409 when stale) and answers when released. */
function fakeServer(versions: Record<string, number>) {
  const patches: { id: string; body: { version: number; document: { parts: unknown[] }; title?: string }; release: () => void }[] = []
  vi.stubGlobal('$fetch', (url: string, init: { method: string; body: { version: number; document: { parts: unknown[] } } }) => new Promise((resolve, reject) => {
    const id = url.split('/').pop()!
    patches.push({
      id,
      body: init.body,
      release: () => {
        if (init.body.version !== versions[id]) return reject(Object.assign(new Error('Saved elsewhere'), { statusCode: 409, data: { message: 'This sketch was saved elsewhere.' } }))
        versions[id]!++
        resolve({ id, version: versions[id], status: 'draft' })
      },
    })
  }))
  return patches
}

const flush = async () => { for (let i = 0; i < 8; i++) await Promise.resolve() }

function open(id: string, version = 1) {
  const s = useSketchStore()
  s.load({ id, title: `Sketch ${id}`, project: '', description: '', status: 'draft', version, ownerId: 'u', createdAt: '', updatedAt: '', partCount: 0, document: emptyDocument() })
  useAutosaveStore().markLoaded()
  return s
}

describe('autosave store', () => {
  beforeEach(() => {
    setActivePinia(createPinia())
    vi.useFakeTimers()
    vi.stubGlobal('window', { addEventListener: () => {}, removeEventListener: () => {} })
  })
  afterEach(() => { vi.unstubAllGlobals(); vi.useRealTimers() })

  it('saves a change after the quiet time with the version it edited, then counts as saved', async () => {
    const patches = fakeServer({ a: 1 })
    const s = open('a')
    const save = useAutosaveStore()
    save.start()
    s.addPart({ outline: rectangleRing([0, 0], [10, 10]) })
    await flush()
    expect(save.status).toBe('unsaved')
    vi.advanceTimersByTime(799)
    expect(patches).toHaveLength(0)
    vi.advanceTimersByTime(1)
    await flush()
    expect(patches).toHaveLength(1)
    expect(patches[0]!.body.version).toBe(1)
    expect(save.status).toBe('saving')
    patches[0]!.release()
    await flush()
    expect(save.status).toBe('saved')
    expect(s.meta!.version).toBe(2)
  })

  it('a 409 stops saving and says so; nothing is sent again until the user chooses', async () => {
    const patches = fakeServer({ a: 5 })
    const s = open('a', 1)
    const save = useAutosaveStore()
    save.start()
    s.addPart({ outline: rectangleRing([0, 0], [10, 10]) })
    await flush()
    vi.advanceTimersByTime(800)
    await flush()
    patches[0]!.release()
    await flush()
    expect(save.status).toBe('conflict')
    expect(save.message).toBe('This sketch was saved elsewhere.')
    s.addPart({ outline: rectangleRing([20, 0], [30, 10]) })
    await flush()
    vi.advanceTimersByTime(5000)
    await flush()
    expect(patches).toHaveLength(1)
  })

  it('leaving with a save under way saves the last change to its own sketch, with the version that save got', async () => {
    const versions = { a: 1, b: 7 }
    const patches = fakeServer(versions)
    const s = open('a')
    const save = useAutosaveStore()
    save.start()
    s.addPart({ outline: rectangleRing([0, 0], [10, 10]) })
    await flush()
    vi.advanceTimersByTime(800)
    await flush()
    s.addPart({ outline: rectangleRing([20, 0], [30, 10]) })
    await flush()
    const left = save.stop()
    // Another sketch opens while the first save is still under way.
    open('b', 7)
    save.start()
    patches[0]!.release()
    await flush()
    expect(patches).toHaveLength(2)
    expect(patches[1]!.id).toBe('a')
    expect(patches[1]!.body.version).toBe(2)
    expect(patches[1]!.body.document.parts).toHaveLength(2)
    patches[1]!.release()
    await left
    expect(versions).toEqual({ a: 3, b: 7 })
    // The sketch open now was not touched and has nothing to save.
    expect(save.status).toBe('saved')
    expect(useSketchStore().meta!.version).toBe(7)
  })
})

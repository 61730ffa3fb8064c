import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { emptyDocument } from '#shared/sketch/document'
import { rectangleRing } from '#shared/editor/transform'
import { useAccessStore, type SketchAccessInfo } from '../../../stores/access'
import { useAutosaveStore } from '../../../stores/autosave'
import { useSketchStore } from '../../../stores/sketch'

const info = (access: SketchAccessInfo['access']): SketchAccessInfo => ({
  id: 'a', access, status: 'draft', owner: 'Owner', checker: null, reviewRevision: null, isChecker: false, approvedBy: null, approvedAt: null, approvedRevision: null,
})

describe('access store', () => {
  beforeEach(() => {
    setActivePinia(createPinia())
    vi.useFakeTimers()
    vi.stubGlobal('window', { addEventListener: () => {}, removeEventListener: () => {} })
  })
  afterEach(() => { vi.unstubAllGlobals(); vi.useRealTimers() })

  it.each([
    ['view', false, false, false],
    ['comment', false, true, false],
    ['edit', true, true, false],
    ['manage', true, true, true],
  ] as const)('%s access: canEdit %s, canComment %s, canManage %s', (access, edit, comment, manage) => {
    const store = useAccessStore()
    store.set(info(access))
    expect([store.canEdit, store.canComment, store.canManage, store.readOnly]).toEqual([edit, comment, manage, !edit])
  })

  it('nothing loaded is not read-only; reset forgets the sketch', () => {
    const store = useAccessStore()
    expect(store.readOnly).toBe(false)
    store.set(info('view'))
    store.reset()
    expect(store.info).toBeNull()
  })

  it.each([['view', 0], ['edit', 1]] as const)('with %s access the autosave sends %i PATCH after a change', async (access, count) => {
    const sent: unknown[] = []
    vi.stubGlobal('$fetch', (url: string, init: unknown) => { sent.push([url, init]); return new Promise(() => {}) })
    useAccessStore().set(info(access))
    const sketch = useSketchStore()
    sketch.load({ id: 'a', title: 'A', project: '', description: '', status: 'draft', version: 1, ownerId: 'u', createdAt: '', updatedAt: '', partCount: 0, document: emptyDocument() })
    const save = useAutosaveStore()
    save.markLoaded()
    save.start()
    sketch.addPart({ outline: rectangleRing([0, 0], [10, 10]) })
    for (let i = 0; i < 8; i++) await Promise.resolve()
    vi.advanceTimersByTime(2000)
    for (let i = 0; i < 8; i++) await Promise.resolve()
    expect(sent).toHaveLength(count)
  })
})

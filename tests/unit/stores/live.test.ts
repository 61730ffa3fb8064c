import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { emptyDocument } from '#shared/sketch/document'
import { rectangleRing } from '#shared/editor/transform'
import { useSketchStore } from '../../../stores/sketch'
import { useAnalysisStore } from '../../../stores/analysis'
import { HOLD_MS, useDisplayStore } from '../../../stores/display'

/**
 * The live analysis and what is on screen, with fetch replaced by a server whose answers the test
 * releases one by one: each answer carries the area the request asked about (the rectangle's
 * width × height, a closed form), so the test can tell which revision an answer belongs to.
 */
function fakeServer() {
  const calls: { body: { parts: { outline: [number, number][] }[] }; release: (status?: number) => void }[] = []
  vi.stubGlobal('fetch', (_url: string, init: { body: string }) => new Promise((resolve) => {
    const body = JSON.parse(init.body)
    calls.push({
      body,
      release: (status = 200) => {
        const o = body.parts[0].outline as [number, number][]
        const xs = o.map(p => p[0])
        const ys = o.map(p => p[1])
        const area = (Math.max(...xs) - Math.min(...xs)) * (Math.max(...ys) - Math.min(...ys))
        const data = status === 200 ? { properties: { area }, regions: [], warnings: [] } : { message: 'Part 1 crosses itself', data: { part: 0, ring: 0, vertex: 1 } }
        resolve({ ok: status === 200, status, json: async () => data })
      },
    })
  }))
  return calls
}

const flush = async () => { for (let i = 0; i < 6; i++) await Promise.resolve() }

function open(id = 's1') {
  const s = useSketchStore()
  s.load({ id, title: 'T', project: '', description: '', status: 'draft', version: 1, ownerId: 'u', createdAt: '', updatedAt: '', partCount: 0, document: emptyDocument() })
  return s
}

describe('live analysis store', () => {
  beforeEach(() => setActivePinia(createPinia()))
  afterEach(() => { vi.unstubAllGlobals(); vi.useRealTimers() })

  it('posts a change synchronously with the edit, one request at a time, the latest revision winning', async () => {
    const calls = fakeServer()
    const s = open()
    const a = useAnalysisStore()
    a.start()
    const id = s.addPart({ outline: rectangleRing([0, 0], [100, 50]) })
    expect(calls).toHaveLength(1) // sent inside the action, before any await
    s.moveParts([id], 10, 0)
    s.moveParts([id], 10, 0)
    expect(calls).toHaveLength(1) // queued, not sent
    calls[0]!.release()
    await flush()
    expect(a.latest.revision).toBe(1)
    expect(a.latest.result?.properties.area).toBe(5000) // 100 × 50
    expect(calls).toHaveLength(2) // only the newest queued revision goes out
    expect(calls[1]!.body.parts[0]!.outline[0]).toEqual([20, 0])
    calls[1]!.release()
    await flush()
    expect(a.latest.revision).toBe(3)
    expect(a.busy).toBe(false)
  })

  it('a queued request that a newer revision replaces settles with null', async () => {
    const calls = fakeServer()
    const s = open()
    const a = useAnalysisStore()
    const id = s.addPart({ outline: rectangleRing([0, 0], [100, 50]) })
    const first = a.request(s.doc, 1)
    s.moveParts([id], 5, 0)
    const replaced = a.request(s.doc, 2)
    s.moveParts([id], 5, 0)
    const newest = a.request(s.doc, 3)
    await expect(replaced).resolves.toBeNull()
    calls[0]!.release()
    expect((await first)?.revision).toBe(1)
    await flush()
    calls[1]!.release()
    expect((await newest)?.revision).toBe(3)
  })

  it('an error answer names the message and where it points; a document with no part answers no result without a request', async () => {
    const calls = fakeServer()
    const s = open()
    const a = useAnalysisStore()
    a.start()
    expect(calls).toHaveLength(0)
    expect(a.latest.revision).toBe(0)
    expect(a.latest.result).toBeNull()
    s.addPart({ outline: rectangleRing([0, 0], [100, 50]) })
    calls[0]!.release(422)
    await flush()
    expect(a.latest.error).toBe('Part 1 crosses itself')
    expect(a.latest.result).toBeNull()
  })

  it('an answer for a sketch that was closed meanwhile is dropped', async () => {
    const calls = fakeServer()
    const s = open('s1')
    const a = useAnalysisStore()
    a.start()
    s.addPart({ outline: rectangleRing([0, 0], [100, 50]) })
    open('s2')
    calls[0]!.release()
    await flush()
    expect(a.latest.result).toBeNull()
  })
})

describe('display store: the parts drawn and the analysis shown advance together', () => {
  beforeEach(() => setActivePinia(createPinia()))
  afterEach(() => { vi.unstubAllGlobals(); vi.useRealTimers() })

  function editor() {
    const calls = fakeServer()
    const s = open()
    const a = useAnalysisStore()
    const d = useDisplayStore()
    a.start()
    const id = s.addPart({ outline: rectangleRing([0, 0], [100, 50]) })
    return { calls, s, a, d, id }
  }

  it('an ordinary edit is drawn at once and its numbers follow with the answer', async () => {
    const { calls, s, d } = editor()
    expect(d.parts).toBe(s.parts)
    expect(d.pending).toBe(true)
    calls[0]!.release()
    await flush()
    expect(d.shown.result?.properties.area).toBe(5000) // 100 × 50
    expect(d.pending).toBe(false)
  })

  it('a held gesture keeps the drawing until its answer, then parts and numbers change in one step', async () => {
    const { calls, s, d, id } = editor()
    calls[0]!.release()
    await flush()
    const drawn = d.parts
    d.hold()
    s.moveVertex(id, 0, 2, [120, 60])
    // Committed at once in the document (autosave, undo see it) but not drawn yet.
    expect(s.parts[0]!.outline[2]).toEqual([120, 60])
    expect(d.parts).toBe(drawn)
    expect(d.holding).toBe(s.revision)
    const seen: [boolean, number | undefined][] = []
    calls[1]!.release()
    await flush()
    seen.push([d.parts === s.parts, d.shown.result?.properties.area])
    expect(seen).toEqual([[true, 120 * 60]]) // the moved corner (120, 60) spans 120 × 60
    expect(d.holding).toBeNull()
  })

  it('a held change is drawn after HOLD_MS when its answer does not come', () => {
    vi.useFakeTimers()
    const { s, d, id } = editor()
    d.hold()
    s.moveParts([id], 10, 0)
    vi.advanceTimersByTime(HOLD_MS - 1)
    expect(d.parts).not.toBe(s.parts)
    vi.advanceTimersByTime(1)
    expect(d.parts).toBe(s.parts)
    expect(d.holding).toBeNull()
  })

  it('another edit while a change is held draws both at once (undo included)', () => {
    const { s, d, id } = editor()
    d.hold()
    s.moveParts([id], 10, 0)
    expect(d.parts).not.toBe(s.parts)
    s.undo()
    expect(d.parts).toBe(s.parts)
    expect(d.parts[0]!.outline[0]).toEqual([0, 0])
    expect(d.holding).toBeNull()
  })

  it('a geometry error keeps the last good result on screen with the error beside it', async () => {
    const { calls, s, d, id } = editor()
    calls[0]!.release()
    await flush()
    s.moveVertex(id, 0, 1, [-10, 60])
    calls[1]!.release(422)
    await flush()
    expect(d.shown.error).toBe('Part 1 crosses itself')
    expect(d.shown.result?.properties.area).toBe(5000)
  })

  it('opening another sketch draws its parts at once and forgets the last result', async () => {
    const { calls, d } = editor()
    d.hold()
    const s2 = open('s2')
    calls[0]!.release()
    await flush()
    expect(d.parts).toBe(s2.parts)
    expect(d.shown.result).toBeNull()
  })
})

import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { emptyDocument } from '#shared/sketch/document'
import { HISTORY_LIMIT, useHistoryStore, type Change } from '../../../stores/history'

const settings = emptyDocument().settings
const change = (label: string): Change => ({ kind: 'settings', label, before: settings, after: { ...settings, gridMm: 5 } })

describe('history store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('push records a change; takeUndo and takeRedo move it between the stacks', () => {
    const h = useHistoryStore()
    h.push(change('a'))
    expect(h.canUndo).toBe(true)
    expect(h.undoLabel).toBe('a')
    expect(h.takeUndo()?.label).toBe('a')
    expect(h.canUndo).toBe(false)
    expect(h.redoLabel).toBe('a')
    expect(h.takeRedo()?.label).toBe('a')
    expect(h.canRedo).toBe(false)
  })

  it('a new change truncates the redo stack', () => {
    const h = useHistoryStore()
    h.push(change('a'))
    h.takeUndo()
    h.push(change('b'))
    expect(h.canRedo).toBe(false)
    expect(h.takeRedo()).toBeNull()
  })

  it('keeps at most HISTORY_LIMIT changes, dropping the oldest', () => {
    const h = useHistoryStore()
    for (let i = 0; i < HISTORY_LIMIT + 5; i++) h.push(change(String(i)))
    expect(h.undoStack).toHaveLength(HISTORY_LIMIT)
    expect(h.undoStack[0]!.label).toBe('5')
  })

  it('takeUndo on an empty stack is null; clear empties both stacks', () => {
    const h = useHistoryStore()
    expect(h.takeUndo()).toBeNull()
    h.push(change('a'))
    h.takeUndo()
    h.clear()
    expect(h.canUndo || h.canRedo).toBe(false)
  })
})

import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { nextTick } from 'vue'
import { readWorkspacePrefs, workspaceKey } from '#shared/editor/workspace-prefs'
import { useWorkspaceStore } from '../../../stores/workspace'

/** A Map behind the Storage interface (the unit tests run without a browser). */
function memoryStorage(): Storage {
  const m = new Map<string, string>()
  return { get length() { return m.size }, clear: () => m.clear(), getItem: k => m.get(k) ?? null, key: i => [...m.keys()][i] ?? null, removeItem: (k) => { m.delete(k) }, setItem: (k, v) => { m.set(k, String(v)) } }
}

describe('workspace prefs', () => {
  it('unreadable stored text gives the defaults', () => {
    for (const text of [null, '', 'not json', '{"group": 5}', '{"legendAt": {"right": -4, "top": 0}}']) {
      expect(readWorkspacePrefs(text)).toEqual({ group: 'section', legendCollapsed: false, legendAt: { right: 12, top: 12 } })
    }
  })
})

describe('workspace store', () => {
  beforeEach(() => {
    setActivePinia(createPinia())
    ;(globalThis as { localStorage?: Storage }).localStorage = memoryStorage()
  })

  it('remembers the group and the legend per user: one user\'s choice is not another\'s', async () => {
    const w = useWorkspaceStore()
    w.remember('user-a')
    w.group = 'checks'
    w.legendCollapsed = true
    await nextTick()
    expect(JSON.parse(localStorage.getItem(workspaceKey('user-a'))!)).toMatchObject({ group: 'checks', legendCollapsed: true })
    expect(localStorage.getItem(workspaceKey('user-b'))).toBeNull()

    setActivePinia(createPinia())
    const b = useWorkspaceStore()
    b.remember('user-b')
    expect(b.group).toBe('section')
    setActivePinia(createPinia())
    const again = useWorkspaceStore()
    again.remember('user-a')
    expect(again.group).toBe('checks')
    expect(again.legendCollapsed).toBe(true)
  })
})

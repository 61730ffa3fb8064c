import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { useSelectionStore } from '../../../stores/selection'

describe('selection store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('select replaces the selection; additive select toggles in click order', () => {
    const s = useSelectionStore()
    s.select('a')
    s.select('b', true)
    expect(s.partIds).toEqual(['a', 'b'])
    s.select('a', true)
    expect(s.partIds).toEqual(['b'])
    s.select('c')
    expect(s.partIds).toEqual(['c'])
  })

  it('selectVertex selects its part; clear drops everything', () => {
    const s = useSelectionStore()
    s.selectVertex({ part: 'p', ring: 0, index: 2 })
    expect(s.partIds).toEqual(['p'])
    s.clear()
    expect(s.partIds).toEqual([])
    expect(s.vertex).toBeNull()
  })

  it('prune drops parts and vertices that no longer exist', () => {
    const s = useSelectionStore()
    s.selectMany(['a', 'b'])
    s.selectVertex({ part: 'a', ring: 0, index: 5 })
    s.prune(new Set(['a']), () => 4)
    expect(s.partIds).toEqual(['a'])
    expect(s.vertex).toBeNull()
  })

  it('setTool and setPreview switch the tool and the insert preview', () => {
    const s = useSelectionStore()
    s.setTool('box')
    expect(s.tool).toBe('box')
    s.setPreview({ outline: [[0, 0], [1, 0], [0, 1]], holes: [] })
    expect(s.preview?.outline).toHaveLength(3)
    s.setPreview(null)
    expect(s.preview).toBeNull()
  })
})

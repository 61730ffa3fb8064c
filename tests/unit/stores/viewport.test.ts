import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { MAX_ZOOM, useViewportStore } from '../../../stores/viewport'

describe('viewport store (screen = pan + zoom·(x, −y))', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('toScreen and toWorld are inverse, with y up in the model', () => {
    const v = useViewportStore()
    v.zoom = 2; v.panX = 100; v.panY = 300
    expect(v.toScreen(10, 20)).toEqual([120, 260])
    expect(v.toWorld(120, 260)).toEqual([10, 20])
  })

  it('zoomAt keeps the model point under the pointer fixed', () => {
    const v = useViewportStore()
    v.zoom = 1; v.panX = 0; v.panY = 0
    const before = v.toWorld(200, 150)
    v.zoomAt(3, 200, 150)
    expect(v.zoom).toBe(3)
    expect(v.toWorld(200, 150)).toEqual(before)
    v.zoomAt(1e12, 0, 0)
    expect(v.zoom).toBe(MAX_ZOOM)
  })

  it('fit centres the bounds and fills the canvas less the margin', () => {
    const v = useViewportStore()
    v.setSize(1000, 600)
    v.fit({ minX: 0, minY: 0, maxX: 200, maxY: 100 }, 50)
    expect(v.zoom).toBe(4.5) // min((1000-100)/200, (600-100)/100)
    expect(v.toScreen(100, 50)).toEqual([500, 300])
  })

  it('panBy moves the view in screen px; visible is the model rectangle on screen', () => {
    const v = useViewportStore()
    v.setSize(100, 50)
    v.zoom = 1; v.panX = 0; v.panY = 50
    v.panBy(10, 0)
    expect(v.visible).toEqual({ minX: -10, minY: 0, maxX: 90, maxY: 50 })
  })
})

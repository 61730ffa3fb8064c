import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { boxesOverlap, placeLabels, type Box, type LabelRequest } from '#shared/canvas/labels'

const AREA: Box = { x: 0, y: 0, w: 400, h: 300 }
const label = (x: number, y: number, w = 60, h = 14, priority = 2, reach = 84): LabelRequest => ({ x, y, w, h, priority, reach })
const inside = (b: Box, a: Box) => b.x >= a.x && b.y >= a.y && b.x + b.w <= a.x + a.w && b.y + b.h <= a.y + a.h

describe('placeLabels', () => {
  it('keeps a label where it asked to be when nothing is in the way', () => {
    expect(placeLabels([label(100, 100)], AREA, [])).toEqual([{ x: 100, y: 100, w: 60, h: 14 }])
  })

  it('moves a label that would stick out of the canvas back inside (the "max C" callout at the edge)', () => {
    const [b] = placeLabels([label(370, -6)], AREA, [])
    expect(b).not.toBeNull()
    expect(inside(b!, AREA)).toBe(true)
  })

  it('moves the second of two labels asked at the same place so they do not overlap', () => {
    const [a, b] = placeLabels([label(100, 100), label(100, 100)], AREA, [])
    expect(a).toEqual({ x: 100, y: 100, w: 60, h: 14 })
    expect(boxesOverlap(a!, b!, 2)).toBe(false)
  })

  it('places a higher priority label first: it keeps its place, the other moves', () => {
    const [low, high] = placeLabels([label(100, 100, 60, 14, 1, 84), label(100, 100, 60, 14, 3)], AREA, [])
    expect(high).toEqual({ x: 100, y: 100, w: 60, h: 14 })
    expect(boxesOverlap(low!, high!, 2)).toBe(false)
  })

  it('keeps labels out of the legend and the dimension lines (keep-out boxes)', () => {
    const legend: Box = { x: 300, y: 0, w: 100, h: 150 }
    const [b] = placeLabels([label(320, 40)], AREA, [legend])
    expect(boxesOverlap(b!, legend, 2)).toBe(false)
    expect(inside(b!, AREA)).toBe(true)
  })

  it('leaves out a label with no free place within its reach rather than draw it over another', () => {
    const wall: Box = { x: 0, y: 0, w: 400, h: 300 }
    expect(placeLabels([label(100, 100, 60, 14, 1, 18)], AREA, [wall])).toEqual([null])
  })

  it('for any labels: every placed box is inside the canvas, clear of the keep-out boxes and of every other (property test)', () => {
    const req = fc.record({ x: fc.integer({ min: -80, max: 460 }), y: fc.integer({ min: -40, max: 340 }), w: fc.integer({ min: 10, max: 120 }), h: fc.integer({ min: 8, max: 20 }), priority: fc.integer({ min: 1, max: 3 }), reach: fc.constantFrom(18, 84) })
    const keep = fc.record({ x: fc.integer({ min: 0, max: 380 }), y: fc.integer({ min: 0, max: 280 }), w: fc.integer({ min: 5, max: 120 }), h: fc.integer({ min: 5, max: 120 }) })
    fc.assert(fc.property(fc.array(req, { maxLength: 25 }), fc.array(keep, { maxLength: 4 }), (labels, keepOut) => {
      const boxes = placeLabels(labels, AREA, keepOut).filter((b): b is Box => b !== null)
      for (const b of boxes) {
        expect(inside(b, AREA)).toBe(true)
        for (const k of keepOut) expect(boxesOverlap(b, k, 2)).toBe(false)
      }
      for (let i = 0; i < boxes.length; i++) for (let j = i + 1; j < boxes.length; j++) expect(boxesOverlap(boxes[i]!, boxes[j]!, 2)).toBe(false)
    }), { numRuns: 200 })
  })
})

import { describe, expect, it } from 'vitest'
import { SHAPES } from '#shared/shapes/registry'
import { ringArea } from '#shared/geometry/moments'
import { draftPart, pickAt, ringsExcept, wheelAction } from '#shared/editor/gesture'
import { rectangleRing } from '#shared/editor/transform'

const build = { circle: (d: number) => SHAPES.circle.build({ d }), tube: (d: number, t: number) => SHAPES.tube.build({ d, t }) }
const parts = [{ id: 'a', outline: rectangleRing([0, 0], [100, 50]), holes: [] }]

describe('gestures', () => {
  it('draftPart turns a box drag into a CCW rectangle and refuses a zero-width one', () => {
    const d = draftPart({ kind: 'box', a: [100, 50], b: [0, 0] }, 8, build, 0)!
    expect(d.outline).toEqual([[0, 0], [100, 0], [100, 50], [0, 50]])
    expect(d.name).toBe('Box 1')
    expect(draftPart({ kind: 'box', a: [0, 0], b: [0, 50] }, 8, build, 0)).toBeNull()
  })

  it('draftPart builds a tube at the drag centre with a wall of at most 90 % of the radius', () => {
    const d = draftPart({ kind: 'round', centre: [10, 20], r: 50, tube: true }, 8, build, 0)!
    expect(d.shape).toEqual({ kind: 'tube', params: { d: 100, t: 8 } })
    expect(d.holes).toHaveLength(1)
    // Inscribed polygons: within the 0.05 mm chord tolerance of π(R² − r²) (closed form).
    const a = ringArea(d.outline) + ringArea(d.holes[0]!.ring)
    expect(Math.abs(a - Math.PI * (50 ** 2 - 42 ** 2)) / a).toBeLessThan(3e-3)
    expect(draftPart({ kind: 'round', centre: [0, 0], r: 5, tube: true }, 8, build, 0)!.shape!.params.t).toBe(4.5)
  })

  it('wheelAction: ctrl+wheel pinches, whole mouse notches zoom, touchpad scrolls pan', () => {
    expect(wheelAction({ deltaX: 0, deltaY: -10, deltaMode: 0, ctrlKey: true, metaKey: false })).toEqual({ kind: 'zoom', factor: Math.exp(0.1) })
    expect(wheelAction({ deltaX: 0, deltaY: -100, deltaMode: 0, ctrlKey: false, metaKey: false })).toEqual({ kind: 'zoom', factor: 1.2 })
    expect(wheelAction({ deltaX: 3, deltaY: 7.5, deltaMode: 0, ctrlKey: false, metaKey: false })).toEqual({ kind: 'pan', dx: -3, dy: -7.5 })
  })

  it('pickAt grabs the rotation handle first, then a vertex of the selection, then a part', () => {
    expect(pickAt(parts, ['a'], [50, 80], 2, [50, 80], [50, 25]).kind).toBe('rotate')
    const v = pickAt(parts, ['a'], [99, 49], 2, null, null)
    expect(v).toMatchObject({ kind: 'vertex', vertex: { part: 'a', ring: 0, index: 2 }, gesture: { prev: [100, 0], next: [0, 50] } })
    expect(pickAt(parts, [], [99, 49], 2, null, null)).toEqual({ kind: 'part', id: 'a' })
    expect(pickAt(parts, [], [300, 300], 2, null, null)).toEqual({ kind: 'none' })
  })

  it('ringsExcept leaves the dragged vertex out', () => {
    expect(ringsExcept(parts, 'a', 0, 1)[0]).toEqual([[0, 0], [100, 50], [0, 50]])
  })
})

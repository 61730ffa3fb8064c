import { describe, expect, it } from 'vitest'
import { ringArea } from '#shared/geometry/moments'
import { deleteVertex, fitBounds, insertVertex, mirrorRing, rectangleRing, ringsBounds, rotateRing, setVertex, translateRing } from '#shared/editor/transform'
import { orientRing } from '#shared/geometry/ring'
import { angleDeg, roundAngle } from '#shared/editor/gesture'

const sq = rectangleRing([0, 0], [20, 10])

describe('transforms', () => {
  it('rectangleRing is counter-clockwise from the lower left, whatever the drag direction', () => {
    expect(rectangleRing([20, 10], [0, 0])).toEqual([[0, 0], [20, 0], [20, 10], [0, 10]])
    expect(ringArea(sq)).toBe(200)
  })

  it('translateRing moves every vertex', () => {
    expect(translateRing(sq, 5, -5)[2]).toEqual([25, 5])
  })

  it('rotateRing by 90° about the origin is exact: (x, y) → (-y, x)', () => {
    expect(rotateRing([[20, 10]], 90, [0, 0])).toEqual([[-10, 20]])
    expect(rotateRing([[20, 10]], -90, [0, 0])).toEqual([[10, -20]])
    expect(rotateRing([[20, 10]], 180, [10, 5])).toEqual([[0, 0]])
  })

  it('rotateRing by 30° matches the closed form (cos 30°, sin 30°)', () => {
    const [[x, y]] = rotateRing([[1, 0]], 30, [0, 0]) as [[number, number]]
    expect(x).toBeCloseTo(Math.sqrt(3) / 2, 15)
    expect(y).toBeCloseTo(0.5, 15)
  })

  it('mirrorRing flips about the line through the centre and keeps the orientation', () => {
    const m = mirrorRing(sq, 'x', [0, 0])
    expect(ringsBounds([m])).toEqual({ minX: -20, minY: 0, maxX: 0, maxY: 10 })
    expect(ringArea(m)).toBe(200)
    const n = mirrorRing(sq, 'y', [0, 5])
    expect(ringsBounds([n])).toEqual({ minX: 0, minY: 0, maxX: 20, maxY: 10 })
    expect(ringArea(n)).toBe(200)
  })

  it('insertVertex, setVertex and deleteVertex edit one ring', () => {
    const ins = insertVertex(sq, 0, [10, 0])
    expect(ins).toHaveLength(5)
    expect(ins[1]).toEqual([10, 0])
    expect(setVertex(sq, 2, [30, 10])[2]).toEqual([30, 10])
    expect(deleteVertex(ins, 1)).toEqual(sq)
    expect(() => deleteVertex(sq.slice(0, 3), 0)).toThrow(/at least 3/)
  })

  it('orientRing orients counter-clockwise or clockwise', () => {
    expect(ringArea(orientRing(sq, false))).toBe(-200)
    expect(ringArea(orientRing([...sq].reverse(), true))).toBe(200)
  })

  it('angleDeg and roundAngle give the rotation of a handle drag', () => {
    expect(angleDeg([0, 0], [0, 5])).toBe(90)
    expect(roundAngle(44.6, 1)).toBe(45)
    expect(roundAngle(52, 15)).toBe(45)
    expect(roundAngle(-190, 1)).toBe(170)
  })
})

describe('fitBounds', () => {
  it('grows the parts\' bounds to take in every load point (by hand)', () => {
    expect(fitBounds({ minX: 0, minY: 0, maxX: 100, maxY: 50 }, [{ x: 150, y: 20 }, { x: -10, y: -40 }])).toEqual({ minX: -10, minY: -40, maxX: 150, maxY: 50 })
  })
  it('is the loads alone without parts, and null with neither', () => {
    expect(fitBounds(null, [{ x: 5, y: 6 }])).toEqual({ minX: 5, minY: 6, maxX: 5, maxY: 6 })
    expect(fitBounds(null, [])).toBeNull()
  })
})

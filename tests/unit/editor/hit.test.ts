import { describe, expect, it } from 'vitest'
import { hitEdge, hitPart, hitVertex, segmentDistance2 } from '#shared/editor/hit'
import { pointInRing } from '#shared/geometry/ring'

const outer = [[0, 0], [100, 0], [100, 100], [0, 100]] as const
const hole = [[40, 40], [40, 60], [60, 60], [60, 40]] as const
const parts = [
  { id: 'a', outline: outer, holes: [{ ring: hole }] },
  { id: 'b', outline: [[80, 80], [180, 80], [180, 180], [80, 180]] as const, holes: [] },
]

describe('hit-testing (mm)', () => {
  it('pointInRing is true inside and false outside', () => {
    expect(pointInRing([50, 10], outer)).toBe(true)
    expect(pointInRing([150, 10], outer)).toBe(false)
  })

  it('segmentDistance2 gives the squared distance and the parameter on the segment', () => {
    expect(segmentDistance2([5, 3], [0, 0], [10, 0])).toEqual({ d2: 9, t: 0.5 })
    expect(segmentDistance2([-4, 3], [0, 0], [10, 0])).toEqual({ d2: 25, t: 0 })
  })

  it('hitPart finds the part under the point, not through its hole, the top part first', () => {
    expect(hitPart(parts, [10, 10], 1)).toBe('a')
    expect(hitPart(parts, [50, 50], 1)).toBe(null)
    expect(hitPart(parts, [90, 90], 1)).toBe('b')
    expect(hitPart(parts, [100.5, 50], 1)).toBe('a')
  })

  it('hitVertex finds the nearest vertex within the tolerance, with its ring', () => {
    expect(hitVertex(parts, [41, 59], 3)).toEqual({ part: 'a', ring: 1, index: 1 })
    expect(hitVertex(parts, [30, 30], 3)).toBe(null)
  })

  it('hitEdge finds the edge and the nearest point on it', () => {
    expect(hitEdge(parts, [50, 1], 2)).toEqual({ part: 'a', ring: 0, index: 0, point: [50, 0] })
  })
})

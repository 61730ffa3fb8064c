import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { describeRing, normaliseRing } from '../../../shared/geometry/normalise'
import { orientRing } from '../../../shared/geometry/ring'
import type { Point } from '../../../shared/geometry/types'
import { SectionError } from '../../../shared/mechanics/types'

const square: Point[] = [[0, 0], [10, 0], [10, 10], [0, 10]]
const outline = { part: 1, ring: 0 }

function thrown(run: () => unknown): SectionError {
  try {
    run()
  } catch (error) {
    expect(error).toBeInstanceOf(SectionError)
    return error as SectionError
  }
  throw new Error('expected a SectionError')
}

describe('normaliseRing', () => {
  it('normaliseRing(square) keeps it unchanged, with source indices 0..3', () => {
    expect(normaliseRing(square, outline)).toEqual({ points: square, source: [0, 1, 2, 3] })
  })

  it('normaliseRing drops a repeated closing vertex', () => {
    expect(normaliseRing([...square, [0, 0]], outline).points).toEqual(square)
  })

  it('normaliseRing drops consecutive duplicates within 1e-12 of the extent, keeping the first', () => {
    const ring: Point[] = [[0, 0], [10, 0], [10, 1e-12], [10, 10], [10, 10], [0, 10], [0, 1e-13]]
    const { points, source } = normaliseRing(ring, outline)
    expect(points).toEqual(square)
    expect(source).toEqual([0, 1, 3, 5])
  })

  it('normaliseRing keeps vertices further apart than the tolerance', () => {
    expect(normaliseRing([[0, 0], [10, 0], [10, 1e-6], [10, 10], [0, 10]], outline).points).toHaveLength(5)
  })

  it('normaliseRing drops a zero-width spike and the duplicate it leaves behind', () => {
    // 10,0 → 15,0 → 10,0 is a spike out and back along one line.
    const { points, source } = normaliseRing([[0, 0], [10, 0], [15, 0], [10, 0], [10, 10], [0, 10]], outline)
    expect(points).toEqual(square)
    expect(source).toEqual([0, 1, 4, 5])
  })

  it('normaliseRing drops a spike across the seam of the ring', () => {
    expect(normaliseRing([[0, 0], [10, 0], [10, 10], [0, 10], [0, -5]], outline).points).toEqual(square)
  })

  it('normaliseRing keeps collinear vertices that do not turn back (they are real vertices)', () => {
    expect(normaliseRing([[0, 0], [5, 0], [10, 0], [10, 10], [0, 10]], outline).points).toHaveLength(5)
  })

  it('normaliseRing keeps the input orientation', () => {
    const cw = square.slice().reverse()
    expect(normaliseRing(cw, outline).points).toEqual(cw)
  })

  it.each([
    ['two vertices', [[0, 0], [1, 1]] as Point[], /at least 3 distinct vertices/],
    ['three vertices of which two coincide', [[0, 0], [1, 1], [1, 1]] as Point[], /at least 3 distinct vertices/],
    ['one point repeated', [[2, 2], [2, 2], [2, 2], [2, 2]] as Point[], /at least 3 distinct vertices/],
    ['collinear vertices', [[0, 0], [5, 5], [10, 10]] as Point[], /encloses no area/],
    ['collinear vertices that fold back', [[0, 0], [10, 0], [5, 0]] as Point[], /encloses no area/],
  ])('normaliseRing rejects %s', (_name, ring, message) => {
    const error = thrown(() => normaliseRing(ring, outline))
    expect(error.message).toMatch(message)
    expect(error.message).toMatch(/^Part 2, outline/)
    expect(error.part).toBe(1)
    expect(error.ring).toBe(0)
  })

  it('normaliseRing leaves a symmetric bow-tie (zero signed area, not collinear) to findSelfIntersection', () => {
    expect(normaliseRing([[0, 0], [10, 10], [10, 0], [0, 10]], outline).points).toHaveLength(4)
  })

  it('normaliseRing accepts a thin but real sliver (1e-9 of its length thick)', () => {
    expect(normaliseRing([[0, 0], [1000, 0], [500, 1e-6]], outline).points).toHaveLength(3)
  })

  it('normaliseRing rejects a NaN coordinate naming the part, hole and vertex (1-based)', () => {
    const error = thrown(() => normaliseRing([[0, 0], [10, 0], [Number.NaN, 10], [0, 10]], { part: 0, ring: 2 }))
    expect(error.message).toBe('Part 1, hole 2: vertex 3 has a coordinate that is not a finite number.')
    expect(error.vertex).toBe(2)
  })

  it.each([[Infinity], [-Infinity]])('normaliseRing rejects the coordinate %s', (value) => {
    expect(() => normaliseRing([[0, 0], [value, 0], [10, 10]], outline)).toThrow(/vertex 2 has a coordinate that is not a finite number/)
  })

  it('normaliseRing rejects |x| > 1e9 mm naming the vertex, and accepts 1e9 itself', () => {
    expect(() => normaliseRing([[0, 0], [1.000001e9, 0], [0, 10]], outline)).toThrow(/vertex 2 lies beyond ±1e9 mm/)
    expect(() => normaliseRing([[0, 0], [0, 10], [0, -1.5e9]], outline)).toThrow(/vertex 3 lies beyond/)
    expect(normaliseRing([[1e9 - 10, 0], [1e9, 0], [1e9, 10]], outline).points).toHaveLength(3)
  })

  it('normaliseRing rejects something that is not a list of points', () => {
    expect(() => normaliseRing(undefined as never, outline)).toThrow(SectionError)
    expect(() => normaliseRing([[0, 0], [1, 0], null] as never, outline)).toThrow(/vertex 3/)
  })
})

describe('orientRing and describeRing', () => {
  it('orientRing(ring, true) returns a counter-clockwise ring (positive area) for either input', () => {
    expect(ringArea(orientRing(square, true))).toBe(100)
    expect(ringArea(orientRing(square.slice().reverse(), true))).toBe(100)
  })

  it('orientRing(ring, false) returns a clockwise ring (negative area) and leaves the input alone', () => {
    const input = square.slice()
    expect(ringArea(orientRing(input, false))).toBe(-100)
    expect(input).toEqual(square)
  })

  it('describeRing names the part 1-based and the ring as outline or hole k', () => {
    expect(describeRing({ part: 0, ring: 0 })).toBe('Part 1, outline')
    expect(describeRing({ part: 3, ring: 2 })).toBe('Part 4, hole 2')
  })
})

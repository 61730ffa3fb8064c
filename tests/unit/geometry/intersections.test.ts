import { describe, expect, it } from 'vitest'
import { findRingsIntersection, findSelfIntersection, isStrictlyConvex } from '../../../shared/geometry/intersections'
import { orient2d } from '../../../shared/geometry/orient'
import type { Point } from '../../../shared/geometry/types'

/** Regular n-gon of circumradius r (mm), CCW. */
function ngon(n: number, r: number, cx = 0, cy = 0): Point[] {
  return Array.from({ length: n }, (_, i): Point => [cx + r * Math.cos((2 * Math.PI * i) / n), cy + r * Math.sin((2 * Math.PI * i) / n)])
}

/** Exact sign of the orientation determinant for coordinates that are multiples of 2^-60. */
function exactOrientSign(a: Point, b: Point, c: Point): number {
  const big = (v: number): bigint => BigInt(v * 2 ** 60)
  const [ax, ay, bx, by, cx, cy] = [a[0], a[1], b[0], b[1], c[0], c[1]].map(big) as bigint[]
  const det = (ax! - cx!) * (by! - cy!) - (ay! - cy!) * (bx! - cx!)
  return det > 0n ? 1 : det < 0n ? -1 : 0
}

/** Brute-force O(n²) reference: any two non-consecutive edges meeting, or consecutive edges overlapping. */
function bruteForceMeets(ring: readonly Point[]): boolean {
  const n = ring.length
  const onSegment = (p: Point, q: Point, m: Point): boolean =>
    Math.min(p[0], q[0]) <= m[0] && m[0] <= Math.max(p[0], q[0]) && Math.min(p[1], q[1]) <= m[1] && m[1] <= Math.max(p[1], q[1])
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const [p, q, r, s] = [ring[i]!, ring[(i + 1) % n]!, ring[j]!, ring[(j + 1) % n]!]
      if (j === i + 1 || (i === 0 && j === n - 1)) {
        const [a, b, c] = j === i + 1 ? [p, q, s] : [r, s, q]
        if (orient2d(a, b, c) === 0 && (a[0] - b[0]) * (c[0] - b[0]) + (a[1] - b[1]) * (c[1] - b[1]) > 0) return true
        continue
      }
      const d1 = orient2d(r, s, p)
      const d2 = orient2d(r, s, q)
      const d3 = orient2d(p, q, r)
      const d4 = orient2d(p, q, s)
      if (d1 * d2 < 0 && d3 * d4 < 0) return true
      if ((d1 === 0 && onSegment(r, s, p)) || (d2 === 0 && onSegment(r, s, q)) || (d3 === 0 && onSegment(p, q, r)) || (d4 === 0 && onSegment(p, q, s))) return true
    }
  }
  return false
}

describe('orient2d', () => {
  it('orient2d(a, b, c) is positive for a counter-clockwise triangle, negative clockwise, zero collinear', () => {
    expect(orient2d([0, 0], [1, 0], [0, 1])).toBeGreaterThan(0)
    expect(orient2d([0, 0], [0, 1], [1, 0])).toBeLessThan(0)
    expect(orient2d([0, 0], [1, 1], [3, 3])).toBe(0)
    expect(orient2d([0, 0], [2, 0], [0, 3])).toBe(6) // twice the triangle area
  })

  it('orient2d gives the exact sign near collinearity (Shewchuk\'s 0.5 + k·2^-53 grid against 12,12 and 24,24)', () => {
    // The classic failure case of the naive formula (Kettner et al., "Classroom examples of robustness problems").
    let naiveWrong = 0
    for (let i = 0; i < 32; i++) {
      for (let j = 0; j < 32; j++) {
        const a: Point = [0.5 + i * 2 ** -53, 0.5 + j * 2 ** -53]
        const b: Point = [12, 12]
        const c: Point = [24, 24]
        const exact = exactOrientSign(a, b, c)
        expect(Math.sign(orient2d(a, b, c))).toBe(exact)
        const naive = Math.sign((a[0] - c[0]) * (b[1] - c[1]) - (a[1] - c[1]) * (b[0] - c[0]))
        if (naive !== exact) naiveWrong++
      }
    }
    expect(naiveWrong).toBeGreaterThan(0) // the grid really exercises the exact fallback
  })
})

describe('findSelfIntersection', () => {
  it('findSelfIntersection(square) returns null', () => {
    expect(findSelfIntersection([[0, 0], [10, 0], [10, 10], [0, 10]])).toBeNull()
  })

  it('findSelfIntersection(bow-tie) returns the two crossing edges and the crossing point', () => {
    const hit = findSelfIntersection([[0, 0], [10, 10], [10, 0], [0, 10]])
    expect(hit).not.toBeNull()
    expect([hit!.edgeA, hit!.edgeB]).toEqual([0, 2])
    expect(hit!.point[0]).toBeCloseTo(5, 12)
    expect(hit!.point[1]).toBeCloseTo(5, 12)
  })

  it.each([
    ['a vertex touching a non-adjacent edge (T-junction)', [[0, 0], [10, 0], [10, 10], [5, 0.0], [0, 10]] as Point[]],
    ['two vertices at the same point (figure eight)', [[0, 0], [5, 5], [10, 0], [10, 10], [5, 5], [0, 10]] as Point[]],
    ['consecutive edges folding back (zero-width spike)', [[0, 0], [10, 0], [10, 10], [10, 5], [10, 20], [0, 10]] as Point[]],
    ['collinear overlapping edges that are not consecutive', [[0, 0], [10, 0], [10, 5], [4, 5], [4, 0.0], [2, 0], [2, -5], [0, -5]] as Point[]],
  ])('findSelfIntersection finds %s', (_name, ring) => {
    expect(findSelfIntersection(ring)).not.toBeNull()
  })

  it('findSelfIntersection accepts collinear consecutive edges and vertical edges', () => {
    expect(findSelfIntersection([[0, 0], [5, 0], [10, 0], [10, 5], [10, 10], [5, 10], [0, 10], [0, 5]])).toBeNull()
  })

  it('findSelfIntersection agrees with an O(n²) brute force on 3000 seeded random grid polygons', () => {
    let seed = 20240601
    const random = (): number => {
      seed = (seed * 1103515245 + 12345) % 2147483648
      return seed / 2147483648
    }
    let simple = 0
    for (let it = 0; it < 3000; it++) {
      const size = 4 + Math.floor(random() * 8)
      const cx = random() * size
      const cy = random() * size
      const raw = Array.from({ length: 3 + Math.floor(random() * 12) }, (): Point => [Math.floor(random() * size), Math.floor(random() * size)])
      const ring = [...new Map(raw.map((p) => [p.join(','), p])).values()]
      if (ring.length < 3) continue
      // Star-shaped about a random centre: often simple, with many collinear and touching cases.
      if (random() < 0.8) ring.sort((p, q) => Math.atan2(p[1] - cy, p[0] - cx) - Math.atan2(q[1] - cy, q[0] - cx))
      const expected = bruteForceMeets(ring)
      if (!expected) simple++
      expect(findSelfIntersection(ring) !== null, JSON.stringify(ring)).toBe(expected)
    }
    expect(simple).toBeGreaterThan(500)
  })

  it('findSelfIntersection(200 000-vertex circle-like ring) returns null', () => {
    expect(findSelfIntersection(ngon(200_000, 1000))).toBeNull()
  })

  it('findSelfIntersection finds the local bow-tie in a 200 000-vertex ring with two vertices swapped', () => {
    const ring = ngon(200_000, 1000)
    const swap = ring[1234]!
    ring[1234] = ring[1236]!
    ring[1236] = swap
    const hit = findSelfIntersection(ring)
    expect(hit).not.toBeNull()
    expect(hit!.edgeA).toBeGreaterThanOrEqual(1232)
    expect(hit!.edgeB).toBeLessThanOrEqual(1237)
  })

  it('findSelfIntersection(200 000-vertex star polygon {n/2 + 1}) finds a crossing', () => {
    const n = 200_001
    const step = (n - 1) / 2
    const star = Array.from({ length: n }, (_, i): Point => {
      const t = (2 * Math.PI * ((i * step) % n)) / n
      return [1000 * Math.cos(t), 1000 * Math.sin(t)]
    })
    expect(findSelfIntersection(star)).not.toBeNull()
  })

  it('findSelfIntersection(comb with 50 000 teeth) returns null with ~100 000 edges in the sweep at once', () => {
    const comb: Point[] = [[0, 0]]
    for (let k = 0; k < 50_000; k++) comb.push([1000, 2 * k], [1000, 2 * k + 1], [10, 2 * k + 1], [10, 2 * k + 2])
    comb.pop()
    comb.push([0, 100_000])
    expect(findSelfIntersection(comb)).toBeNull()
  })
})

describe('findRingsIntersection', () => {
  const outline: Point[] = [[0, 0], [100, 0], [100, 100], [0, 100]]

  it('findRingsIntersection(outline, hole inside) returns null', () => {
    expect(findRingsIntersection([outline, [[20, 20], [20, 40], [40, 40], [40, 20]]])).toBeNull()
  })

  it('findRingsIntersection(outline, hole crossing it) names both rings', () => {
    const hit = findRingsIntersection([outline, [[80, 20], [80, 40], [120, 40], [120, 20]]])
    expect(hit).not.toBeNull()
    expect(new Set([hit!.ringA, hit!.ringB])).toEqual(new Set([0, 1]))
  })

  it('findRingsIntersection(outline, hole touching it at one vertex) reports the contact', () => {
    expect(findRingsIntersection([outline, [[50, 0], [60, 20], [40, 20]]])).not.toBeNull()
  })
})

describe('isStrictlyConvex (the O(n) shortcut before the sweep)', () => {
  it('accepts convex polygons of either orientation, from a triangle to a 1 000-gon (definition of convexity)', () => {
    expect(isStrictlyConvex([[0, 0], [4, 0], [0, 3]])).toBe(true)
    expect(isStrictlyConvex([[0, 0], [0, 3], [4, 0]])).toBe(true)
    expect(isStrictlyConvex(ngon(1000, 200))).toBe(true)
    expect(isStrictlyConvex(ngon(1000, 200).reverse())).toBe(true)
    // Vertical edges (dx = 0) do not count as a change of direction.
    expect(isStrictlyConvex([[0, 0], [10, 0], [10, 10], [0, 10]])).toBe(true)
  })

  it('rejects a pentagram, whose turns all go one way but which winds twice (and crosses itself)', () => {
    const star = Array.from({ length: 5 }, (_, i): Point => [Math.cos((4 * Math.PI * i) / 5), Math.sin((4 * Math.PI * i) / 5)])
    expect(isStrictlyConvex(star)).toBe(false)
    expect(findSelfIntersection(star)).not.toBeNull() // still caught by the sweep
  })

  it('rejects a re-entrant corner and a collinear vertex (they go to the sweep)', () => {
    expect(isStrictlyConvex([[0, 0], [10, 0], [10, 10], [5, 4], [0, 10]])).toBe(false)
    expect(isStrictlyConvex([[0, 0], [5, 0], [10, 0], [10, 10], [0, 10]])).toBe(false)
  })

  it('agrees with the brute-force test: every ring it accepts has no meeting edges (random rings, seeded)', () => {
    let seed = 7
    const rand = (): number => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31)
    let accepted = 0
    for (let trial = 0; trial < 400; trial++) {
      // Points at sorted or shuffled angles with random radii: some convex, most not, some crossing.
      const n = 3 + Math.floor(rand() * 9)
      const angles = Array.from({ length: n }, () => rand() * 2 * Math.PI)
      if (trial % 2 === 0) angles.sort((a, b) => a - b)
      const ring = angles.map((t): Point => { const r = trial % 3 === 0 ? 50 : 20 + 30 * rand(); return [r * Math.cos(t), r * Math.sin(t)] })
      if (isStrictlyConvex(ring)) {
        accepted++
        expect(bruteForceMeets(ring)).toBe(false)
      }
    }
    expect(accepted).toBeGreaterThan(20)
  })
})

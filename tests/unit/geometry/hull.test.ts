import { describe, expect, it } from 'vitest'
import { convexHull, ringsHull } from '../../../shared/geometry/hull'
import { findSelfIntersection } from '../../../shared/geometry/intersections'
import { orient2d } from '../../../shared/geometry/orient'
import { ringArea } from '../../../shared/geometry/moments'
import type { Point } from '../../../shared/geometry/types'

function seeded(seed: number): () => number {
  let state = seed
  return () => {
    state = (state * 1103515245 + 12345) % 2147483648
    return state / 2147483648
  }
}

/** Checks the hull is strictly convex and CCW, and every point lies inside or on it. */
function expectHullOf(hull: readonly Point[], points: readonly Point[]): void {
  const n = hull.length
  let notConvex = 0
  let outside = 0
  for (let i = 0; i < n; i++) {
    if (!(orient2d(hull[i]!, hull[(i + 1) % n]!, hull[(i + 2) % n]!) > 0)) notConvex++
    for (const p of points) if (orient2d(hull[i]!, hull[(i + 1) % n]!, p) < 0) outside++
  }
  expect({ notConvex, outside }).toEqual({ notConvex: 0, outside: 0 })
}

describe('convexHull', () => {
  it('convexHull(square with interior, edge-midpoint and repeated points) returns the 4 corners CCW from the lowest x', () => {
    const points: Point[] = [[5, 5], [10, 10], [0, 0], [10, 0], [5, 0], [0, 10], [0, 5], [10, 10], [3, 7]]
    expect(convexHull(points)).toEqual([[0, 0], [10, 0], [10, 10], [0, 10]])
  })

  it('convexHull of collinear points returns the two ends; of one point, that point; of none, nothing', () => {
    expect(convexHull([[2, 2], [0, 0], [1, 1], [3, 3]])).toEqual([[0, 0], [3, 3]])
    expect(convexHull([[1, 2], [1, 2]])).toEqual([[1, 2]])
    expect(convexHull([])).toEqual([])
  })

  it('convexHull drops nearly collinear points exactly (orient2d), not by tolerance', () => {
    // 1,0 lies 5e-301 above the chord from 0,0 to 2,-1e-300: inside. With 2,+1e-300 it is a corner.
    expect(convexHull([[0, 0], [1, 0], [2, -1e-300], [2, 2], [0, 2]])).toEqual([[0, 0], [2, -1e-300], [2, 2], [0, 2]])
    expect(convexHull([[0, 0], [1, 0], [2, 1e-300], [2, 2], [0, 2]])).toEqual([[0, 0], [1, 0], [2, 1e-300], [2, 2], [0, 2]])
  })

  it('convexHull of 2000 seeded random points is convex, CCW and contains them all', () => {
    const random = seeded(7)
    const points = Array.from({ length: 2000 }, (): Point => [Math.round(random() * 100), Math.round(random() * 60)])
    const hull = convexHull(points)
    expectHullOf(hull, points)
    expect(ringArea(hull)).toBeGreaterThan(0)
  })
})

describe('ringsHull', () => {
  it('ringsHull([L-shape]) equals convexHull of its vertices', () => {
    const angle: Point[] = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]
    expect(ringsHull([angle])).toEqual(convexHull(angle))
    expect(ringsHull([angle.slice().reverse()])).toEqual(convexHull(angle))
  })

  it('ringsHull of two separate rings spans both', () => {
    const a: Point[] = [[0, 0], [10, 0], [10, 10], [0, 10]]
    const b: Point[] = [[20, 5], [30, 5], [30, 15], [20, 15]]
    expect(ringsHull([a, b])).toEqual([[0, 0], [10, 0], [30, 5], [30, 15], [20, 15], [0, 10]])
  })

  it('ringsHull matches convexHull on 2000 seeded random simple grid polygons (Melkman vs monotone chain)', () => {
    const random = seeded(11)
    let tested = 0
    for (let it = 0; it < 2000; it++) {
      const size = 4 + Math.floor(random() * 10)
      const raw = Array.from({ length: 4 + Math.floor(random() * 20) }, (): Point => [Math.floor(random() * size), Math.floor(random() * size)])
      const cx = random() * size
      const cy = random() * size
      const ring = [...new Map(raw.map((p) => [p.join(','), p])).values()]
        .sort((p, q) => Math.atan2(p[1] - cy, p[0] - cx) - Math.atan2(q[1] - cy, q[0] - cx))
      if (ring.length < 3 || ringArea(ring) === 0 || findSelfIntersection(ring)) continue
      tested++
      expect(ringsHull([ring]), JSON.stringify(ring)).toEqual(convexHull(ring))
    }
    expect(tested).toBeGreaterThan(1000)
  })

  it('ringsHull of a 100 000-gon keeps every vertex (all are extreme)', () => {
    const n = 100_000
    const ring = Array.from({ length: n }, (_, i): Point => [Math.cos((2 * Math.PI * i) / n), Math.sin((2 * Math.PI * i) / n)])
    expect(ringsHull([ring])).toHaveLength(n)
  })
})

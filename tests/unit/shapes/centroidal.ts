import type { Point, Ring } from '../../../shared/geometry/types'
import { polygonMoments } from '../../../shared/geometry/moments'
import type { ShapeGeometry } from '../../../shared/shapes/common'

/**
 * Test helper: centroidal properties of a shape (mm, mm², mm⁴), summed by polygonMoments about
 * the bounding-box centre and shifted to the centroid by the parallel-axis theorem, here rather
 * than through the properties module so that these tests depend only on the moment sums.
 */
export function centroidal(g: ShapeGeometry) {
  const xs = g.outline.map((p) => p[0])
  const ys = g.outline.map((p) => p[1])
  const minX = Math.min(...xs)
  const maxX = Math.max(...xs)
  const minY = Math.min(...ys)
  const maxY = Math.max(...ys)
  const origin: Point = [(minX + maxX) / 2, (minY + maxY) / 2]
  const m = polygonMoments([g.outline, ...g.holes], origin)
  const xc = m.Qy / m.A
  const yc = m.Qx / m.A
  return {
    A: m.A,
    xc: xc + origin[0],
    yc: yc + origin[1],
    Ixx: m.Jxx - m.A * yc * yc,
    Iyy: m.Jyy - m.A * xc * xc,
    Ixy: m.Jxy - m.A * xc * yc,
    bounds: { minX, maxX, minY, maxY },
  }
}

/** Test helper: true when no two consecutive vertices (the last and first included) coincide. */
export function hasNoRepeatedVertex(ring: Ring): boolean {
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i]!
    const q = ring[(i + 1) % ring.length]!
    if (p[0] === q[0] && p[1] === q[1]) return false
  }
  return true
}

/** Test helper: runs fn and returns the error it throws (fails when it returns). */
export function thrown(fn: () => unknown): Error {
  try {
    fn()
  } catch (e) {
    return e as Error
  }
  throw new Error('expected the call to throw')
}

import type { Ring } from '../../shared/geometry/types'

/** An axis-aligned rectangle [x0, y0, x1, y1] in mm. */
export type Rect = readonly [x0: number, y0: number, x1: number, y1: number]

/** The rectangle as a counter-clockwise ring. */
export function rectRing([x0, y0, x1, y1]: Rect): Ring {
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]]
}

/** Centroidal inertia of a composite of rectangles, computed by hand by the parallel-axis theorem
 * (any mechanics of materials text): an independent method from Green's theorem. */
export function composite(rects: readonly Rect[]) {
  let A = 0
  let Sx = 0
  let Sy = 0
  for (const [x0, y0, x1, y1] of rects) {
    const a = (x1 - x0) * (y1 - y0)
    A += a
    Sx += (a * (x0 + x1)) / 2
    Sy += (a * (y0 + y1)) / 2
  }
  const xc = Sx / A
  const yc = Sy / A
  let Ixx = 0
  let Iyy = 0
  let Ixy = 0
  for (const [x0, y0, x1, y1] of rects) {
    const b = x1 - x0
    const h = y1 - y0
    const dx = (x0 + x1) / 2 - xc
    const dy = (y0 + y1) / 2 - yc
    Ixx += (b * h ** 3) / 12 + b * h * dy * dy
    Iyy += (h * b ** 3) / 12 + b * h * dx * dx
    Ixy += b * h * dx * dy
  }
  return { area: A, centroid: { x: xc, y: yc }, Ixx, Iyy, Ixy }
}

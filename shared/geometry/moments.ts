import type { Point, Polygon, Ring } from './types'

/**
 * Area integrals of a region about a chosen origin (mm units):
 * A = ∫dA, Qx = ∫y dA, Qy = ∫x dA, Jxx = ∫y² dA, Jyy = ∫x² dA, Jxy = ∫xy dA.
 * Signed: a counter-clockwise ring gives positive A, a clockwise ring negative.
 */
export interface Moments {
  A: number
  Qx: number
  Qy: number
  Jxx: number
  Jyy: number
  Jxy: number
}

/** A fresh all-zero set of moments. */
export function zeroMoments(): Moments {
  return { A: 0, Qx: 0, Qy: 0, Jxx: 0, Jyy: 0, Jxy: 0 }
}

/**
 * Adds the Green's-theorem moments of one ring, measured from `origin`, into `acc`
 * (scaled by `weight`, e.g. the modular ratio n). Counter-clockwise rings add, clockwise subtract.
 * Coordinates are shifted to the origin before any product so that far-away drawings keep
 * full precision.
 */
export function addRingMoments(acc: Moments, ring: Ring, origin: Point = [0, 0], weight = 1): Moments {
  const n = ring.length
  if (n < 3) return acc
  const ox = origin[0]
  const oy = origin[1]
  let A = 0
  let Qx = 0
  let Qy = 0
  let Jxx = 0
  let Jyy = 0
  let Jxy = 0
  let x0 = ring[n - 1]![0] - ox
  let y0 = ring[n - 1]![1] - oy
  for (let i = 0; i < n; i++) {
    const p = ring[i]!
    const x1 = p[0] - ox
    const y1 = p[1] - oy
    const a = x0 * y1 - x1 * y0
    A += a
    Qy += (x0 + x1) * a
    Qx += (y0 + y1) * a
    Jxx += (y0 * y0 + y0 * y1 + y1 * y1) * a
    Jyy += (x0 * x0 + x0 * x1 + x1 * x1) * a
    Jxy += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * a
    x0 = x1
    y0 = y1
  }
  acc.A += (weight * A) / 2
  acc.Qx += (weight * Qx) / 6
  acc.Qy += (weight * Qy) / 6
  acc.Jxx += (weight * Jxx) / 12
  acc.Jyy += (weight * Jyy) / 12
  acc.Jxy += (weight * Jxy) / 24
  return acc
}

/** Moments of a polygon with holes (outline CCW, holes CW) about `origin`. */
export function polygonMoments(polygon: Polygon, origin: Point = [0, 0], weight = 1, acc: Moments = zeroMoments()): Moments {
  for (const ring of polygon) addRingMoments(acc, ring, origin, weight)
  return acc
}

/** Signed area of a ring (mm²): positive if counter-clockwise, negative if clockwise. */
export function ringArea(ring: Ring): number {
  const n = ring.length
  if (n < 3) return 0
  const ox = ring[0]![0]
  const oy = ring[0]![1]
  let s = 0
  for (let i = 1; i < n - 1; i++) {
    const p = ring[i]!
    const q = ring[i + 1]!
    s += (p[0] - ox) * (q[1] - oy) - (q[0] - ox) * (p[1] - oy)
  }
  return s / 2
}

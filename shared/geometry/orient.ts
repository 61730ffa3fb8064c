import type { Point } from './types'

/** Unit roundoff of IEEE doubles and Shewchuk's first error bound for orient2d. */
const EPSILON = 2 ** -53
const CCW_ERR_BOUND = (3 + 16 * EPSILON) * EPSILON
const SPLITTER = 2 ** 27 + 1

/**
 * Orientation of the triangle a, b, c (mm²): positive if a, b, c turn counter-clockwise (with
 * y up), negative if clockwise, zero if collinear. The sign is exact: a floating-point filter
 * (Shewchuk's error bound) answers almost every call, and near-degenerate cases fall back to an
 * exact expansion sum (exact while the coordinate products neither overflow nor underflow, which
 * holds for any |x|, |y| up to 1e9 mm not below 1e-150). The magnitude is twice the signed
 * triangle area, approximate in the fallback.
 */
export function orient2d(a: Point, b: Point, c: Point): number {
  return orientXY(a[0], a[1], b[0], b[1], c[0], c[1])
}

/** orient2d on bare coordinates (mm), so that hot loops need not build tuples. Same sign rule. */
export function orientXY(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  const detLeft = (ax - cx) * (by - cy)
  const detRight = (ay - cy) * (bx - cx)
  const det = detLeft - detRight
  let detSum: number
  if (detLeft > 0) {
    if (detRight <= 0) return det
    detSum = detLeft + detRight
  } else if (detLeft < 0) {
    if (detRight >= 0) return det
    detSum = -detLeft - detRight
  } else {
    return det
  }
  if (Math.abs(det) >= CCW_ERR_BOUND * detSum) return det
  return orientExact([ax, ay], [bx, by], [cx, cy])
}

/** Sum of the six exact products a0·b1 - a1·b0 + b0·c1 - b1·c0 + c0·a1 - c1·a0, as an expansion. */
function orientExact(a: Point, b: Point, c: Point): number {
  let expansion: number[] = []
  const terms: [number, number][] = [
    [a[0], b[1]], [-a[1], b[0]], [b[0], c[1]], [-b[1], c[0]], [c[0], a[1]], [-c[1], a[0]],
  ]
  for (const [u, v] of terms) {
    const hi = u * v
    expansion = growExpansion(expansion, hi)
    expansion = growExpansion(expansion, productTail(u, v, hi))
  }
  // Non-overlapping components in increasing magnitude: the last non-zero one carries the sign.
  for (let i = expansion.length - 1; i >= 0; i--) if (expansion[i] !== 0) return expansion[i]!
  return 0
}

/** The rounding error of hi = u·v, so that u·v = hi + tail exactly (Dekker, Veltkamp split). */
function productTail(u: number, v: number, hi: number): number {
  const cu = SPLITTER * u
  const uHi = cu - (cu - u)
  const uLo = u - uHi
  const cv = SPLITTER * v
  const vHi = cv - (cv - v)
  const vLo = v - vHi
  return uLo * vLo - (((hi - uHi * vHi) - uLo * vHi) - uHi * vLo)
}

/** Shewchuk's GROW-EXPANSION with zero elimination: returns the expansion of e + b exactly. */
function growExpansion(e: readonly number[], b: number): number[] {
  const out: number[] = []
  let q = b
  for (const component of e) {
    const sum = q + component
    const bVirtual = sum - q
    const tail = (q - (sum - bVirtual)) + (component - bVirtual)
    if (tail !== 0) out.push(tail)
    q = sum
  }
  out.push(q)
  return out
}

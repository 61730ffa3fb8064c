import type { TriMesh } from './types'

/**
 * Gauss rule of degree 4 on a triangle (six points; Dunavant 1985): barycentric coordinates and
 * weights summing to 1. Exact for every integrand the torsion and shear sums need on straight-
 * sided six-node triangles (products of two linear gradients, of a quadratic and a quadratic).
 */
const G1 = 0.445948490915965; const W1 = 0.223381589678011
const G2 = 0.091576213509771; const W2 = 0.109951743655322
export const GAUSS6: readonly (readonly [number, number, number, number])[] = [
  [G1, G1, 1 - 2 * G1, W1], [G1, 1 - 2 * G1, G1, W1], [1 - 2 * G1, G1, G1, W1],
  [G2, G2, 1 - 2 * G2, W2], [G2, 1 - 2 * G2, G2, W2], [1 - 2 * G2, G2, G2, W2],
]

/**
 * Values and gradients of the six quadratic shape functions of one element at one point, with
 * the point's position and its integration weight (weight × element area, mm²). Buffers are
 * reused between calls: read them before the next call.
 */
export interface ShapeAt {
  readonly N: Float64Array
  readonly dx: Float64Array
  readonly dy: Float64Array
  x: number
  y: number
  wA: number
}

/** A reusable evaluator of the six-node shape functions over the mesh (mm). */
export function shapeEvaluator(mesh: TriMesh): { at: (e: number, L0: number, L1: number, L2: number, w: number) => ShapeAt; area: (e: number) => number } {
  const s: ShapeAt = { N: new Float64Array(6), dx: new Float64Array(6), dy: new Float64Array(6), x: 0, y: 0, wA: 0 }
  const { xy, elements } = mesh
  const area = (e: number) => {
    const a = elements[6 * e]!; const b = elements[6 * e + 1]!; const c = elements[6 * e + 2]!
    return ((xy[2 * b]! - xy[2 * a]!) * (xy[2 * c + 1]! - xy[2 * a + 1]!) - (xy[2 * c]! - xy[2 * a]!) * (xy[2 * b + 1]! - xy[2 * a + 1]!)) / 2
  }
  const at = (e: number, L0: number, L1: number, L2: number, w: number): ShapeAt => {
    const a = elements[6 * e]!; const b = elements[6 * e + 1]!; const c = elements[6 * e + 2]!
    const x0 = xy[2 * a]!; const y0 = xy[2 * a + 1]!; const x1 = xy[2 * b]!; const y1 = xy[2 * b + 1]!; const x2 = xy[2 * c]!; const y2 = xy[2 * c + 1]!
    const twoA = (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0)
    // Gradients of the barycentric coordinates (constant over a straight-sided triangle).
    const g0x = (y1 - y2) / twoA; const g0y = (x2 - x1) / twoA
    const g1x = (y2 - y0) / twoA; const g1y = (x0 - x2) / twoA
    const g2x = (y0 - y1) / twoA; const g2y = (x1 - x0) / twoA
    const { N, dx, dy } = s
    N[0] = L0 * (2 * L0 - 1); N[1] = L1 * (2 * L1 - 1); N[2] = L2 * (2 * L2 - 1)
    N[3] = 4 * L0 * L1; N[4] = 4 * L1 * L2; N[5] = 4 * L2 * L0
    dx[0] = (4 * L0 - 1) * g0x; dy[0] = (4 * L0 - 1) * g0y
    dx[1] = (4 * L1 - 1) * g1x; dy[1] = (4 * L1 - 1) * g1y
    dx[2] = (4 * L2 - 1) * g2x; dy[2] = (4 * L2 - 1) * g2y
    dx[3] = 4 * (L1 * g0x + L0 * g1x); dy[3] = 4 * (L1 * g0y + L0 * g1y)
    dx[4] = 4 * (L2 * g1x + L1 * g2x); dy[4] = 4 * (L2 * g1y + L1 * g2y)
    dx[5] = 4 * (L0 * g2x + L2 * g0x); dy[5] = 4 * (L0 * g2y + L2 * g0y)
    s.x = L0 * x0 + L1 * x1 + L2 * x2
    s.y = L0 * y0 + L1 * y1 + L2 * y2
    s.wA = (w * twoA) / 2
    return s
  }
  return { at, area }
}

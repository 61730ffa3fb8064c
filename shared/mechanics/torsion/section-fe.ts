import { ENVELOPE_MAX_ENTRIES, ENVELOPE_MAX_FLOPS, envelopeCholesky, envelopeCost } from './envelope'
import { permute, reverseCuthillMcKee } from './ordering'
import { conjugateGradients, incompleteCholesky, type SolveInfo } from './pcg'
import { csrAddElement, csrPattern, csrPin, type Csr } from './sparse'
import { GAUSS6, shapeEvaluator } from './tri6'
import type { TorsionRegion, TriMesh } from './types'

/**
 * The finite element solution on one mesh: the warping function ω (torsion, G-weighted) and the
 * flexural functions Ψ (for Vx) and Φ (for Vy), with the sums the results need. Coordinates are
 * the mesh's frame; `cx, cy` is the E-weighted centroid in that frame, and every second moment is
 * about it, E-weighted (equivalent for E_ref).
 */
export interface SectionSolution {
  readonly mesh: TriMesh
  readonly regions: readonly TorsionRegion[]
  readonly omega: Float64Array
  readonly psi: Float64Array
  readonly phi: Float64Array
  readonly cx: number
  readonly cy: number
  readonly Ixx: number
  readonly Iyy: number
  readonly Ixy: number
  /** Effective Poisson's ratio of the section (E·A-weighted mean) used by the flexure functions. */
  readonly nu: number
  /** Torsion constant, equivalent for G_ref (mm⁴). */
  readonly J: number
  /** Shear centre relative to the centroid (mm), from the warping integrals. */
  readonly xs: number
  readonly ys: number
  /** Warping constant about the shear centre, equivalent for E_ref (mm⁶). */
  readonly Cw: number
  /** Shear areas for shear along x and along y (mm², equivalent for G_ref). */
  readonly Asx: number
  readonly Asy: number
  /** Number of separate pieces (not joined by material). */
  readonly pieces: number
  readonly solves: readonly SolveInfo[]
}

/**
 * Solves the Saint-Venant torsion and flexure problems on the mesh (after Pilkey, Analysis and
 * Design of Elastic Beams, 2002, ch. 6): K·ω = F with K = ∫G ∇N·∇N and F = ∫G (y ∂N/∂x − x ∂N/∂y),
 * Neumann throughout (one node pinned per piece), then J, the shear centre (Trefftz: the pole
 * whose warping is orthogonal to x and y), Cw, and the shear areas from Ψ and Φ.
 */
export function solveSectionFe(mesh: TriMesh, regions: readonly TorsionRegion[]): SectionSolution {
  const nodes = mesh.xy.length / 2
  const ne = mesh.elements.length / 6
  const shape = shapeEvaluator(mesh)
  const nOf = (e: number) => regions[mesh.region[e]!]!.n
  const mOf = (e: number) => regions[mesh.region[e]!]!.m

  let A = 0; let Qx = 0; let Qy = 0; let EA = 0; let nuEA = 0
  forGauss(ne, shape, (e, s) => {
    const n = nOf(e)
    A += n * s.wA; Qx += n * s.y * s.wA; Qy += n * s.x * s.wA
    EA += n * s.wA; nuEA += n * regions[mesh.region[e]!]!.nu * s.wA
  })
  const cx = Qy / A; const cy = Qx / A
  let Ixx = 0; let Iyy = 0; let Ixy = 0
  forGauss(ne, shape, (e, s) => {
    const n = nOf(e); const x = s.x - cx; const y = s.y - cy
    Ixx += n * y * y * s.wA; Iyy += n * x * x * s.wA; Ixy += n * x * y * s.wA
  })
  const nu = nuEA / EA
  const sameWeights = regions.every(r => Math.abs(r.n - r.m) <= 1e-12 * Math.max(r.n, r.m))

  // Torsion: G-weighted stiffness and load.
  const kG = csrPattern(nodes, mesh.elements, 6)
  const kE: Csr = sameWeights ? kG : { ...kG, val: new Float64Array(kG.val.length) }
  const fT = new Float64Array(nodes); const fPsi = new Float64Array(nodes); const fPhi = new Float64Array(nodes)
  const keG = new Float64Array(36); const keE = new Float64Array(36)
  const nodesOf = new Uint32Array(6)
  for (let e = 0; e < ne; e++) {
    keG.fill(0)
    const n = nOf(e); const m = mOf(e)
    for (let a = 0; a < 6; a++) nodesOf[a] = mesh.elements[6 * e + a]!
    for (const [L0, L1, L2, w] of GAUSS6) {
      const s = shape.at(e, L0, L1, L2, w)
      const x = s.x - cx; const y = s.y - cy
      const r = x * x - y * y; const q = 2 * x * y
      const d1 = Ixx * r - Ixy * q; const d2 = Ixy * r + Ixx * q
      const h1 = -Ixy * r + Iyy * q; const h2 = -Iyy * r - Ixy * q
      for (let a = 0; a < 6; a++) {
        const i = nodesOf[a]!
        fT[i]! += m * s.wA * (y * s.dx[a]! - x * s.dy[a]!)
        fPsi[i]! += n * s.wA * ((nu / 2) * (s.dx[a]! * d1 + s.dy[a]! * d2) + 2 * (1 + nu) * s.N[a]! * (Ixx * x - Ixy * y))
        fPhi[i]! += n * s.wA * ((nu / 2) * (s.dx[a]! * h1 + s.dy[a]! * h2) + 2 * (1 + nu) * s.N[a]! * (Iyy * y - Ixy * x))
        for (let b = 0; b < 6; b++) keG[a * 6 + b]! += s.wA * (s.dx[a]! * s.dx[b]! + s.dy[a]! * s.dy[b]!)
      }
    }
    if (!sameWeights) {
      for (let k = 0; k < 36; k++) keE[k] = keG[k]! * n
      csrAddElement(kE, nodesOf, keE)
    }
    for (let k = 0; k < 36; k++) keG[k]! *= m
    csrAddElement(kG, nodesOf, keG)
  }

  const piece = pieces(nodes, mesh.elements)
  const pins = piece.first
  csrPin(kG, pins, [fT])
  const solveG = symmetricSolver(kG)
  const omega = new Float64Array(nodes)
  const solves: SolveInfo[] = [solveG(fT, omega)]
  let solveE = solveG
  if (!sameWeights) { csrPin(kE, pins, [fPsi, fPhi]); solveE = symmetricSolver(kE) } else { for (const i of pins) { fPsi[i] = 0; fPhi[i] = 0 } }
  const psi = new Float64Array(nodes); const phi = new Float64Array(nodes)
  solves.push(solveE(fPsi, psi), solveE(fPhi, phi))

  // ω with zero E-weighted mean on every piece, then J, the warping integrals and the shear centre.
  const sumN = new Float64Array(piece.count); const sumW = new Float64Array(piece.count)
  forGauss(ne, shape, (e, s) => {
    const k = piece.of[mesh.elements[6 * e]!]!
    sumN[k]! += nOf(e) * s.wA
    sumW[k]! += nOf(e) * interp(s.N, omega, mesh.elements, e) * s.wA
  })
  for (let i = 0; i < nodes; i++) omega[i]! -= sumW[piece.of[i]!]! / sumN[piece.of[i]!]!
  let J = 0; let Iwx = 0; let Iwy = 0
  forGauss(ne, shape, (e, s) => {
    const m = mOf(e); const n = nOf(e); const x = s.x - cx; const y = s.y - cy
    const [wx, wy] = grad(s.dx, s.dy, omega, mesh.elements, e)
    J += m * (x * x + y * y + x * wy - y * wx) * s.wA
    const w = interp(s.N, omega, mesh.elements, e)
    Iwx += n * w * x * s.wA; Iwy += n * w * y * s.wA
  })
  const D = Ixx * Iyy - Ixy * Ixy
  const xs = (Ixy * Iwx - Iyy * Iwy) / D
  const ys = (Ixx * Iwx - Ixy * Iwy) / D
  let mean = 0; let Cw = 0
  forGauss(ne, shape, (e, s) => { mean += nOf(e) * (interp(s.N, omega, mesh.elements, e) + xs * (s.y - cy) - ys * (s.x - cx)) * s.wA })
  mean /= A
  forGauss(ne, shape, (e, s) => {
    const wS = interp(s.N, omega, mesh.elements, e) + xs * (s.y - cy) - ys * (s.x - cx) - mean
    Cw += nOf(e) * wS * wS * s.wA
  })

  // Shear areas from the energy of the flexural shear stresses (Pilkey's shear deformation coefficients).
  let kx = 0; let ky = 0
  forGauss(ne, shape, (e, s) => {
    const n = nOf(e); const m = mOf(e); const x = s.x - cx; const y = s.y - cy
    const r = x * x - y * y; const q = 2 * x * y
    const [px, py] = grad(s.dx, s.dy, psi, mesh.elements, e)
    const [fx, fy] = grad(s.dx, s.dy, phi, mesh.elements, e)
    const ux = px - (nu / 2) * (Ixx * r - Ixy * q); const uy = py - (nu / 2) * (Ixy * r + Ixx * q)
    const vx = fx - (nu / 2) * (-Ixy * r + Iyy * q); const vy = fy - (nu / 2) * (-Iyy * r - Ixy * q)
    kx += ((n * n) / m) * (ux * ux + uy * uy) * s.wA
    ky += ((n * n) / m) * (vx * vx + vy * vy) * s.wA
  })
  const deltaS = 2 * (1 + nu) * D
  return {
    mesh, regions, omega, psi, phi, cx, cy, Ixx, Iyy, Ixy, nu, J, xs, ys, Cw,
    Asx: (deltaS * deltaS) / kx, Asy: (deltaS * deltaS) / ky, pieces: piece.count, solves,
  }
}

/**
 * A solver for A·x = b in reverse Cuthill-McKee order: the direct envelope Cholesky factor when
 * the envelope is small enough (thin-walled sections), else IC(0)-preconditioned conjugate gradients.
 */
function symmetricSolver(a: Csr): (b: Float64Array, x: Float64Array) => SolveInfo {
  const perm = reverseCuthillMcKee(a)
  const pa = permute(a, perm)
  const cost = envelopeCost(pa)
  const direct = cost.entries <= ENVELOPE_MAX_ENTRIES && cost.flops <= ENVELOPE_MAX_FLOPS ? envelopeCholesky(pa) : null
  const m = direct ? null : incompleteCholesky(pa)
  return (b, x) => {
    const pb = new Float64Array(a.n); const px = new Float64Array(a.n)
    for (let k = 0; k < a.n; k++) pb[k] = b[perm[k]!]!
    const info = direct ? direct(pb, px) : conjugateGradients(pa, pb, px, m!, 1e-9)
    for (let k = 0; k < a.n; k++) x[perm[k]!] = px[k]!
    return info
  }
}

/** Calls fn at every Gauss point of every element. */
export function forGauss(ne: number, shape: ReturnType<typeof shapeEvaluator>, fn: (e: number, s: ReturnType<ReturnType<typeof shapeEvaluator>['at']>) => void): void {
  for (let e = 0; e < ne; e++) for (const [L0, L1, L2, w] of GAUSS6) fn(e, shape.at(e, L0, L1, L2, w))
}

/** Σ N_a·u_a over element e. */
export function interp(N: Float64Array, u: Float64Array, elements: Uint32Array, e: number): number {
  let s = 0
  for (let a = 0; a < 6; a++) s += N[a]! * u[elements[6 * e + a]!]!
  return s
}

/** The gradient (∂u/∂x, ∂u/∂y) over element e. */
export function grad(dx: Float64Array, dy: Float64Array, u: Float64Array, elements: Uint32Array, e: number): [number, number] {
  let gx = 0; let gy = 0
  for (let a = 0; a < 6; a++) { const v = u[elements[6 * e + a]!]!; gx += dx[a]! * v; gy += dy[a]! * v }
  return [gx, gy]
}

/** Connected pieces of the mesh (union-find over element nodes): piece per node and a first node of each. */
function pieces(nodes: number, elements: Uint32Array): { of: Int32Array; first: number[]; count: number } {
  const parent = new Int32Array(nodes)
  for (let i = 0; i < nodes; i++) parent[i] = i
  const find = (i: number): number => {
    while (parent[i] !== i) { parent[i] = parent[parent[i]!]!; i = parent[i]! }
    return i
  }
  for (let e = 0; e < elements.length; e += 6) {
    const r = find(elements[e]!)
    for (let a = 1; a < 6; a++) { const q = find(elements[e + a]!); if (q !== r) parent[q] = r }
  }
  const of = new Int32Array(nodes).fill(-1)
  const first: number[] = []
  const label = new Map<number, number>()
  for (let i = 0; i < nodes; i++) {
    const root = find(i)
    let k = label.get(root)
    if (k === undefined) { k = first.length; label.set(root, k); first.push(i) }
    of[i] = k
  }
  return { of, first, count: first.length }
}

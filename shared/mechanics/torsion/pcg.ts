import { csrMultiply, type Csr } from './sparse'

/** Result of a conjugate-gradient solve: iterations used, final relative residual ‖r‖/‖b‖. */
export interface SolveInfo {
  iterations: number
  residual: number
  converged: boolean
}

/** A preconditioner z = M⁻¹·r. */
export type Preconditioner = (r: Float64Array, z: Float64Array) => void

/**
 * Incomplete Cholesky IC(0) of a symmetric positive definite matrix (the pattern of its lower
 * triangle, no fill). A pivot that is not positive (IC(0) can break down on quadratic elements)
 * restarts the factorisation with the diagonal raised by a growing shift (Manteuffel's shifted
 * IC); Jacobi scaling is the last resort.
 */
export function incompleteCholesky(a: Csr): Preconditioner {
  for (const shift of [0, 1e-3, 1e-2, 1e-1]) {
    const f = factor(a, shift)
    if (f) return f
  }
  const inv = new Float64Array(a.n)
  for (let i = 0; i < a.n; i++) for (let p = a.rowPtr[i]!; p < a.rowPtr[i + 1]!; p++) if (a.col[p] === i) inv[i] = 1 / a.val[p]!
  return (r, z) => { for (let i = 0; i < a.n; i++) z[i] = r[i]! * inv[i]! }
}

function factor(a: Csr, shift: number): Preconditioner | null {
  const { n, rowPtr, col, val } = a
  // Lower triangle, row-wise, diagonal last in each row.
  const lPtr = new Int32Array(n + 1)
  for (let i = 0; i < n; i++) {
    let c = 0
    for (let p = rowPtr[i]!; p < rowPtr[i + 1]!; p++) if (col[p]! <= i) c++
    lPtr[i + 1] = lPtr[i]! + c
  }
  const lCol = new Int32Array(lPtr[n]!)
  const lVal = new Float64Array(lPtr[n]!)
  for (let i = 0; i < n; i++) {
    let q = lPtr[i]!
    for (let p = rowPtr[i]!; p < rowPtr[i + 1]!; p++) {
      if (col[p]! > i) break
      lCol[q] = col[p]!
      lVal[q] = col[p] === i ? val[p]! * (1 + shift) : val[p]!
      q++
    }
  }
  for (let i = 0; i < n; i++) {
    const start = lPtr[i]!; const diag = lPtr[i + 1]! - 1
    for (let q = start; q < diag; q++) {
      const k = lCol[q]!
      // L_ik = (A_ik - Σ_{j<k} L_ij L_kj) / L_kk over the common columns of rows i and k.
      let s = lVal[q]!
      let u = start; let v = lPtr[k]!
      const vEnd = lPtr[k + 1]! - 1
      while (u < q && v < vEnd) {
        const cu = lCol[u]!; const cv = lCol[v]!
        if (cu === cv) { s -= lVal[u]! * lVal[v]!; u++; v++ } else if (cu < cv) u++
        else v++
      }
      lVal[q] = s / lVal[vEnd]!
    }
    let d = lVal[diag]!
    for (let q = start; q < diag; q++) d -= lVal[q]! * lVal[q]!
    if (!(d > 0)) return null
    lVal[diag] = Math.sqrt(d)
  }
  return (r, z) => {
    for (let i = 0; i < n; i++) {
      let s = r[i]!
      const diag = lPtr[i + 1]! - 1
      for (let q = lPtr[i]!; q < diag; q++) s -= lVal[q]! * z[lCol[q]!]!
      z[i] = s / lVal[diag]!
    }
    for (let i = n - 1; i >= 0; i--) {
      const diag = lPtr[i + 1]! - 1
      const zi = z[i]! / lVal[diag]!
      z[i] = zi
      for (let q = lPtr[i]!; q < diag; q++) z[lCol[q]!]! -= lVal[q]! * zi
    }
  }
}

/**
 * Preconditioned conjugate gradients for A·x = b (A symmetric positive definite), from the
 * starting x given, until ‖r‖ ≤ tol·‖b‖ or maxIterations.
 */
export function conjugateGradients(a: Csr, b: Float64Array, x: Float64Array, m: Preconditioner, tol = 1e-10, maxIterations = 4 * a.n + 100): SolveInfo {
  const n = a.n
  const r = new Float64Array(n); const z = new Float64Array(n); const p = new Float64Array(n); const q = new Float64Array(n)
  csrMultiply(a, x, q)
  let bNorm = 0
  for (let i = 0; i < n; i++) { r[i] = b[i]! - q[i]!; bNorm += b[i]! * b[i]! }
  bNorm = Math.sqrt(bNorm)
  if (bNorm === 0) { x.fill(0); return { iterations: 0, residual: 0, converged: true } }
  m(r, z)
  p.set(z)
  let rz = dot(r, z)
  let res = Math.sqrt(dot(r, r)) / bNorm
  let it = 0
  while (res > tol && it < maxIterations) {
    csrMultiply(a, p, q)
    const alpha = rz / dot(p, q)
    for (let i = 0; i < n; i++) { x[i]! += alpha * p[i]!; r[i]! -= alpha * q[i]! }
    res = Math.sqrt(dot(r, r)) / bNorm
    it++
    if (res <= tol) break
    m(r, z)
    const rzNew = dot(r, z)
    const beta = rzNew / rz
    rz = rzNew
    for (let i = 0; i < n; i++) p[i] = z[i]! + beta * p[i]!
  }
  return { iterations: it, residual: res, converged: res <= tol }
}

function dot(u: Float64Array, v: Float64Array): number {
  let s = 0
  for (let i = 0; i < u.length; i++) s += u[i]! * v[i]!
  return s
}

import { csrMultiply, type Csr } from './sparse'
import type { SolveInfo } from './pcg'

/** Most stored entries and multiply-adds the direct (envelope) factorisation may take. */
export const ENVELOPE_MAX_ENTRIES = 8e6
export const ENVELOPE_MAX_FLOPS = 4e8

/** Size of the envelope of a symmetric matrix (its profile below the diagonal) and the work of factoring it. */
export function envelopeCost(a: Csr): { entries: number; flops: number } {
  let entries = 0; let flops = 0
  for (let i = 0; i < a.n; i++) {
    const w = i - a.col[a.rowPtr[i]!]! + 1
    entries += w
    flops += (w * w) / 2
  }
  return { entries, flops }
}

/**
 * Cholesky factor of a symmetric positive definite matrix stored over its envelope (the profile
 * method of Jennings 1966: row i holds columns first(i)..i, so no fill falls outside). With a
 * bandwidth-reducing order (reverse Cuthill-McKee) the envelope of a thin-walled section is narrow
 * and one factorisation serves every right-hand side. Returns null when a pivot is not positive.
 */
export function envelopeCholesky(a: Csr): ((b: Float64Array, x: Float64Array) => SolveInfo) | null {
  const n = a.n
  const first = new Int32Array(n)
  const off = new Float64Array(n + 1)
  for (let i = 0; i < n; i++) {
    first[i] = Math.min(a.col[a.rowPtr[i]!]!, i)
    off[i + 1] = off[i]! + (i - first[i]! + 1)
  }
  const L = new Float64Array(off[n]!)
  for (let i = 0; i < n; i++) for (let p = a.rowPtr[i]!; p < a.rowPtr[i + 1]!; p++) {
    const j = a.col[p]!
    if (j <= i) L[off[i]! + j - first[i]!] = a.val[p]!
  }
  for (let i = 0; i < n; i++) {
    const fi = first[i]!; const oi = off[i]! - fi
    for (let j = fi; j < i; j++) {
      const fj = first[j]!; const oj = off[j]! - fj
      let s = L[oi + j]!
      for (let k = Math.max(fi, fj); k < j; k++) s -= L[oi + k]! * L[oj + k]!
      L[oi + j] = s / L[oj + j]!
    }
    let d = L[oi + i]!
    for (let k = fi; k < i; k++) d -= L[oi + k]! * L[oi + k]!
    if (!(d > 0)) return null
    L[oi + i] = Math.sqrt(d)
  }
  return (b, x) => {
    const y = Float64Array.from(b)
    for (let i = 0; i < n; i++) {
      const fi = first[i]!; const oi = off[i]! - fi
      let s = y[i]!
      for (let k = fi; k < i; k++) s -= L[oi + k]! * y[k]!
      y[i] = s / L[oi + i]!
    }
    for (let i = n - 1; i >= 0; i--) {
      const fi = first[i]!; const oi = off[i]! - fi
      const xi = y[i]! / L[oi + i]!
      y[i] = xi
      for (let k = fi; k < i; k++) y[k]! -= L[oi + k]! * xi
    }
    x.set(y)
    const r = new Float64Array(n)
    csrMultiply(a, x, r)
    let rr = 0; let bb = 0
    for (let i = 0; i < n; i++) { rr += (r[i]! - b[i]!) ** 2; bb += b[i]! * b[i]! }
    const residual = bb === 0 ? 0 : Math.sqrt(rr / bb)
    return { iterations: 0, residual, converged: residual <= 1e-8 }
  }
}

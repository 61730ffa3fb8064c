import type { Csr } from './sparse'

/**
 * Reverse Cuthill-McKee ordering of a symmetric pattern (Cuthill & McKee 1969; George's reversal):
 * breadth-first from a pseudo-peripheral node, neighbours by increasing degree. Returns perm with
 * perm[newIndex] = oldIndex. Local numbering makes the incomplete Cholesky factor much closer to
 * the full one, so conjugate gradients needs fewer iterations.
 */
export function reverseCuthillMcKee(a: Csr): Int32Array {
  const { n, rowPtr, col } = a
  const degree = (i: number) => rowPtr[i + 1]! - rowPtr[i]!
  const order = new Int32Array(n)
  const seen = new Uint8Array(n)
  let filled = 0
  for (let s0 = 0; s0 < n; s0++) {
    if (seen[s0]) continue
    // Two sweeps of breadth-first search towards a far node give a pseudo-peripheral start.
    let start = s0
    for (let sweep = 0; sweep < 2; sweep++) start = farthest(a, start)
    const head = filled
    order[filled++] = start
    seen[start] = 1
    for (let q = head; q < filled; q++) {
      const i = order[q]!
      const next: number[] = []
      for (let p = rowPtr[i]!; p < rowPtr[i + 1]!; p++) {
        const j = col[p]!
        if (!seen[j]) { seen[j] = 1; next.push(j) }
      }
      next.sort((u, v) => degree(u) - degree(v))
      for (const j of next) order[filled++] = j
    }
  }
  return order.reverse()
}

function farthest(a: Csr, start: number): number {
  const dist = new Int32Array(a.n).fill(-1)
  dist[start] = 0
  const queue = [start]
  let last = start
  for (let q = 0; q < queue.length; q++) {
    const i = queue[q]!
    last = i
    for (let p = a.rowPtr[i]!; p < a.rowPtr[i + 1]!; p++) {
      const j = a.col[p]!
      if (dist[j] === -1) { dist[j] = dist[i]! + 1; queue.push(j) }
    }
  }
  return last
}

/** The matrix P·A·Pᵀ in the new numbering (perm[new] = old), columns sorted. */
export function permute(a: Csr, perm: Int32Array): Csr {
  const inv = new Int32Array(a.n)
  for (let k = 0; k < a.n; k++) inv[perm[k]!] = k
  const rowPtr = new Int32Array(a.n + 1)
  for (let k = 0; k < a.n; k++) rowPtr[k + 1] = rowPtr[k]! + (a.rowPtr[perm[k]! + 1]! - a.rowPtr[perm[k]!]!)
  const col = new Int32Array(a.col.length)
  const val = new Float64Array(a.val.length)
  const pairs: [number, number][] = []
  for (let k = 0; k < a.n; k++) {
    const i = perm[k]!
    pairs.length = 0
    for (let p = a.rowPtr[i]!; p < a.rowPtr[i + 1]!; p++) pairs.push([inv[a.col[p]!]!, a.val[p]!])
    pairs.sort((u, v) => u[0] - v[0])
    let q = rowPtr[k]!
    for (const [c, v] of pairs) { col[q] = c; val[q] = v; q++ }
  }
  return { n: a.n, rowPtr, col, val }
}

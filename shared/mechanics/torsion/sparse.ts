/**
 * A sparse symmetric matrix in compressed rows, both triangles stored: row i holds the sorted
 * columns col[rowPtr[i]] .. col[rowPtr[i + 1] - 1] and their values.
 */
export interface Csr {
  readonly n: number
  readonly rowPtr: Int32Array
  readonly col: Int32Array
  readonly val: Float64Array
}

/** The sparsity pattern of a finite element matrix: node i couples with every node of its elements (values zero). */
export function csrPattern(n: number, elements: Uint32Array, nodesPer: number): Csr {
  const rows: number[][] = Array.from({ length: n }, () => [])
  for (let e = 0; e < elements.length; e += nodesPer) {
    for (let a = 0; a < nodesPer; a++) {
      const row = rows[elements[e + a]!]!
      for (let b = 0; b < nodesPer; b++) row.push(elements[e + b]!)
    }
  }
  const rowPtr = new Int32Array(n + 1)
  const cols: number[] = []
  for (let i = 0; i < n; i++) {
    const row = rows[i]!
    row.push(i)
    row.sort((u, v) => u - v)
    let last = -1
    for (const c of row) if (c !== last) { cols.push(c); last = c }
    rowPtr[i + 1] = cols.length
  }
  return { n, rowPtr, col: Int32Array.from(cols), val: new Float64Array(cols.length) }
}

/** Position of entry (i, j) in the value array, or -1 when it is not in the pattern. */
export function csrIndex(m: Csr, i: number, j: number): number {
  let lo = m.rowPtr[i]!; let hi = m.rowPtr[i + 1]! - 1
  while (lo <= hi) {
    const mid = (lo + hi) >> 1
    const c = m.col[mid]!
    if (c === j) return mid
    if (c < j) lo = mid + 1
    else hi = mid - 1
  }
  return -1
}

/** Adds an element matrix `ke` (row-major, nodes.length squared) at the element's nodes. */
export function csrAddElement(m: Csr, nodes: ArrayLike<number>, ke: Float64Array): void {
  const k = nodes.length
  for (let a = 0; a < k; a++) {
    const i = nodes[a]!
    for (let b = 0; b < k; b++) m.val[csrIndex(m, i, nodes[b]!)]! += ke[a * k + b]!
  }
}

/** y = A·x. */
export function csrMultiply(m: Csr, x: Float64Array, y: Float64Array): void {
  const { n, rowPtr, col, val } = m
  for (let i = 0; i < n; i++) {
    let s = 0
    for (let p = rowPtr[i]!; p < rowPtr[i + 1]!; p++) s += val[p]! * x[col[p]!]!
    y[i] = s
  }
}

/**
 * Pins the listed unknowns to zero (row and column cleared, diagonal 1, right-hand sides 0):
 * one pinned node per connected piece turns the singular Neumann matrix into a positive
 * definite one without changing the gradients of the solution.
 */
export function csrPin(m: Csr, nodes: readonly number[], rhs: readonly Float64Array[]): void {
  const pinned = new Set(nodes)
  for (let i = 0; i < m.n; i++) {
    for (let p = m.rowPtr[i]!; p < m.rowPtr[i + 1]!; p++) {
      const j = m.col[p]!
      if (pinned.has(i) || pinned.has(j)) m.val[p] = i === j ? 1 : 0
    }
  }
  for (const b of rhs) for (const i of nodes) b[i] = 0
}

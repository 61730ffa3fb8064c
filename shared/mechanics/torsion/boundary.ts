import type { TorsionRegion } from './types'

/**
 * The boundary of all regions as one planar straight-line graph: distinct points `xy`
 * (x0, y0, x1, y1, ... in mm) and undirected segments `seg` (point index pairs). Shared edges of
 * touching regions appear once, and a vertex lying on another ring's edge (a plate on part of a
 * flange) splits that edge, so the mesh is conforming across material interfaces.
 */
export interface BoundaryGraph {
  readonly xy: number[]
  readonly seg: number[]
  /** Per ring (all regions, all polygons), its point indices in ring order. */
  readonly rings: number[][]
  /** Diagonal of the bounding box (mm). */
  readonly size: number
}

/** Collects the rings of the regions into a boundary graph (coordinates in mm, any frame). */
export function boundaryGraph(regions: readonly TorsionRegion[]): BoundaryGraph {
  let minX = Infinity; let minY = Infinity; let maxX = -Infinity; let maxY = -Infinity
  for (const r of regions) for (const poly of r.polygons) for (const ring of poly) for (const [x, y] of ring) {
    if (x < minX) minX = x
    if (x > maxX) maxX = x
    if (y < minY) minY = y
    if (y > maxY) maxY = y
  }
  const size = Math.hypot(maxX - minX, maxY - minY)
  const quantum = size * 1e-10
  const index = new Map<string, number>()
  const xy: number[] = []
  const rings: number[][] = []
  for (const r of regions) for (const poly of r.polygons) for (const ring of poly) {
    const ids: number[] = []
    for (const [x, y] of ring) {
      const key = `${Math.round(x / quantum)},${Math.round(y / quantum)}`
      let id = index.get(key)
      if (id === undefined) {
        id = xy.length / 2
        index.set(key, id)
        xy.push(x, y)
      }
      if (ids[ids.length - 1] !== id) ids.push(id)
    }
    if (ids.length > 1 && ids[0] === ids[ids.length - 1]) ids.pop()
    rings.push(ids)
  }
  const raw: number[] = []
  for (const ids of rings) for (let i = 0; i < ids.length; i++) raw.push(ids[i]!, ids[(i + 1) % ids.length]!)
  const seg = splitAtVertices(xy, raw, size * 1e-9)
  return { xy, seg, rings, size }
}

/** Splits every segment at the graph's points lying on it (within tol mm) and drops duplicates. */
function splitAtVertices(xy: readonly number[], raw: readonly number[], tol: number): number[] {
  const n = xy.length / 2
  let total = 0
  for (let s = 0; s < raw.length; s += 2) total += Math.hypot(xy[2 * raw[s]!]! - xy[2 * raw[s + 1]!]!, xy[2 * raw[s]! + 1]! - xy[2 * raw[s + 1]! + 1]!)
  const cell = Math.max(total / Math.max(raw.length / 2, 1), tol * 10)
  const grid = new Map<string, number[]>()
  for (let i = 0; i < n; i++) {
    const key = `${Math.floor(xy[2 * i]! / cell)},${Math.floor(xy[2 * i + 1]! / cell)}`
    const list = grid.get(key)
    if (list) list.push(i)
    else grid.set(key, [i])
  }
  const seen = new Set<string>()
  const out: number[] = []
  const push = (a: number, b: number) => {
    const key = a < b ? `${a},${b}` : `${b},${a}`
    if (a === b || seen.has(key)) return
    seen.add(key)
    out.push(a, b)
  }
  for (let s = 0; s < raw.length; s += 2) {
    const a = raw[s]!; const b = raw[s + 1]!
    const ax = xy[2 * a]!; const ay = xy[2 * a + 1]!; const bx = xy[2 * b]!; const by = xy[2 * b + 1]!
    const dx = bx - ax; const dy = by - ay
    const len2 = dx * dx + dy * dy
    const on: { t: number; i: number }[] = []
    const i0 = Math.floor(Math.min(ax, bx) / cell); const i1 = Math.floor(Math.max(ax, bx) / cell)
    const j0 = Math.floor(Math.min(ay, by) / cell); const j1 = Math.floor(Math.max(ay, by) / cell)
    // Long segments span many cells: walk the cells of the segment's box only when it is small.
    if ((i1 - i0 + 1) * (j1 - j0 + 1) <= 64) {
      for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) {
        for (const p of grid.get(`${i},${j}`) ?? []) collect(p)
      }
    } else {
      for (let p = 0; p < n; p++) collect(p)
    }
    function collect(p: number): void {
      if (p === a || p === b) return
      const px = xy[2 * p]! - ax; const py = xy[2 * p + 1]! - ay
      const t = (px * dx + py * dy) / len2
      if (t <= 0 || t >= 1) return
      const dist = Math.abs(px * dy - py * dx) / Math.sqrt(len2)
      if (dist <= tol) on.push({ t, i: p })
    }
    if (on.length === 0) { push(a, b); continue }
    on.sort((u, v) => u.t - v.t)
    let prev = a
    for (const { i } of on) { push(prev, i); prev = i }
    push(prev, b)
  }
  return out
}

/**
 * Where a horizontal line y crosses the rings: the sorted x of every crossing (even-odd: material
 * lies between crossings 0-1, 2-3, ...). Regions never overlap, so the even-odd rule over all
 * rings (a shared interface edge counted once per ring) is the union of the regions.
 */
export function rowCrossings(xy: readonly number[], rings: readonly (readonly number[])[], y: number): number[] {
  const xs: number[] = []
  for (const ids of rings) {
    for (let k = 0; k < ids.length; k++) {
      const a = ids[k]!; const b = ids[(k + 1) % ids.length]!
      const ay = xy[2 * a + 1]!; const by = xy[2 * b + 1]!
      if ((ay > y) === (by > y)) continue
      const ax = xy[2 * a]!; const bx = xy[2 * b]!
      xs.push(ax + ((y - ay) / (by - ay)) * (bx - ax))
    }
  }
  return xs.sort((u, v) => u - v)
}

/**
 * A point-in-section test for many points: the ring edges bucketed by horizontal bands, so each
 * query looks only at the edges of its band. Even-odd over all rings given (mm).
 */
export function insideTester(rings: readonly (readonly (readonly [number, number])[])[]): (x: number, y: number) => boolean {
  let minY = Infinity; let maxY = -Infinity; let edges = 0
  for (const ring of rings) for (const [, y] of ring) { minY = Math.min(minY, y); maxY = Math.max(maxY, y); edges++ }
  const bands = Math.max(1, Math.min(4096, Math.round(Math.sqrt(edges) * 2)))
  const height = (maxY - minY) / bands || 1
  const lists: number[][] = Array.from({ length: bands }, () => [])
  const flat: number[] = []
  for (const ring of rings) {
    for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
      const [xi, yi] = ring[i]!; const [xj, yj] = ring[j]!
      const id = flat.length
      flat.push(xi, yi, xj, yj)
      const b0 = Math.max(0, Math.floor((Math.min(yi, yj) - minY) / height))
      const b1 = Math.min(bands - 1, Math.floor((Math.max(yi, yj) - minY) / height))
      for (let b = b0; b <= b1; b++) lists[b]!.push(id)
    }
  }
  return (x, y) => {
    if (!(y >= minY && y <= maxY)) return false
    const list = lists[Math.min(bands - 1, Math.floor((y - minY) / height))]!
    let inside = false
    for (const id of list) {
      const xi = flat[id]!; const yi = flat[id + 1]!; const xj = flat[id + 2]!; const yj = flat[id + 3]!
      if ((yi > y) !== (yj > y) && x < xj + ((y - yj) / (yi - yj)) * (xi - xj)) inside = !inside
    }
    return inside
  }
}

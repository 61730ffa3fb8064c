import Constrainautor from '@kninnug/constrainautor'
import Delaunator from 'delaunator'
import { boundaryGraph, insideTester, rowCrossings, type BoundaryGraph } from './boundary'
import { meshSize, thinnestWall } from './mesh-size'
import { simplifyForMesh } from './simplify'
import type { TorsionMeshDensity, TorsionRegion, TriMesh } from './types'

/** Quality bound of the refinement: no angle below this (degrees) where the input allows it. */
const MIN_ANGLE = 20
/** Refinement passes at most (each re-triangulates all points). */
const MAX_ROUNDS = 24

type Rings = (readonly (readonly [number, number])[])[]

/**
 * Meshes the regions (mm; CCW outlines, CW holes; regions touching but not overlapping) into
 * six-node triangles: a constrained Delaunay triangulation (delaunator with constrainautor) of the
 * boundary, split to the target size, and an interior lattice, then refined by circumcentre
 * insertion (Ruppert's rule: an encroached boundary piece is split instead) until no triangle has
 * an angle under 20° or an area over twice the target. The target edge length follows the
 * thinnest wall and the density (see meshSize).
 */
export function meshSection(input: readonly TorsionRegion[], density: TorsionMeshDensity = 'normal'): TriMesh {
  let area = 0
  for (const r of input) for (const poly of r.polygons) for (const ring of poly) area += signedArea(ring as Rings[number])
  const h = meshSize(Math.abs(area), thinnestWall(boundaryGraph(input)), density)
  // A deviation of h/400 changes J by about that fraction of the wall: far below the mesh error.
  const regions = simplifyForMesh(input, h / 400, h / 2)
  const graph = boundaryGraph(regions)
  const regionRings: Rings[] = regions.map(r => r.polygons.flatMap(poly => poly.map(ring => ring as readonly (readonly [number, number])[])))
  const pts: number[] = graph.xy.slice()
  let sub = subdivide(pts, graph.seg, h)
  addLattice(pts, graph, sub, h)

  const maxArea = 2 * (Math.sqrt(3) / 4) * h * h
  // Boundary pieces already shorter than h/2 are not split again: the input's own fine arcs set
  // the element size there, and splitting them further only cascades.
  const minLen = Math.max(h / 2, graph.size * 1e-7)
  const inRegion = regionRings.map(rings => insideTester(rings))
  const inSection = insideTester(regionRings.flat())
  let tri = triangulate(pts, sub, inRegion)
  for (let round = 0; round < MAX_ROUNDS; round++) {
    const added = refineOnce(pts, sub, tri, inSection, h, maxArea, minLen)
    if (added.split.size === 0 && added.points === 0) break
    sub = applySplits(pts, sub, added.split)
    tri = triangulate(pts, sub, inRegion)
  }
  return toSixNode(pts, tri.triangles, tri.region, h)
}

interface Triangulation {
  triangles: Uint32Array
  /** Region per triangle, -1 outside the section. */
  region: Int32Array
}

/** Splits every boundary segment into equal pieces no longer than h; returns the pieces. */
function subdivide(pts: number[], seg: readonly number[], h: number): number[] {
  const out: number[] = []
  for (let s = 0; s < seg.length; s += 2) {
    const a = seg[s]!; const b = seg[s + 1]!
    const ax = pts[2 * a]!; const ay = pts[2 * a + 1]!; const bx = pts[2 * b]!; const by = pts[2 * b + 1]!
    const k = Math.max(1, Math.ceil(Math.hypot(bx - ax, by - ay) / h - 1e-9))
    let prev = a
    for (let i = 1; i < k; i++) {
      const id = pts.length / 2
      pts.push(ax + ((bx - ax) * i) / k, ay + ((by - ay) * i) / k)
      out.push(prev, id)
      prev = id
    }
    out.push(prev, b)
  }
  return out
}

/** Adds a triangular lattice of spacing h inside the section, kept about 0.6 h clear of the boundary. */
function addLattice(pts: number[], graph: BoundaryGraph, sub: readonly number[], h: number): void {
  const cell = h
  const grid = new Map<string, number[]>()
  const boundaryIds = new Set(sub)
  for (const id of boundaryIds) {
    const key = `${Math.floor(pts[2 * id]! / cell)},${Math.floor(pts[2 * id + 1]! / cell)}`
    const list = grid.get(key)
    if (list) list.push(id)
    else grid.set(key, [id])
  }
  let minY = Infinity; let maxY = -Infinity
  for (let i = 1; i < graph.xy.length; i += 2) { minY = Math.min(minY, graph.xy[i]!); maxY = Math.max(maxY, graph.xy[i]!) }
  const dy = (h * Math.sqrt(3)) / 2
  const clear2 = (0.75 * h) ** 2
  for (let row = 0, y = minY + dy / 2; y < maxY; row++, y += dy) {
    const xs = rowCrossings(graph.xy, graph.rings, y)
    for (let k = 0; k + 1 < xs.length; k += 2) {
      const x0 = xs[k]!; const x1 = xs[k + 1]!
      const shift = row % 2 === 0 ? 0 : h / 2
      for (let x = Math.floor((x0 - shift) / h) * h + shift; x < x1; x += h) {
        if (x <= x0 || !clearOf(grid, pts, x, y, cell, clear2)) continue
        // A small fixed jitter: a perfect lattice is all co-circular quadruples, on which the
        // Delaunay edge flips of the constraint step can cycle.
        const k2 = pts.length
        pts.push(x + h * 0.01 * Math.sin(k2 * 12.9898), y + h * 0.01 * Math.sin(k2 * 78.233))
      }
    }
  }
}

function clearOf(grid: Map<string, number[]>, pts: readonly number[], x: number, y: number, cell: number, clear2: number): boolean {
  const ci = Math.floor(x / cell); const cj = Math.floor(y / cell)
  for (let i = ci - 1; i <= ci + 1; i++) for (let j = cj - 1; j <= cj + 1; j++) {
    for (const id of grid.get(`${i},${j}`) ?? []) {
      const ex = pts[2 * id]! - x; const ey = pts[2 * id + 1]! - y
      if (ex * ex + ey * ey < clear2) return false
    }
  }
  return true
}

/** Constrained Delaunay triangulation of the points with the boundary pieces, triangles classified by region. */
function triangulate(pts: readonly number[], sub: readonly number[], inRegion: readonly ((x: number, y: number) => boolean)[]): Triangulation {
  const del = new Delaunator(Float64Array.from(pts))
  const edges: [number, number][] = []
  for (let s = 0; s < sub.length; s += 2) edges.push([sub[s]!, sub[s + 1]!])
  const con = new Constrainautor(del, edges)
  const triangles = del.triangles
  const halfedges = del.halfedges
  const count = triangles.length / 3
  const region = new Int32Array(count).fill(-2)
  // Collinear boundary points on the convex hull leave zero-area triangles: they are no material.
  let scale = 0
  for (let t = 0; t < count; t++) scale = Math.max(scale, triArea(pts, triangles, t))
  for (let t = 0; t < count; t++) if (triArea(pts, triangles, t) <= scale * 1e-9) region[t] = -1
  const stack: number[] = []
  for (let t0 = 0; t0 < count; t0++) {
    if (region[t0] !== -2) continue
    // Flood fill across edges that are not boundary pieces: one component lies in one region.
    const members: number[] = []
    region[t0] = -3
    stack.push(t0)
    let best = t0; let bestArea = -1
    while (stack.length > 0) {
      const t = stack.pop()!
      members.push(t)
      const a = triArea(pts, triangles, t)
      if (a > bestArea) { bestArea = a; best = t }
      for (let e = 3 * t; e < 3 * t + 3; e++) {
        const opp = halfedges[e]!
        if (opp < 0 || con.isConstrained(e)) continue
        const u = Math.floor(opp / 3)
        if (region[u] === -2) { region[u] = -3; stack.push(u) }
      }
    }
    const [cx, cy] = triCentroid(pts, triangles, best)
    let which = -1
    for (let r = 0; r < inRegion.length; r++) if (inRegion[r]!(cx, cy)) { which = r; break }
    for (const t of members) region[t] = which
  }
  return { triangles, region }
}

interface Additions {
  /** Boundary pieces to split at their midpoints (index of the piece's first entry in `sub`). */
  split: Set<number>
  points: number
}

/** One refinement pass: adds circumcentres of poor triangles to pts, or marks encroached pieces to split. */
function refineOnce(pts: number[], sub: readonly number[], tri: Triangulation, inside: (x: number, y: number) => boolean, h: number, maxArea: number, minLen: number): Additions {
  const cell = h
  const pieces = new Map<string, number[]>()
  for (let s = 0; s < sub.length; s += 2) {
    const mx = (pts[2 * sub[s]!]! + pts[2 * sub[s + 1]!]!) / 2; const my = (pts[2 * sub[s]! + 1]! + pts[2 * sub[s + 1]! + 1]!) / 2
    const key = `${Math.floor(mx / cell)},${Math.floor(my / cell)}`
    const list = pieces.get(key)
    if (list) list.push(s)
    else pieces.set(key, [s])
  }
  const fresh = new Map<string, number[]>()
  const split = new Set<number>()
  let points = 0
  const { triangles, region } = tri
  const sinMin = Math.sin((MIN_ANGLE * Math.PI) / 180)
  for (let t = 0; t < region.length; t++) {
    if (region[t]! < 0) continue
    const a = triangles[3 * t]!; const b = triangles[3 * t + 1]!; const c = triangles[3 * t + 2]!
    const ax = pts[2 * a]!; const ay = pts[2 * a + 1]!; const bx = pts[2 * b]!; const by = pts[2 * b + 1]!; const cx = pts[2 * c]!; const cy = pts[2 * c + 1]!
    const la = Math.hypot(bx - cx, by - cy); const lb = Math.hypot(cx - ax, cy - ay); const lc = Math.hypot(ax - bx, ay - by)
    const area2 = Math.abs((bx - ax) * (cy - ay) - (by - ay) * (cx - ax))
    const shortest = Math.min(la, lb, lc)
    // Circumradius R = la·lb·lc / (2·area2); the smallest angle θ has sin θ = shortest / (2R).
    const sinSmallest = (shortest * area2) / (la * lb * lc)
    const poor = sinSmallest < sinMin && shortest > minLen / 32
    if (!poor && area2 / 2 <= maxArea) continue
    const d = 2 * ((ax - cx) * (by - cy) - (ay - cy) * (bx - cx))
    const sa = (ax - cx) ** 2 + (ay - cy) ** 2; const sb = (bx - cx) ** 2 + (by - cy) ** 2
    const ox = cx + ((by - cy) * sa - (ay - cy) * sb) / d
    const oy = cy + ((ax - cx) * sb - (bx - cx) * sa) / d
    // A near-degenerate triangle has a far circumcentre: use its centroid instead.
    if (!(Math.hypot(ox - cx, oy - cy) < 50 * h)) {
      continue
    }
    const hit = encroached(pts, sub, pieces, ox, oy, cell)
    if (hit >= 0) {
      if (Math.hypot(pts[2 * sub[hit]!]! - pts[2 * sub[hit + 1]!]!, pts[2 * sub[hit]! + 1]! - pts[2 * sub[hit + 1]! + 1]!) > minLen) split.add(hit)
      continue
    }
    let px = ox; let py = oy
    if (!inside(px, py)) {
      px = (ax + bx + cx) / 3
      py = (ay + by + cy) / 3
    }
    // Batch insertion: one new point per neighbourhood of the circumcircle, as one-at-a-time
    // refinement would have removed the neighbours' poor triangles with it.
    const spacing = 0.5 * Math.hypot(ox - ax, oy - ay)
    if (!clearOf(fresh, pts, px, py, cell, spacing * spacing)) continue
    const id = pts.length / 2
    pts.push(px, py)
    const key = `${Math.floor(px / cell)},${Math.floor(py / cell)}`
    const list = fresh.get(key)
    if (list) list.push(id)
    else fresh.set(key, [id])
    points++
  }
  return { split, points }
}

/** The boundary piece whose diametral circle holds (x, y), or -1. */
function encroached(pts: readonly number[], sub: readonly number[], pieces: Map<string, number[]>, x: number, y: number, cell: number): number {
  const ci = Math.floor(x / cell); const cj = Math.floor(y / cell)
  for (let i = ci - 1; i <= ci + 1; i++) for (let j = cj - 1; j <= cj + 1; j++) {
    for (const s of pieces.get(`${i},${j}`) ?? []) {
      const ax = pts[2 * sub[s]!]!; const ay = pts[2 * sub[s]! + 1]!; const bx = pts[2 * sub[s + 1]!]!; const by = pts[2 * sub[s + 1]! + 1]!
      // Inside the diametral circle: the piece subtends an obtuse angle at (x, y).
      if ((ax - x) * (bx - x) + (ay - y) * (by - y) < 0) return s
    }
  }
  return -1
}

/** Splits the marked boundary pieces at their midpoints (new points appended to pts). */
function applySplits(pts: number[], sub: readonly number[], split: ReadonlySet<number>): number[] {
  if (split.size === 0) return sub as number[]
  const out: number[] = []
  for (let s = 0; s < sub.length; s += 2) {
    const a = sub[s]!; const b = sub[s + 1]!
    if (!split.has(s)) { out.push(a, b); continue }
    const id = pts.length / 2
    pts.push((pts[2 * a]! + pts[2 * b]!) / 2, (pts[2 * a + 1]! + pts[2 * b + 1]!) / 2)
    out.push(a, id, id, b)
  }
  return out
}

/** Builds the six-node mesh from the kept triangles (mid-side nodes shared between neighbours). */
function toSixNode(pts: readonly number[], triangles: Uint32Array, region: Int32Array, h: number): TriMesh {
  const corner = new Int32Array(pts.length / 2).fill(-1)
  let corners = 0
  let kept = 0
  for (let t = 0; t < region.length; t++) {
    if (region[t]! < 0) continue
    kept++
    for (let k = 0; k < 3; k++) {
      const p = triangles[3 * t + k]!
      if (corner[p] === -1) corner[p] = corners++
    }
  }
  const xy: number[] = new Array(corners * 2)
  for (let p = 0; p < corner.length; p++) if (corner[p]! >= 0) { xy[2 * corner[p]!] = pts[2 * p]!; xy[2 * corner[p]! + 1] = pts[2 * p + 1]! }
  const elements = new Uint32Array(kept * 6)
  const regionOut = new Uint16Array(kept)
  const mid = new Map<number, number>()
  let next = corners
  let e = 0
  let minAngle = 180
  for (let t = 0; t < region.length; t++) {
    if (region[t]! < 0) continue
    const v = [corner[triangles[3 * t]!]!, corner[triangles[3 * t + 1]!]!, corner[triangles[3 * t + 2]!]!]
    // delaunator orients its triangles for a y-down screen; the elements run counter-clockwise with y up.
    if ((xy[2 * v[1]!]! - xy[2 * v[0]!]!) * (xy[2 * v[2]! + 1]! - xy[2 * v[0]! + 1]!) - (xy[2 * v[1]! + 1]! - xy[2 * v[0]! + 1]!) * (xy[2 * v[2]!]! - xy[2 * v[0]!]!) < 0) {
      const swap = v[1]!; v[1] = v[2]!; v[2] = swap
    }
    for (let k = 0; k < 3; k++) elements[6 * e + k] = v[k]!
    for (let k = 0; k < 3; k++) {
      const i = v[k]!; const j = v[(k + 1) % 3]!
      const key = i < j ? i * corners + j : j * corners + i
      let m = mid.get(key)
      if (m === undefined) {
        m = next++
        mid.set(key, m)
        xy.push((xy[2 * i]! + xy[2 * j]!) / 2, (xy[2 * i + 1]! + xy[2 * j + 1]!) / 2)
      }
      elements[6 * e + 3 + k] = m
    }
    minAngle = Math.min(minAngle, smallestAngle(xy, v[0]!, v[1]!, v[2]!))
    regionOut[e] = region[t]!
    e++
  }
  return { xy: Float64Array.from(xy), elements, region: regionOut, corners, minAngle, size: h }
}

function smallestAngle(xy: readonly number[], a: number, b: number, c: number): number {
  const ang = (p: number, q: number, r: number) => {
    const ux = xy[2 * q]! - xy[2 * p]!; const uy = xy[2 * q + 1]! - xy[2 * p + 1]!
    const vx = xy[2 * r]! - xy[2 * p]!; const vy = xy[2 * r + 1]! - xy[2 * p + 1]!
    return Math.abs(Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy))
  }
  return (Math.min(ang(a, b, c), ang(b, c, a), ang(c, a, b)) * 180) / Math.PI
}

function signedArea(ring: readonly (readonly [number, number])[]): number {
  let s = 0
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) s += ring[j]![0] * ring[i]![1] - ring[i]![0] * ring[j]![1]
  return s / 2
}

function triArea(pts: readonly number[], tri: Uint32Array, t: number): number {
  const a = tri[3 * t]!; const b = tri[3 * t + 1]!; const c = tri[3 * t + 2]!
  return Math.abs((pts[2 * b]! - pts[2 * a]!) * (pts[2 * c + 1]! - pts[2 * a + 1]!) - (pts[2 * b + 1]! - pts[2 * a + 1]!) * (pts[2 * c]! - pts[2 * a]!)) / 2
}

function triCentroid(pts: readonly number[], tri: Uint32Array, t: number): [number, number] {
  const a = tri[3 * t]!; const b = tri[3 * t + 1]!; const c = tri[3 * t + 2]!
  return [(pts[2 * a]! + pts[2 * b]! + pts[2 * c]!) / 3, (pts[2 * a + 1]! + pts[2 * b + 1]! + pts[2 * c + 1]!) / 3]
}

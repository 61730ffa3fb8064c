import { boxesNear, ringsBounds } from '../geometry/bounds'
import { polygonBoolean, polygonsArea } from '../geometry/boolean'
import { polygonMoments, zeroMoments } from '../geometry/moments'
import type { Polygon, Ring } from '../geometry/types'
import { inertiaDeterminant, type InertiaLike } from './stress'
import { SectionError } from './types'

/** One part for {@link connectionShearFlows}: index and name, n = E / E_ref, a material key, and its net polygons (mm). */
export interface ConnectionPart {
  readonly index: number
  readonly name: string
  readonly n: number
  /** Parts with the same key are one material: where they overlap, the overlap counts once. */
  readonly materialKey: string
  readonly polygons: readonly Polygon[]
}

/**
 * 'tree': cutting the line separates the section, q is exact; 'closed-cell': it does not, q is not
 * statically determinate (the finite element shear solution gives it: torsion `connections`).
 */
export type ConnectionStatus = 'tree' | 'closed-cell'

/** The line where two parts meet, and the shear flow it must carry (README "Method", shear flow). */
export interface Connection {
  /** The two parts (0-based), in drawing order. */
  parts: [number, number]
  names: [string, string]
  /** Length of the contact line (mm). */
  length: number
  /**
   * The contact line as straight pieces [x1, y1, x2, y2] (mm), each directed so that its right-hand
   * normal points from the first part into the second (the sign of the finite element flow).
   */
  line: [number, number, number, number][]
  status: ConnectionStatus
  /** The parts on the side the line cuts off (the smaller side by area); null for a closed cell. */
  side: number[] | null
  /** First moments of that side about the centroid (mm³, equivalent): Qx = ∫(y - y_c) n dA, Qy = ∫(x - x_c) n dA. */
  Qx: number | null
  Qy: number | null
  /** Shear flow across the line (N/mm), signed for V on the side `side`; null for a closed cell. */
  q: number | null
  message: string
}

/** Shear flow per connection, and the parts that touch nothing. */
export interface ConnectionResult {
  connections: Connection[]
  /** Parts (0-based) that share no contact line with any other part. */
  isolated: number[]
}

/** Default contact tolerance (mm): edges this close and collinear are one contact line (common practice for drawings snapped to 0.1 mm). */
export const CONTACT_TOLERANCE = 0.1

/**
 * Finds where the parts of a built-up section meet and the shear flow each connection carries for
 * shear forces Vx, Vy (N) on the centroidal axes: q = [(Vy·Iyy - Vx·Ixy)·Qx + (Vx·Ixx - Vy·Ixy)·Qy] / D
 * with Q of the side the cut separates (README "Method": shear flow per connection).
 * Parts of one material that overlap are split first: the overlap belongs to the part that leaves the
 * other in fewer pieces (a flange plate keeps its full width over a full-height web), then to the part
 * drawn first; the contact line is the boundary between the pieces. Two parts connect where their edges
 * lie on one line within `tolerance` mm over more than `tolerance` mm. A connection whose removal leaves
 * the section connected closes a cell: status 'closed-cell', q null. Throws SectionError for a section
 * without bending stiffness.
 */
export function connectionShearFlows(props: InertiaLike, parts: readonly ConnectionPart[], Vx: number, Vy: number, tolerance = CONTACT_TOLERANCE): ConnectionResult {
  const { Ixx, Iyy, Ixy } = props
  const D = inertiaDeterminant(props)
  if (D === null) {
    throw new SectionError('The section has no area or no bending stiffness, so no shear flow can be computed.')
  }
  if (!Number.isFinite(Vx) || !Number.isFinite(Vy)) throw new SectionError('The shear forces must be finite numbers.')
  const owned = ownedPieces(parts)
  const boxes = owned.map((polygons) => (polygons.length > 0 ? ringsBounds(polygons.map((p) => p[0]!)) : null))
  const found: { a: number; b: number; length: number; line: [number, number, number, number][] }[] = []
  for (let a = 0; a < parts.length; a++) {
    for (let b = a + 1; b < parts.length; b++) {
      const boxA = boxes[a]
      const boxB = boxes[b]
      if (!boxA || !boxB || !boxesNear(boxA, boxB, tolerance)) continue
      const line: [number, number, number, number][] = []
      const length = contactLength(owned[a]!, owned[b]!, tolerance, line)
      if (length > tolerance) found.push({ a, b, length, line })
    }
  }
  const origin = [props.centroid.x, props.centroid.y] as const
  const moments = owned.map((polygons, k) => {
    const m = zeroMoments()
    for (const polygon of polygons) polygonMoments(polygon, origin, parts[k]!.n, m)
    return m
  })
  const kx = (Vy * Iyy - Vx * Ixy) / D
  const ky = (Vx * Ixx - Vy * Ixy) / D
  const connections = found.map((edge, e): Connection => {
    const pa = parts[edge.a]!
    const pb = parts[edge.b]!
    const base = { parts: [pa.index, pb.index] as [number, number], names: [pa.name, pb.name] as [string, string], length: edge.length, line: edge.line }
    const sideB = reachable(parts.length, found, e, edge.b)
    if (sideB.has(edge.a)) {
      return { ...base, status: 'closed-cell', side: null, Qx: null, Qy: null, q: null, message: 'These parts close a cell: cutting this line does not free either side, so its shear flow is not statically determinate; the finite element shear solution (torsion) gives it.' }
    }
    const sideA = reachable(parts.length, found, e, edge.a)
    const area = (side: Set<number>) => [...side].reduce((s, k) => s + moments[k]!.A, 0)
    const side = area(sideB) <= area(sideA) ? sideB : sideA
    let Qx = 0
    let Qy = 0
    for (const k of side) {
      Qx += moments[k]!.Qx
      Qy += moments[k]!.Qy
    }
    const names = [...side].sort((u, v) => u - v).map((k) => parts[k]!.index)
    return { ...base, status: 'tree', side: names, Qx, Qy, q: kx * Qx + ky * Qy, message: 'Exact: cutting this line separates the section.' }
  })
  const touched = new Set(found.flatMap((edge) => [edge.a, edge.b]))
  const isolated = parts.length > 1 ? parts.filter((_, k) => !touched.has(k) && owned[k]!.length > 0).map((p) => p.index) : []
  return { connections, isolated }
}

/**
 * Each part's own share of the material (mm): its net polygons less the overlaps another part of the
 * same material owns. Falls back to drawing order if the pairwise choices do not tile the union.
 */
function ownedPieces(parts: readonly ConnectionPart[]): Polygon[][] {
  const owners: number[][] = parts.map(() => [])
  let anyOverlap = false
  for (let a = 0; a < parts.length; a++) {
    for (let b = a + 1; b < parts.length; b++) {
      const pa = parts[a]!
      const pb = parts[b]!
      if (pa.materialKey !== pb.materialKey || pa.polygons.length === 0 || pb.polygons.length === 0) continue
      const ba = ringsBounds(pa.polygons.map((p) => p[0]!))!
      const bb = ringsBounds(pb.polygons.map((p) => p[0]!))!
      if (!boxesNear(ba, bb)) continue
      const overlap = polygonsArea(polygonBoolean('intersection', [pa.polygons, pb.polygons]))
      if (!(overlap > 1e-9 * Math.min(polygonsArea(pa.polygons), polygonsArea(pb.polygons)))) continue
      anyOverlap = true
      const bWithoutA = polygonBoolean('difference', [pb.polygons, pa.polygons]).length
      const aWithoutB = polygonBoolean('difference', [pa.polygons, pb.polygons]).length
      // The owner keeps the overlap; the other part loses it. Fewer pieces left over wins, then drawing order.
      if (aWithoutB < bWithoutA) owners[a]!.push(b)
      else owners[b]!.push(a)
    }
  }
  if (!anyOverlap) return parts.map((p) => [...p.polygons])
  const owned = parts.map((p, k) => (owners[k]!.length === 0 ? [...p.polygons] : polygonBoolean('difference', [p.polygons, ...owners[k]!.map((o) => parts[o]!.polygons)])))
  const byKey = new Map<string, number[]>()
  parts.forEach((p, k) => byKey.set(p.materialKey, [...(byKey.get(p.materialKey) ?? []), k]))
  for (const members of byKey.values()) {
    const union = polygonsArea(polygonBoolean('union', members.map((k) => parts[k]!.polygons).filter((g) => g.length > 0)))
    const tiled = members.reduce((s, k) => s + polygonsArea(owned[k]!), 0)
    if (Math.abs(tiled - union) > 1e-9 * union) {
      return parts.map((p, k) => (k === 0 ? [...p.polygons] : polygonBoolean('difference', [p.polygons, ...parts.slice(0, k).filter((q) => q.materialKey === p.materialKey).map((q) => q.polygons)])))
    }
  }
  return owned
}

/**
 * Total length (mm) over which edges of `a` and edges of `b` lie on one line within `tolerance`:
 * for each pair of edges, both ends of the shorter within tolerance of the longer's line, and the
 * overlap of their projections on it. Each shared piece is pushed to `line`, directed so that its
 * right-hand normal points out of `a`'s material (into `b`).
 */
function contactLength(a: readonly Polygon[], b: readonly Polygon[], tolerance: number, line: [number, number, number, number][]): number {
  const ringsB = b.flat()
  const boxB = ringsBounds(ringsB)
  if (!boxB) return 0
  let total = 0
  for (const polygon of a) {
    polygon.forEach((ra, r) => {
      // Walking an outline counter-clockwise (a hole clockwise), the material is on the left.
      const flip = (ringSignedArea(ra) > 0) !== (r === 0)
      for (let i = 0; i < ra.length; i++) {
        const p = ra[i]!
        const q = ra[(i + 1) % ra.length]!
        if (Math.max(p[0], q[0]) < boxB.minX - tolerance || Math.min(p[0], q[0]) > boxB.maxX + tolerance) continue
        if (Math.max(p[1], q[1]) < boxB.minY - tolerance || Math.min(p[1], q[1]) > boxB.maxY + tolerance) continue
        for (const rb of ringsB) total += edgeContact(flip ? q : p, flip ? p : q, rb, tolerance, line)
      }
    })
  }
  return total
}

/** Twice the signed area of a ring (mm²): positive counter-clockwise. */
function ringSignedArea(ring: Ring): number {
  let s = 0
  for (let i = 0; i < ring.length; i++) {
    const p = ring[i]!
    const q = ring[(i + 1) % ring.length]!
    s += p[0] * q[1] - q[0] * p[1]
  }
  return s
}

/** Length (mm) of edge p→q shared with the edges of ring `ring` (collinear within tolerance); the shared pieces go to `line`. */
function edgeContact(p: readonly [number, number], q: readonly [number, number], ring: Ring, tolerance: number, line: [number, number, number, number][]): number {
  const dx = q[0] - p[0]
  const dy = q[1] - p[1]
  const len = Math.hypot(dx, dy)
  if (!(len > tolerance)) return 0
  const ux = dx / len
  const uy = dy / len
  let total = 0
  for (let j = 0; j < ring.length; j++) {
    const r = ring[j]!
    const s = ring[(j + 1) % ring.length]!
    // Distances of r and s from the line of p→q, and their positions along it.
    const dr = (r[0] - p[0]) * uy - (r[1] - p[1]) * ux
    const ds = (s[0] - p[0]) * uy - (s[1] - p[1]) * ux
    if (Math.abs(dr) > tolerance || Math.abs(ds) > tolerance) continue
    const tr = (r[0] - p[0]) * ux + (r[1] - p[1]) * uy
    const ts = (s[0] - p[0]) * ux + (s[1] - p[1]) * uy
    const from = Math.max(0, Math.min(tr, ts))
    const to = Math.min(len, Math.max(tr, ts))
    if (to > from) {
      total += to - from
      line.push([p[0] + ux * from, p[1] + uy * from, p[0] + ux * to, p[1] + uy * to])
    }
  }
  return total
}

/** The parts reachable from `start` over the connections, leaving out connection `skip`. */
function reachable(count: number, edges: readonly { a: number; b: number }[], skip: number, start: number): Set<number> {
  const seen = new Set<number>([start])
  const stack = [start]
  while (stack.length > 0) {
    const k = stack.pop()!
    edges.forEach((edge, e) => {
      if (e === skip) return
      const other = edge.a === k ? edge.b : edge.b === k ? edge.a : -1
      if (other >= 0 && other < count && !seen.has(other)) {
        seen.add(other)
        stack.push(other)
      }
    })
  }
  return seen
}

import { orientXY } from './orient'
import type { Point, Ring } from './types'


/** Two edges that meet although they should not: ring and edge indices (edge k runs from vertex k to k+1). */
export interface RingsIntersection {
  ringA: number
  edgeA: number
  ringB: number
  edgeB: number
  /** A point (mm) where they meet: the crossing, the touching vertex or one end of the overlap. */
  point: Point
}

/** Two edges of one ring that cross, touch or overlap; edgeA < edgeB (edge k joins vertex k and k+1). */
export interface SelfIntersection {
  edgeA: number
  edgeB: number
  point: Point
}

/**
 * First pair of edges of one ring (distinct vertices, no closing vertex, either orientation)
 * that cross, touch or overlap, other than two consecutive edges meeting at their shared vertex;
 * null when the ring is simple. O(n log n) (Shamos–Hoey sweep).
 */
export function findSelfIntersection(ring: Ring): SelfIntersection | null {
  const hit = findRingsIntersection([ring])
  if (!hit) return null
  const edgeA = Math.min(hit.edgeA, hit.edgeB)
  const edgeB = Math.max(hit.edgeA, hit.edgeB)
  return { edgeA, edgeB, point: hit.point }
}

/**
 * First pair of edges among several rings (each with at least 3 distinct vertices) that cross,
 * touch or overlap, other than consecutive edges of one ring at their shared vertex; null when
 * the rings are simple and pairwise disjoint (as an outline and its holes must be).
 * Shamos–Hoey sweep in x then y with a treap as the ordered status: O(n log n) for n edges.
 */
export function findRingsIntersection(rings: readonly Ring[]): RingsIntersection | null {
  if (rings.length === 1 && isStrictlyConvex(rings[0]!)) return null
  const edges = new RingEdges(rings)
  const status = new SweepStatus(edges.size, (s, t) => edges.compare(s, t))
  const test = (s: number, t: number): RingsIntersection | null => (s < 0 || t < 0 ? null : edges.meet(s, t))
  const insertIfStarting = (e: number, v: number): RingsIntersection | null => {
    if (edges.lo[e] !== v) return null
    status.insert(e)
    return test(status.prev[e]!, e) ?? test(e, status.next[e]!)
  }
  const removeIfEnding = (e: number, v: number): RingsIntersection | null => {
    if (edges.hi[e] !== v) return null
    const below = status.prev[e]!
    const above = status.next[e]!
    status.remove(e)
    return test(below, above)
  }
  const order: number[] = []
  for (let v = 0; v < edges.size; v++) order.push(v)
  order.sort((i, j) => edges.lex(i, j))
  for (let k = 0; k < order.length; k++) {
    const v = order[k]!
    if (k > 0 && edges.lex(order[k - 1]!, v) === 0) return edges.report(order[k - 1]!, v, edges.point(v))
    // The two edges at v: insert those that start here, then remove those that end here.
    const before = edges.prevOf[v]!
    const hit = insertIfStarting(before, v) ?? insertIfStarting(v, v) ?? removeIfEnding(before, v) ?? removeIfEnding(v, v)
    if (hit) return hit
  }
  return null
}

/**
 * True when the ring (distinct consecutive vertices, no closing vertex) is a strictly convex
 * polygon: every turn goes the same way (exact orientation, no collinear vertex) and the edge
 * directions wind round exactly once, which shows as exactly two sign changes of the edges' x
 * steps. A ring turning one way throughout winds k times with 2k sign changes, so a star-shaped
 * self-crossing ring (a pentagram, k = 2) fails. Such a ring is simple: O(n) instead of the sweep.
 */
export function isStrictlyConvex(ring: Ring): boolean {
  const n = ring.length
  if (n < 3) return false
  let turn = 0
  let changes = 0
  let lastDx = 0
  let firstDx = 0
  for (let i = 0; i < n; i++) {
    const a = ring[i]!
    const b = ring[(i + 1) % n]!
    const c = ring[(i + 2) % n]!
    const o = orientXY(a[0], a[1], b[0], b[1], c[0], c[1])
    if (o === 0 || (turn !== 0 && (o > 0) !== (turn > 0))) return false
    turn = o
    const dx = b[0] - a[0]
    if (dx === 0) continue
    if (firstDx === 0) firstDx = dx
    else if ((dx > 0) !== (lastDx > 0)) changes++
    lastDx = dx
  }
  if ((firstDx > 0) !== (lastDx > 0)) changes++
  return changes === 2
}

/**
 * The rings' vertices in flat arrays, edge s running from vertex s to nextOf[s], with lo/hi its
 * lexicographically smaller and larger ends, and the exact predicates the sweep needs.
 */
class RingEdges {
  readonly size: number
  readonly xs: Float64Array
  readonly ys: Float64Array
  readonly prevOf: Int32Array
  readonly lo: Int32Array
  readonly hi: Int32Array
  private readonly nextOf: Int32Array
  private readonly ringOf: Int32Array
  private readonly localOf: Int32Array

  constructor(rings: readonly Ring[]) {
    const n = rings.reduce((sum, ring) => sum + ring.length, 0)
    this.size = n
    this.xs = new Float64Array(n)
    this.ys = new Float64Array(n)
    this.prevOf = new Int32Array(n)
    this.nextOf = new Int32Array(n)
    this.ringOf = new Int32Array(n)
    this.localOf = new Int32Array(n)
    this.lo = new Int32Array(n)
    this.hi = new Int32Array(n)
    let v = 0
    rings.forEach((ring, r) => {
      const start = v
      ring.forEach((p, i) => {
        this.xs[v] = p[0]
        this.ys[v] = p[1]
        this.ringOf[v] = r
        this.localOf[v] = i
        this.nextOf[v] = start + ((i + 1) % ring.length)
        this.prevOf[v] = start + ((i + ring.length - 1) % ring.length)
        v++
      })
    })
    for (let s = 0; s < this.size; s++) {
      const t = this.nextOf[s]!
      const sFirst = this.lex(s, t) < 0
      this.lo[s] = sFirst ? s : t
      this.hi[s] = sFirst ? t : s
    }
  }

  /** Sweep order of vertices: by x, then y. */
  lex(i: number, j: number): number {
    return this.xs[i]! - this.xs[j]! || this.ys[i]! - this.ys[j]!
  }

  point(v: number): Point {
    return [this.xs[v]!, this.ys[v]!]
  }

  report(s: number, t: number, at: Point): RingsIntersection {
    return { ringA: this.ringOf[s]!, edgeA: this.localOf[s]!, ringB: this.ringOf[t]!, edgeB: this.localOf[t]!, point: at }
  }

  /** Order of two edges crossing the sweep line, bottom to top, judged where the later one starts. */
  compare(s: number, t: number): number {
    if (s === t) return 0
    const c = this.lex(this.lo[s]!, this.lo[t]!)
    return c > 0 || (c === 0 && s > t) ? this.sideOf(s, t) : -this.sideOf(t, s)
  }

  /** +1 if edge s lies above edge t where s starts, -1 below; collinear edges by index. */
  private sideOf(s: number, t: number): number {
    const d = this.orient(t, this.lo[s]!) || this.orient(t, this.hi[s]!)
    if (d !== 0) return d > 0 ? 1 : -1
    return s > t ? 1 : -1
  }

  /** orient2d of edge t (from lo to hi) and vertex v: positive if v lies to its left (above). */
  private orient(t: number, v: number): number {
    const a = this.lo[t]!
    const b = this.hi[t]!
    return orientXY(this.xs[a]!, this.ys[a]!, this.xs[b]!, this.ys[b]!, this.xs[v]!, this.ys[v]!)
  }

  /** The report if edges s and t meet where they should not, else null. */
  meet(s: number, t: number): RingsIntersection | null {
    let at: Point | null
    if (this.nextOf[s] === t) at = this.foldBack(s, t, this.nextOf[t]!)
    else if (this.nextOf[t] === s) at = this.foldBack(t, s, this.nextOf[s]!)
    else at = this.closedEdgesMeet(s, t)
    return at ? this.report(s, t, at) : null
  }

  /** For consecutive edges a→b→c (vertex ids): the point where they overlap beyond b, or null. */
  private foldBack(a: number, b: number, c: number): Point | null {
    const xs = this.xs
    const ys = this.ys
    if (orientXY(xs[a]!, ys[a]!, xs[b]!, ys[b]!, xs[c]!, ys[c]!) !== 0) return null
    if ((xs[a]! - xs[b]!) * (xs[c]! - xs[b]!) + (ys[a]! - ys[b]!) * (ys[c]! - ys[b]!) <= 0) return null
    const nearer = Math.hypot(xs[a]! - xs[b]!, ys[a]! - ys[b]!) <= Math.hypot(xs[c]! - xs[b]!, ys[c]! - ys[b]!)
    return this.point(nearer ? a : c)
  }

  /** Where closed edges s and t meet (crossing, touching or overlapping), or null. */
  private closedEdgesMeet(s: number, t: number): Point | null {
    const p = this.lo[s]!
    const q = this.hi[s]!
    const r = this.lo[t]!
    const u = this.hi[t]!
    // Disjoint bounding boxes cannot meet (exact comparisons): most sweep neighbours end here.
    const xs = this.xs
    const ys = this.ys
    if (xs[p]! > xs[u]! || xs[r]! > xs[q]!) return null
    if (Math.max(ys[p]!, ys[q]!) < Math.min(ys[r]!, ys[u]!) || Math.max(ys[r]!, ys[u]!) < Math.min(ys[p]!, ys[q]!)) return null
    const dp = this.orient(t, p)
    const dq = this.orient(t, q)
    const dr = this.orient(s, r)
    const du = this.orient(s, u)
    if (opposite(dp, dq) && opposite(dr, du)) {
      const f = dp / (dp - dq)
      return [this.xs[p]! + f * (this.xs[q]! - this.xs[p]!), this.ys[p]! + f * (this.ys[q]! - this.ys[p]!)]
    }
    if (dp === 0 && this.within(t, p)) return this.point(p)
    if (dq === 0 && this.within(t, q)) return this.point(q)
    if (dr === 0 && this.within(s, r)) return this.point(r)
    if (du === 0 && this.within(s, u)) return this.point(u)
    return null
  }

  /** For a vertex v on the line of edge t: whether it lies on the closed edge (its lexicographic span). */
  private within(t: number, v: number): boolean {
    return this.lex(this.lo[t]!, v) <= 0 && this.lex(v, this.hi[t]!) <= 0
  }
}

function opposite(u: number, v: number): boolean {
  return (u > 0 && v < 0) || (u < 0 && v > 0)
}

/**
 * The sweep status: edge ids ordered bottom to top in an array-backed treap with parent links
 * (expected O(log n) per insertion; removal by id, without comparisons), plus in-order links
 * `prev`/`next` (-1 for none) so the edges just below and above are found in O(1).
 */
class SweepStatus {
  readonly prev: Int32Array
  readonly next: Int32Array
  /** child[2i] is the left child of node i, child[2i + 1] the right one; -1 for none. */
  private readonly child: Int32Array
  private readonly parent: Int32Array
  private readonly priority: Uint32Array
  private root = -1
  private seed = 0x2545f491

  constructor(size: number, private readonly compare: (a: number, b: number) => number) {
    this.prev = new Int32Array(size)
    this.next = new Int32Array(size)
    this.child = new Int32Array(2 * size)
    this.parent = new Int32Array(size)
    this.priority = new Uint32Array(size)
  }

  insert(item: number): void {
    let parent = -1
    let side = 0
    let below = -1
    let above = -1
    for (let cur = this.root; cur >= 0; cur = this.child[2 * cur + side]!) {
      parent = cur
      side = this.compare(item, cur) < 0 ? 0 : 1
      if (side === 0) above = cur
      else below = cur
    }
    this.child[2 * item] = -1
    this.child[2 * item + 1] = -1
    this.priority[item] = this.random()
    this.attach(parent, side, item)
    this.prev[item] = below
    this.next[item] = above
    if (below >= 0) this.next[below] = item
    if (above >= 0) this.prev[above] = item
    while (this.parent[item]! >= 0 && this.priority[item]! > this.priority[this.parent[item]!]!) this.rotateUp(item)
  }

  remove(item: number): void {
    const below = this.prev[item]!
    const above = this.next[item]!
    if (below >= 0) this.next[below] = above
    if (above >= 0) this.prev[above] = below
    // Rotate the item down until it has at most one child, then splice it out.
    for (;;) {
      const left = this.child[2 * item]!
      const right = this.child[2 * item + 1]!
      if (left < 0 || right < 0) break
      this.rotateUp(this.priority[left]! > this.priority[right]! ? left : right)
    }
    const only = Math.max(this.child[2 * item]!, this.child[2 * item + 1]!)
    const parent = this.parent[item]!
    this.attach(parent, this.sideIn(parent, item), only)
  }

  /** Rotates node x above its parent, keeping the in-order sequence. */
  private rotateUp(x: number): void {
    const p = this.parent[x]!
    const grand = this.parent[p]!
    const side = this.sideIn(p, x)
    const inner = this.child[2 * x + 1 - side]!
    this.attach(grand, this.sideIn(grand, p), x)
    this.attach(p, side, inner)
    this.attach(x, 1 - side, p)
  }

  /** Which child (0 left, 1 right) x is of p; 0 when p is -1 (x is the root). */
  private sideIn(p: number, x: number): number {
    return p >= 0 && this.child[2 * p + 1] === x ? 1 : 0
  }

  /** Hangs x (or nothing, -1) as child `side` of p, or as the root when p is -1. */
  private attach(p: number, side: number, x: number): void {
    if (x >= 0) this.parent[x] = p
    if (p < 0) this.root = x
    else this.child[2 * p + side] = x
  }

  /** xorshift32: deterministic per instance, no shared state. */
  private random(): number {
    let x = this.seed
    x ^= x << 13
    x ^= x >>> 17
    x ^= x << 5
    this.seed = x >>> 0
    return this.seed
  }
}

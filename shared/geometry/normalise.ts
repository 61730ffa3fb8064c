import { SectionError } from '../mechanics/types'
import { ringArea } from './moments'
import type { Point, Ring } from './types'

/** Largest coordinate accepted (mm): beyond it the Green's-theorem sums lose too much precision. */
export const MAX_COORDINATE = 1e9

/** Two vertices closer than this fraction of the ring's extent are one vertex. */
const DUPLICATE_TOLERANCE = 1e-12
/** A ring whose vertices all lie within this fraction of its extent from one line encloses nothing. */
const FLATNESS_TOLERANCE = 1e-12
/** A reversing vertex whose turn has |sin| below this is a zero-width spike. */
const SPIKE_TOLERANCE = 1e-12

/**
 * Where a ring sits in the input: 0-based part index, and ring 0 for the outline or k for hole k
 * (1-based among the part's holes, notches numbered after them). With `cut`, `part` is the index of a
 * section-wide cut. `name`, when given, is shown beside the number. Messages show numbers 1-based.
 */
export interface RingLocation {
  readonly part: number
  readonly ring: number
  readonly cut?: boolean
  readonly name?: string
}

/** A cleaned ring (mm, input orientation) and, for each kept vertex, its 0-based input index. */
export interface NormalisedRing {
  readonly points: Point[]
  readonly source: number[]
}

/** "Part 2, outline" or "Part 2, hole 1": the prefix of every message about a ring. */
export function describeRing(where: RingLocation): string {
  const named = where.name ? ` (${where.name})` : ''
  if (where.cut) return `Cut ${where.part + 1}${named}`
  return `Part ${where.part + 1}${named}, ${where.ring === 0 ? 'outline' : `hole ${where.ring}`}`
}

/**
 * Cleans one ring of a part (mm): drops a repeated closing vertex, consecutive duplicates (within
 * 1e-12 of the ring's extent) and zero-width spikes, keeping the input orientation. Throws a
 * SectionError naming the part, the ring and (1-based) the vertex for a non-finite coordinate or
 * |x|, |y| > 1e9 mm, and for fewer than 3 distinct vertices or a ring that encloses no area.
 */
export function normaliseRing(ring: Ring, where: RingLocation): NormalisedRing {
  const label = describeRing(where)
  if (!Array.isArray(ring)) throw new SectionError(`${label}: expected a list of [x, y] points.`, where)
  let minX = Infinity
  let minY = Infinity
  let maxX = -Infinity
  let maxY = -Infinity
  ring.forEach((p, i) => {
    const x: unknown = p?.[0]
    const y: unknown = p?.[1]
    if (typeof x !== 'number' || typeof y !== 'number' || !Number.isFinite(x) || !Number.isFinite(y)) {
      throw new SectionError(`${label}: vertex ${i + 1} has a coordinate that is not a finite number.`, { ...where, vertex: i })
    }
    if (Math.abs(x) > MAX_COORDINATE || Math.abs(y) > MAX_COORDINATE) {
      throw new SectionError(`${label}: vertex ${i + 1} lies beyond ±1e9 mm; move the drawing nearer the origin.`, { ...where, vertex: i })
    }
    minX = Math.min(minX, x)
    minY = Math.min(minY, y)
    maxX = Math.max(maxX, x)
    maxY = Math.max(maxY, y)
  })
  const extent = Math.max(maxX - minX, maxY - minY, 0)
  if (!(extent > 0)) throw new SectionError(`${label}: needs at least 3 distinct vertices.`, where)
  const same = (p: Point, q: Point): boolean =>
    Math.max(Math.abs(p[0] - q[0]), Math.abs(p[1] - q[1])) <= DUPLICATE_TOLERANCE * extent

  const points: Point[] = []
  const source: number[] = []
  ring.forEach((p, i) => {
    if (points.length > 0 && same(points[points.length - 1]!, p)) return
    points.push(p)
    source.push(i)
  })
  while (points.length > 1 && same(points[points.length - 1]!, points[0]!)) {
    points.pop()
    source.pop()
  }
  if (points.length < 3) throw new SectionError(`${label}: needs at least 3 distinct vertices.`, where)
  const cleaned = removeSpikes(points, source, same)
  if (cleaned.points.length < 3 || isFlat(cleaned.points, maxX - minX >= maxY - minY ? 0 : 1, extent)) {
    throw new SectionError(`${label}: encloses no area (its vertices are collinear).`, where)
  }
  return cleaned
}

/**
 * Whether every vertex lies within 1e-12·extent of the line through the two vertices farthest
 * apart along the ring's longer bounding-box side. (A ring that is not flat but has zero signed
 * area, such as a symmetric bow-tie, crosses itself: that is for findSelfIntersection to report.)
 */
function isFlat(points: readonly Point[], axis: 0 | 1, extent: number): boolean {
  let p = points[0]!
  let q = points[0]!
  for (const v of points) {
    if (v[axis]! < p[axis]!) p = v
    if (v[axis]! > q[axis]!) q = v
  }
  const dx = q[0] - p[0]
  const dy = q[1] - p[1]
  const length = Math.hypot(dx, dy)
  return points.every((v) => Math.abs(dx * (v[1] - p[1]) - dy * (v[0] - p[0])) <= FLATNESS_TOLERANCE * extent * length)
}

/** Drops zero-width spikes (and the duplicates their removal leaves), also across the seam. */
function removeSpikes(points: readonly Point[], source: readonly number[], same: (p: Point, q: Point) => boolean): NormalisedRing {
  const out: Point[] = []
  const src: number[] = []
  const last = (k: number): Point => out[out.length - k]!
  points.forEach((p, i) => {
    out.push(p)
    src.push(source[i]!)
    // The new vertex may make its predecessor a spike; removing that may leave a duplicate.
    while (out.length >= 3 && isSpike(last(3), last(2), last(1))) {
      out.splice(out.length - 2, 1)
      src.splice(src.length - 2, 1)
      if (same(last(2), last(1))) {
        out.pop()
        src.pop()
      }
    }
  })
  for (let changed = true; changed && out.length >= 3; ) {
    const n = out.length
    changed = same(out[n - 1]!, out[0]!) || isSpike(out[n - 2]!, out[n - 1]!, out[0]!)
    if (changed) {
      out.pop()
      src.pop()
    } else if (isSpike(out[n - 1]!, out[0]!, out[1]!)) {
      out.shift()
      src.shift()
      changed = true
    }
  }
  return { points: out, source: src }
}


/** Whether b is a zero-width spike of a→b→c: the path turns back on itself along one line. */
function isSpike(a: Point, b: Point, c: Point): boolean {
  const ux = b[0] - a[0]
  const uy = b[1] - a[1]
  const vx = c[0] - b[0]
  const vy = c[1] - b[1]
  if (ux * vx + uy * vy >= 0) return false
  return Math.abs(ux * vy - uy * vx) <= SPIKE_TOLERANCE * Math.hypot(ux, uy) * Math.hypot(vx, vy)
}

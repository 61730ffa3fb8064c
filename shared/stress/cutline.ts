import { pointInRing } from '../geometry/ring'
import type { Ring } from '../geometry/types'

/** One stretch of a cut line inside one region: distances s along the line (mm) and values there. */
export interface CutPiece {
  region: number
  s: number[]
  v: number[]
}

/** Stress along a cut line: pieces inside the section, boundary crossings and zero crossings (s in mm from the start). */
export interface CutProfile {
  length: number
  pieces: CutPiece[]
  /** Distances (mm) where the line crosses the section boundary. */
  boundary: number[]
  /** Points where the value changes sign inside a piece (s in mm, x, y in section coordinates). */
  zeros: { s: number; x: number; y: number }[]
}

/** A region for {@link cutLineProfile}: its rings (mm) and its value at a point (MPa, tension positive). */
export interface CutRegion {
  rings: readonly Ring[]
  value: (x: number, y: number) => number
}

/**
 * Samples the field along the segment p0 → p1 (mm). Inside each region's stretches the value is
 * taken at both ends (exact for a plane: `samples` = 2) or at `samples` evenly spaced points (for
 * envelopes and cracked fields); zero crossings are interpolated linearly between samples.
 */
export function cutLineProfile(p0: readonly [number, number], p1: readonly [number, number], regions: readonly CutRegion[], samples = 2): CutProfile {
  const ux = p1[0] - p0[0]
  const uy = p1[1] - p0[1]
  const length = Math.hypot(ux, uy)
  const out: CutProfile = { length, pieces: [], boundary: [], zeros: [] }
  if (!(length > 0)) return out
  const n = Math.max(2, Math.floor(samples))
  regions.forEach((region, r) => {
    const ts: number[] = []
    for (const ring of region.rings) segmentCrossings(ring, p0, ux, uy, ts)
    ts.sort((a, b) => a - b)
    for (const t of ts) out.boundary.push(t * length)
    // Even-odd: inside between entry and exit; the start is inside when it lies in an odd number of rings.
    let inside = region.rings.reduce((acc, ring) => acc !== pointInRing(p0, ring), false)
    let from = 0
    for (const t of [...ts, 1]) {
      if (inside && t > from) out.pieces.push(piece(r, region, p0, ux, uy, length, from, t, n, out.zeros))
      inside = !inside
      from = t
    }
  })
  out.boundary.sort((a, b) => a - b)
  out.pieces.sort((a, b) => a.s[0]! - b.s[0]!)
  out.zeros.sort((a, b) => a.s - b.s)
  return out
}

function piece(r: number, region: CutRegion, p0: readonly [number, number], ux: number, uy: number, length: number, t0: number, t1: number, n: number, zeros: CutProfile['zeros']): CutPiece {
  const s: number[] = []
  const v: number[] = []
  for (let k = 0; k < n; k++) {
    const t = t0 + ((t1 - t0) * k) / (n - 1)
    const value = region.value(p0[0] + t * ux, p0[1] + t * uy)
    if (k > 0 && v[k - 1]! !== 0 && value !== 0 && (v[k - 1]! < 0) !== (value < 0)) {
      const tPrev = t0 + ((t1 - t0) * (k - 1)) / (n - 1)
      const tz = tPrev + ((t - tPrev) * v[k - 1]!) / (v[k - 1]! - value)
      zeros.push({ s: tz * length, x: p0[0] + tz * ux, y: p0[1] + tz * uy })
    }
    s.push(t * length)
    v.push(value)
  }
  return { region: r, s, v }
}

/** Pushes the parameters t in (0, 1) where p0 + t·u crosses the ring's edges. */
function segmentCrossings(ring: Ring, p0: readonly [number, number], ux: number, uy: number, out: number[]): void {
  const n = ring.length
  let p = ring[n - 1]!
  for (let i = 0; i < n; i++) {
    const q = ring[i]!
    const ex = q[0] - p[0]
    const ey = q[1] - p[1]
    const den = ux * ey - uy * ex
    if (den !== 0) {
      const wx = p[0] - p0[0]
      const wy = p[1] - p0[1]
      const t = (wx * ey - wy * ex) / den
      const s = (wx * uy - wy * ux) / den
      // Half-open on the edge so a crossing through a vertex counts once.
      if (t > 0 && t < 1 && s >= 0 && s < 1) out.push(t)
    }
    p = q
  }
}

import { contours } from 'd3-contour'
import type { Bounds, Ring } from '../geometry/types'
import type { StressPlane } from '../mechanics/types'
import { scaleStops, type StressScale } from './scale'
import { niceStep } from '../format/step'

/** Isoline spacing: 1, 2, 2.5 or 5 × 10ⁿ (README Method, stress view). */
const ISOLINE_STEPS = [1, 2, 2.5, 5] as const

/**
 * An exact colour fill for a planar stress field over a region, as a canvas linear gradient in
 * SECTION coordinates (mm): colour is constant across lines perpendicular to start → end. `stops`
 * is Konva's flat [t0, colour0, t1, colour1, ...] with t in [0, 1]. `uniform` is set (and the
 * gradient omitted) when the field does not vary over the region.
 */
export interface FieldGradient {
  start: { x: number; y: number }
  end: { x: number; y: number }
  stops: (number | string)[]
  uniform: string | null
  /** Least and greatest value (MPa, tension positive, after `clampAbove`) over the region. */
  min: number
  max: number
}

/**
 * The exact gradient of sigma = n·(a + b·x + c·y) (MPa, tension positive) over the given rings (mm).
 * The scale is piecewise linear in sRGB, and so is a canvas gradient between stops, so placing one stop
 * at every breakpoint of the scale (and at `clampAbove`, where values above are held: 0 shows a no-tension
 * field with lifted parts at neutral) reproduces the scale exactly. O(vertices).
 */
export function planeGradient(plane: StressPlane, n: number, rings: readonly Ring[], scale: StressScale, clampAbove = Infinity): FieldGradient {
  const b = n * plane.b
  const c = n * plane.c
  const a = n * plane.a
  let sMin = Infinity
  let sMax = -Infinity
  for (const ring of rings) {
    for (let i = 0; i < ring.length; i++) {
      const p = ring[i]!
      const s = b * p[0] + c * p[1]
      if (s < sMin) sMin = s
      if (s > sMax) sMax = s
    }
  }
  const g2 = b * b + c * c
  const clamp = (v: number) => (v > clampAbove ? clampAbove : v)
  const v0 = a + sMin
  const v1 = a + sMax
  const out: FieldGradient = { start: { x: 0, y: 0 }, end: { x: 0, y: 0 }, stops: [], uniform: null, min: clamp(v0), max: clamp(v1) }
  if (!Number.isFinite(sMin) || !(g2 > 0) || !(v1 - v0 > 1e-12 * Math.max(1, Math.abs(v0)))) {
    const v = Number.isFinite(sMin) ? clamp(v0) : 0
    out.uniform = scale(v)
    out.min = v
    out.max = v
    return out
  }
  // The point where b·x + c·y = s on the line through the origin along (b, c).
  out.start = { x: (b * sMin) / g2, y: (c * sMin) / g2 }
  out.end = { x: (b * sMax) / g2, y: (c * sMax) / g2 }
  out.stops.push(0, scale(clamp(v0)))
  const breaks = clampAbove > v0 && clampAbove < v1 ? [...scaleStops(scale), clampAbove].sort((u, v) => u - v) : scaleStops(scale)
  for (const bv of breaks) {
    if (bv > v0 && bv < v1 && bv <= clampAbove) out.stops.push((bv - v0) / (v1 - v0), scale(bv))
  }
  out.stops.push(1, scale(clamp(v1)))
  return out
}

/**
 * The parts of the line a + b·x + c·y = 0 (section coordinates, mm) that lie inside the rings (even-odd,
 * so holes are excluded), as flat segments [x1, y1, x2, y2, ...]. Written into `out` (cleared first);
 * returns it. Empty when the line misses the section or is undefined (b = c = 0).
 */
export function lineInRings(rings: readonly Ring[], a: number, b: number, c: number, out: number[] = [], scratch: number[] = []): number[] {
  out.length = 0
  scratch.length = 0
  const g2 = b * b + c * c
  if (!(g2 > 0)) return out
  const g = Math.sqrt(g2)
  // Foot of the perpendicular from the origin and the unit direction along the line.
  const x0 = (-a * b) / g2
  const y0 = (-a * c) / g2
  const dx = -c / g
  const dy = b / g
  for (const ring of rings) {
    const n = ring.length
    if (n < 2) continue
    let p = ring[n - 1]!
    let fp = a + b * p[0] + c * p[1]
    for (let i = 0; i < n; i++) {
      const q = ring[i]!
      const fq = a + b * q[0] + c * q[1]
      if (fp < 0 !== fq < 0) {
        const t = fp / (fp - fq)
        const x = p[0] + t * (q[0] - p[0])
        const y = p[1] + t * (q[1] - p[1])
        scratch.push((x - x0) * dx + (y - y0) * dy)
      }
      p = q
      fp = fq
    }
  }
  scratch.sort((u, v) => u - v)
  for (let i = 0; i + 1 < scratch.length; i += 2) {
    const s0 = scratch[i]!
    const s1 = scratch[i + 1]!
    if (s1 - s0 <= 0) continue
    out.push(x0 + s0 * dx, y0 + s0 * dy, x0 + s1 * dx, y0 + s1 * dy)
  }
  return out
}

/** Index (in segments, not numbers) of the longest segment of a flat segment list, or -1 when empty. */
export function longestSegment(segments: readonly number[]): number {
  let best = -1
  let bestLen = -1
  for (let i = 0; i + 3 < segments.length; i += 4) {
    const len = Math.hypot(segments[i + 2]! - segments[i]!, segments[i + 3]! - segments[i + 1]!)
    if (len > bestLen) {
      bestLen = len
      best = i / 4
    }
  }
  return best
}

/**
 * The line a + b·x + c·y = 0 (mm) clipped to a box: [x1, y1, x2, y2], or null when it misses the box
 * or is undefined. Used to draw the neutral line right across the view.
 */
export function lineAcrossBox(a: number, b: number, c: number, box: Bounds): [number, number, number, number] | null {
  const g2 = b * b + c * c
  if (!(g2 > 0)) return null
  const g = Math.sqrt(g2)
  const x0 = (-a * b) / g2
  const y0 = (-a * c) / g2
  const dx = -c / g
  const dy = b / g
  let t0 = -Infinity
  let t1 = Infinity
  const clip = (p: number, d: number, lo: number, hi: number): boolean => {
    if (Math.abs(d) < 1e-15) return p >= lo && p <= hi
    let u = (lo - p) / d
    let v = (hi - p) / d
    if (u > v) [u, v] = [v, u]
    t0 = Math.max(t0, u)
    t1 = Math.min(t1, v)
    return t0 <= t1
  }
  if (!clip(x0, dx, box.minX, box.maxX) || !clip(y0, dy, box.minY, box.maxY)) return null
  return [x0 + t0 * dx, y0 + t0 * dy, x0 + t1 * dx, y0 + t1 * dy]
}

/**
 * Isoline values at round multiples of a nice step strictly inside (min, max) (MPa), zero left out
 * (the neutral line is drawn on its own). `step` is given in display units via `perMPa` so the labels
 * come out round in the units the user reads; values are returned in MPa.
 */
export function isolineValues(min: number, max: number, target = 6, perMPa = 1): number[] {
  const out: number[] = []
  if (!(max > min) || !Number.isFinite(min) || !Number.isFinite(max)) return out
  const step = niceStep((max - min) * perMPa / Math.max(1, target), ISOLINE_STEPS) / perMPa
  const first = Math.ceil(min / step)
  const last = Math.floor(max / step)
  for (let k = first; k <= last && out.length < 50; k++) {
    const v = k * step
    if (k !== 0 && v > min && v < max) out.push(v)
  }
  return out
}

/** A field sampled on a regular grid over bounds (mm): value i is at pixel (i % nx, ⌊i / nx⌋) centre. */
export interface SampledGrid {
  nx: number
  ny: number
  x0: number
  y0: number
  /** Pixel size (mm). */
  dx: number
  dy: number
  values: Float64Array
}

/**
 * Samples fn(x, y) (any unit) at pixel centres of a grid over bounds with about `cells` pixels in all,
 * square pixels, for fields that are not planar (envelope, cracked section). Reuses `reuse` if it fits.
 */
export function sampleGrid(bounds: Bounds, cells: number, fn: (x: number, y: number) => number, reuse?: SampledGrid): SampledGrid {
  const w = Math.max(bounds.maxX - bounds.minX, 1e-9)
  const h = Math.max(bounds.maxY - bounds.minY, 1e-9)
  const d = Math.sqrt((w * h) / Math.max(4, cells))
  const nx = Math.max(2, Math.ceil(w / d))
  const ny = Math.max(2, Math.ceil(h / d))
  const values = reuse && reuse.values.length === nx * ny ? reuse.values : new Float64Array(nx * ny)
  const dx = w / nx
  const dy = h / ny
  for (let j = 0; j < ny; j++) {
    const y = bounds.minY + (j + 0.5) * dy
    for (let i = 0; i < nx; i++) values[j * nx + i] = fn(bounds.minX + (i + 0.5) * dx, y)
  }
  return { nx, ny, x0: bounds.minX, y0: bounds.minY, dx, dy, values }
}

/** A contour band: the region where the field is >= `value`, as closed flat rings in mm. */
export interface ContourBand {
  value: number
  rings: number[][]
}

/**
 * Filled contour bands of a sampled grid (d3-contour, marching squares) at the given thresholds,
 * mapped back to section coordinates (mm). Draw them in increasing order, each over the last, and clip
 * to the section. Values below the grid's minimum are skipped.
 */
export function contourBands(grid: SampledGrid, thresholds: readonly number[]): ContourBand[] {
  const gen = contours().size([grid.nx, grid.ny]).thresholds(thresholds as number[])
  const bands = gen(grid.values as unknown as number[])
  return bands.map(mp => ({
    value: mp.value,
    rings: mp.coordinates.flatMap(poly => poly.map(ring => {
      const flat: number[] = new Array(ring.length * 2)
      for (let i = 0; i < ring.length; i++) {
        flat[2 * i] = grid.x0 + ring[i]![0]! * grid.dx
        flat[2 * i + 1] = grid.y0 + ring[i]![1]! * grid.dy
      }
      return flat
    })),
  }))
}

/** Envelope drawing data for one region: contour bands (mm) with their fill, and a label point per threshold. */
export interface EnvelopeBandsOut {
  base: string
  bands: { flat: number[][]; fill: string; value: number }[]
  labels: { x: number; y: number; value: number }[]
}

/**
 * Samples the envelope of n·planes (MPa, tension positive) over a region's bounds — the most compressive
 * value when `worstCompression`, else the most tensile — and contours it at the thresholds (increasing).
 * Each band is filled with the colour of its middle value; a label point is chosen per threshold on the
 * band's edge, inside the bounds, nearest the point `near` (mm). Values above `clampAbove` are held
 * there (0 for a no-tension envelope: where every set lifts off the pressure is 0, never tension).
 * A label point must also satisfy `inside` (the region's material, so a label never sits in a void).
 */
export function envelopeBands(
  bounds: Bounds,
  n: number,
  planes: readonly StressPlane[],
  worstCompression: boolean,
  thresholds: readonly number[],
  colour: (v: number) => string,
  near: readonly [number, number],
  cells = 3600,
  clampAbove = Infinity,
  inside: (x: number, y: number) => boolean = () => true,
): EnvelopeBandsOut {
  const grid = sampleGrid(bounds, cells, (x, y) => {
    let lo = Infinity
    let hi = -Infinity
    for (const p of planes) {
      const v = n * (p.a + p.b * x + p.c * y)
      if (v < lo) lo = v
      if (v > hi) hi = v
    }
    const v = worstCompression ? lo : hi
    return v > clampAbove ? clampAbove : v
  })
  let top = -Infinity
  for (const v of grid.values) if (v > top) top = v
  const raw = contourBands(grid, thresholds)
  const bands = raw.map((band, k) => ({ flat: band.rings, value: band.value, fill: colour((band.value + (thresholds[k + 1] ?? top)) / 2) }))
  const eps = 1e-6 * Math.max(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY)
  const labels: EnvelopeBandsOut['labels'] = []
  raw.forEach((band, k) => {
    if (k === 0) return
    let best: [number, number] | null = null
    let bestD = Infinity
    for (const ring of band.rings) {
      for (let j = 0; j < ring.length; j += 2) {
        const x = ring[j]!
        const y = ring[j + 1]!
        if (Math.abs(x - bounds.minX) < eps || Math.abs(x - bounds.maxX) < eps || Math.abs(y - bounds.minY) < eps || Math.abs(y - bounds.maxY) < eps) continue
        if (!inside(x, y)) continue
        const d = Math.hypot(x - near[0], (y - near[1]) * 3)
        if (d < bestD) {
          bestD = d
          best = [x, y]
        }
      }
    }
    if (best) labels.push({ x: best[0], y: best[1], value: band.value })
  })
  return { base: bands[0]?.fill ?? colour(thresholds[0] ?? 0), bands, labels }
}

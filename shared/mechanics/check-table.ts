import { polygonBoolean } from '../geometry/boolean'
import { polygonMoments, zeroMoments, type Moments } from '../geometry/moments'
import { normaliseRing } from '../geometry/normalise'
import { orientRing } from '../geometry/ring'
import type { Point, Polygon, Ring } from '../geometry/types'
import { materialKey } from './prepare'
import { inertiaDeterminant, type InertiaLike } from './stress'
import type { PartInput, PreparedSection } from './types'

/** What a row of the check table stands for: a part's outline, one of its holes, a cut through it, an overlap counted once, or what is left. */
export type CheckRowKind = 'part' | 'hole' | 'cut' | 'overlap' | 'remainder'

/**
 * One row of the hand tabulation (mm, mm², mm³, mm⁴): its own area A (real, positive) and centroid
 * (x, y) in section coordinates, its own second moments about its own centroid, and the parallel-axis
 * terms about the section's centroid. `sign` is -1 for what is taken away; n = E / E_ref.
 */
export interface CheckTableRow {
  name: string
  kind: CheckRowKind
  /** The part (0-based, in the request's order) the row belongs to, or null. */
  part: number | null
  sign: 1 | -1
  n: number
  A: number
  /** n·A, the equivalent area. */
  nA: number
  x: number
  y: number
  /** sign·n·A·x and sign·n·A·y (mm³). */
  Ax: number
  Ay: number
  Ixx0: number
  Iyy0: number
  Ixy0: number
  /** x - x̄ and y - ȳ of the row's centroid from the section's (mm). */
  dx: number
  dy: number
  /** sign·n·A·dy², sign·n·A·dx², sign·n·A·dx·dy (mm⁴). */
  Ady2: number
  Adx2: number
  Adxdy: number
  note: string | null
}

/** Column sums and what follows from them: x̄ = ΣAx/ΣA, Ixx = Σ sign·n·(Ixx0 + A·dy²), and so on. */
export interface CheckTableSums {
  A: number
  Ax: number
  Ay: number
  x: number
  y: number
  Ixx: number
  Iyy: number
  Ixy: number
}

export interface CheckTable {
  rows: CheckTableRow[]
  sums: CheckTableSums
}

/** Shapes whose outline has arcs (root fillets, rounds): their row says the polygon is exact, not a tabulated value. */
const ROUNDED_SHAPES: Record<string, string> = {
  ishape: 'I or H section', channel: 'channel', angle: 'angle', tee: 'tee', rhs: 'box tube', circle: 'round', tube: 'tube',
}

/** Sums may differ from the integrated section by this fraction before a remainder row is shown. */
const MATCH_TOLERANCE = 1e-9

/**
 * The check table of a prepared section (README "Method", check table): a row per part outline, per
 * hole of a part (its part inside the outline, negative), per cut through a part (what it removes from
 * that part, negative) and per overlap of two parts of one material (counted once, negative), in the
 * parts' order. Each row's own moments and parallel-axis terms about the section centroid `props`;
 * the sums reproduce A, the centroid and Ixx, Iyy, Ixy. Should a rare geometry (holes overlapping
 * each other, three parts over one spot) leave a difference, a last row says so and carries it.
 * `sources[j]` names the shape a part came from (its polygon includes any fillets exactly).
 */
export function checkTable(parts: readonly PartInput[], cuts: readonly Ring[], prepared: PreparedSection, props: InertiaLike, sources: readonly (string | null)[] = []): CheckTable {
  const centre: Point = [props.centroid.x, props.centroid.y]
  const rows: CheckTableRow[] = []
  const add = (name: string, kind: CheckRowKind, part: number | null, sign: 1 | -1, n: number, polygons: readonly Polygon[], note: string | null = null): void => {
    const m = zeroMoments()
    for (const polygon of polygons) polygonMoments(polygon, centre, 1, m)
    if (!(m.A > 0)) return
    rows.push(rowFrom(name, kind, part, sign, n, m, centre, note))
  }
  const cleanCuts = cuts.map((ring, k) => orientRing(normaliseRing(ring, { part: k, ring: 0, cut: true }).points, true))
  prepared.parts.forEach((part, j) => {
    const input = parts[j]!
    const outline = orientRing(normaliseRing(input.outline, { part: j, ring: 0 }).points, true)
    const own = [...(input.holes ?? []), ...(input.notches ?? [])].map((ring, k) => orientRing(normaliseRing(ring, { part: j, ring: k + 1 }).points, true))
    const source = sources[j]
    const rounded = source ? ROUNDED_SHAPES[source] : undefined
    add(part.name, 'part', j, 1, part.n, [[outline]], rounded ? `${rounded} with its fillets drawn: the row uses the shape's own polygon, not a tabulated value` : null)
    own.forEach((hole, k) => add(`${part.name}: hole ${k + 1}`, 'hole', j, -1, part.n, polygonBoolean('intersection', [[[outline]], [[hole]]])))
    if (part.cuts.length === 0) return
    const ownNet = own.length === 0 ? [[outline]] : polygonBoolean('difference', [[[outline]], ...own.map((hole) => [[hole]])])
    for (const k of part.cuts) add(`Cut ${k + 1} through ${part.name}`, 'cut', j, -1, part.n, polygonBoolean('intersection', [ownNet, [[cleanCuts[k]!]]]))
  })
  for (let a = 0; a < prepared.parts.length; a++) {
    for (let b = a + 1; b < prepared.parts.length; b++) {
      const pa = prepared.parts[a]!
      const pb = prepared.parts[b]!
      if (pa.polygons.length === 0 || pb.polygons.length === 0 || materialKey(pa.material) !== materialKey(pb.material)) continue
      add(`Overlap of ${pa.name} and ${pb.name} (counted once)`, 'overlap', null, -1, pa.n, polygonBoolean('intersection', [pa.polygons, pb.polygons]))
    }
  }
  const whole = zeroMoments()
  for (const region of prepared.regions) for (const polygon of region.polygons) polygonMoments(polygon, centre, region.n, whole)
  const tabled = rows.reduce((m, r) => addRow(m, r), zeroMoments())
  const rest: Moments = { A: whole.A - tabled.A, Qx: whole.Qx - tabled.Qx, Qy: whole.Qy - tabled.Qy, Jxx: whole.Jxx - tabled.Jxx, Jyy: whole.Jyy - tabled.Jyy, Jxy: whole.Jxy - tabled.Jxy }
  if (Math.abs(rest.A) > MATCH_TOLERANCE * whole.A || Math.abs(rest.Jxx) > MATCH_TOLERANCE * whole.Jxx || Math.abs(rest.Jyy) > MATCH_TOLERANCE * whole.Jyy) {
    const sign = rest.A < 0 ? -1 : 1
    const m: Moments = sign < 0 ? { A: -rest.A, Qx: -rest.Qx, Qy: -rest.Qy, Jxx: -rest.Jxx, Jyy: -rest.Jyy, Jxy: -rest.Jxy } : rest
    rows.push(rowFrom('Overlaps among several holes, cuts or parts (counted once)', 'remainder', null, sign, 1, m, centre, 'The difference between the rows above and the integrated section, equivalent values (n applied).'))
  }
  const sum = (f: (r: CheckTableRow) => number): number => rows.reduce((s, r) => s + f(r), 0)
  const A = sum((r) => r.sign * r.nA)
  const Ax = sum((r) => r.Ax)
  const Ay = sum((r) => r.Ay)
  return {
    rows,
    sums: {
      A,
      Ax,
      Ay,
      x: Ax / A,
      y: Ay / A,
      Ixx: sum((r) => r.sign * r.n * r.Ixx0 + r.Ady2),
      Iyy: sum((r) => r.sign * r.n * r.Iyy0 + r.Adx2),
      Ixy: sum((r) => r.sign * r.n * r.Ixy0 + r.Adxdy),
    },
  }
}

/** A row from its polygons' moments `m` (real area, about the section centroid `centre`). */
function rowFrom(name: string, kind: CheckRowKind, part: number | null, sign: 1 | -1, n: number, m: Moments, centre: Point, note: string | null): CheckTableRow {
  const A = m.A
  const dx = m.Qy / A
  const dy = m.Qx / A
  const x = centre[0] + dx
  const y = centre[1] + dy
  const nA = n * A
  return {
    name, kind, part, sign, n, A, nA, x, y,
    Ax: sign * nA * x,
    Ay: sign * nA * y,
    Ixx0: m.Jxx - A * dy * dy,
    Iyy0: m.Jyy - A * dx * dx,
    Ixy0: m.Jxy - A * dx * dy,
    dx, dy,
    Ady2: sign * nA * dy * dy,
    Adx2: sign * nA * dx * dx,
    Adxdy: sign * nA * dx * dy,
    note,
  }
}

/** Adds a row's equivalent moments (about the section centroid) into m. */
function addRow(m: Moments, r: CheckTableRow): Moments {
  const w = r.sign * r.n
  m.A += w * r.A
  m.Qx += w * r.A * r.dy
  m.Qy += w * r.A * r.dx
  m.Jxx += w * (r.Ixx0 + r.A * r.dy * r.dy)
  m.Jyy += w * (r.Iyy0 + r.A * r.dx * r.dx)
  m.Jxy += w * (r.Ixy0 + r.A * r.dx * r.dy)
  return m
}

/** The stress at one point written out term by term (MPa, tension-positive): σ = N/A + ky·(y - ȳ) + kx·(x - x̄), times n. */
export interface StressTerms {
  x: number
  y: number
  n: number
  /** N/A (MPa). */
  direct: number
  /** (Mx·Iyy - My·Ixy)/D · (y - ȳ) and its factor (MPa/mm). */
  fromY: number
  ky: number
  /** (My·Ixx - Mx·Ixy)/D · (x - x̄) and its factor (MPa/mm). */
  fromX: number
  kx: number
  /** n·(direct + fromY + fromX). */
  total: number
}

/**
 * The general bending formula at (x, y) mm term by term (README "Method", stress), for N (N, tension
 * positive), Mx, My (N·mm) about the centroid and a region of modular ratio n. Null when the section
 * has no bending stiffness (D ≈ 0).
 */
export function stressTerms(props: InertiaLike, N: number, Mx: number, My: number, x: number, y: number, n = 1): StressTerms | null {
  const { area, Ixx, Iyy, Ixy } = props
  const D = inertiaDeterminant(props)
  if (D === null) return null
  const ky = (Mx * Iyy - My * Ixy) / D
  const kx = (My * Ixx - Mx * Ixy) / D
  const direct = N / area
  const fromY = ky * (y - props.centroid.y)
  const fromX = kx * (x - props.centroid.x)
  return { x, y, n, direct, fromY, ky, fromX, kx, total: n * (direct + fromY + fromX) }
}

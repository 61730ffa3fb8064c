import type { Ring } from '../geometry/types'
import type { StressPlane } from '../mechanics/types'

/**
 * A material region to check: n = E / E_ref, its rings (mm), and its limits (MPa, magnitudes): the
 * user's allowable stress in tension and in compression, each falling back to the yield stress fy
 * (compression: to the compression or bearing strength fc first).
 */
export interface CheckRegion {
  readonly name: string
  readonly n: number
  readonly rings: readonly Ring[]
  readonly allowableT?: number | null
  readonly allowableC?: number | null
  readonly fy?: number | null
  /** Compression or bearing strength (MPa): the compression limit when no allowable compression is typed, before fy. */
  readonly fc?: number | null
}

/** One side of a material's check: its worst point (MPa, tension positive), the limit used and the verdict. */
export interface CheckSide {
  readonly worst: { value: number; x: number; y: number } | null
  /** Limit stress (MPa, a magnitude) and which value it is; null when the user gave none. */
  readonly limit: number | null
  readonly limitKind: 'allowable' | 'strength' | 'yield' | null
  /** |worst| / limit (-); null without a limit or without a point stressed on this side. */
  readonly utilisation: number | null
  /** 'none': no point of the material is stressed on this side. */
  readonly status: 'pass' | 'over' | 'no-limit' | 'none'
}

/**
 * The check of one material: the worst tensile point against the allowable tension (else fy), the
 * worst compressive point against the allowable compression (else fy), both listed, and the
 * governing side (the higher utilisation, or the larger stress when there is no limit). The
 * top-level worst/limit/utilisation/status are those of the governing side.
 */
export interface CheckRow extends CheckSide {
  readonly name: string
  readonly tension: CheckSide
  readonly compression: CheckSide
  readonly governing: 'tension' | 'compression' | null
}

/**
 * Utilisation per material and per side (README "Method": a plane's extremes lie on vertices, so the ring
 * vertices suffice): the largest tensile and the largest compressive n·sigma over all the planes (MPa,
 * tension positive; several planes for an envelope), values above `clampAbove` held there (0 for a
 * no-tension view, so it has no tensile side). Pass when utilisation <= 1. A linear-elastic check of
 * the section only: show the caution of README "Cautions" beside it.
 */
export function checkUtilisation(regions: readonly CheckRegion[], planes: readonly StressPlane[], clampAbove = Infinity): CheckRow[] {
  return regions.map((region) => {
    let t: { value: number; x: number; y: number } | null = null
    let c: { value: number; x: number; y: number } | null = null
    for (const plane of planes) {
      for (const ring of region.rings) {
        for (let i = 0; i < ring.length; i++) {
          const p = ring[i]!
          let v = region.n * (plane.a + plane.b * p[0] + plane.c * p[1])
          if (v > clampAbove) v = clampAbove
          if (v > 0 && (t === null || v > t.value)) t = { value: v, x: p[0], y: p[1] }
          if (v < 0 && (c === null || v < c.value)) c = { value: v, x: p[0], y: p[1] }
        }
      }
    }
    const fy = positive(region.fy)
    const tension = side(t, positive(region.allowableT), fy)
    const compression = side(c, positive(region.allowableC), fy, positive(region.fc))
    const governing = govern(tension, compression)
    const g = governing === 'tension' ? tension : governing === 'compression' ? compression : { worst: null, limit: null, limitKind: null, utilisation: null, status: 'none' as const }
    return { name: region.name, ...g, tension, compression, governing }
  })
}

function side(worst: CheckSide['worst'], allowable: number | null, fy: number | null, fc: number | null = null): CheckSide {
  const limit = allowable ?? fc ?? fy
  const limitKind = allowable !== null ? 'allowable' : fc !== null ? 'strength' : fy !== null ? 'yield' : null
  if (worst === null) return { worst, limit, limitKind, utilisation: null, status: 'none' }
  const utilisation = limit !== null ? Math.abs(worst.value) / limit : null
  const status = utilisation === null ? 'no-limit' : utilisation <= 1 ? 'pass' : 'over'
  return { worst, limit, limitKind, utilisation, status }
}

function govern(t: CheckSide, c: CheckSide): 'tension' | 'compression' | null {
  if (!t.worst && !c.worst) return null
  if (!t.worst) return 'compression'
  if (!c.worst) return 'tension'
  if (t.utilisation !== null && c.utilisation !== null) return t.utilisation > c.utilisation ? 'tension' : 'compression'
  if (t.utilisation !== null) return 'tension'
  if (c.utilisation !== null) return 'compression'
  return Math.abs(t.worst.value) > Math.abs(c.worst.value) ? 'tension' : 'compression'
}

function positive(v: number | null | undefined): number | null {
  return typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : null
}

/** What a side's limit is, in words: "the allowable compression", "the yield stress fy". */
export function limitWords(kind: CheckSide['limitKind'], which: 'tension' | 'compression'): string {
  return kind === 'allowable' ? `the allowable ${which}` : kind === 'strength' ? 'the compression or bearing strength fc' : 'the yield stress fy'
}

/**
 * A plain message for a check row, of its governing side: "Pass: 82 % of the allowable compression
 * (compression governs)." or "Over: 112 % of the yield stress fy...". No stressed point: no load.
 */
export function checkMessage(row: CheckRow): string {
  if (row.governing === null) return 'No stress in this material: there is no load to check.'
  const g = row.governing === 'tension' ? row.tension : row.compression
  if (g.status === 'no-limit') return 'No limit given: type an allowable stress or fy for this material.'
  const pct = Math.round((g.utilisation ?? 0) * 100)
  const what = `${limitWords(g.limitKind, row.governing)} (${row.governing} governs)`
  return g.status === 'pass' ? `Pass: ${pct} % of ${what}.` : `Over: ${pct} % of ${what}; the worst point exceeds it.`
}

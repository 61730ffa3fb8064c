import type { Ring } from '../geometry/types'
import type { StressPlane } from '../mechanics/types'

/** A material region to check: n = E / E_ref, its rings (mm), and the user's allowable or the yield stress (MPa). */
export interface CheckRegion {
  readonly name: string
  readonly n: number
  readonly rings: readonly Ring[]
  readonly allowable?: number | null
  readonly fy?: number | null
}

/** The utilisation of one material: worst point (MPa, tension positive), the limit used and the verdict. */
export interface CheckRow {
  readonly name: string
  readonly worst: { value: number; x: number; y: number } | null
  /** Limit stress (MPa, a magnitude) and which value it is; null when the user gave none. */
  readonly limit: number | null
  readonly limitKind: 'allowable' | 'yield' | null
  /** |worst| / limit (-), null without a limit. */
  readonly utilisation: number | null
  readonly status: 'pass' | 'over' | 'no-limit'
}

/**
 * Utilisation of the worst point per material (README "Method": a plane's extremes lie on vertices, so the
 * ring vertices suffice): |n·sigma| at its largest over all the planes (MPa, tension positive; several
 * planes for an envelope), values above `clampAbove` held there (0 for a no-tension view). The limit
 * is the allowable stress when typed, else fy; pass when utilisation <= 1. A linear-elastic check of
 * the section only: show the caution of README "Method" beside it.
 */
export function checkUtilisation(regions: readonly CheckRegion[], planes: readonly StressPlane[], clampAbove = Infinity): CheckRow[] {
  return regions.map((region) => {
    let worst: { value: number; x: number; y: number } | null = null
    let worstAbs = -1
    for (const plane of planes) {
      for (const ring of region.rings) {
        for (let i = 0; i < ring.length; i++) {
          const p = ring[i]!
          let v = region.n * (plane.a + plane.b * p[0] + plane.c * p[1])
          if (v > clampAbove) v = clampAbove
          if (Math.abs(v) > worstAbs) {
            worstAbs = Math.abs(v)
            worst = { value: v, x: p[0], y: p[1] }
          }
        }
      }
    }
    const allowable = positive(region.allowable)
    const fy = positive(region.fy)
    const limit = allowable ?? fy
    const limitKind = allowable !== null ? 'allowable' : fy !== null ? 'yield' : null
    const utilisation = limit !== null && worst !== null ? worstAbs / limit : null
    const status = utilisation === null ? 'no-limit' : utilisation <= 1 ? 'pass' : 'over'
    return { name: region.name, worst, limit, limitKind, utilisation, status }
  })
}

function positive(v: number | null | undefined): number | null {
  return typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : null
}

/** A plain message for a check row: "Pass: 82 % of the allowable stress" or "Over: 112 % of the yield stress". */
export function checkMessage(row: CheckRow): string {
  if (row.status === 'no-limit') return 'No limit given: type an allowable stress or fy for this material.'
  const pct = Math.round((row.utilisation ?? 0) * 100)
  const what = row.limitKind === 'allowable' ? 'the allowable stress' : 'the yield stress fy'
  return row.status === 'pass' ? `Pass: ${pct} % of ${what}.` : `Over: ${pct} % of ${what}; the worst point exceeds it.`
}

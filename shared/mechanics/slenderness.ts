import type { InertiaLike } from './stress'

/** KL/r above which a note says the short-column assumption may not hold (a caution, not a code limit). */
export const SLENDERNESS_NOTE_KLR = 50
/** P / P_euler above which a stronger caution is given (a caution, not a code limit). */
export const EULER_RATIO_CAUTION = 0.1

/** Slenderness about one principal axis: K·L (mm), r (mm), KL/r (-) and the Euler load (N), null where unknown. */
export interface AxisSlenderness {
  KL: number | null
  r: number | null
  KLr: number | null
  eulerLoad: number | null
}

/**
 * Slenderness of a member: about the major (u) and minor (v) principal axes, and the governing one
 * (the lower Euler load): its KL/r (-), Euler load (N) and P / P_euler (-); the minor principal I_min
 * (mm⁴) and r_min (mm); a caution; and the note that flexural-torsional buckling is not checked.
 */
export interface SlendernessResult {
  u: AxisSlenderness
  v: AxisSlenderness
  governing: 'u' | 'v' | null
  Imin: number | null
  rMin: number | null
  KLr: number | null
  eulerLoad: number | null
  /** P / P_euler for a compressive P (N, compression-positive); null when P <= 0 or the Euler load is unknown. */
  ratio: number | null
  warning: string | null
  /** Always given: flexural-torsional buckling may govern angles, tees and other open sections. */
  torsionalNote: string
}

/** Effective lengths K·L (mm) about the principal axes; one number applies about both. */
export type EffectiveLengths = number | { readonly u?: number | null; readonly v?: number | null }

/** The caution every slenderness answer carries (README "Cautions"). */
export const TORSIONAL_NOTE = 'Flexural-torsional and torsional buckling are not checked: they may govern angles, tees, channels and other open sections whose shear centre is away from the centroid.'

/**
 * Slenderness check for the short-column assumption (README "Cautions"): about each principal axis
 * I1, I2 from Ixx, Iyy, Ixy (mm⁴), r = sqrt(I / A), KL/r with that axis' effective length (mm), and the
 * Euler load π²·E·I/(KL)² (N) with E (MPa; the reference E for an equivalent section); the axis with
 * the lower Euler load governs (the minor axis when one length is given). P (N) is compression-positive.
 * Invalid input gives nulls and a message in `warning`, never NaN.
 */
export function slenderness(props: Pick<InertiaLike, 'area' | 'Ixx' | 'Iyy' | 'Ixy'>, E: number, effectiveLength: EffectiveLengths, P: number): SlendernessResult {
  const lengths = typeof effectiveLength === 'number' ? { u: effectiveLength, v: effectiveLength } : { u: effectiveLength.u ?? null, v: effectiveLength.v ?? null }
  const noAxis: AxisSlenderness = { KL: null, r: null, KLr: null, eulerLoad: null }
  const none = { u: noAxis, v: noAxis, governing: null, Imin: null, rMin: null, KLr: null, eulerLoad: null, ratio: null, torsionalNote: TORSIONAL_NOTE }
  const { area, Ixx, Iyy, Ixy } = props
  const half = (Ixx - Iyy) / 2
  const I1 = (Ixx + Iyy) / 2 + Math.hypot(half, Ixy)
  const Imin = (Ixx + Iyy) / 2 - Math.hypot(half, Ixy)
  if (!(area > 0) || !Number.isFinite(Imin) || !(Imin > 0)) {
    return { ...none, warning: 'The section has no bending stiffness about its minor axis, so slenderness cannot be assessed.' }
  }
  const rMin = Math.sqrt(Imin / area)
  const valid = (KL: number | null): KL is number => typeof KL === 'number' && KL > 0 && Number.isFinite(KL)
  if (!valid(lengths.u) && !valid(lengths.v)) {
    return { ...none, Imin, rMin, warning: 'Give a positive effective length KL (mm) to assess slenderness.' }
  }
  const goodE = E > 0 && Number.isFinite(E)
  const about = (I: number, KL: number | null): AxisSlenderness => {
    const r = Math.sqrt(I / area)
    if (!valid(KL)) return { KL: null, r, KLr: null, eulerLoad: null }
    return { KL, r, KLr: KL / r, eulerLoad: goodE ? (Math.PI * Math.PI * E * I) / (KL * KL) : null }
  }
  const u = about(I1, lengths.u)
  const v = about(Imin, lengths.v)
  const governing: 'u' | 'v' = v.KLr === null ? 'u' : u.KLr === null ? 'v' : (u.eulerLoad ?? Infinity) < (v.eulerLoad ?? Infinity) || (!goodE && u.KLr > v.KLr) ? 'u' : 'v'
  const g = governing === 'u' ? u : v
  const base = { u, v, governing, Imin, rMin, KLr: g.KLr, torsionalNote: TORSIONAL_NOTE }
  if (!goodE) return { ...base, eulerLoad: null, ratio: null, warning: 'Give a positive modulus E (MPa) to compute the Euler load.' }
  const ratio = P > 0 && Number.isFinite(P) ? P / g.eulerLoad! : null
  return { ...base, eulerLoad: g.eulerLoad, ratio, warning: caution(g.KLr!, ratio) }
}

function caution(KLr: number, ratio: number | null): string | null {
  const klr = KLr.toFixed(0)
  if (ratio !== null && ratio >= 1) {
    return `Caution: the load exceeds the elastic buckling (Euler) load (P/Pe = ${ratio.toFixed(2)}, KL/r = ${klr}). The member would buckle; the cross-section stresses shown do not apply.`
  }
  if (ratio !== null && ratio > EULER_RATIO_CAUTION) {
    return `Caution: the load is ${(ratio * 100).toFixed(0)} % of the Euler load (KL/r = ${klr}). Second-order effects and buckling may govern; the short-column stresses shown may be unsafe. Check member stability to the governing code.`
  }
  if (KLr > SLENDERNESS_NOTE_KLR) {
    return `Note: KL/r = ${klr} exceeds ${SLENDERNESS_NOTE_KLR}; the short-column assumption may not hold. Check member stability to the governing code.`
  }
  return null
}

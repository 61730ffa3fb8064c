import type { InertiaLike } from './stress'

/** KL/r above which a note says the short-column assumption may not hold (a caution, not a code limit). */
export const SLENDERNESS_NOTE_KLR = 50
/** P / P_euler above which a stronger caution is given (a caution, not a code limit). */
export const EULER_RATIO_CAUTION = 0.1

/** Slenderness of a member: r_min (mm), I_min (mm⁴), KL/r (-), Euler load (N), P / P_euler (-), and a caution. */
export interface SlendernessResult {
  Imin: number | null
  rMin: number | null
  KLr: number | null
  eulerLoad: number | null
  /** P / P_euler for a compressive P (N, compression-positive); null when P <= 0 or the Euler load is unknown. */
  ratio: number | null
  warning: string | null
}

/**
 * Slenderness check for the short-column assumption (notes §9): I_min is the minor principal moment
 * from Ixx, Iyy, Ixy (mm⁴), r_min = sqrt(I_min / A), KL/r with effectiveLength KL (mm), Euler load
 * π²·E·I_min/(KL)² (N) with E (MPa; the reference E for an equivalent section), and P (N, compression-positive).
 * Invalid input gives nulls and a message in `warning`, never NaN.
 */
export function slenderness(props: Pick<InertiaLike, 'area' | 'Ixx' | 'Iyy' | 'Ixy'>, E: number, effectiveLength: number, P: number): SlendernessResult {
  const none = { Imin: null, rMin: null, KLr: null, eulerLoad: null, ratio: null }
  const { area, Ixx, Iyy, Ixy } = props
  const half = (Ixx - Iyy) / 2
  const Imin = (Ixx + Iyy) / 2 - Math.hypot(half, Ixy)
  if (!(area > 0) || !Number.isFinite(Imin) || !(Imin > 0)) {
    return { ...none, warning: 'The section has no bending stiffness about its minor axis, so slenderness cannot be assessed.' }
  }
  const rMin = Math.sqrt(Imin / area)
  if (!(effectiveLength > 0) || !Number.isFinite(effectiveLength)) {
    return { ...none, Imin, rMin, warning: 'Give a positive effective length KL (mm) to assess slenderness.' }
  }
  if (!(E > 0) || !Number.isFinite(E)) {
    return { ...none, Imin, rMin, KLr: effectiveLength / rMin, warning: 'Give a positive modulus E (MPa) to compute the Euler load.' }
  }
  const KLr = effectiveLength / rMin
  const eulerLoad = (Math.PI * Math.PI * E * Imin) / (effectiveLength * effectiveLength)
  const ratio = P > 0 && Number.isFinite(P) ? P / eulerLoad : null
  return { Imin, rMin, KLr, eulerLoad, ratio, warning: caution(KLr, ratio) }
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

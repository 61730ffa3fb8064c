import { fromDisplay, toDisplay, type UnitSystem } from '../editor/units'

const STEPS = [1, 2, 5] as const

/** True when `v` (> 0) is a 1-2-5 step: 1, 2, 5 times a power of ten (to 1e-9 relative). */
export function isNiceStep(v: number): boolean {
  if (!(v > 0) || !Number.isFinite(v)) return false
  const exp = Math.floor(Math.log10(v) + 1e-12)
  const m = v / 10 ** exp
  return STEPS.some(s => Math.abs(m - s) <= 1e-9 * s)
}

/** The 1-2-5 step nearest to `v` (> 0) on a log scale: 0.3937 → 0.5, 12.7 → 10. */
export function nearestNiceStep(v: number): number {
  const exp = Math.floor(Math.log10(v))
  let best = 1
  let bestD = Infinity
  for (const e of [exp - 1, exp, exp + 1]) {
    for (const s of STEPS) {
      const c = s * 10 ** e
      const d = Math.abs(Math.log(c / v))
      if (d < bestD) { bestD = d; best = Number(c.toPrecision(12)) }
    }
  }
  return best
}

/**
 * The grid (mm) after the display units change from `from` to `to`: a 1-2-5 step of the old unit
 * becomes the nearest 1-2-5 step of the new one (10 mm ↔ 0.5 in, 1 in ↔ 20 mm), a pairing that is
 * its own inverse, so SI → US → SI gives the grid back; any other grid keeps its length.
 */
export function gridForUnits(gridMm: number, from: UnitSystem, to: UnitSystem): number {
  if (from === to || !isNiceStep(toDisplay(gridMm, 'length', from))) return gridMm
  return fromDisplay(nearestNiceStep(toDisplay(gridMm, 'length', to)), 'length', to)
}

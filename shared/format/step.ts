/**
 * The smallest "nice" step m × 10ⁿ at least `min` (m from `mantissas`, ascending in [1, 10)): 1, 2, 5
 * for grid lines and the scale bar; 1, 2, 2.5, 5 for isoline spacing. 1 for a zero or invalid `min`.
 */
export function niceStep(min: number, mantissas: readonly number[] = [1, 2, 5]): number {
  if (!(min > 0) || !Number.isFinite(min)) return 1
  const base = 10 ** Math.floor(Math.log10(min))
  for (const m of [...mantissas, 10]) if (m * base >= min * (1 - 1e-12)) return Number((m * base).toPrecision(12))
  return 10 * base
}

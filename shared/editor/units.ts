/**
 * Display units. The model is always mm, N, MPa, N·mm; these helpers convert for display only.
 * Factors from NIST Special Publication 811 (2008), Appendix B: 1 in = 25.4 mm exactly,
 * 1 ft = 304.8 mm, 1 lbf = 4.448 221 615 260 5 N exactly, 1 kip = 1000 lbf,
 * 1 psi = 6 894.757 293 168 Pa.
 */

/** The two display systems: SI (mm, kN, MPa) and US customary (in, kip, ksi). */
export type UnitSystem = 'SI' | 'US'

/** What a number measures, which fixes its display unit. */
export type Quantity = 'length' | 'area' | 'modulus' | 'inertia' | 'force' | 'stress' | 'moment' | 'massPerLength' | 'angle'

/** mm per inch (NIST SP 811, exact). */
export const MM_PER_IN = 25.4
/** mm per foot (NIST SP 811, exact). */
export const MM_PER_FT = 304.8
/** N per pound-force (NIST SP 811, exact). */
export const N_PER_LBF = 4.4482216152605
/** N per kip (1000 lbf). */
export const N_PER_KIP = 1000 * N_PER_LBF
/** MPa per ksi: 6 894.757 293 168 Pa per psi × 1000 / 1e6 (NIST SP 811). */
export const MPA_PER_KSI = 6.894757293168
/** kg/m per lb/ft: 0.453 592 37 kg per lb (exact) / 0.3048 m per ft. */
export const KGM_PER_LBFT = 0.45359237 / 0.3048

interface UnitDef { unit: string; factor: number }

// factor = model units per display unit (divide a model value by it to display).
const TABLE: Record<UnitSystem, Record<Quantity, UnitDef>> = {
  SI: {
    length: { unit: 'mm', factor: 1 },
    area: { unit: 'mm²', factor: 1 },
    modulus: { unit: 'mm³', factor: 1 },
    inertia: { unit: 'mm⁴', factor: 1 },
    force: { unit: 'kN', factor: 1000 },
    stress: { unit: 'MPa', factor: 1 },
    moment: { unit: 'kN·m', factor: 1e6 },
    massPerLength: { unit: 'kg/m', factor: 1 },
    angle: { unit: '°', factor: 1 },
  },
  US: {
    length: { unit: 'in', factor: MM_PER_IN },
    area: { unit: 'in²', factor: MM_PER_IN ** 2 },
    modulus: { unit: 'in³', factor: MM_PER_IN ** 3 },
    inertia: { unit: 'in⁴', factor: MM_PER_IN ** 4 },
    force: { unit: 'kip', factor: N_PER_KIP },
    stress: { unit: 'ksi', factor: MPA_PER_KSI },
    moment: { unit: 'kip·ft', factor: N_PER_KIP * MM_PER_FT },
    massPerLength: { unit: 'lb/ft', factor: KGM_PER_LBFT },
    angle: { unit: '°', factor: 1 },
  },
}

/** The display unit label of a quantity in a system, e.g. unitLabel('inertia', 'US') = 'in⁴'. */
export function unitLabel(q: Quantity, system: UnitSystem): string {
  return TABLE[system][q].unit
}

/** A model value (mm, N, MPa, N·mm, kg/m) converted to the display unit of `system`. */
export function toDisplay(value: number, q: Quantity, system: UnitSystem): number {
  return value / TABLE[system][q].factor
}

/** A value typed in the display unit of `system` converted back to model units (mm, N, MPa...). */
export function fromDisplay(value: number, q: Quantity, system: UnitSystem): number {
  return value * TABLE[system][q].factor
}

/**
 * A model value formatted for display with its unit: four significant digits, switching to
 * "1.234 × 10⁶" notation beyond 1e6 or below 1e-3 so large inertias stay readable.
 */
export function formatQuantity(value: number | null | undefined, q: Quantity, system: UnitSystem, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—'
  return `${formatNumber(toDisplay(value, q, system), digits)} ${unitLabel(q, system)}`
}

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', 0: '⁰', 1: '¹', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶', 7: '⁷', 8: '⁸', 9: '⁹' }

/** A plain number with `digits` significant digits; scientific "× 10ⁿ" outside [1e-3, 1e6). */
export function formatNumber(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return '—'
  if (v === 0) return '0'
  const a = Math.abs(v)
  if (a >= 1e6 || a < 1e-3) {
    const exp = Math.floor(Math.log10(a))
    const mant = v / 10 ** exp
    const sup = String(exp).split('').map(c => SUPERSCRIPT[c] ?? c).join('')
    return `${Number(mant.toPrecision(digits))} × 10${sup}`
  }
  // Keep at least the integer digits: 12 345 mm² stays 12345, not 1.235e4.
  const intDigits = Math.max(1, Math.floor(Math.log10(a)) + 1)
  return String(Number(v.toPrecision(Math.max(digits, intDigits))))
}

/** A length in mm written for an input box in the display unit (up to 6 decimals, no trailing zeros). */
export function lengthForInput(mm: number, system: UnitSystem): string {
  return String(Number(toDisplay(mm, 'length', system).toFixed(6)))
}

/**
 * `v`, or 0 when it is only round-off relative to `scale` (below scale × 1e-10): the centroid of a
 * symmetric section is 0 mm, not 4e-15 mm.
 */
export function cleanZero(v: number, scale: number): number {
  return Math.abs(v) <= Math.abs(scale) * 1e-10 ? 0 : v
}

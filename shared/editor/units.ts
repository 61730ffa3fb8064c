import { KGM_PER_LBFT, MM_PER_FT, MM_PER_IN, MPA_PER_KSI, N_PER_KIP } from '../format/units'
import { formatNumber } from '../format/number'

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

export { MM_PER_IN, MM_PER_FT, N_PER_LBF, N_PER_KIP, MPA_PER_KSI, KGM_PER_LBFT } from '../format/units'
/** The one display formatter (shared/format/number), re-exported for the editor's callers. */
export { formatNumber }

/** The area and second-moment display units the trade uses; null in the settings follows the unit system. */
export type AreaUnit = 'mm2' | 'cm2' | 'm2' | 'in2'
/** Second-moment display units (mm⁴, cm⁴, m⁴, in⁴). */
export type InertiaUnit = 'mm4' | 'cm4' | 'm4' | 'in4'

/** The display choices: the unit system and, optionally, the area and inertia units (null = the system's). */
export interface UnitPrefs {
  readonly units: UnitSystem
  readonly areaUnit?: AreaUnit | null
  readonly inertiaUnit?: InertiaUnit | null
}

/** A unit system alone or with the area and inertia choices (the sketch settings fit). */
export type Units = UnitSystem | UnitPrefs

interface UnitDef { unit: string; factor: number }

const POW: Record<string, { unit: string; mm: number }> = { mm: { unit: 'mm', mm: 1 }, cm: { unit: 'cm', mm: 10 }, m: { unit: 'm', mm: 1000 }, in: { unit: 'in', mm: MM_PER_IN } }

/** The unit of `q` under `units`: the area unit for areas, the inertia unit for second moments and (its length cubed) for moduli. */
function def(q: Quantity, units: Units): UnitDef {
  if (typeof units === 'string') return TABLE[units][q]
  const a = units.areaUnit ? POW[units.areaUnit.slice(0, -1)] : null
  const i = units.inertiaUnit ? POW[units.inertiaUnit.slice(0, -1)] : null
  if (q === 'area' && a) return { unit: `${a.unit}²`, factor: a.mm ** 2 }
  if (q === 'inertia' && i) return { unit: `${i.unit}⁴`, factor: i.mm ** 4 }
  if (q === 'modulus' && i) return { unit: `${i.unit}³`, factor: i.mm ** 3 }
  return TABLE[units.units][q]
}

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
export function unitLabel(q: Quantity, system: Units): string {
  return def(q, system).unit
}

/** A model value (mm, N, MPa, N·mm, kg/m) converted to the display unit of `system`. */
export function toDisplay(value: number, q: Quantity, system: Units): number {
  return value / def(q, system).factor
}

/** A value typed in the display unit of `system` converted back to model units (mm, N, MPa...). */
export function fromDisplay(value: number, q: Quantity, system: Units): number {
  return value * def(q, system).factor
}

/**
 * A model value formatted for display with its unit (shared/format/number: four significant digits,
 * exponents in steps of three beyond 1e6 or below 1e-3: "159.1 × 10⁶ mm⁴").
 */
export function formatQuantity(value: number | null | undefined, q: Quantity, system: Units, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—'
  return `${formatNumber(toDisplay(value, q, system), digits)} ${unitLabel(q, system)}`
}

/** A length in mm written for an input box in the display unit (up to 6 decimals, no trailing zeros). */
export function lengthForInput(mm: number, system: Units): string {
  // Rounded to 6 decimals, then every remaining digit kept: the box shows what parseQuantity reads back.
  return formatNumber(Number(toDisplay(mm, 'length', system).toFixed(6)), { digits: 15 })
}

/**
 * `v`, or 0 when it is only round-off relative to `scale` (below scale × 1e-10): the centroid of a
 * symmetric section is 0 mm, not 4e-15 mm.
 */
export function cleanZero(v: number, scale: number): number {
  return Math.abs(v) <= Math.abs(scale) * 1e-10 ? 0 : v
}

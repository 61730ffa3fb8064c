import { scaleLinear } from 'd3-scale'
import { MM_PER_IN, N_PER_KIP, toDisplay, unitLabel, type Quantity, type Units, type UnitSystem } from '../editor/units'
import { formatNumber } from '../format/number'

/**
 * Stress colours: compression dark blue-violet, tension ochre, a light neutral at zero. The two hues
 * differ in lightness as well (CIE L* about 31 against 69), so they stay apart in greyscale and for
 * red-green colour-blind readers. Values from tailwind.config.ts (comp, tens) so CSS and canvas agree.
 */
export const STRESS_COLOURS = {
  compression: '#3a3f9e',
  compressionLight: '#b9c2ea',
  neutral: '#f4f3ee',
  tensionLight: '#f7e2b0',
  tension: '#d59a1c',
} as const

export type { UnitSystem }

/** Display units: labels and the factor that turns an internal value (MPa, N, mm, N/mm, N·mm) into it. */
export interface DisplayUnits {
  readonly system: UnitSystem
  readonly stress: { readonly label: string; readonly perMPa: number }
  readonly force: { readonly label: string; readonly perN: number }
  readonly length: { readonly label: string; readonly perMm: number }
  /** Force per unit length (shear flow): N/mm shown as kN/m (numerically equal) or kip/in. */
  readonly flow: { readonly label: string; readonly perNPerMm: number }
  readonly moment: { readonly label: string; readonly perNmm: number }
  /** Areas (mm²), section moduli (mm³) and second moments (mm⁴) in the chosen units (settings areaUnit, inertiaUnit). */
  readonly area: { readonly label: string; readonly perMm2: number }
  readonly modulus: { readonly label: string; readonly perMm3: number }
  readonly inertia: { readonly label: string; readonly perMm4: number }
}

/**
 * SI shows kN, MPa, mm, kN/m, kN·m; US shows kip, ksi, in, kip/in, kip·ft. Factors from the editor's
 * units module (NIST SP 811, README "Method"), so the stress view and the property panel agree.
 */
export function displayUnits(units: Units): DisplayUnits {
  const system = typeof units === 'string' ? units : units.units
  const per = (q: Quantity) => ({ label: unitLabel(q, units), factor: toDisplay(1, q, units) })
  const stress = per('stress')
  const force = per('force')
  const length = per('length')
  const moment = per('moment')
  return {
    system,
    stress: { label: stress.label, perMPa: stress.factor },
    force: { label: force.label, perN: force.factor },
    length: { label: length.label, perMm: length.factor },
    flow: system === 'US' ? { label: 'kip/in', perNPerMm: MM_PER_IN / N_PER_KIP } : { label: 'kN/m', perNPerMm: 1 },
    moment: { label: moment.label, perNmm: moment.factor },
    area: { label: per('area').label, perMm2: per('area').factor },
    modulus: { label: per('modulus').label, perMm3: per('modulus').factor },
    inertia: { label: per('inertia').label, perMm4: per('inertia').factor },
  }
}

/** The one display formatter (shared/format/number), re-exported for the stress view's callers. */
export { formatNumber }

/** Coordinates closer to zero than this (mm, a nanometre) are rounding noise of the mechanics and read 0. */
const POINT_ZERO_MM = 1e-6

/** A point (mm) in display units, "(x, y)" with 4 significant digits; rounding noise reads 0, not 6.1e−14. */
export function formatPoint(x: number, y: number, units: DisplayUnits): string {
  const f = (v: number): string => formatNumber(Math.abs(v) < POINT_ZERO_MM ? 0 : v * units.length.perMm, 4)
  return `(${f(x)}, ${f(y)})`
}

/**
 * A stress (MPa, tension positive) as a display string with its C/T letter and unit:
 * "12.4 MPa C" for −12.4 MPa. Values within `zeroTol` MPa of zero read "0 MPa".
 */
export function formatStress(valueMPa: number, units: DisplayUnits, zeroTol = 1e-9): string {
  if (!Number.isFinite(valueMPa)) return '–'
  if (Math.abs(valueMPa) <= zeroTol) return `0 ${units.stress.label}`
  return `${formatNumber(Math.abs(valueMPa) * units.stress.perMPa, 3)} ${units.stress.label} ${valueMPa < 0 ? 'C' : 'T'}`
}

/** A diverging colour scale of stress (MPa, tension positive): maps a value to a CSS colour. */
export interface StressScale {
  (valueMPa: number): string
  /** Symmetric half-range (MPa): −limit is full compression colour, +limit full tension colour. */
  readonly limit: number
}

/**
 * The diverging scale (d3-scale, linear in sRGB between five stops) over [−limit, +limit] MPa:
 * compression → light compression → neutral (0) → light tension → tension. Symmetric so zero is
 * always the neutral colour; values beyond the limit clamp. A zero or invalid limit becomes 1 MPa.
 * `c` is the ramp: the light one by default, the dark canvas passes its own (shared/canvas/palette).
 */
export function stressScale(limitMPa: number, c: Readonly<Record<keyof typeof STRESS_COLOURS, string>> = STRESS_COLOURS): StressScale {
  const limit = Number.isFinite(limitMPa) && limitMPa > 0 ? limitMPa : 1
  const s = scaleLinear<string>()
    .domain([-limit, -limit / 2, 0, limit / 2, limit])
    .range([c.compression, c.compressionLight, c.neutral, c.tensionLight, c.tension])
    .clamp(true)
  const fn = ((v: number) => s(v)) as StressScale
  Object.defineProperty(fn, 'limit', { value: limit })
  return fn
}

/** The scale's stop values (MPa) in increasing order, for exact gradients: −L, −L/2, 0, L/2, L. */
export function scaleStops(scale: StressScale): readonly number[] {
  const L = scale.limit
  return [-L, -L / 2, 0, L / 2, L]
}

/** A legend tick: the value (MPa, tension positive), its label in display units with C/T, its colour. */
export interface LegendTick {
  readonly value: number
  readonly label: string
  readonly colour: string
}

/**
 * Legend ticks at round values covering [minMPa, maxMPa] (the field's actual range), always including
 * 0 when the range spans it; labels in the chosen units with C or T (never sign alone).
 */
export function legendTicks(scale: StressScale, minMPa: number, maxMPa: number, units: DisplayUnits, count = 6): LegendTick[] {
  const lo = Math.min(minMPa, maxMPa, 0)
  const hi = Math.max(minMPa, maxMPa, 0)
  const s = scaleLinear().domain([lo * units.stress.perMPa, hi * units.stress.perMPa])
  const values = s.ticks(count).map(v => v / units.stress.perMPa)
  if (lo < 0 && hi > 0 && !values.some(v => Math.abs(v) < 1e-12)) values.push(0)
  values.sort((a, b) => a - b)
  return values.map(v => ({ value: v, label: formatStress(v, units, 1e-12 * Math.max(1, hi - lo)), colour: scale(v) }))
}

/** CIE L* (0 black – 100 white) of a #rrggbb colour, for the lightness check of the two hues. */
export function lightness(hex: string): number {
  const [r, g, b] = hexToLinear(hex)
  const Y = 0.2126 * r + 0.7152 * g + 0.0722 * b
  return Y > 216 / 24389 ? 116 * Math.cbrt(Y) - 16 : (24389 / 27) * Y
}

/** Linear-light RGB (0–1) of a #rrggbb colour. */
export function hexToLinear(hex: string): [number, number, number] {
  const h = hex.replace('#', '')
  const ch = (i: number) => {
    const v = parseInt(h.slice(i, i + 2), 16) / 255
    return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4
  }
  return [ch(0), ch(2), ch(4)]
}

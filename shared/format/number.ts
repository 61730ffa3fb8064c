/**
 * The one display formatter of numbers (README "Numbers: display and input"). Every panel, label
 * and input box writes numbers through `formatNumber`, so digits, exponent style and minus sign
 * agree everywhere, and `parseNumber` (./parse) reads back whatever is shown here.
 *
 * Style: significant digits with no trailing zeros (5, not 5.00000); the true minus sign U+2212;
 * values at or below `zeroBelow` in magnitude read 0 (round-off of the mechanics: 1.5e-13 N/mm is 0);
 * from 10⁶ up and below 10⁻³ an exponent in steps of three as the trade writes them, the mantissa
 * in [1, 1000): 159.1 × 10⁶. Integers below 10⁶ keep all their digits (12345 stays 12345).
 */

/** The true minus sign (U+2212) used in displayed numbers. */
export const MINUS = '\u2212'

/** Magnitudes at or below this are round-off and display as 0 (display units, default). */
export const ZERO_BELOW = 1e-9

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', 0: '⁰', 1: '¹', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶', 7: '⁷', 8: '⁸', 9: '⁹' }

/** An integer exponent written in superscript digits: 6 → "⁶", −3 → "⁻³". */
export function superscript(n: number): string {
  return String(n).split('').map(c => SUPERSCRIPT[c] ?? c).join('')
}

/** Options of `formatNumber`: significant digits and the magnitude that reads as zero. */
export interface FormatOptions {
  /** Significant digits (default 4). */
  readonly digits?: number
  /** |v| at or below this reads 0 (default ZERO_BELOW = 1e-9, in the unit being shown). */
  readonly zeroBelow?: number
}

/**
 * `v` written with `digits` significant digits (no trailing zeros, U+2212 for minus, 0 for
 * round-off), with an exponent in steps of three outside [10⁻³, 10⁶): "159.1 × 10⁶", "2.5 × 10⁻⁶".
 * A dash for a non-finite value. The second argument may be the digit count or FormatOptions.
 */
export function formatNumber(v: number, options: number | FormatOptions = {}): string {
  const opts: FormatOptions = typeof options === 'number' ? { digits: options } : options
  const digits = Math.max(1, Math.min(15, Math.round(opts.digits ?? 4)))
  if (!Number.isFinite(v)) return '—'
  const a = Math.abs(v)
  if (a <= (opts.zeroBelow ?? ZERO_BELOW)) return '0'
  const sign = v < 0 ? MINUS : ''
  let exp = Math.floor(Math.log10(a))
  // Rounding may carry into the next decade (999 999.9 at 4 digits is 1.000 × 10⁶).
  const rounded = Number(a.toPrecision(digits))
  exp = Math.floor(Math.log10(rounded))
  if (rounded >= 1e6 || rounded < 1e-3) {
    let e3 = Math.floor(exp / 3) * 3
    let mant = Number((rounded / 10 ** e3).toPrecision(digits))
    if (mant >= 1000) { e3 += 3; mant = Number((mant / 1000).toPrecision(digits)) }
    return `${sign}${plain(mant)} × 10${superscript(e3)}`
  }
  // Keep at least the integer digits: 12 345 mm² stays 12345, not 1.235 × 10⁴.
  const intDigits = Math.max(1, exp + 1)
  return sign + plain(Number(a.toPrecision(Math.max(digits, intDigits))))
}

/** A non-negative number in plain positional notation (no "e"), no trailing zeros. */
function plain(a: number): string {
  const s = String(a)
  if (!/e/i.test(s)) return s
  // String() switches to exponent form below 1e-6; toFixed with enough places keeps it positional.
  return a.toFixed(20).replace(/0+$/, '').replace(/\.$/, '')
}

/**
 * A value for an input box: `formatNumber` with 6 significant digits by default, so what the box
 * shows parses back (parseNumber) to the value within its displayed precision. `decimals` rounds
 * first to that many places (a vertex at 1.2e-14 mm of round-off shows 0, not 12 × 10⁻¹⁵) and
 * writes values below 10⁶ positionally (0.00001).
 */
export function formatForInput(v: number | null | undefined, digits = 6, decimals?: number): string {
  if (v === null || v === undefined) return ''
  if (decimals !== undefined && Number.isFinite(v)) {
    v = Number(v.toFixed(decimals))
    // Below 10⁶ a rounded coordinate is written out (0.00001, not 10 × 10⁻⁶): it reads like the rest of its column.
    if (Math.abs(v) < 1e6) return v === 0 ? '0' : (v < 0 ? MINUS : '') + plain(Number(Math.abs(v).toPrecision(Math.min(15, digits))))
  }
  // No zero cut-off here: a value typed into a box comes back exactly as typed.
  return formatNumber(v, { digits, zeroBelow: 0 })
}

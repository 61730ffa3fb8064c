import { formatNumber } from './number'
import { findUnit, kindOfUnit, KIND_WORDS, type UnitKind } from './units'

/**
 * The one parser of what a user types into a numeric field (README "Numbers: display and input").
 * It reads back everything `formatNumber` shows (U+2212 minus, "159.1 × 10⁶") and what people type:
 * "-5", "−5", "1.5e6", "1,5" (a comma that cannot be a thousands separator is a decimal mark),
 * "1,234.5" and "12 345" (grouped thousands), and a unit suffix: the field's own unit, or another
 * unit of the same kind, converted. Anything else is refused with a message saying why.
 */

/** The outcome of parsing: the value in model units (mm, N, MPa, N·mm...) or a message. */
export type ParseResult =
  | { readonly ok: true; readonly value: number; readonly unit: string | null }
  | { readonly ok: false; readonly message: string }

const SUP_DIGITS: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-', '⁺': '+' }
const MINUSES = /[\u2212\u2012\u2013\uFE63\uFF0D]/g
const SPACES = /[\u00A0\u2007\u2009\u202F]/g

const fail = (message: string): ParseResult => ({ ok: false, message })

/**
 * A plain number from `text` with no unit: see the module note for what is accepted. Returns the
 * number, or a message naming what was typed and why it is not a number.
 */
export function parseNumber(text: string): { ok: true; value: number } | { ok: false; message: string } {
  const r = splitNumber(text)
  if (!r.ok) return r
  if (r.rest !== '') return { ok: false, message: `“${text.trim()}” is not a number.` }
  return { ok: true, value: r.value }
}

/** Splits "150 kN" into 150 and "kN". */
function splitNumber(text: string): { ok: true; value: number; rest: string } | { ok: false; message: string } {
  const shown = text.trim()
  let s = shown.replace(MINUSES, '-').replace(SPACES, ' ')
  // "× 10⁶", "x 10^6", "·10^-3", "*10^6" → e6
  s = s.replace(/\s*[×xX·*]\s*10\s*(\^\s*[+-]?\d+|[⁺⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+)/, (_, e: string) => `e${e.replace(/\^\s*/, '').replace(/[⁰-⁹⁺⁻¹²³]/g, c => SUP_DIGITS[c] ?? c)}`)
  const m = /^([+-]?)\s*((?:\d[\d ,.]*)?\d|[.,]\d+)(?:\s*[eE]\s*([+-]?\d+))?(.*)$/.exec(s)
  if (shown === '') return { ok: false, message: 'Type a number.' }
  if (!m) return { ok: false, message: `“${shown}” is not a number.` }
  const [, sign, body, exp, rest] = m as unknown as [string, string, string, string | undefined, string]
  const mantissa = readMantissa(body!, shown)
  if (typeof mantissa !== 'string') return { ok: false, message: mantissa.error }
  const value = Number(`${sign}${mantissa}${exp !== undefined ? `e${exp}` : ''}`)
  if (!Number.isFinite(value)) return { ok: false, message: `“${shown}” is too large.` }
  return { ok: true, value, rest: rest.trim() }
}

/** The digits of `body` with "." as the only decimal mark, or a message why it is ambiguous or malformed. */
function readMantissa(body: string, shown: string): string | { error: string } {
  const grouped = (intPart: string, sep: string): string | null => {
    const groups = intPart.split(sep)
    const ok = groups.length > 1 && /^[1-9]\d{0,2}$/.test(groups[0]!) && groups.slice(1).every(g => /^\d{3}$/.test(g))
    return ok ? groups.join('') : null
  }
  const hasComma = body.includes(',')
  const dots = body.split('.').length - 1
  const spaced = body.includes(' ')
  if (spaced && hasComma) return bad(`“${shown}” mixes spaces and commas between its digits: type it as 1234.5.`)
  if (dots > 1) return bad(grouped(body, '.') ? `“${shown}” uses dots between groups of three digits: type it without them, with a dot as the decimal mark (1234.5).` : `“${shown}” has more than one decimal mark.`)
  if (hasComma && dots === 1) {
    // 1,234.5: the commas group thousands before the decimal dot.
    const [intPart, frac] = body.split('.') as [string, string]
    if (intPart.includes(',')) {
      const g = grouped(intPart, ',')
      if (g !== null && !frac.includes(',')) return `${g}.${frac}`
    }
    return bad(`“${shown}” mixes commas and a dot in a way that can be read two ways: use a dot as the decimal mark and no thousands separator (1234.5).`)
  }
  if (hasComma) {
    const parts = body.split(',')
    if (parts.length > 2) {
      const g = grouped(body, ',')
      return g ?? bad(`“${shown}” has more than one comma: use a dot as the decimal mark.`)
    }
    const [intPart, frac] = parts as [string, string]
    // A comma followed by exactly three digits after a group that could lead (1,500) may be a
    // thousands separator: 1500 or 1.5? Refuse rather than guess.
    if (/^[1-9]\d{0,2}$/.test(intPart) && /^\d{3}$/.test(frac)) {
      return bad(`“${shown}” can be read two ways: the comma may separate thousands (${intPart}${frac}) or mark the decimals (${intPart}.${frac}). Type ${intPart}${frac} or ${intPart}.${frac}.`)
    }
    if (intPart.includes(' ')) return bad(`“${shown}” is not a number.`)
    return `${intPart === '' ? '0' : intPart}.${frac}`
  }
  if (spaced) {
    const [intPart, frac] = body.split('.') as [string, string | undefined]
    const g = grouped(intPart, ' ')
    if (g === null || (frac !== undefined && frac.includes(' '))) return bad(`“${shown}” has spaces that are not between groups of three digits.`)
    return frac === undefined ? g : `${g}.${frac}`
  }
  return body
}

const bad = (error: string) => ({ error })

/** What a field accepts: the kind of quantity, the field's own unit (label), and limits. */
export interface FieldSpec {
  readonly kind: UnitKind
  /** The unit the field shows its value in, e.g. "kN"; a bare number is in this unit. Ignored for 'factor'. */
  readonly unit?: string
  /** The value must be > 0 (after conversion). */
  readonly positive?: boolean
  /** The value must be >= 0. */
  readonly nonNegative?: boolean
  /** Bounds in the field's own unit, inclusive. */
  readonly min?: number
  readonly max?: number
  /** What the field is, for messages ("The grid"); defaults to "The value". */
  readonly name?: string
}

/**
 * Parses a field's text into model units (mm, N, MPa, N·mm, kg/m³...): a bare number is in the
 * field's own unit; a unit of the same kind is converted (0.5 m in a mm field is 500 mm; 25 ksi in
 * an MPa field is 172.4 MPa); a unit of another kind, an unknown word, or a value out of bounds is
 * refused with a message that says what was typed and what the field expects.
 */
export function parseQuantity(text: string, spec: FieldSpec): ParseResult {
  const r = splitNumber(text)
  if (!r.ok) return r
  const shown = text.trim()
  const name = spec.name ?? 'The value'
  let factor = 1
  let unitLabel: string | null = null
  const own = spec.kind === 'factor' ? null : findUnit(spec.kind, spec.unit ?? '')
  const ownFactor = own?.factor ?? 1
  if (r.rest !== '') {
    if (spec.kind === 'factor') return fail(`“${shown}” is not a plain number: ${name.toLowerCase()} takes no unit.`)
    const u = findUnit(spec.kind, r.rest)
    if (!u) {
      const other = kindOfUnit(r.rest)
      const expect = spec.unit ? `type a number in ${spec.unit}, or with a unit of ${KIND_WORDS[spec.kind]}` : `use a unit of ${KIND_WORDS[spec.kind]}`
      return fail(other ? `“${shown}” is ${KIND_WORDS[other]}, not ${KIND_WORDS[spec.kind]}: ${expect}.` : `“${r.rest}” is not a unit this field knows: ${expect}.`)
    }
    factor = u.factor
    unitLabel = u.label
  } else {
    factor = ownFactor
  }
  const value = r.value * factor
  const inOwn = value / ownFactor
  const suffix = spec.unit && spec.kind !== 'factor' ? ` ${spec.unit}` : ''
  if (spec.positive && !(value > 0)) return fail(`${name} must be positive (you typed “${shown}”).`)
  if (spec.nonNegative && value < 0) return fail(`${name} cannot be negative (you typed “${shown}”).`)
  if (spec.min !== undefined && inOwn < spec.min) return fail(`${name} must be at least ${formatNumber(spec.min)}${suffix} (you typed “${shown}”).`)
  if (spec.max !== undefined && inOwn > spec.max) return fail(`${name} must be at most ${formatNumber(spec.max)}${suffix} (you typed “${shown}”).`)
  return { ok: true, value, unit: unitLabel }
}

/** `parseQuantity`'s value in model units, or NaN when refused: for callers that already test isFinite. */
export function parseOrNaN(text: string, spec: FieldSpec): number {
  const r = parseQuantity(text, spec)
  return r.ok ? r.value : Number.NaN
}

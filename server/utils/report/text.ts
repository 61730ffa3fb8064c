import { formatNumber, toDisplay, unitLabel, type Quantity, type Units } from '../../../shared/editor/units'

// The PDF embeds the Latin subset of IBM Plex: superscripts beyond ³ and Greek or maths signs are
// spelled out so no glyph goes missing (a missing glyph prints as a blank box).
const SPELL: Record<string, string> = {
  '⁰': '^0', '⁴': '^4', '⁵': '^5', '⁶': '^6', '⁷': '^7', '⁸': '^8', '⁹': '^9', '⁻': '^-', 'σ': 'sigma', 'θ': 'theta', 'τ': 'tau', 'ω': 'omega', 'ν': 'nu',
  '√': 'sqrt', '≥': '>=', '≤': '<=', '≠': '!=', 'π': 'pi', 'Σ': 'sum ', '∫': 'int ', '⅙': '1/6', '⁄': '/', '≈': '~', '→': '->', '±': '±',
}

/** Text made printable in the embedded Latin fonts (see SPELL). */
export function pdfText(s: string): string {
  const plain = (run: string) => run.replace(/[⁰¹²³⁴-⁹⁻]/g, c => ('⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c) >= 0 ? String('⁰¹²³⁴⁵⁶⁷⁸⁹'.indexOf(c)) : '-'))
  // An exponent of ten ("× 10⁻¹⁴") becomes "× 10^-14"; a unit's ² and ³ stay (they are in Latin-1).
  s = s.replace(/10([⁰¹²³⁴-⁹⁻]+)/g, (_m, run: string) => `10^${plain(run)}`)
  return s.replace(/[⁰⁴-⁹⁻σθτων√≥≤≠πΣ∫⅙⁄≈→]/g, c => SPELL[c] ?? c)
}

/** A model value (mm, N, MPa, N·mm…) in the sheet's unit system, four significant digits and its unit. */
export function q(value: number | null | undefined, quantity: Quantity, system: Units, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—'
  return pdfText(`${formatNumber(toDisplay(value, quantity, system), digits)} ${unitLabel(quantity, system)}`)
}

/** A value in display units without its unit (for table cells under a unit heading). */
export function v(value: number | null | undefined, quantity: Quantity, system: Units, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—'
  return pdfText(formatNumber(toDisplay(value, quantity, system), digits))
}

/** The unit label of a quantity, printable. */
export function u(quantity: Quantity, system: Units): string {
  return pdfText(unitLabel(quantity, system))
}

/** A stress (MPa model value, tension-positive) with its C or T. */
export function stressCT(value: number, system: Units): string {
  if (!Number.isFinite(value)) return '—'
  const tag = Math.abs(value) < 1e-9 ? '' : value < 0 ? ' C' : ' T'
  return `${v(Math.abs(value), 'stress', system)}${tag}`
}

/**
 * The units a user may type or choose, per kind of quantity, each with its factor to the model unit
 * (mm, mm², mm³, mm⁴, N, MPa, N·mm, N/mm, kg/m³, degree). Factors from NIST Special Publication 811
 * (2008), Appendix B: 1 in = 25.4 mm and 1 ft = 0.3048 m exactly, 1 lbf = 4.448 221 615 260 5 N
 * exactly, 1 kip = 1000 lbf, 1 psi = 6 894.757 293 168 Pa, 1 lb = 0.453 592 37 kg exactly.
 */

/** What a typed or shown number measures; its model unit is fixed (see module note). */
export type UnitKind = 'length' | 'area' | 'modulus' | 'inertia' | 'force' | 'stress' | 'moment' | 'flow' | 'density' | 'massPerLength' | 'angle' | 'factor'

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
/** kg/m³ per lb/ft³: 0.453 592 37 kg / 0.3048³ m³ (NIST SP 811). */
export const KGM3_PER_LBFT3 = 0.45359237 / 0.3048 ** 3

/** A unit: its label as shown, other spellings accepted when typed, and model units per one of it. */
export interface UnitDef {
  readonly label: string
  readonly aliases?: readonly string[]
  readonly factor: number
  /** Only its exact case is accepted: mN (millinewton) is not MN. */
  readonly exactCase?: boolean
}

const len = (label: string, mm: number, power: 1 | 2 | 3 | 4): UnitDef => {
  const sup = ['', '', '²', '³', '⁴'][power]!
  return { label: `${label}${sup}`, aliases: power > 1 ? [`${label}${power}`, `${label}^${power}`] : [], factor: mm ** power }
}

/** Every unit accepted per kind; the first of each kind is its model unit (factor 1). */
export const UNITS: Record<UnitKind, readonly UnitDef[]> = {
  length: [len('mm', 1, 1), len('cm', 10, 1), len('m', 1000, 1), { label: 'in', aliases: ['"', 'inch', 'inches'], factor: MM_PER_IN }, { label: 'ft', aliases: ["'", 'foot', 'feet'], factor: MM_PER_FT }],
  area: [len('mm', 1, 2), len('cm', 10, 2), len('m', 1000, 2), len('in', MM_PER_IN, 2), len('ft', MM_PER_FT, 2)],
  modulus: [len('mm', 1, 3), len('cm', 10, 3), len('m', 1000, 3), len('in', MM_PER_IN, 3)],
  inertia: [len('mm', 1, 4), len('cm', 10, 4), len('m', 1000, 4), len('in', MM_PER_IN, 4)],
  force: [{ label: 'N', factor: 1 }, { label: 'kN', factor: 1e3 }, { label: 'MN', factor: 1e6, exactCase: true }, { label: 'kip', aliases: ['kips'], factor: N_PER_KIP }, { label: 'lbf', aliases: ['lb'], factor: N_PER_LBF }],
  stress: [{ label: 'MPa', aliases: ['N/mm²', 'N/mm2', 'N/mm^2'], factor: 1 }, { label: 'kPa', factor: 1e-3 }, { label: 'Pa', factor: 1e-6 }, { label: 'GPa', aliases: ['kN/mm²', 'kN/mm2'], factor: 1e3 }, { label: 'ksi', factor: MPA_PER_KSI }, { label: 'psi', factor: MPA_PER_KSI / 1000 }],
  moment: [{ label: 'N·mm', factor: 1 }, { label: 'N·m', factor: 1e3 }, { label: 'kN·m', factor: 1e6 }, { label: 'kN·mm', factor: 1e3 }, { label: 'MN·m', factor: 1e9, exactCase: true }, { label: 'kip·ft', factor: N_PER_KIP * MM_PER_FT }, { label: 'kip·in', factor: N_PER_KIP * MM_PER_IN }, { label: 'lbf·ft', aliases: ['lb·ft'], factor: N_PER_LBF * MM_PER_FT }, { label: 'lbf·in', aliases: ['lb·in'], factor: N_PER_LBF * MM_PER_IN }],
  flow: [{ label: 'N/mm', aliases: ['kN/m'], factor: 1 }, { label: 'kip/in', factor: N_PER_KIP / MM_PER_IN }, { label: 'kip/ft', factor: N_PER_KIP / MM_PER_FT }],
  density: [{ label: 'kg/m³', aliases: ['kg/m3', 'kg/m^3'], factor: 1 }, { label: 'lb/ft³', aliases: ['lb/ft3', 'lb/ft^3', 'pcf'], factor: KGM3_PER_LBFT3 }],
  massPerLength: [{ label: 'kg/m', factor: 1 }, { label: 'lb/ft', aliases: ['plf'], factor: KGM_PER_LBFT }],
  angle: [{ label: '°', aliases: ['deg', 'degrees'], factor: 1 }],
  factor: [],
}

/** Writes a typed unit in one spelling: no spaces, "·" for any product sign (* . - ⋅ or a space), case kept. */
export function normaliseUnit(text: string): string {
  return text.trim()
    .replace(/(?<=[A-Za-z])\s*[*.\-⋅×·\s]\s*(?=[A-Za-z])/g, '·')
    .replace(/\s+/g, '')
}

/** The unit of `kind` spelled `text` (exact spelling first, then ignoring case and the product sign), or null. */
export function findUnit(kind: UnitKind, text: string): UnitDef | null {
  const t = normaliseUnit(text)
  const all = UNITS[kind]
  const names = (u: UnitDef) => [u.label, ...(u.aliases ?? [])].map(normaliseUnit)
  const loose = (n: string, exactCase = false) => (exactCase ? n.replace(/·/g, '') : n.replace(/·/g, '').toLowerCase())
  // Exact spelling first, then ignoring case (not for MN) and the product sign (kNm, Nmm, kipft).
  return all.find(u => names(u).includes(t)) ?? all.find(u => names(u).some(n => loose(n, u.exactCase) === loose(t, u.exactCase))) ?? null
}

/** The kind a unit spelling belongs to, for the message "150 kN is a force, not a length". */
export function kindOfUnit(text: string): UnitKind | null {
  for (const kind of Object.keys(UNITS) as UnitKind[]) if (findUnit(kind, text)) return kind
  return null
}

/** Plain words for a kind, in messages. */
export const KIND_WORDS: Record<UnitKind, string> = {
  length: 'a length', area: 'an area', modulus: 'a section modulus', inertia: 'a second moment of area', force: 'a force',
  stress: 'a stress', moment: 'a moment', flow: 'a force per length', density: 'a density', massPerLength: 'a mass per length', angle: 'an angle', factor: 'a plain factor',
}

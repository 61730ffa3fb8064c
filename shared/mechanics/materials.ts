import type { Material } from './types'

/**
 * A material preset for the editor: E and fy in MPa, density in kg/m³, `noTension` for
 * materials analysed without tensile strength (cracked / partial contact). Every value is a
 * typical one: `note` says what it stands for and `source` where it comes from.
 */
export interface MaterialPreset extends Material {
  readonly key: MaterialPresetKey
  readonly name: string
  readonly E: number
  readonly density: number
  readonly noTension: boolean
  readonly note: string
  readonly source: string
}

/** Keys of MATERIAL_PRESETS. */
export type MaterialPresetKey = 'steel' | 'aluminium' | 'timber' | 'concrete' | 'masonry' | 'soil'

/**
 * Typical material values (E and fy in MPa, density kg/m³), labelled as typical: the user must
 * check them against the product data and the governing code.
 */
export const MATERIAL_PRESETS: { readonly [K in MaterialPresetKey]: MaterialPreset & { readonly key: K } } = {
  steel: {
    key: 'steel',
    name: 'Steel',
    E: 200_000,
    fy: 355,
    density: 7850,
    noTension: false,
    note: 'Structural steel; fy of grade S355 (typical, check the grade).',
    source:
      'E = 200 000 MPa: common practice (AISC 360 uses 29 000 ksi ≈ 200 000 MPa; EN 1993-1-1 §3.2.6 uses 210 000 MPa). ' +
      'fy = 355 MPa: nominal yield of S355 to EN 10025-2 for thicknesses up to 16 mm. Density 7850 kg/m³: typical handbook value.',
  },
  aluminium: {
    key: 'aluminium',
    name: 'Aluminium',
    E: 70_000,
    fy: 240,
    density: 2700,
    noTension: false,
    note: 'Aluminium alloy 6061-T6 (typical, check the alloy, temper and product form).',
    source:
      'E = 70 000 MPa: the value EN 1999-1-1 takes for aluminium alloys (the Aluminum Design Manual uses about 10 000 ksi). ' +
      'fy ≈ 240 MPa: typical minimum 0.2 % proof stress of 6061-T6 extrusions (35 ksi); it drops in heat-affected zones near welds. ' +
      'Density 2700 kg/m³: typical handbook value.',
  },
  timber: {
    key: 'timber',
    name: 'Timber (softwood)',
    E: 11_000,
    density: 420,
    noTension: false,
    note: 'Softwood, stiffness parallel to the grain; varies by grade and species (typical, check the grade).',
    source:
      'Strength class C24 of EN 338: E0,mean = 11 000 MPa parallel to the grain, mean density 420 kg/m³ ' +
      '(characteristic 350 kg/m³). No yield stress is given: timber is checked by its strength class, not fy.',
  },
  concrete: {
    key: 'concrete',
    name: 'Concrete',
    E: 30_000,
    fc: 30,
    density: 2400,
    noTension: true,
    note: 'Normal-weight concrete of about C30 strength, short-term modulus, no tensile strength (typical, check the mix).',
    source:
      'E ≈ 30 000 MPa: a typical short-term value for normal-weight concrete of about 30 MPa strength ' +
      '(EN 1992-1-1 Table 3.1 gives Ecm = 33 000 MPa for C30/37; ACI 318 gives 4700·√f′c ≈ 25 700 MPa for f′c = 30 MPa); ' +
      'long-term (creep) values are much lower. fc = 30 MPa: the characteristic cylinder strength fck of C30/37 (EN 1992-1-1 Table 3.1), ' +
      'unfactored. Density 2400 kg/m³ plain, about 2500 reinforced (EN 1991-1-1 Table A.1).',
  },
  masonry: {
    key: 'masonry',
    name: 'Masonry',
    E: 5_000,
    fc: 5,
    density: 1900,
    noTension: true,
    note: 'Clay brick in mortar; E varies widely with unit and mortar, no tensile strength (typical, check the product data).',
    source:
      'E ≈ 5 000 MPa: EN 1996-1-1 suggests a short-term E of about 1000·fk, here for fk ≈ 5 MPa; real walls range from ' +
      'about 2 000 to 15 000 MPa. fc ≈ 5 MPa: a typical characteristic compressive strength fk of clay brickwork in ' +
      'general-purpose mortar (EN 1996-1-1 §3.6.1), unfactored. Density ≈ 1900 kg/m³: typical for solid clay brickwork.',
  },
  soil: {
    key: 'soil',
    name: 'Soil under a footing',
    E: 50,
    fc: 0.2,
    density: 1900,
    noTension: true,
    note: 'The ground under a pad: no tension, fc an allowable bearing pressure of 200 kPa (typical, check the site investigation).',
    source:
      'fc = 0.2 MPa (200 kPa): a presumed allowable bearing value of the order given for medium-dense sand or firm clay in ' +
      'common practice (BS 8004 tables of presumed bearing values); the real value comes from the geotechnical report. ' +
      'E = 50 MPa: a typical order of magnitude for a firm soil; it does not change a single-material contact result.',
  },
}

/** The material presets in display order (E, fy in MPa; density kg/m³). */
export const MATERIAL_PRESET_LIST: readonly MaterialPreset[] = [
  MATERIAL_PRESETS.steel,
  MATERIAL_PRESETS.aluminium,
  MATERIAL_PRESETS.timber,
  MATERIAL_PRESETS.concrete,
  MATERIAL_PRESETS.masonry,
  MATERIAL_PRESETS.soil,
]

/** The material of a part drawn without one, and of an analysis part that names none: the steel preset (E, fy, density). */
export function defaultMaterial(): Material {
  const { name, E, fy, density } = MATERIAL_PRESETS.steel
  return { name, E, fy, density }
}

/** The same, as a constant for readers that do not change it. */
export const DEFAULT_MATERIAL: Material = Object.freeze(defaultMaterial())

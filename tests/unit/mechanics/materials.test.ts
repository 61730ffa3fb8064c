import { describe, expect, it } from 'vitest'
import { DEFAULT_MATERIAL, defaultMaterial, MATERIAL_PRESET_LIST, MATERIAL_PRESETS } from '../../../shared/mechanics/materials'

describe('MATERIAL_PRESETS', () => {
  it('lists steel, aluminium, timber, concrete, masonry and soil under a footing, in that display order', () => {
    expect(Object.keys(MATERIAL_PRESETS)).toEqual(['steel', 'aluminium', 'timber', 'concrete', 'masonry', 'soil'])
    expect(MATERIAL_PRESET_LIST.map((m) => m.key)).toEqual(['steel', 'aluminium', 'timber', 'concrete', 'masonry', 'soil'])
    for (const [key, m] of Object.entries(MATERIAL_PRESETS)) expect(m.key).toBe(key)
  })

  // Typical values, each with its source in the preset itself:
  // steel E 200 000 MPa (the app default; AISC 360 29 000 ksi), S355 fy 355 MPa (EN 10025-2), 7850 kg/m³;
  // aluminium 6061-T6 E 70 000 MPa (EN 1999-1-1), fy 240 MPa, 2700 kg/m³;
  // softwood C24 E0,mean 11 000 MPa, mean density 420 kg/m³ (EN 338);
  // concrete ≈ C30 E 30 000 MPa, 2400 kg/m³; masonry E ≈ 1000 fk ≈ 5 000 MPa (EN 1996-1-1), 1900 kg/m³.
  it.each([
    ['steel', 200_000, 355, 7850, false],
    ['aluminium', 70_000, 240, 2700, false],
    ['timber', 11_000, undefined, 420, false],
    ['concrete', 30_000, undefined, 2400, true],
    ['masonry', 5_000, undefined, 1900, true],
  ] as const)('%s: E = %d MPa, fy = %s MPa, density = %d kg/m³, noTension = %s', (key, E, fy, density, noTension) => {
    const m = MATERIAL_PRESETS[key]
    expect(m.E).toBe(E)
    expect(m.fy).toBe(fy)
    expect(m.density).toBe(density)
    expect(m.noTension).toBe(noTension)
  })

  it('every preset says it is typical and names its source', () => {
    for (const m of MATERIAL_PRESET_LIST) {
      expect(m.name.length).toBeGreaterThan(0)
      expect(m.note).toMatch(/typical, check/)
      expect(m.source.length).toBeGreaterThan(40)
    }
    expect(MATERIAL_PRESETS.steel.source).toContain('EN 1993-1-1 §3.2.6 uses 210 000 MPa')
  })

  it('the default material is structural steel, and a fresh copy each time', () => {
    // E 200 000 MPa: common practice; fy 355 MPa: S355 to EN 10025-2 (t <= 16 mm); 7850 kg/m³: handbook value, from memory.
    expect(DEFAULT_MATERIAL).toEqual({ name: 'Steel', E: 200_000, fy: 355, density: 7850 })
    const a = defaultMaterial()
    ;(a as { E: number }).E = 1
    expect(defaultMaterial().E).toBe(200_000)
    expect(MATERIAL_PRESETS.steel.E).toBe(200_000)
  })
})

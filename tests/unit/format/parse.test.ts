import { describe, expect, it } from 'vitest'
import { expectClose } from '../../support/expect-close'
import { parseNumber, parseQuantity, type FieldSpec } from '#shared/format/parse'
import { formatForInput } from '#shared/format/number'
import { UNITS } from '#shared/format/units'
import { toDisplay, unitLabel, type Quantity, type UnitPrefs } from '#shared/editor/units'

const value = (text: string, spec: FieldSpec): number => {
  const r = parseQuantity(text, spec)
  if (!r.ok) throw new Error(`refused: ${r.message}`)
  return r.value
}
const message = (text: string, spec: FieldSpec): string => {
  const r = parseQuantity(text, spec)
  if (r.ok) throw new Error(`accepted ${text} as ${r.value}`)
  return r.message
}

describe('parseNumber', () => {
  it.each([
    ['12', 12], ['-5', -5], ['−5', -5], ['+2.5', 2.5], ['1.5e6', 1.5e6], ['2E-3', 2e-3],
    ['1,5', 1.5], ['0,500', 0.5], ['1,5000', 1.5], [',25', 0.25],   // a comma that cannot group thousands is a decimal mark
    ['1,234.5', 1234.5], ['1,500,000', 1500000], ['12 345', 12345], ['12\u202F345.5', 12345.5],
    ['159.1 × 10⁶', 159.1e6], ['2.5 × 10⁻⁶', 2.5e-6], ['3x10^4', 3e4], ['−1.2 × 10³', -1200],
  ])('parseNumber(%j) is %s', (text, v) => {
    const r = parseNumber(text)
    expect(r.ok).toBe(true)
    if (r.ok) expectClose(r.value, v, 1e-15)
  })

  it.each([
    ['1,500', 'can be read two ways'],           // issue 17: "1,500" became 1.5
    ['-2,000', 'can be read two ways'],
    ['abc', 'is not a number'],                   // issue 17: "abc" became 0
    ['', 'Type a number'],
    ['1.2.3', 'more than one decimal mark'],
    ['1.500,5', 'read two ways'],
    ['1,2,3', 'more than one comma'],
    ['1e999', 'too large'],
  ])('parseNumber(%j) is refused: %s', (text, why) => {
    const r = parseNumber(text)
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.message).toContain(why)
  })
})

describe('parseQuantity: the field unit, other units converted (NIST SP 811 factors)', () => {
  it.each([
    ['150', { kind: 'force', unit: 'kN' }, 150_000],
    ['150 kN', { kind: 'force', unit: 'kN' }, 150_000],          // issue 17: "150 kN" was ignored
    ['150kN', { kind: 'force', unit: 'kN' }, 150_000],
    ['10 kip', { kind: 'force', unit: 'kN' }, 44482.216152605],  // 1 kip = 4448.2216152605 N
    ['2000 N', { kind: 'force', unit: 'kip' }, 2000],
    ['0.5 m', { kind: 'length', unit: 'mm' }, 500],
    ['2 in', { kind: 'length', unit: 'mm' }, 50.8],              // 1 in = 25.4 mm exactly
    ['1 ft', { kind: 'length', unit: 'in' }, 304.8],
    ['3 cm', { kind: 'length', unit: 'in' }, 30],
    ['25 ksi', { kind: 'stress', unit: 'MPa' }, 172.3689323292],  // 6.894757293168 MPa per ksi
    ['210 GPa', { kind: 'stress', unit: 'MPa' }, 210_000],
    ['50000 psi', { kind: 'stress', unit: 'ksi' }, 344.7378646584],
    ['235 N/mm²', { kind: 'stress', unit: 'MPa' }, 235],
    ['100 kN·m', { kind: 'moment', unit: 'kN·m' }, 1e8],
    ['100 kNm', { kind: 'moment', unit: 'kN·m' }, 1e8],
    ['100 kN m', { kind: 'moment', unit: 'kN·m' }, 1e8],
    ['1 kip·ft', { kind: 'moment', unit: 'kN·m' }, 4448.2216152605 * 304.8],
    ['5e6 N·mm', { kind: 'moment', unit: 'kN·m' }, 5e6],
    ['12 cm²', { kind: 'area', unit: 'mm²' }, 1200],
    ['1 in2', { kind: 'area', unit: 'mm²' }, 645.16],            // 1 in² = 645.16 mm²
    ['1 in⁴', { kind: 'inertia', unit: 'cm⁴' }, 416231.4256],    // 1 in⁴ = 416 231.425 6 mm⁴
    ['159.1 × 10⁶ mm⁴', { kind: 'inertia', unit: 'mm⁴' }, 159.1e6],
    ['490 lb/ft³', { kind: 'density', unit: 'kg/m³' }, 490 * 0.45359237 / 0.3048 ** 3],
    ['1,35', { kind: 'factor' }, 1.35],
  ] as [string, FieldSpec, number][])('%j in %j is %s model units', (text, spec, v) => {
    expectClose(value(text, spec), v, 1e-12)
  })

  it('refuses a unit of another kind, naming both kinds', () => {
    expect(message('150 kg', { kind: 'force', unit: 'kN' })).toContain('not a unit this field knows')
    expect(message('150 mm', { kind: 'force', unit: 'kN' })).toContain('is a length, not a force')
    expect(message('3 MPa', { kind: 'length', unit: 'mm' })).toContain('is a stress, not a length')
    expect(message('2 m', { kind: 'factor', name: 'The factor' })).toContain('takes no unit')
  })

  it('reads a unit in any case except where case is the prefix: mpa is MPa, but mN is not MN', () => {
    expect(value('235 mpa', { kind: 'stress', unit: 'MPa' })).toBe(235)
    expect(value('2 KN', { kind: 'force', unit: 'kN' })).toBe(2000)
    expect(value('2 MN', { kind: 'force', unit: 'kN' })).toBe(2e6)
    expect(message('2 mN', { kind: 'force', unit: 'kN' })).toContain('not a unit this field knows')
    expect(message('5k', { kind: 'force', unit: 'kN' })).toContain('not a unit this field knows')
  })

  it('applies the limits after conversion', () => {
    expect(message('-10', { kind: 'length', unit: 'mm', positive: true, name: 'The grid' })).toBe('The grid must be positive (you typed “-10”).')
    expect(message('0', { kind: 'stress', unit: 'MPa', positive: true, name: 'E' })).toContain('must be positive')
    expect(message('−1', { kind: 'density', unit: 'kg/m³', nonNegative: true })).toContain('cannot be negative')
    expect(message('400', { kind: 'angle', unit: '°', max: 360 })).toContain('at most 360 °')
  })
})

describe('what the UI shows can be typed back (format, then parse)', () => {
  const prefs: UnitPrefs[] = [{ units: 'SI' }, { units: 'US' }, { units: 'SI', areaUnit: 'cm2', inertiaUnit: 'cm4' }, { units: 'SI', areaUnit: 'm2', inertiaUnit: 'm4' }, { units: 'US', areaUnit: 'mm2', inertiaUnit: 'mm4' }]
  const quantities: Quantity[] = ['length', 'area', 'modulus', 'inertia', 'force', 'stress', 'moment', 'massPerLength', 'angle']
  const samples = [1, -1, 0, 12.5, -3.3e-4, 123456.789, 159.1e6, -2.75e9, 4.2e-7, 1e12]
  for (const p of prefs) {
    for (const q of quantities) {
      it(`${q} in ${JSON.stringify(p)}`, () => {
        const unit = unitLabel(q, p)
        for (const v of samples) {
          const shown = formatForInput(toDisplay(v, q, p))
          const back = value(shown, { kind: q, unit })
          // six significant digits are shown, so the value comes back to 6 digits, or to round-off for 0
          expectClose(back, v, 5e-6, 1e-300)
          expect(formatForInput(toDisplay(back, q, p))).toBe(shown)
          // with the unit suffix as the property panel writes it
          expectClose(value(`${shown} ${unit}`, { kind: q, unit }), back, 1e-12, 1e-12)
        }
      })
    }
  }
})

describe('every unit a field may show reads back in its own field and in a field of another unit of its kind', () => {
  for (const kind of Object.keys(UNITS) as (keyof typeof UNITS)[]) {
    for (const u of UNITS[kind]) {
      it(`${kind}: ${u.label}`, () => {
        for (const v of [1, -2.5, 1234.5678, 7.5e8]) {
          const shown = formatForInput(v / u.factor)
          expectClose(value(shown, { kind, unit: u.label }), v, 5e-6)
          // the same text with its unit typed into a field of the kind's model unit
          expectClose(value(`${shown} ${u.label}`, { kind, unit: UNITS[kind][0]!.label }), v, 5e-6)
        }
      })
    }
  }
})

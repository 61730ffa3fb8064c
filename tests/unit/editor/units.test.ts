import { describe, expect, it } from 'vitest'
import { expectClose } from '../../support/expect-close'
import { formatNumber, formatQuantity, fromDisplay, lengthForInput, MPA_PER_KSI, N_PER_KIP, toDisplay, unitLabel } from '#shared/editor/units'

describe('display units (factors from NIST SP 811, Appendix B)', () => {
  it.each([
    ['length', 25.4, 1],                 // 1 in = 25.4 mm exactly
    ['area', 645.16, 1],                 // 1 in² = 645.16 mm²
    ['modulus', 16387.064, 1],           // 1 in³ = 16 387.064 mm³
    ['inertia', 416231.4256, 1],         // 1 in⁴ = 416 231.425 6 mm⁴
    ['force', 4448.2216152605, 1],       // 1 kip = 1000 × 4.448 221 615 260 5 N
    ['stress', 6.894757293168, 1],       // 1 ksi = 6.894 757 MPa
    ['moment', 4448.2216152605 * 304.8, 1], // 1 kip·ft
  ] as const)('toDisplay(%s) converts the model value of one US unit to 1', (q, model, shown) => {
    expectClose(toDisplay(model, q, 'US'), shown, 1e-12)
  })

  it('fromDisplay is the inverse of toDisplay', () => {
    expectClose(fromDisplay(toDisplay(123.456, 'inertia', 'US'), 'inertia', 'US'), 123.456, 1e-14)
  })

  it('SI shows mm, mm², kN and kN·m: 1 kN = 1000 N, 1 kN·m = 1e6 N·mm', () => {
    expect(toDisplay(1000, 'force', 'SI')).toBe(1)
    expect(toDisplay(1e6, 'moment', 'SI')).toBe(1)
    expect(toDisplay(42, 'length', 'SI')).toBe(42)
  })

  it('the kip and ksi constants follow NIST SP 811', () => {
    expect(N_PER_KIP).toBeCloseTo(4448.2216152605, 9)
    expect(MPA_PER_KSI).toBeCloseTo(6.894757, 6)
  })

  it('unitLabel names the display unit', () => {
    expect(unitLabel('inertia', 'SI')).toBe('mm⁴')
    expect(unitLabel('inertia', 'US')).toBe('in⁴')
    expect(unitLabel('stress', 'US')).toBe('ksi')
  })

  it('formatNumber keeps integer digits and switches to exponents in steps of three beyond a million', () => {
    expect(formatNumber(12345)).toBe('12345')
    expect(formatNumber(2.72480001)).toBe('2.725')
    expect(formatNumber(19430000)).toBe('19.43 × 10⁶')
    expect(formatNumber(0.0001234)).toBe('123.4 × 10⁻⁶')
  })

  it('formatQuantity writes value and unit, and a dash for null', () => {
    expect(formatQuantity(645.16, 'area', 'US')).toBe('1 in²')
    expect(formatQuantity(null, 'area', 'SI')).toBe('—')
  })

  it('lengthForInput gives inches for US with 6 decimals at most', () => {
    expect(lengthForInput(254, 'US')).toBe('10')
    expect(lengthForInput(1, 'US')).toBe('0.03937')
  })

  // NIST SP 811: 1 cm⁴ = 10⁴ mm⁴, 1 m⁴ = 10¹² mm⁴, 1 in⁴ = 416 231.425 6 mm⁴; 1 in² = 645.16 mm².
  it.each([
    [{ units: 'SI', inertiaUnit: 'cm4' }, 'inertia', 159.1e6, '15910 cm⁴'],
    [{ units: 'SI', inertiaUnit: 'm4' }, 'inertia', 159.1e6, '159.1 × 10⁻⁶ m⁴'],
    [{ units: 'SI', inertiaUnit: 'in4' }, 'inertia', 416231.4256, '1 in⁴'],
    [{ units: 'US', inertiaUnit: 'mm4' }, 'inertia', 159.1e6, '159.1 × 10⁶ mm⁴'],
    [{ units: 'SI', inertiaUnit: 'cm4' }, 'modulus', 1e6, '1000 cm³'],
    [{ units: 'SI', areaUnit: 'cm2' }, 'area', 14400, '144 cm²'],
    [{ units: 'SI', areaUnit: 'm2' }, 'area', 14400, '0.0144 m²'],
    [{ units: 'SI', areaUnit: 'in2' }, 'area', 645.16, '1 in²'],
    [{ units: 'US', areaUnit: null }, 'area', 645.16, '1 in²'],
  ] as const)('formatQuantity under %j shows %s %s as %s', (prefs, q, v, text) => {
    expect(formatQuantity(v, q, prefs)).toBe(text)
  })
})

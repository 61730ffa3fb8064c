import { describe, expect, it } from 'vitest'
import { formatForInput, formatNumber } from '#shared/format/number'
import { formatNumber as editorFormat } from '#shared/editor/units'
import { formatNumber as stressFormat } from '#shared/stress/scale'

// Expected strings follow the trade's usual notation (common practice): engineering exponents in
// steps of three, the true minus sign, no trailing zeros.
describe('formatNumber (shared/format/number)', () => {
  it.each([
    [159.1e6, 4, '159.1 × 10⁶'],        // issue 17: "159.1 × 10⁶ mm⁴"
    [19430000, 4, '19.43 × 10⁶'],
    [1.2e9, 4, '1.2 × 10⁹'],
    [0.0001234, 4, '123.4 × 10⁻⁶'],
    [2.5e-6, 4, '2.5 × 10⁻⁶'],
    [999999.9, 4, '1 × 10⁶'],           // rounding carries into the next decade
    [12345, 4, '12345'],                // integer digits kept below 10⁶
    [5, 6, '5'],                        // no trailing zeros (not 5.00000)
    [2.72480001, 4, '2.725'],
    [-0.012345, 3, '−0.0123'],          // U+2212 minus
    [1.495e-13, 4, '0'],                // round-off reads 0 (issue 17: 1.495e-13 N/mm)
    [-1e-12, 4, '0'],
    [0, 4, '0'],
    [0.001, 4, '0.001'],
  ])('formatNumber(%s, %s) is %s', (v, digits, text) => {
    expect(formatNumber(v, digits)).toBe(text)
  })

  it('writes a dash for a non-finite value', () => {
    expect(formatNumber(Number.NaN)).toBe('—')
    expect(formatNumber(Infinity)).toBe('—')
  })

  it('the editor and the stress view use this one formatter', () => {
    expect(editorFormat).toBe(formatNumber)
    expect(stressFormat).toBe(formatNumber)
  })

  it('formatForInput keeps six significant digits and leaves null blank', () => {
    expect(formatForInput(3.14159265)).toBe('3.14159')
    expect(formatForInput(null)).toBe('')
    expect(formatForInput(1.2246e-14, 15, 6)).toBe('0')            // round-off of a rotated vertex
    expect(formatForInput(-149.99999999997, 15, 6)).toBe('−150')
    expect(formatForInput(12.7000001, 15, 6)).toBe('12.7')
    expect(formatForInput(0.00001, 15, 6)).toBe('0.00001')
    expect(formatForInput(-0.0000004, 15, 6)).toBe('0')
  })
})

import { describe, expect, it } from 'vitest'
import { STRESS_COLOURS, displayUnits, formatNumber, formatPoint, formatStress, hexToLinear, legendTicks, lightness, stressScale } from '../../../shared/stress/scale'
import { expectClose } from '../../support/expect-close'

/** Deuteranopia / protanopia simulation matrices (Machado, Oliveira & Fernandes 2009, severity 1), linear RGB. */
const DEUTAN = [[0.367322, 0.860646, -0.227968], [0.280085, 0.672501, 0.047413], [-0.01182, 0.04294, 0.968881]]
const PROTAN = [[0.152286, 1.052583, -0.204868], [0.114503, 0.786281, 0.099216], [-0.003882, -0.048116, 1.051998]]

function simulatedLightness(hex: string, m: number[][]): number {
  const [r, g, b] = hexToLinear(hex)
  const rgb = m.map(row => Math.min(1, Math.max(0, row[0]! * r + row[1]! * g + row[2]! * b)))
  const Y = 0.2126 * rgb[0]! + 0.7152 * rgb[1]! + 0.0722 * rgb[2]!
  return Y > 216 / 24389 ? 116 * Math.cbrt(Y) - 16 : (24389 / 27) * Y
}

describe('stress colours', () => {
  it('compression and tension differ in lightness by more than 20 L* (common practice for colour-blind safe pairs)', () => {
    expect(lightness(STRESS_COLOURS.tension) - lightness(STRESS_COLOURS.compression)).toBeGreaterThan(20)
  })

  it('stay apart in lightness under simulated deuteranopia and protanopia (Machado 2009 matrices)', () => {
    for (const m of [DEUTAN, PROTAN]) {
      expect(simulatedLightness(STRESS_COLOURS.tension, m) - simulatedLightness(STRESS_COLOURS.compression, m)).toBeGreaterThan(20)
    }
  })

  it('the neutral colour is the lightest', () => {
    expect(lightness(STRESS_COLOURS.neutral)).toBeGreaterThan(90)
  })
})

describe('stressScale', () => {
  it('maps −limit, 0 and +limit to compression, neutral and tension and clamps beyond', () => {
    const s = stressScale(10)
    expect(s(-10)).toBe('rgb(58, 63, 158)')
    expect(s(-50)).toBe('rgb(58, 63, 158)')
    expect(s(0)).toBe('rgb(244, 243, 238)')
    expect(s(10)).toBe('rgb(213, 154, 28)')
    expect(s.limit).toBe(10)
    expect(stressScale(0).limit).toBe(1)
  })
})

describe('units and labels', () => {
  it('formatStress labels C and T and converts to ksi by NIST SP 811 (1 ksi = 6.894757 MPa)', () => {
    expect(formatStress(-12.4, displayUnits('SI'))).toBe('12.4 MPa C')
    expect(formatStress(6.894757293168, displayUnits('US'))).toBe('1 ksi T')
    expect(formatStress(0, displayUnits('SI'))).toBe('0 MPa')
  })

  it('shear flow in N/mm reads as kN/m in SI and kip/in in US (1 kip/in = 4448.22/25.4 N/mm)', () => {
    expect(displayUnits('SI').flow.perNPerMm).toBe(1)
    expectClose(1 / displayUnits('US').flow.perNPerMm, 4448.2216152605 / 25.4)
  })

  it('formatNumber keeps the digits asked for with a true minus sign (four by default, as the editor)', () => {
    expect(formatNumber(-0.012345, 3)).toBe('−0.0123')
    expect(formatNumber(1234.5)).toBe('1235')
    expect(formatNumber(-0.012345)).toBe('−0.01235')
  })
})

describe('legendTicks', () => {
  it('gives round ticks over the range, with 0 and C/T labels', () => {
    const units = displayUnits('SI')
    const ticks = legendTicks(stressScale(8.3), -8.3, 2.1, units)
    expect(ticks.some(t => t.value === 0)).toBe(true)
    expect(ticks[0]!.label.endsWith('C')).toBe(true)
    expect(ticks[ticks.length - 1]!.label.endsWith('T')).toBe(true)
    expect(ticks.map(t => t.value)).toEqual([-8, -6, -4, -2, 0, 2])
  })
})

describe('formatPoint', () => {
  it('formatPoint shows a point in display units and reads roundoff noise as 0 (25.4 mm per inch, by definition)', () => {
    const si = displayUnits('SI')
    expect(formatPoint(-500, 6.123e-14, si)).toBe('(−500, 0)')
    expect(formatPoint(200, -300, si)).toBe('(200, −300)')
    expect(formatPoint(254, 2e-6, displayUnits('US'))).toBe('(10, 78.74 × 10⁻⁹)')
  })
})

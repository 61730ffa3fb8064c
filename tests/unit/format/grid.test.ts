import { describe, expect, it } from 'vitest'
import { expectClose } from '../../support/expect-close'
import { gridForUnits, isNiceStep, nearestNiceStep } from '#shared/format/grid'

// 1 in = 25.4 mm exactly (NIST SP 811); steps 1-2-5 (common practice for grids and scale bars).
describe('gridForUnits', () => {
  it('SI → US → SI gives 10 mm back (issue 17: it became 20 mm)', () => {
    const us = gridForUnits(10, 'SI', 'US')
    expectClose(us, 12.7)        // 0.5 in
    expect(gridForUnits(us, 'US', 'SI')).toBe(10)
  })

  it.each([0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000])('a %s mm grid survives SI → US → SI, and its US step survives US → SI → US', (mm) => {
    const us = gridForUnits(mm, 'SI', 'US')
    expect(isNiceStep(us / 25.4)).toBe(true)
    expectClose(gridForUnits(us, 'US', 'SI'), mm, 1e-12)
    expectClose(gridForUnits(gridForUnits(us, 'US', 'SI'), 'SI', 'US'), us, 1e-12)
  })

  it('a grid that is not a 1-2-5 step keeps its length', () => {
    expect(gridForUnits(6.35, 'SI', 'US')).toBe(6.35)
    expect(gridForUnits(0.25 * 25.4, 'US', 'SI')).toBe(0.25 * 25.4)
  })

  it('nearestNiceStep rounds on a log scale', () => {
    expect(nearestNiceStep(0.3937)).toBe(0.5)
    expect(nearestNiceStep(12.7)).toBe(10)
    expect(nearestNiceStep(3.1)).toBe(2)
    expect(nearestNiceStep(3.3)).toBe(5)
  })
})

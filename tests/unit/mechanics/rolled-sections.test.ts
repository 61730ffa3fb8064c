import { describe, expect, it } from 'vitest'
import { prepareSection } from '../../../shared/mechanics/prepare'
import { sectionProperties } from '../../../shared/mechanics/properties'
import { ishape } from '../../../shared/shapes/ishape'
import { expectClose } from '../../support/expect-close'

// Whole-pipeline check of rolled sections with root fillets: shape builder → prepareSection →
// sectionProperties, including the plastic moduli, against handbook table values.
const IN = 25.4 // mm per inch, exact (NIST SP 811)

function analyse(params: Parameters<typeof ishape>[0]) {
  const g = ishape(params)
  return sectionProperties(prepareSection([{ outline: g.outline, holes: g.holes }]))
}

describe('rolled I sections through the whole pipeline (from memory of the published tables, about 1 %)', () => {
  it('IPE 200: A 28.5 cm², Iy 1943 cm⁴, Wel,y 194 cm³, Wpl,y 221 cm³, Iz 142 cm⁴ (from memory)', () => {
    const p = analyse({ h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12 })
    expectClose(p.area / 1e2, 28.5, 0.01)
    expectClose(p.Ixx / 1e4, 1943, 0.01)
    expectClose(p.S.top / 1e3, 194, 0.01)
    expectClose(p.Z.x / 1e3, 221, 0.01)
    expectClose(p.Iyy / 1e4, 142, 0.01)
    // Doubly symmetric: the plastic axis passes through the centroid (symmetry, exact).
    expectClose(p.pna.y, p.centroid.y, 1e-9, 1)
  })

  it('W8x31: A 9.13 in², Ix 110 in⁴, Zx 30.4 in³, Iy 37.1 in⁴ (from memory; root radius 0.4 in assumed)', () => {
    const p = analyse({ h: 8.0 * IN, b: 8.0 * IN, tw: 0.285 * IN, tf: 0.435 * IN, r: 0.4 * IN })
    expectClose(p.area / IN ** 2, 9.13, 0.01)
    expectClose(p.Ixx / IN ** 4, 110, 0.01)
    expectClose(p.Z.x / IN ** 3, 30.4, 0.01)
    expectClose(p.Iyy / IN ** 4, 37.1, 0.01)
  })

  it('the principal axes of a doubly symmetric I are x and y (symmetry): theta = 0, I1 = Ixx', () => {
    const p = analyse({ h: 300, b: 150, tw: 7.1, tf: 10.7, r: 15 })
    expect(Math.abs(p.theta)).toBeLessThan(1e-9)
    expectClose(p.I1, p.Ixx, 1e-12)
  })
})

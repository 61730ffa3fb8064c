import { describe, expect, it } from 'vitest'
import type { Point, Ring } from '../../../../shared/geometry/types'
import { prepareSection } from '../../../../shared/mechanics/prepare'
import { torsionAnalysis } from '../../../../shared/mechanics/torsion/analysis'
import type { PartInput } from '../../../../shared/mechanics/types'
import { ishape } from '../../../../shared/shapes/ishape'
import { expectClose } from '../../../support/expect-close'
import { rectRing } from '../../../support/sections'

const steel = { E: 200_000, nu: 0.3 }
const torsion = (parts: PartInput[], options: Parameters<typeof torsionAnalysis>[1] = {}) => torsionAnalysis(prepareSection(parts), options)
const part = (outline: Ring, holes: Ring[] = [], material: PartInput['material'] = steel): PartInput => ({ outline, holes, material })

function circleRing(r: number, n: number, cw = false): Point[] {
  const pts: Point[] = []
  for (let i = 0; i < n; i++) {
    const t = ((cw ? -1 : 1) * 2 * Math.PI * i) / n
    pts.push([r * Math.cos(t), r * Math.sin(t)])
  }
  return pts
}

/** Polar moment of a regular n-gon of circumradius R: 2 × n R⁴ sin(2π/n)(2 + cos(2π/n)) / 24 (exact for the polygon). */
const ngonIp = (n: number, R: number) => (2 * n * R ** 4 * Math.sin((2 * Math.PI) / n) * (2 + Math.cos((2 * Math.PI) / n))) / 24

/**
 * Torsion constant of a solid a × b rectangle (a ≥ b) by the series solution of Timoshenko &
 * Goodier, Theory of Elasticity (3rd ed., §109): J = a b³ [1/3 − (64/π⁵)(b/a) Σ_{n odd} tanh(nπa/2b)/n⁵].
 */
function rectangleJ(a: number, b: number): number {
  let sum = 0
  for (let n = 1; n < 200; n += 2) sum += Math.tanh((n * Math.PI * a) / (2 * b)) / n ** 5
  return a * b ** 3 * (1 / 3 - ((64 / Math.PI ** 5) * (b / a)) * sum)
}

describe('torsionAnalysis: torsion constant J', () => {
  it('of a solid circle is its polar moment (Saint-Venant: no warping; exact)', () => {
    const n = 256
    const t = torsion([part(circleRing(50, n))])
    // The 256-gon itself is meshed, so its own polar moment is the reference (within the FE error).
    expectClose(t.J, ngonIp(n, 50), 2e-3)
    expect(t.converged).toBe(true)
  })

  it('of a tube is its polar moment π(D⁴ − d⁴)/32 (exact for a circular tube)', () => {
    const n = 256
    const t = torsion([part(circleRing(50, n), [circleRing(40, n, true)])])
    expectClose(t.J, ngonIp(n, 50) - ngonIp(n, 40), 3e-3)
  })

  // Tabulated coefficients β of J = β a b³, Timoshenko & Goodier §109 table (to three figures).
  it.each([
    [1, 0.141],
    [2, 0.229],
    [4, 0.281],
    [10, 0.312],
  ])('of a rectangle of aspect %i matches the series solution and the tabulated β = %f (Timoshenko & Goodier)', (ratio, beta) => {
    const b = 20
    const a = ratio * b
    const t = torsion([part(rectRing([0, 0, a, b]))])
    expectClose(t.J, rectangleJ(a, b), 3e-3)
    expect(Math.abs(t.J / (a * b ** 3) - beta)).toBeLessThan(1.5e-3)
  })

  it('of a thin strip is b·t³/3 less the usual end correction (1 − 0.630 t/b; Timoshenko & Goodier, Roark)', () => {
    const b = 200; const th = 4
    const t = torsion([part(rectRing([0, 0, b, th]))])
    expectClose(t.J, ((b * th ** 3) / 3) * (1 - (0.63 * th) / b), 5e-3)
  })

  it('of a thin open angle is about Σ b·t³/3 over the legs (thin-walled open-section theory)', () => {
    const th = 4
    const angle = part([[0, 0], [150, 0], [150, th], [th, th], [th, 100], [0, 100]])
    const t = torsion([angle])
    // Leg lengths along the mid-lines: 150 − t/2 and 100 − t/2.
    const thinWalled = ((150 - th / 2) * th ** 3) / 3 + ((100 - th / 2) * th ** 3) / 3
    expectClose(t.J, thinWalled, 0.05)
  })

  it('of a thin closed box matches Bredt\'s formula J = 4 A_m² t / s (thin-walled closed section)', () => {
    const b = 200; const th = 5
    const box = part(rectRing([-b / 2 - th / 2, -b / 2 - th / 2, b / 2 + th / 2, b / 2 + th / 2]), [[...rectRing([-b / 2 + th / 2, -b / 2 + th / 2, b / 2 - th / 2, b / 2 - th / 2])].reverse()])
    const t = torsion([box])
    expectClose(t.J, (4 * (b * b) ** 2 * th) / (4 * b), 0.015)
  })

  it('falls in error as the mesh is refined (convergence, against the series solution)', () => {
    const ring = rectRing([0, 0, 40, 20])
    const exact = rectangleJ(40, 20)
    const errors = (['coarse', 'normal', 'fine'] as const).map(mesh => Math.abs(torsion([part(ring)], { mesh }).J - exact) / exact)
    expect(errors[1]!).toBeLessThan(errors[0]!)
    expect(errors[2]!).toBeLessThan(errors[1]!)
  })

  it('is the same whether a plate is one part or two materials of equal E and G side by side (conforming interface)', () => {
    const whole = torsion([part(rectRing([0, 0, 60, 20]))])
    const split = torsion([part(rectRing([0, 0, 30, 20])), part(rectRing([30, 0, 60, 20]), [], { E: 200_000, nu: 0.3, fy: 235 })])
    expectClose(split.J, whole.J, 2e-3)
  })
})

describe('torsionAnalysis: shear centre and warping constant', () => {
  it('puts the shear centre of a channel at e = 3b²/(h + 6b) behind the web (thin-walled closed form, equal thicknesses)', () => {
    const h = 200; const b = 100; const th = 4
    // Web mid-line on x = 0, flange mid-lines at y = ±h/2, flange tips at x = b.
    const channel = part([[-th / 2, -h / 2 - th / 2], [b, -h / 2 - th / 2], [b, -h / 2 + th / 2], [th / 2, -h / 2 + th / 2], [th / 2, h / 2 - th / 2], [b, h / 2 - th / 2], [b, h / 2 + th / 2], [-th / 2, h / 2 + th / 2]])
    const t = torsion([channel])
    const e = (3 * b * b) / (h + 6 * b)
    expectClose(t.shearCentre.x, -e, 0.03)
    expect(Math.abs(t.shearCentre.y)).toBeLessThan(1e-6 * h)
  })

  it('puts the shear centre of an angle at the intersection of its leg mid-lines (thin-walled theory)', () => {
    const th = 5
    const t = torsion([part([[0, 0], [100, 0], [100, th], [th, th], [th, 100], [0, 100]])])
    expect(Math.hypot(t.shearCentre.x - th / 2, t.shearCentre.y - th / 2)).toBeLessThan(0.2 * th)
  })

  it('gives a doubly symmetric I the warping constant Cw = Iy·h²/4 (thin-walled, h between flange mid-planes)', () => {
    const b = 200; const h = 400; const tf = 10; const tw = 8
    const I = part([[-b / 2, -h / 2 - tf / 2], [b / 2, -h / 2 - tf / 2], [b / 2, -h / 2 + tf / 2], [tw / 2, -h / 2 + tf / 2], [tw / 2, h / 2 - tf / 2], [b / 2, h / 2 - tf / 2], [b / 2, h / 2 + tf / 2], [-b / 2, h / 2 + tf / 2], [-b / 2, h / 2 - tf / 2], [-tw / 2, h / 2 - tf / 2], [-tw / 2, -h / 2 + tf / 2], [-b / 2, -h / 2 + tf / 2]])
    const t = torsion([I])
    const IyFlanges = (2 * tf * b ** 3) / 12
    expectClose(t.Cw, (IyFlanges * h * h) / 4, 0.02)
    expect(Math.hypot(t.shearCentre.x, t.shearCentre.y)).toBeLessThan(1e-6 * h)
  })

  it.each([
    ['an angle', [[0, 0], [100, 0], [100, 6], [6, 6], [6, 100], [0, 100]] as Point[]],
    ['a tee', [[-50, 94], [-3, 94], [-3, 0], [3, 0], [3, 94], [50, 94], [50, 100], [-50, 100]] as Point[]],
  ])('gives %s a nearly zero warping constant (thin-walled theory: Cw = 0 for plates meeting at one point)', (_name, ring) => {
    const t = torsion([part(ring)])
    // Against an I of the same depth and flange width, whose Cw = Iy·h²/4 is of order 10¹¹ mm⁶ here.
    const scale = ((2 * 6 * 100 ** 3) / 12) * 100 ** 2 / 4
    expect(t.Cw).toBeGreaterThanOrEqual(0)
    expect(t.Cw / scale).toBeLessThan(5e-3)
  })
})

describe('torsionAnalysis: the small warping constant of an angle', () => {
  it('is about (t³/36)(b₁³ + b₂³) with b along the leg mid-lines (AISC Design Guide 9, from memory)', () => {
    const th = 5
    const t = torsion([part([[0, 0], [100, 0], [100, th], [th, th], [th, 100], [0, 100]])])
    const b = 100 - th / 2
    expectClose(t.Cw, ((th ** 3) / 36) * (2 * b ** 3), 0.03)
  })
})

describe('torsionAnalysis: shear areas and shear stresses', () => {
  it('gives a rectangle the shear area 5/6·A with ν = 0 (parabolic shear stress, exact)', () => {
    const t = torsion([part(rectRing([0, 0, 40, 80]), [], { E: 200_000, nu: 0 })])
    expectClose(t.shearAreas.x, (5 / 6) * 3200, 2e-3)
    expectClose(t.shearAreas.y, (5 / 6) * 3200, 2e-3)
  })

  it('gives a circle the shear area 6/7·A with ν = 0 (Cowper 1966, from memory: k = 6(1+ν)/(7+6ν))', () => {
    const t = torsion([part(circleRing(50, 256), [], { E: 200_000, nu: 0 })])
    // Area of the 256-gon: n R² sin(2π/n) / 2 (exact for the polygon).
    const A = (256 * 50 ** 2 * Math.sin((2 * Math.PI) / 256)) / 2
    expectClose(t.shearAreas.x, (6 / 7) * A, 5e-3)
  })

  it('gives a circle under a torque the peak τ = 16T/(πD³) at the rim (elementary torsion, exact)', () => {
    const T = 1e6
    const t = torsion([part(circleRing(50, 256))], { loads: { Vx: 0, Vy: 0, T } })
    expectClose(t.stress!.max.value, (16 * T) / (Math.PI * 100 ** 3), 0.01)
    expectClose(Math.hypot(t.stress!.max.x, t.stress!.max.y), 50, 0.01)
  })

  it('gives a rectangle under Vy the peak τ = 1.5·V/A at mid-depth with ν = 0 (elementary shear, exact for ν = 0)', () => {
    const V = 1e4
    const t = torsion([part(rectRing([-20, -40, 20, 40]), [], { E: 200_000, nu: 0 })], { loads: { Vx: 0, Vy: V, T: 0 } })
    expectClose(t.stress!.max.value, (1.5 * V) / 3200, 0.01)
    expect(Math.abs(t.stress!.max.y)).toBeLessThan(4)
  })
})

describe('torsionAnalysis: mesh and options', () => {
  it('meshes to the quality bound (no angle under 20°) and reports the counts', () => {
    const t = torsion([part(rectRing([0, 0, 100, 10]))])
    expect(t.mesh.minAngle).toBeGreaterThanOrEqual(20)
    expect(t.mesh.nodes).toBeGreaterThan(t.mesh.elements)
  })

  it('runs the mesh study at two densities and reports their difference', () => {
    const t = torsion([part(rectRing([0, 0, 40, 20]))], { study: true })
    const [a, b] = t.study!.rows
    expect(a!.elements).toBeLessThan(b!.elements)
    expectClose(t.study!.difference.J, Math.abs(b!.J - a!.J) / b!.J, 1e-12)
  })

  it('warns when the section is several separate pieces and sums their J (each a rectangle: series solution)', () => {
    const t = torsion([part(rectRing([0, 0, 40, 20])), part(rectRing([100, 0, 140, 20]))])
    expectClose(t.J, 2 * rectangleJ(40, 20), 3e-3)
    expect(t.warnings.join(' ')).toMatch(/separate pieces/)
  })
})

describe('torsionAnalysis: a rolled section with root fillets', () => {
  it('gives an IPE 200 about the published It = 6.98 cm⁴ and Iw = 12.99 × 10³ cm⁶ (European section tables, from memory)', () => {
    const g = ishape({ h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12 })
    const t = torsion([part(g.outline, [...g.holes])])
    expectClose(t.J, 6.98e4, 0.03)
    expectClose(t.Cw, 12.99e9, 0.03)
  })
})

describe('torsionAnalysis: several materials', () => {
  it('gives a steel tube round an aluminium bar J = (G₁·Ip₁ + G₂·Ip₂)/G_ref (concentric circles: no warping, exact)', () => {
    const n = 192
    const tube = part(circleRing(50, n), [circleRing(40, n, true)], { E: 200_000, nu: 0.3 })
    // A bar 1 mm clear of the bore (a core filling the bore exactly trips the Boolean step).
    const core = part(circleRing(39, n), [], { E: 70_000, nu: 0.33 })
    const t = torsion([tube, core])
    const gSteel = 200_000 / 2.6; const gAl = 70_000 / 2.66
    const expected = (gSteel * (ngonIp(n, 50) - ngonIp(n, 40)) + gAl * ngonIp(n, 39)) / gSteel
    expectClose(t.J, expected, 3e-3)
    expect(t.equivalent).toBe(true)
  })

  it('meshes a plate on part of a flange conformingly: two materials of equal E and G give the one-material J', () => {
    const flange = rectRing([0, 0, 100, 10]); const plate = rectRing([30, 10, 70, 20])
    const one = torsion([part(flange), part(plate)])
    const two = torsion([part(flange), part(plate, [], { E: 200_000, nu: 0.3, fy: 235 })])
    expectClose(two.J, one.J, 2e-3)
  })
})

describe('torsionAnalysis: bad input', () => {
  it('rejects a Poisson ratio outside 0 ≤ ν < 0.5 with a SectionError that says so', () => {
    expect(() => torsion([part(rectRing([0, 0, 10, 10]), [], { E: 200_000, nu: 0.5 })])).toThrow(/Poisson/)
  })
})

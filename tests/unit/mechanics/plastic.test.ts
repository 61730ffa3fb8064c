import { describe, expect, it } from 'vitest'
import { clipRingHalfPlane } from '../../../shared/geometry/clip'
import { addRingMoments, zeroMoments } from '../../../shared/geometry/moments'
import type { Point } from '../../../shared/geometry/types'
import { plasticModuli } from '../../../shared/mechanics/plastic'
import { prepareSection } from '../../../shared/mechanics/prepare'
import type { Material, PartInput, PreparedSection } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'

function rect(x: number, y: number, w: number, h: number): Point[] {
  return [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]
}

function plastic(parts: PartInput[]): ReturnType<typeof plasticModuli> {
  return plasticModuli(prepareSection(parts))
}

/** Z about y = yp by the existing clip.ts and moments.ts (a second path to the same integral). */
function zAboutHorizontal(prepared: PreparedSection, yp: number): number {
  const above = zeroMoments()
  const below = zeroMoments()
  for (const region of prepared.regions) {
    for (const polygon of region.polygons) {
      for (const ring of polygon) {
        addRingMoments(above, clipRingHalfPlane(ring, -yp, 0, 1), [0, yp], region.n)
        addRingMoments(below, clipRingHalfPlane(ring, yp, 0, -1), [0, yp], region.n)
      }
    }
  }
  return above.Qx - below.Qx
}

describe('plasticModuli: single material (PNA halves the area)', () => {
  it('rectangle b x h: Zx = bh²/4, Zy = hb²/4, PNAs through the centre (Gere & Goodno)', () => {
    const z = plastic([{ outline: rect(-20, 5, 60, 150) }])
    expectClose(z.x.Z!, (60 * 150 ** 2) / 4, 1e-13)
    expectClose(z.y.Z!, (150 * 60 ** 2) / 4, 1e-13)
    expectClose(z.pnaY, 80, 1e-14)
    expectClose(z.pnaX, 10, 1e-14)
  })

  it('T section (flange 200 x 20 over web 10 x 180), by hand: PNA 14.5 mm below the top, Zx = 195 950 mm³', () => {
    // A = 4000 + 1800 = 5800; half 2900 = 200·d, so d = 14.5 mm into the flange.
    // Above: 200·14.5·7.25 = 21 025. Below: flange 200·5.5·2.75 = 3025; web 1800·(5.5 + 90) = 171 900.
    const z = plastic([{ outline: rect(-100, 180, 200, 20) }, { outline: rect(-5, 0, 10, 180) }])
    expectClose(z.pnaY, 185.5, 1e-13)
    expectClose(z.x.Z!, 21_025 + 3025 + 171_900, 1e-12)
    // Symmetric about x = 0: Zy = 20·200²/4 + 180·10²/4 = 204 500.
    expectClose(z.pnaX, 0, 1e-12, 100)
    expectClose(z.y.Z!, 204_500, 1e-12)
    expect(z.method).toBe('geometric')
    // One steel (fy 355 by default): Mp = fy·Z in both senses.
    expectClose(z.x.Mp!, 355 * z.x.Z!, 1e-12)
    expectClose(z.x.MpNeg!, 355 * z.x.Z!, 1e-12)
  })

  it('triangle (apex up) base 120, height 90: PNA at h(1 - 1/√2) from the base, converged to 1e-12', () => {
    const h = 90
    const prepared = prepareSection([{ outline: [[0, 0], [120, 0], [60, h]] }])
    const z = plasticModuli(prepared)
    const yp = h * (1 - Math.SQRT1_2)
    expectClose(z.pnaY, yp, 1e-12)
    // Zx by hand: above, a triangle of height h - yp (centroid a third up); below, the trapezoid.
    const A = (120 * h) / 2
    const heightAbove = h - yp
    const zAbove = (A / 2) * (heightAbove / 3)
    const centroidBelow = (A * (h / 3) - (A / 2) * (yp + heightAbove / 3)) / (A / 2)
    expectClose(z.x.Z!, zAbove + (A / 2) * (yp - centroidBelow), 1e-12)
    expectClose(z.x.Z!, zAboutHorizontal(prepared, z.pnaY), 1e-12)
  })

  it('two flanges with a gap (no web): any PNA in the gap gives Z = 2·A_f·d', () => {
    const z = plastic([{ outline: rect(0, 0, 100, 10) }, { outline: rect(0, 190, 100, 10) }])
    expect(z.pnaY).toBeGreaterThanOrEqual(10)
    expect(z.pnaY).toBeLessThanOrEqual(190)
    expectClose(z.x.Z!, 2 * 1000 * 95, 1e-12)
  })

  it('a box with a hole: Zx = BH²/4 - bh²/4', () => {
    const z = plastic([{ outline: rect(0, 0, 200, 300), holes: [rect(10, 20, 180, 260)] }])
    expectClose(z.x.Z!, (200 * 300 ** 2) / 4 - (180 * 260 ** 2) / 4, 1e-12)
  })

  it('translation to 5e6 mm leaves Z unchanged and moves the PNA with the section', () => {
    const near = plastic([{ outline: rect(-100, 180, 200, 20) }, { outline: rect(-5, 0, 10, 180) }])
    const far = plastic([{ outline: rect(5e6 - 100, 5e6 + 180, 200, 20) }, { outline: rect(5e6 - 5, 5e6, 10, 180) }])
    expectClose(far.x.Z!, near.x.Z!, 1e-9)
    expectClose(far.y.Z!, near.y.Z!, 1e-9)
    expectClose(far.pnaY - 5e6, near.pnaY, 1e-9)
  })
})

describe('plasticModuli: independent of E for one material', () => {
  it('an S355 rectangle 100 x 200 with referenceE 210 000: Zx = bh²/4 = 1 000 000 mm³ (closed form; was 952 381)', () => {
    const prepared = prepareSection([{ outline: rect(0, 0, 100, 200), material: { E: 200_000, fy: 355 } }], { referenceE: 210_000 })
    const z = plasticModuli(prepared)
    expectClose(z.x.Z!, (100 * 200 ** 2) / 4, 1e-12)
    expectClose(z.y.Z!, (200 * 100 ** 2) / 4, 1e-12)
    expectClose(z.x.Mp!, 355 * 1_000_000, 1e-12)
    expect(z.method).toBe('geometric')
  })

  it('about the principal axes: a 60 x 150 rectangle turned 30° has Zu = 60·150²/4 and Zv = 150·60²/4 (closed form)', () => {
    const turn = (p: Point): Point => {
      const c = Math.cos(Math.PI / 6)
      const s = Math.sin(Math.PI / 6)
      return [c * p[0] - s * p[1], s * p[0] + c * p[1]]
    }
    const z = plasticModuli(prepareSection([{ outline: rect(-30, -75, 60, 150).map(turn) }]), 30)
    expectClose(z.u.Z!, (60 * 150 ** 2) / 4, 1e-10)
    expectClose(z.v.Z!, (150 * 60 ** 2) / 4, 1e-10)
  })
})

describe('plasticModuli: several materials', () => {
  const s355: Material = { E: 200_000, fy: 355, density: 7850 }
  const s235: Material = { E: 200_000, fy: 235, density: 7850 }

  it('fy on every region: the PNA halves the yield force and Z is in reference-material terms (Mp = fy_ref·Z)', () => {
    // Top plate 100 x 10 of S355 (reference, first part) on a bottom plate 100 x 10 of S235.
    // Forces: 355·1000 above y = 10, 235·1000 below: half = 295 000 N, so the PNA lies in the top
    // plate at 10 + t with 355·100·(10 - t) = 295 000, i.e. t = 10 - 295 000/35 500 = 1.6901... mm.
    const z = plastic([
      { outline: rect(0, 10, 100, 10), material: s355 },
      { outline: rect(0, 0, 100, 10), material: s235 },
    ])
    const t = 10 - 295_000 / 35_500
    expect(z.method).toBe('force')
    expectClose(z.pnaY, 10 + t, 1e-12)
    // Mp by hand: S355 above (100·(10 - t), arm (10 - t)/2), S355 below (100·t, arm t/2), S235 (1000, arm t + 5).
    const Mp = 355 * (100 * (10 - t) * ((10 - t) / 2) + 100 * t * (t / 2)) + 235 * 1000 * (t + 5)
    expectClose(z.x.Mp!, Mp, 1e-12)
    expectClose(z.x.Z!, Mp / 355, 1e-12)
  })

  it('fy missing on some region: no plastic capacity and a note naming the material (never E-weighted)', () => {
    const z = plastic([
      { outline: rect(0, 20, 100, 10), material: { E: 200_000, fy: 355 } },
      { outline: rect(0, 0, 100, 20), material: { name: 'Aluminium', E: 70_000 } },
    ])
    expect(z.method).toBe('unavailable')
    expect(z.x.Z).toBeNull()
    expect(z.x.Mp).toBeNull()
    expect(z.note).toMatch(/Aluminium has no yield strength fy/)
  })

  it('steel plate under a concrete slab (no tension, 0.85·fc): PNA and Mp in both senses by force balance (by hand)', () => {
    // Steel 200 x 20 (y 0..20, fy 355) under a slab 1000 x 100 (y 20..120, fc 30, stress block 0.85).
    const z = plastic([
      { outline: rect(0, 0, 200, 20), material: { E: 200_000, fy: 355 } },
      { outline: rect(-400, 20, 1000, 100), material: { name: 'Concrete', E: 30_000, fc: 30, noTension: true } },
    ])
    expect(z.method).toBe('force')
    // Below in compression: the slab above carries no tension, so the PNA halves the steel: y = 10,
    // Mp = 355·200·20²/4.
    expectClose(z.x.Mp!, (355 * 200 * 20 ** 2) / 4, 1e-9)
    // Above in compression: 0.85·30·1000·a = 355·4000, a = 55.686 mm; Mp = T·(PNA - 10) + C·a/2.
    const a = (355 * 4000) / (0.85 * 30 * 1000)
    const pna = 120 - a
    expectClose(z.x.MpNeg!, 355 * 4000 * (pna - 10) + 0.85 * 30 * 1000 * a * (a / 2), 1e-9)
    // Equivalent Z for the reference material (steel, the first part): the smaller Mp over its fy.
    expectClose(z.x.Z!, z.x.Mp! / 355, 1e-12)
  })
})

describe('plasticModuli about principal axes that are x and y', () => {
  it('theta = 90° (a wide plate: major axis vertical): Zu is Zy and Zv is Zx, the senses following the turned normals (closed form hb²/4, bh²/4)', () => {
    // 150 wide, 60 deep: Iyy > Ixx, so the major axis u is vertical (θ = 90°).
    const prepared = prepareSection([{ outline: rect(0, 0, 150, 60), material: { E: 200_000, fy: 355 } }])
    const z = plasticModuli(prepared, 90)
    expectClose(z.u.Z!, (60 * 150 ** 2) / 4, 1e-12)
    expectClose(z.v.Z!, (150 * 60 ** 2) / 4, 1e-12)
    // u's normal is (-1, 0): its PNA is the line -x = offset through the middle, x = 75.
    expectClose(z.u.offset, -75, 1e-12)
    expectClose(z.v.offset, 30, 1e-12)
  })
})

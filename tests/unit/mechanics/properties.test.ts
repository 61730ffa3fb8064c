import { polygonArea, polygonCentroid } from 'd3-polygon'
import earcut from 'earcut'
import { eigs } from 'mathjs'
import { describe, expect, it } from 'vitest'
import type { Point, Ring } from '../../../shared/geometry/types'
import { prepareSection } from '../../../shared/mechanics/prepare'
import { sectionProperties } from '../../../shared/mechanics/properties'
import { SectionError } from '../../../shared/mechanics/types'
import type { Material, PartInput, PreparedSection, SectionProperties } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'

const steel: Material = { name: 'Steel', E: 200_000, fy: 355, density: 7850 }
const aluminium: Material = { name: 'Aluminium', E: 70_000, fy: 200, density: 2700 }

/** Axis-aligned rectangle ring, CCW. */
function rect(x: number, y: number, w: number, h: number): Point[] {
  return [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]
}

/** Regular n-gon of circumradius R, CCW, first vertex on +x. */
function ngon(n: number, R: number, cx = 0, cy = 0): Point[] {
  return Array.from({ length: n }, (_, i): Point => [cx + R * Math.cos((2 * Math.PI * i) / n), cy + R * Math.sin((2 * Math.PI * i) / n)])
}

/** Notes §10, exact for the polygon itself: A = n R² sin(2π/n)/2, I = n R⁴ sin(2π/n)(2 + cos(2π/n))/24. */
function ngonExact(n: number, R: number): { A: number; I: number } {
  const s = Math.sin((2 * Math.PI) / n)
  return { A: (n * R * R * s) / 2, I: (n * R ** 4 * s * (2 + Math.cos((2 * Math.PI) / n))) / 24 }
}

interface Piece {
  x: number
  y: number
  w: number
  h: number
  /** Weight: n for a transformed section, -1 for a void. */
  k?: number
}

/** By hand, independently of Green's theorem: rectangles combined by the parallel-axis theorem. */
function byParallelAxis(pieces: readonly Piece[]): { A: number; xc: number; yc: number; Ixx: number; Iyy: number; Ixy: number } {
  let A = 0
  let Sx = 0
  let Sy = 0
  for (const { x, y, w, h, k = 1 } of pieces) {
    A += k * w * h
    Sx += k * w * h * (x + w / 2)
    Sy += k * w * h * (y + h / 2)
  }
  const xc = Sx / A
  const yc = Sy / A
  let Ixx = 0
  let Iyy = 0
  let Ixy = 0
  for (const { x, y, w, h, k = 1 } of pieces) {
    const dx = x + w / 2 - xc
    const dy = y + h / 2 - yc
    Ixx += k * ((w * h ** 3) / 12 + w * h * dy * dy)
    Iyy += k * ((h * w ** 3) / 12 + w * h * dx * dx)
    Ixy += k * w * h * dx * dy
  }
  return { A, xc, yc, Ixx, Iyy, Ixy }
}

function properties(parts: PartInput[], referenceE?: number): SectionProperties {
  return sectionProperties(prepareSection(parts, { referenceE }))
}

function expectMatches(p: SectionProperties, hand: ReturnType<typeof byParallelAxis>, rel = 1e-12): void {
  expectClose(p.area, hand.A, rel)
  expectClose(p.centroid.x, hand.xc, rel, 1)
  expectClose(p.centroid.y, hand.yc, rel, 1)
  expectClose(p.Ixx, hand.Ixx, rel)
  expectClose(p.Iyy, hand.Iyy, rel)
  expectClose(p.Ixy, hand.Ixy, rel, Math.max(hand.Ixx, hand.Iyy))
}

function transform(ring: readonly Point[], angleDeg: number, dx = 0, dy = 0): Point[] {
  const c = Math.cos((angleDeg * Math.PI) / 180)
  const s = Math.sin((angleDeg * Math.PI) / 180)
  return ring.map((p): Point => [c * p[0] - s * p[1] + dx, s * p[0] + c * p[1] + dy])
}

/** Angle difference reduced to (-90, 90] (axes have no direction). */
function axisDifference(a: number, b: number): number {
  let d = (a - b) % 180
  if (d <= -90) d += 180
  if (d > 90) d -= 180
  return d
}

// L 150 x 90 x 10 without root or toe radii: long leg up the y axis, short leg along x.
const angle: Point[] = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]
const angleByHand = byParallelAxis([{ x: 0, y: 0, w: 10, h: 150 }, { x: 10, y: 0, w: 80, h: 10 }])

describe('sectionProperties: closed forms (Gere & Goodno, Mechanics of Materials, appendix "properties of plane areas")', () => {
  const b = 100
  const h = 200
  const p = properties([{ outline: rect(10, 20, b, h), material: steel }])

  it('rectangle b x h: A = bh, Ixx = bh³/12, Iyy = hb³/12, Ixy = 0, centroid at its centre', () => {
    expectClose(p.area, b * h, 1e-15)
    expectClose(p.Ixx, (b * h ** 3) / 12, 1e-14)
    expectClose(p.Iyy, (h * b ** 3) / 12, 1e-14)
    expect(Math.abs(p.Ixy)).toBeLessThan(1e-14 * p.Ixx)
    expect(p.centroid).toEqual({ x: 60, y: 120 })
  })

  it('rectangle: S = bh²/6 to top and bottom, hb²/6 to left and right; Z = bh²/4 and hb²/4', () => {
    for (const S of [p.S.top, p.S.bottom]) expectClose(S, (b * h * h) / 6, 1e-14)
    for (const S of [p.S.left, p.S.right]) expectClose(S, (h * b * b) / 6, 1e-14)
    expectClose(p.Z.x, (b * h * h) / 4, 1e-12)
    expectClose(p.Z.y, (h * b * b) / 4, 1e-12)
    expectClose(p.pna.y, 120, 1e-12)
    expectClose(p.pna.x, 60, 1e-12)
  })

  it('rectangle: r = h/√12, principal axes along x (theta = 0), Ip = Ixx + Iyy, perimeter 2(b + h), mass = A·ρ', () => {
    expectClose(p.rx, h / Math.sqrt(12), 1e-14)
    expectClose(p.ry, b / Math.sqrt(12), 1e-14)
    expectClose(p.r1, p.rx, 1e-14)
    expectClose(p.r2, p.ry, 1e-14)
    expect(p.theta).toBe(0)
    expectClose(p.I1, p.Ixx, 1e-14)
    expectClose(p.I2, p.Iyy, 1e-14)
    expectClose(p.Ip, p.Ixx + p.Iyy, 1e-15)
    expect(p.perimeter).toBe(600)
    expectClose(p.massPerMetre!, b * h * 1e-6 * 7850, 1e-14) // 157 kg/m
    expect(p.equivalent).toBe(false)
    expect(p.referenceE).toBe(200_000)
    expect(p.bounds).toEqual({ minX: 10, minY: 20, maxX: 110, maxY: 220 })
  })

  it('a wide rectangle has its major axis vertical: theta = 90', () => {
    expect(properties([{ outline: rect(0, 0, 200, 100) }]).theta).toBe(90)
  })

  it('right triangle b x h: I_c = bh³/36, hb³/36, Ixy_c = -b²h²/72, centroid (b/3, h/3)', () => {
    const t = properties([{ outline: [[0, 0], [120, 0], [0, 90]] }])
    expectClose(t.area, (120 * 90) / 2, 1e-14)
    expectClose(t.centroid.x, 40, 1e-14)
    expectClose(t.centroid.y, 30, 1e-14)
    expectClose(t.Ixx, (120 * 90 ** 3) / 36, 1e-13)
    expectClose(t.Iyy, (90 * 120 ** 3) / 36, 1e-13)
    expectClose(t.Ixy, -(120 ** 2 * 90 ** 2) / 72, 1e-13)
    expectClose(t.S.top, t.Ixx / 60, 1e-14)
    expectClose(t.S.bottom, t.Ixx / 30, 1e-14)
  })

  it('720-gon R = 100 matches the regular n-gon formula; theta = 0 when I1 = I2', () => {
    const n = 720
    const c = properties([{ outline: ngon(n, 100) }])
    const exact = ngonExact(n, 100)
    expectClose(c.area, exact.A, 1e-13)
    expectClose(c.Ixx, exact.I, 1e-12)
    expectClose(c.Iyy, exact.I, 1e-12)
    expect(Math.abs(c.Ixy)).toBeLessThan(1e-12 * exact.I)
    expect(c.theta).toBe(0)
    expectClose(c.S.top, exact.I / 100, 1e-12) // a vertex sits at the top, y = R
    // And close to the circle itself: pi D^4/64 within the discretisation (relative error ~ (2pi/n)²/3... < 1e-4).
    expectClose(c.Ixx, (Math.PI * 200 ** 4) / 64, 1e-4)
  })

  it('tube as a 720-gon with a 720-gon hole: A and I are the differences of the n-gon formulas', () => {
    const n = 720
    const tube = properties([{ outline: ngon(n, 100), holes: [ngon(n, 80)] }])
    const outer = ngonExact(n, 100)
    const inner = ngonExact(n, 80)
    expectClose(tube.area, outer.A - inner.A, 1e-12)
    expectClose(tube.Ixx, outer.I - inner.I, 1e-12)
    expectClose(tube.Iyy, outer.I - inner.I, 1e-12)
    expectClose(tube.Ixx, (Math.PI * (200 ** 4 - 160 ** 4)) / 64, 1e-4) // pi (D^4 - d^4)/64 within the discretisation
  })
})

describe('sectionProperties: composites by the parallel-axis theorem, computed by hand from rectangles', () => {
  it('built-up I from 3 plates (2 flanges 200 x 20, web 10 x 360) as three parts of one material', () => {
    const p = properties([
      { outline: rect(0, 380, 200, 20), material: steel },
      { outline: rect(95, 20, 10, 360), material: steel },
      { outline: rect(0, 0, 200, 20), material: steel },
    ])
    expectMatches(p, byParallelAxis([{ x: 0, y: 380, w: 200, h: 20 }, { x: 95, y: 20, w: 10, h: 360 }, { x: 0, y: 0, w: 200, h: 20 }]))
    expectClose(p.S.top, p.Ixx / 200, 1e-14)
    // Plastic modulus by hand: flanges 2·(200·20)·190, web 10·360²/4.
    expectClose(p.Z.x, 2 * 200 * 20 * 190 + (10 * 360 ** 2) / 4, 1e-12)
    // The union has one outer boundary: 2·200 + 4·20 + 2·190 + 2·360.
    expectClose(p.perimeter, 1580, 1e-14)
  })

  it('box 200 x 300 with a 180 x 260 void drawn as a hole: Ixx = (BH³ - bh³)/12', () => {
    const p = properties([{ outline: rect(0, 0, 200, 300), holes: [rect(10, 20, 180, 260)] }])
    expectMatches(p, byParallelAxis([{ x: 0, y: 0, w: 200, h: 300 }, { x: 10, y: 20, w: 180, h: 260, k: -1 }]))
    expectClose(p.Ixx, (200 * 300 ** 3 - 180 * 260 ** 3) / 12, 1e-12)
  })

  it('Z-section 130 x 200 x 10 (one outline): Ixy ≠ 0 by hand, and the principal axes from README "Method"', () => {
    const outline: Point[] = [[-65, -100], [5, -100], [5, 90], [65, 90], [65, 100], [-5, 100], [-5, -90], [-65, -90]]
    const p = properties([{ outline }])
    const hand = byParallelAxis([{ x: -5, y: -100, w: 10, h: 200 }, { x: 5, y: 90, w: 60, h: 10 }, { x: -65, y: -100, w: 60, h: 10 }])
    expectMatches(p, hand)
    expectClose(hand.Ixy, 2 * 600 * 35 * 95, 1e-15) // 3 990 000 mm⁴, both flanges in quadrants 1 and 3
    const R = Math.hypot((hand.Ixx - hand.Iyy) / 2, hand.Ixy)
    expectClose(p.I1, (hand.Ixx + hand.Iyy) / 2 + R, 1e-12)
    expectClose(p.I2, (hand.Ixx + hand.Iyy) / 2 - R, 1e-12)
    expectClose(p.theta, (0.5 * Math.atan2(-2 * hand.Ixy, hand.Ixx - hand.Iyy) * 180) / Math.PI, 1e-12)
    // Ixy > 0 (flanges in quadrants 1 and 3): the major axis turns clockwise from x, away from the flanges' diagonal.
    expect(p.theta).toBeLessThan(0)
  })

  it('unequal angle L 150 x 90 x 10 (no radii): Ixx, Iyy, Ixy by hand', () => {
    expectMatches(properties([{ outline: angle }]), angleByHand)
  })
})

describe('sectionProperties: principal axes checked outside the formula', () => {
  const p = properties([{ outline: angle }])

  it('I1, I2 and theta of the L 150 x 90 x 10 equal mathjs eigs of [[Ixx, -Ixy], [-Ixy, Iyy]]', () => {
    // The second moment about an axis along u = (cos t, sin t) is uᵀ M u with this M.
    const result = eigs([[p.Ixx, -p.Ixy], [-p.Ixy, p.Iyy]])
    const pairs = result.eigenvectors.map(({ value, vector }) => ({ value: Number(value), vector: (vector as number[]).map(Number) }))
    pairs.sort((a, b) => b.value - a.value)
    expectClose(p.I1, pairs[0]!.value, 1e-12)
    expectClose(p.I2, pairs[1]!.value, 1e-12)
    const [ux, uy] = pairs[0]!.vector as [number, number]
    expect(Math.abs(axisDifference(p.theta, (Math.atan2(uy, ux) * 180) / Math.PI))).toBeLessThan(1e-9)
  })

  it('rotating the L by -theta makes x its major axis: Ixx = I1 and Ixy = 0 (the sign of theta is right)', () => {
    const turned = properties([{ outline: transform(angle, -p.theta) }])
    expectClose(turned.Ixx, p.I1, 1e-11)
    expectClose(turned.Iyy, p.I2, 1e-11)
    expect(Math.abs(turned.Ixy)).toBeLessThan(1e-11 * p.I1)
    expect(Math.abs(turned.theta)).toBeLessThan(1e-9)
  })
})

describe('sectionProperties: independent integrations (d3-polygon, earcut)', () => {
  // A non-convex outline with a hole, far from any symmetry.
  const outline: Point[] = [[0, 0], [140, -10], [170, 60], [110, 45], [120, 130], [40, 150], [-20, 80], [30, 50]]
  const hole: Point[] = [[60, 40], [100, 70], [70, 100], [50, 80]]
  const p = properties([{ outline, holes: [hole] }])

  it('area and centroid match d3-polygon polygonArea and polygonCentroid (outline minus hole)', () => {
    const Ao = Math.abs(polygonArea(outline as [number, number][]))
    const Ah = Math.abs(polygonArea(hole as [number, number][]))
    const co = polygonCentroid(outline as [number, number][])
    const ch = polygonCentroid(hole as [number, number][])
    expectClose(p.area, Ao - Ah, 1e-13)
    expectClose(p.centroid.x, (Ao * co[0] - Ah * ch[0]) / (Ao - Ah), 1e-12)
    expectClose(p.centroid.y, (Ao * co[1] - Ah * ch[1]) / (Ao - Ah), 1e-12)
  })

  it('Ixx, Iyy, Ixy match earcut triangles summed by the triangle closed forms', () => {
    const flat = [...outline, ...hole].flatMap((q) => [q[0], q[1]])
    const triangles = earcut(flat, [outline.length])
    let A = 0
    let Sx = 0
    let Sy = 0
    let Jxx = 0
    let Jyy = 0
    let Jxy = 0
    for (let t = 0; t < triangles.length; t += 3) {
      const [x1, y1, x2, y2, x3, y3] = [0, 1, 2].flatMap((k) => [flat[2 * triangles[t + k]!]!, flat[2 * triangles[t + k]! + 1]!]) as number[]
      const a = Math.abs((x2! - x1!) * (y3! - y1!) - (x3! - x1!) * (y2! - y1!)) / 2
      A += a
      Sx += (a * (x1! + x2! + x3!)) / 3
      Sy += (a * (y1! + y2! + y3!)) / 3
      Jxx += (a / 6) * (y1! ** 2 + y2! ** 2 + y3! ** 2 + y1! * y2! + y2! * y3! + y3! * y1!)
      Jyy += (a / 6) * (x1! ** 2 + x2! ** 2 + x3! ** 2 + x1! * x2! + x2! * x3! + x3! * x1!)
      Jxy += (a / 12) * (2 * x1! * y1! + 2 * x2! * y2! + 2 * x3! * y3! + x1! * y2! + x2! * y1! + x1! * y3! + x3! * y1! + x2! * y3! + x3! * y2!)
    }
    const xc = Sx / A
    const yc = Sy / A
    expectClose(p.area, A, 1e-12)
    expectClose(p.Ixx, Jxx - A * yc * yc, 1e-10)
    expectClose(p.Iyy, Jyy - A * xc * xc, 1e-10)
    expectClose(p.Ixy, Jxy - A * xc * yc, 1e-10)
  })
})

describe('sectionProperties: invariances', () => {
  const base = properties([{ outline: angle }])

  it('translation to x = y = 5e6 mm leaves centroidal I and Z unchanged (to 1e-9)', () => {
    const far = properties([{ outline: transform(angle, 0, 5e6, 5e6) }])
    expectClose(far.centroid.x, base.centroid.x + 5e6, 1e-15)
    expectClose(far.centroid.y, base.centroid.y + 5e6, 1e-15)
    for (const key of ['area', 'Ixx', 'Iyy', 'Ixy', 'I1', 'I2', 'theta'] as const) expectClose(far[key], base[key], 1e-9)
    expectClose(far.Z.x, base.Z.x, 1e-9)
    expectClose(far.Z.y, base.Z.y, 1e-9)
    expectClose(far.S.top, base.S.top, 1e-9)
  })

  it('rotation by 30° keeps I1, I2 and area and turns theta by 30°', () => {
    const turned = properties([{ outline: transform(angle, 30, 12, -7) }])
    expectClose(turned.area, base.area, 1e-13)
    expectClose(turned.I1, base.I1, 1e-11)
    expectClose(turned.I2, base.I2, 1e-11)
    expect(Math.abs(axisDifference(turned.theta, base.theta + 30))).toBeLessThan(1e-9)
  })

  it('a clockwise outline (reversed orientation) gives the same results', () => {
    const reversed = properties([{ outline: angle.slice().reverse() }])
    for (const key of ['area', 'Ixx', 'Iyy', 'Ixy', 'theta', 'perimeter'] as const) expectClose(reversed[key], base[key], 1e-13)
    expectClose(reversed.Z.x, base.Z.x, 1e-12)
  })
})

describe('sectionProperties: transformed sections and mass', () => {
  // Steel plate 200 x 10 on an aluminium block 100 x 100; steel listed first, so E_ref = 200 000 MPa.
  const parts: PartInput[] = [
    { name: 'Plate', outline: rect(-50, 100, 200, 10), material: steel },
    { name: 'Block', outline: rect(0, 0, 100, 100), material: aluminium },
  ]

  it('equivalent area, centroid and Ixx with n = E_al/E_steel = 0.35, by hand', () => {
    const p = properties(parts)
    const n = 70_000 / 200_000
    expectMatches(p, byParallelAxis([{ x: -50, y: 100, w: 200, h: 10 }, { x: 0, y: 0, w: 100, h: 100, k: n }]))
    expectClose(p.area, 2000 + n * 10_000, 1e-14) // 5500 mm² of equivalent steel
    expectClose(p.centroid.y, 70, 1e-14)
    expect(p.equivalent).toBe(true)
    expect(p.referenceE).toBe(200_000)
  })

  it('referenceE = 70 000 expresses the same section in aluminium: area scaled by E_steel/E_al', () => {
    const p = properties(parts, 70_000)
    expectClose(p.area, 2000 * (200 / 70) + 10_000, 1e-14)
    expectClose(p.centroid.y, 70, 1e-14)
    expect(p.referenceE).toBe(70_000)
  })

  it('massPerMetre uses the real areas: 2000 mm²·7850 + 10 000 mm²·2700 = 42.7 kg/m', () => {
    expectClose(properties(parts).massPerMetre!, 2000e-6 * 7850 + 10_000e-6 * 2700, 1e-14)
  })

  it('massPerMetre is null when a part has no density', () => {
    expect(properties([{ outline: rect(0, 0, 10, 10), material: { E: 200_000 } }]).massPerMetre).toBeNull()
  })

  it('a single material with a different E_ref is labelled equivalent', () => {
    expect(properties([{ outline: rect(0, 0, 10, 10), material: steel }], 100_000).equivalent).toBe(true)
  })
})

describe('sectionProperties: rejection', () => {
  it('sectionProperties throws SectionError when the prepared section has no area', () => {
    const empty: PreparedSection = {
      regions: [],
      referenceE: 200_000,
      origin: [0, 0],
      bounds: { minX: 0, minY: 0, maxX: 0, maxY: 0 },
      hull: [] as Ring,
      parts: [],
      warnings: [],
    }
    expect(() => sectionProperties(empty)).toThrow(SectionError)
  })
})

import { describe, expect, it } from 'vitest'
import { polygonMoments } from '../../../shared/geometry/moments'
import type { Ring } from '../../../shared/geometry/types'
import {
  inKern,
  kernMargin,
  neutralAxis,
  planeExtremes,
  resultantActions,
  sectionStress,
  stressPlane,
  tensionOnset,
} from '../../../shared/mechanics/stress'
import type { InertiaLike } from '../../../shared/mechanics/stress'
import { SectionError } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'
import { composite } from '../../support/sections'

/** Axis-aligned rectangle ring, CCW. */
function rect(x0: number, y0: number, x1: number, y1: number): Ring {
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]]
}

/** Closed form (README "Method"): rectangle b×h centred at (cx, cy): A = bh, I = bh³/12, Ixy = 0. */
function rectProps(b: number, h: number, cx = 0, cy = 0): InertiaLike {
  return { area: b * h, centroid: { x: cx, y: cy }, Ixx: (b * h ** 3) / 12, Iyy: (h * b ** 3) / 12, Ixy: 0 }
}


const at = (plane: { a: number; b: number; c: number }, x: number, y: number) => plane.a + plane.b * x + plane.c * y

describe('resultantActions', () => {
  const props = { centroid: { x: 10, y: 20 } }

  it('resultantActions(one load) gives N = -P, Mx = N·(y - yc), My = N·(x - xc) (README "Method")', () => {
    const r = resultantActions(props, [{ P: 1000, x: 40, y: 5 }])
    expect(r.N).toBe(-1000)
    expect(r.P).toBe(1000)
    expectClose(r.Mx, -1000 * (5 - 20)) // README "Method" by hand: +15 000 N·mm
    expectClose(r.My, -1000 * (40 - 10)) // README "Method" by hand: -30 000 N·mm
    expectClose(r.ex!, 30)
    expectClose(r.ey!, -15)
  })

  it('resultantActions(several loads, applied moments) adds them and folds the moments into the eccentricity', () => {
    const r = resultantActions(props, [{ P: 100, x: 10, y: 20 }, { P: 300, x: 30, y: 20 }], { Mx: 800, My: 0 })
    expectClose(r.N, -400)
    expectClose(r.My, -300 * 20) // by hand: only the second load is eccentric in x
    expectClose(r.Mx, 800)
    expectClose(r.ex!, 15) // by hand: (300·20)/400
    expectClose(r.ey!, -2) // by hand: -Mx/P = -800/400
  })

  it.each([
    ['no loads', []],
    ['a pure couple (P = +100 and -100)', [{ P: 100, x: 0, y: 0 }, { P: -100, x: 0, y: 50 }]],
  ])('resultantActions(%s) gives a null eccentricity, never NaN', (_name, loads) => {
    const r = resultantActions(props, loads)
    expect(r.ex).toBeNull()
    expect(r.ey).toBeNull()
    expect(Number.isFinite(r.Mx) && Number.isFinite(r.My) && Number.isFinite(r.N)).toBe(true)
  })
})

describe('stressPlane', () => {
  const b = 300
  const h = 500
  const cx = 5_000_000 // far from the origin: the plane must still be right in section coordinates
  const cy = -2_000_000
  const props = rectProps(b, h, cx, cy)

  it.each([
    // [name, N, Mx, My, x from centroid, y from centroid, expected]
    ['N only: -P/A', -1.5e6, 0, 0, 150, 250, -1.5e6 / (b * h)],
    ['Mx at the top fibre: Mx/S, S = bh²/6 (closed form)', 0, 2e8, 0, 0, h / 2, 2e8 / ((b * h * h) / 6)],
    ['My at the right fibre: My/S, S = hb²/6 (closed form)', 0, 0, 3e7, b / 2, 0, 3e7 / ((h * b * b) / 6)],
    ['N + Mx + My at the bottom-left corner', -1e6, 5e7, -2e7, -b / 2, -h / 2, -1e6 / (b * h) - 5e7 / ((b * h * h) / 6) + 2e7 / ((h * b * b) / 6)],
  ])('stressPlane(rectangle, %s)', (_name, N, Mx, My, dx, dy, expected) => {
    const plane = stressPlane(props, N, Mx, My)!
    expectClose(at(plane, cx + dx, cy + dy), expected, 1e-7, 1e-6)
  })

  // Unequal angle L 150×90×10: Ixy ≠ 0, properties by the parallel-axis theorem by hand.
  const angleRects = [[0, 0, 10, 150], [10, 0, 90, 10]] as const
  const angle = composite(angleRects)
  const angleRing: Ring = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]

  it.each([
    ['Mx only', 0, 1e7, 0],
    ['My only', 0, 0, 1e7],
    ['N and both moments', -2e5, -3e6, 4e6],
  ])('stressPlane(unequal angle, %s) is in equilibrium with N, Mx, My (independent integration, README "Method")', (_n, N, Mx, My) => {
    const plane = stressPlane(angle, N, Mx, My)!
    // ∫σ dA, ∫σ·(y - yc) dA, ∫σ·(x - xc) dA from the ring's own Green's moments about the centroid.
    const m = polygonMoments([angleRing], [angle.centroid.x, angle.centroid.y])
    const s0 = at(plane, angle.centroid.x, angle.centroid.y)
    // Zero-valued actions are compared on the scale of the others (force ~ moment / 100 mm).
    const forceScale = Math.abs(N) + (Math.abs(Mx) + Math.abs(My)) / 100
    const momentScale = Math.abs(Mx) + Math.abs(My) + 100 * Math.abs(N)
    expectClose(s0 * m.A + plane.b * m.Qy + plane.c * m.Qx, N, 1e-9, forceScale)
    expectClose(s0 * m.Qx + plane.b * m.Jxy + plane.c * m.Jxx, Mx, 1e-9, momentScale)
    expectClose(s0 * m.Qy + plane.b * m.Jyy + plane.c * m.Jxy, My, 1e-9, momentScale)
  })

  it('stressPlane(unequal angle, Mx) differs from the symmetric formula Mx·y/Ixx (the classic error, README "Method")', () => {
    const plane = stressPlane(angle, 0, 1e7, 0)!
    const y = 150 - angle.centroid.y
    const naive = (1e7 * y) / angle.Ixx
    expect(Math.abs(at(plane, 0, 150) - naive) / Math.abs(naive)).toBeGreaterThan(0.05)
  })

  it.each([
    ['zero area', { ...props, area: 0 }],
    ['D = Ixx·Iyy - Ixy² = 0', { ...props, Ixx: 4, Iyy: 9, Ixy: 6 }],
    ['NaN inertia', { ...props, Ixx: Number.NaN }],
  ])('stressPlane(%s) returns null', (_n, bad) => {
    expect(stressPlane(bad, -1, 1, 1)).toBeNull()
  })
})

describe('planeExtremes and neutralAxis', () => {
  const hull = rect(0, 0, 4, 2)

  it('planeExtremes(plane, hull) finds the max and min on hull vertices (by hand)', () => {
    const ext = planeExtremes({ a: 1, b: 2, c: -3 }, hull)!
    expect(ext.max).toEqual({ value: 9, x: 4, y: 0 }) // 1 + 8 - 0
    expect(ext.min).toEqual({ value: -5, x: 0, y: 2 }) // 1 + 0 - 6
  })

  it('planeExtremes(plane, empty hull) returns null', () => {
    expect(planeExtremes({ a: 1, b: 0, c: 0 }, [])).toBeNull()
  })

  it.each([
    ['x = 0.5', { a: -1, b: 2, c: 0 }, { a: -0.5, b: 1, c: 0 }],
    ['3x + 4y = 10', { a: -10, b: 3, c: 4 }, { a: -2, b: 0.6, c: 0.8 }],
  ])('neutralAxis(%s) is normalised so sqrt(b² + c²) = 1 (by hand)', (_n, plane, expected) => {
    const line = neutralAxis(plane)!
    expectClose(line.a, expected.a)
    expectClose(line.b, expected.b, 1e-12, 1e-12)
    expectClose(line.c, expected.c, 1e-12, 1e-12)
  })

  it.each([
    ['uniform stress', { a: -3, b: 0, c: 0 }],
    ['zero stress', { a: 0, b: 0, c: 0 }],
    ['a round-off gradient', { a: -3, b: 1e-20, c: 0 }],
  ])('neutralAxis(%s) returns null', (_n, plane) => {
    expect(neutralAxis(plane, 100)).toBeNull()
  })
})

describe('inKern, tensionOnset, kernMargin', () => {
  const b = 600
  const h = 300
  const cx = 1000
  const cy = 2000
  const props = rectProps(b, h, cx, cy)
  const hull = rect(cx - b / 2, cy - h / 2, cx + b / 2, cy + h / 2)

  it.each([
    ['the centroid', 0, 0, true],
    ['the kern vertex b/6 (standard kern result, on the boundary counts as in)', b / 6, 0, true],
    ['just past b/6', b / 6 * 1.001, 0, false],
    ['the rhombus edge midpoint (b/12, h/12)', b / 12, h / 12, true],
    ['just past the rhombus edge', (b / 12) * 1.01, (h / 12) * 1.01, false],
    ['the kern vertex -h/6', 0, -h / 6, true],
    ['far outside', 0, h, false],
  ])('inKern(rectangle, %s) is %s', (_n, ex, ey, expected) => {
    expect(inKern(props, hull, ex, ey)).toBe(expected)
  })

  it('inKern(degenerate properties) is false', () => {
    expect(inKern({ ...props, area: 0 }, hull, 0, 0)).toBe(false)
  })

  it('tensionOnset(from the centroid along +x) travels b/6 and the left edge goes into tension (standard kern result)', () => {
    const onset = tensionOnset(props, hull, 0, 0, 2, 0)! // direction need not be unit
    expectClose(onset.distance, b / 6)
    expect(onset.x).toBe(cx - b / 2)
    expect(onset.startsInTension).toBe(false)
  })

  it('tensionOnset(from the centroid along the diagonal) reaches the rhombus edge x/(b/6) + y/(h/6) = 1 (by hand)', () => {
    const onset = tensionOnset(props, hull, 0, 0, 1, 1)!
    // t/√2·(6/b + 6/h) = 1
    expectClose(onset.distance, Math.SQRT2 / (6 / b + 6 / h))
    expect([onset.x, onset.y]).toEqual([cx - b / 2, cy - h / 2])
  })

  it('tensionOnset(from outside the kern) reports distance 0 and the most tensile vertex', () => {
    const onset = tensionOnset(props, hull, 0, h / 2, 1, 0)!
    expect(onset.distance).toBe(0)
    expect(onset.startsInTension).toBe(true)
    expect(onset.y).toBe(cy - h / 2)
  })

  it('tensionOnset(zero direction) returns null', () => {
    expect(tensionOnset(props, hull, 0, 0, 0, 0)).toBeNull()
  })

  const square: Ring = [[0, 0], [1, 0], [1, 1], [0, 1]]
  it.each([
    ['the centre', 0.5, 0.5, 0.5],
    ['near the bottom edge', 0.5, 0.1, 0.1],
    ['outside beside an edge', 2, 0.5, -1],
    ['outside beyond a corner', 2, 2, -Math.SQRT2],
    ['on the boundary', 1, 0.5, 0],
  ])('kernMargin(unit square, %s) is the signed distance (by hand)', (_n, x, y, expected) => {
    expectClose(kernMargin(square, x, y)!, expected, 1e-12, 1e-12)
  })

  it('kernMargin(fewer than 3 vertices) returns null', () => {
    expect(kernMargin([[0, 0], [1, 0]], 0, 0)).toBeNull()
  })
})

describe('sectionStress', () => {
  const b = 400
  const h = 200
  const props = rectProps(b, h, 0, 0)
  const ring = rect(-b / 2, -h / 2, b / 2, h / 2)

  it('sectionStress(rectangle, load at the kern vertex b/6) gives 2P/A and zero at the far edge (standard kern result)', () => {
    const P = 8e5
    const r = sectionStress(props, ring, [{ n: 1, polygons: [[ring]], region: 0 }], [{ P, x: b / 6, y: 0 }])
    expectClose(r.min.value, (-2 * P) / (b * h)) // closed form: P/A·(1 + 6e/b) with e = b/6
    expect(r.min.x).toBe(b / 2)
    expectClose(r.max.value, 0, 1, 1e-9)
    expect(r.max.x).toBe(-b / 2)
    expect(r.inKern).toBe(true)
    expect(r.vertices).toHaveLength(1)
    expect(r.vertices[0]!.values).toHaveLength(4)
    // Each vertex's value is the plane at that vertex: -P/A (1 + 12 e x / b²), from P/A + P e x / Iyy with Iyy = h b³/12 (closed form).
    r.vertices[0]!.values.forEach((v, i) => expectClose(v, (-P / (b * h)) * (1 + (12 * (b / 6) * ring[i]![0]) / b ** 2)))
    expect(r.neutralAxis).not.toBeNull()
    expectClose(-r.neutralAxis!.a / r.neutralAxis!.b, -b / 2) // the line x = -b/2
  })

  it('sectionStress(two materials, centric load) gives n times the equivalent stress in each part (transformed section by hand)', () => {
    // Plate 1 (n = 1) 100×20 on y ∈ [0, 20]; plate 2 (n = 2) 100×20 on y ∈ [20, 40]. Equivalent: A = 2000 + 4000.
    const r1 = rect(0, 0, 100, 20)
    const r2 = rect(0, 20, 100, 40)
    const Aeq = 2000 + 2 * 2000
    const yc = (2000 * 10 + 4000 * 30) / Aeq
    const Ixx = (100 * 20 ** 3) / 12 + 2000 * (10 - yc) ** 2 + 2 * ((100 * 20 ** 3) / 12 + 2000 * (30 - yc) ** 2)
    const Iyy = 3 * ((20 * 100 ** 3) / 12)
    const eq: InertiaLike = { area: Aeq, centroid: { x: 50, y: yc }, Ixx, Iyy, Ixy: 0 }
    const hull = rect(0, 0, 100, 40)
    const P = 6e5
    const r = sectionStress(eq, hull, [{ n: 1, polygons: [[r1]], region: 0 }, { n: 2, polygons: [[r2]], region: 1 }], [{ P, x: 50, y: yc }])
    for (const v of r.vertices) for (const value of v.values) expectClose(value, (v.region === 0 ? -1 : -2) * (P / Aeq))
    expectClose(r.min.value, (-2 * P) / Aeq)
    expectClose(r.max.value, -P / Aeq)
    expect(r.neutralAxis).toBeNull() // uniform strain
    expect(r.vertices.filter((v) => v.region === 1).flatMap((v) => v.values)).toHaveLength(4)
  })

  it('sectionStress(hole rings) numbers the rings of a region in order', () => {
    const hole: Ring = [[-10, -10], [-10, 10], [10, 10], [10, -10]]
    const r = sectionStress(props, ring, [{ n: 1, polygons: [[ring, hole]], region: 3 }], [{ P: 1, x: 0, y: 0 }])
    expect(r.vertices.map((v) => [v.region, v.polygon, v.ring, v.values.length])).toEqual([[3, 0, 0, 4], [3, 0, 1, 4]])
  })

  it('sectionStress(pure moment, P = 0) is not "in the kern" and has a neutral axis through the centroid', () => {
    const r = sectionStress(props, ring, [{ n: 1, polygons: [[ring]], region: 0 }], [], { Mx: 1e6, My: 0 })
    expect(r.inKern).toBe(false)
    expectClose(r.max.value, (1e6 * (h / 2)) / props.Ixx) // Mx·y/Ixx (closed form, Ixy = 0)
    expectClose(r.neutralAxis!.a, 0, 1, 1e-12)
  })

  it('sectionStress(no loads) gives zeros and no neutral axis, never NaN', () => {
    const r = sectionStress(props, ring, [{ n: 1, polygons: [[ring]], region: 0 }], [])
    expect(r.max.value).toBe(0)
    expect(r.min.value).toBe(0)
    expect(r.neutralAxis).toBeNull()
    expect(r.inKern).toBe(false)
  })

  it('sectionStress(degenerate properties) throws a SectionError', () => {
    expect(() => sectionStress({ ...props, Ixx: 0 }, ring, [], [{ P: 1, x: 0, y: 0 }])).toThrow(SectionError)
  })
})


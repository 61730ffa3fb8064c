import { describe, expect, it } from 'vitest'
import { clipRingHalfPlane } from '../../../shared/geometry/clip'
import { addRingMoments, zeroMoments } from '../../../shared/geometry/moments'
import type { Point, Ring } from '../../../shared/geometry/types'
import { solveContact } from '../../../shared/mechanics/contact'
import type { InertiaLike } from '../../../shared/mechanics/stress'
import type { ContactResult, PointLoad } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'

function rect(x0: number, y0: number, x1: number, y1: number): Ring {
  return [[x0, y0], [x1, y0], [x1, y1], [x0, y1]]
}

function ngon(n: number, R: number, cx = 0, cy = 0): Ring {
  return Array.from({ length: n }, (_, i) => [cx + R * Math.cos((2 * Math.PI * i) / n), cy + R * Math.sin((2 * Math.PI * i) / n)] as const)
}

/**
 * Independent equilibrium check: integrates the returned plane over the rings clipped to q >= 0
 * (in coordinates local to `o`), and returns the residuals scaled by P and P·extent.
 */
function residuals(rings: Ring | readonly Ring[], r: ContactResult, loads: readonly PointLoad[], o: Point, extent: number): number[] {
  const list = (typeof rings[0]![0] === 'number' ? [rings] : rings) as readonly Ring[]
  const { a, b, c } = r.plane!
  const a0 = a + b * o[0] + c * o[1]
  const m = zeroMoments()
  for (const ring of list) addRingMoments(m, clipRingHalfPlane(ring.map(([x, y]) => [x - o[0], y - o[1]] as const), a0, b, c))
  const F = a0 * m.A + b * m.Qy + c * m.Qx
  const Fx = a0 * m.Qy + b * m.Jyy + c * m.Jxy
  const Fy = a0 * m.Qx + b * m.Jxy + c * m.Jxx
  const P = loads.reduce((s, l) => s + l.P, 0)
  const Px = loads.reduce((s, l) => s + l.P * (l.x - o[0]), 0)
  const Py = loads.reduce((s, l) => s + l.P * (l.y - o[1]), 0)
  return [(F - P) / P, (Fx - Px) / (P * extent), (Fy - Py) / (P * extent)]
}

describe('solveContact: rectangular footing B×L, load on the long axis (closed form, README "Method" footing)', () => {
  const B = 1200 // along x
  const L = 2400 // along y
  const cx = 350_000 // far from the origin, to exercise the local shift
  const cy = -120_000
  const ring = rect(cx - B / 2, cy - L / 2, cx + B / 2, cy + L / 2)
  const props: InertiaLike = { area: B * L, centroid: { x: cx, y: cy }, Ixx: (B * L ** 3) / 12, Iyy: (L * B ** 3) / 12, Ixy: 0 }
  const regions = [{ n: 1, polygons: [[ring]] }]
  const P = 1.5e6

  it.each([0, L / 24, L / 12, L / 6])('e = %d mm (<= L/6): full contact, q = P/(BL)(1 ± 6e/L)', (e) => {
    const r = solveContact(props, regions, ring, [{ P, x: cx, y: cy + e }])
    expect(r.status).toBe('full')
    expect(r.converged).toBe(true)
    expect(r.liftOff).toBeNull()
    expectClose(r.area!, B * L)
    expectClose(r.peak!.value, (P / (B * L)) * (1 + (6 * e) / L))
    const { a, b, c } = r.plane!
    expectClose(a + b * cx + c * (cy - L / 2), (P / (B * L)) * (1 - (6 * e) / L), 1e-9, P / (B * L))
  })

  it.each([0.17, 0.2, 0.25, 0.3, 0.4, 0.45, 0.49])('e = %f·L (> L/6): contact length 3(L/2 - e), q_max = 2P/(3B(L/2 - e))', (f) => {
    const e = f * L
    const r = solveContact(props, regions, ring, [{ P, x: cx, y: cy + e }])
    expect(r.status).toBe('partial')
    expect(r.converged).toBe(true)
    const contact = 3 * (L / 2 - e)
    expectClose(r.area!, B * contact, 1e-8)
    expectClose(r.peak!.value, (2 * P) / (3 * B * (L / 2 - e)), 1e-8)
    expectClose(r.peak!.y, cy + L / 2)
    // Lift-off line y = cy + L/2 - contact, normalised.
    const line = r.liftOff!
    expectClose(Math.hypot(line.b, line.c), 1)
    expectClose(-line.a / line.c, cy + L / 2 - contact, 1e-10)
    expect(Math.abs(line.b)).toBeLessThan(1e-9)
    for (const res of residuals(ring, r, [{ P, x: cx, y: cy + e }], [cx, cy], L)) expect(Math.abs(res)).toBeLessThan(1e-9)
  })

  it('e = 0.35·B along the short axis: the same closed form with B and L swapped', () => {
    const e = 0.35 * B
    const r = solveContact(props, regions, ring, [{ P, x: cx - e, y: cy }])
    expect(r.status).toBe('partial')
    expectClose(r.area!, L * 3 * (B / 2 - e), 1e-8)
    expectClose(r.peak!.value, (2 * P) / (3 * L * (B / 2 - e)), 1e-8)
    expectClose(r.peak!.x, cx - B / 2)
  })

  it.each([1, 1e-2, 1e-3])('a load %f mm from the edge (a sliver of contact) still meets the closed form', (gap) => {
    const e = L / 2 - gap
    const r = solveContact(props, regions, ring, [{ P, x: cx + 100, y: cy + e }, { P, x: cx - 100, y: cy + e }])
    expect(r.converged).toBe(true)
    expectClose(r.area!, B * 3 * gap, 1e-6)
    expectClose(r.peak!.value, (2 * 2 * P) / (3 * B * gap), 1e-6)
  })

  it('a load within 1e-7 of the base size from the edge counts as on the edge: overturning', () => {
    expect(solveContact(props, regions, ring, [{ P, x: cx, y: cy + L / 2 - 1e-5 }]).status).toBe('overturning')
  })

  it('two loads whose resultant is at e = 0.3·L give the single-load answer', () => {
    const e = 0.3 * L
    const r = solveContact(props, regions, ring, [{ P: P / 2, x: cx, y: cy + e - 100 }, { P: P / 2, x: cx, y: cy + e + 100 }])
    expectClose(r.peak!.value, (2 * P) / (3 * B * (L / 2 - e)), 1e-8)
  })
})

describe('solveContact: biaxial loads on a rectangle', () => {
  const B = 1000
  const L = 2000
  const ring = rect(-B / 2, -L / 2, B / 2, L / 2)
  const props: InertiaLike = { area: B * L, centroid: { x: 0, y: 0 }, Ixx: (B * L ** 3) / 12, Iyy: (L * B ** 3) / 12, Ixy: 0 }
  const regions = [{ n: 1, polygons: [[ring]] }]
  const P = 2e6

  // Triangular contact at the corner (B/2, L/2) with legs s, t and q zero on the hypotenuse: the pressure
  // volume is a tetrahedron, volume q_max·s·t/6 = P, centroid s/4 and t/4 from the corner (by hand). So a
  // load at distances (u, v) from the corner gives legs s = 4u, t = 4v and q_max = 6P/(s·t), if s <= B, t <= L.
  it.each([
    [100, 150],
    [50, 400],
    [200, 250],
    [240, 480],
  ])('a load %d, %d mm from the corner gives a triangular contact with legs 4u, 4v (tetrahedron by hand)', (u, v) => {
    const load = { P, x: B / 2 - u, y: L / 2 - v }
    const r = solveContact(props, regions, ring, [load])
    const s = 4 * u
    const t = 4 * v
    expect(r.status).toBe('partial')
    expect(r.converged).toBe(true)
    expectClose(r.area!, (s * t) / 2, 1e-8)
    expectClose(r.peak!.value, (6 * P) / (s * t), 1e-8)
    expect([r.peak!.x, r.peak!.y]).toEqual([B / 2, L / 2])
    const line = r.liftOff!
    const legEnds: Point[] = [[B / 2 - s, L / 2], [B / 2, L / 2 - t]]
    for (const [x, y] of legEnds) expect(Math.abs(line.a + line.b * x + line.c * y)).toBeLessThan(1e-6)
  })

  it.each([
    [0.15, 0.12],
    [-0.2, 0.3],
    [0.3, -0.05],
    [-0.45, -0.45],
    [0.05, 0.48],
  ])('a load at (%f·B, %f·L) satisfies the three equilibrium equations to 1e-9 (independent integration)', (fx, fy) => {
    const load = { P, x: fx * B, y: fy * L }
    const r = solveContact(props, regions, ring, [load])
    expect(r.status).not.toBe('overturning')
    expect(r.converged).toBe(true)
    for (const res of residuals(ring, r, [load], [0, 0], Math.hypot(B, L) / 2)) expect(Math.abs(res)).toBeLessThan(1e-9)
    const { a, b, c } = r.plane!
    // Compression-positive plane: the peak is the largest q on the base.
    for (const [x, y] of ring) expect(a + b * x + c * y).toBeLessThanOrEqual(r.peak!.value * (1 + 1e-12))
  })

  it('a load exactly on the kern boundary (B/12, L/12 on the rhombus edge) is full contact (standard kern result)', () => {
    const r = solveContact(props, regions, ring, [{ P, x: B / 12, y: L / 12 }])
    expect(r.status).toBe('full')
    expectClose(r.peak!.value, (P / (B * L)) * (1 + 6 / 12 + 6 / 12)) // P/A(1 + 6ex/B + 6ey/L), closed form
  })

  it('a load inside the kern is full contact with the whole area', () => {
    const r = solveContact(props, regions, ring, [{ P, x: B / 20, y: -L / 30 }])
    expect(r.status).toBe('full')
    expectClose(r.area!, B * L)
    expect(r.iterations).toBe(0)
  })

  it('a weight n = 2 on the only material halves the equivalent plane but not the physical pressure', () => {
    const one = solveContact(props, regions, ring, [{ P, x: 0, y: 0.3 * L }])
    const two = solveContact({ ...props, area: 2 * B * L }, [{ n: 2, polygons: [[ring]] }], ring, [{ P, x: 0, y: 0.3 * L }])
    expectClose(two.peak!.value, one.peak!.value, 1e-9)
    expectClose(two.plane!.c, one.plane!.c / 2, 1e-9)
    expectClose(two.area!, one.area!, 1e-9)
  })

  it('maxIter = 0 (no Newton step) on a biaxial case reports converged = false with a message and finite numbers', () => {
    const r = solveContact(props, regions, ring, [{ P, x: 0.3 * B, y: 0.2 * L }], { maxIter: 0 })
    expect(r.status).toBe('partial')
    expect(r.converged).toBe(false)
    expect(r.message).toMatch(/did not converge/)
    expect(Number.isFinite(r.peak!.value) && Number.isFinite(r.area!)).toBe(true)
  })

  it.each([
    ['outside the hull', [{ P, x: 0, y: 0.6 * L }], /outside the base/],
    ['on the hull edge', [{ P, x: 0, y: L / 2 }], /outside the base/],
    ['beyond a corner', [{ P, x: B, y: L }], /outside the base/],
    ['P = 0', [{ P: 0, x: 0, y: 0 }], /must be compressive/],
    ['net tension', [{ P: -P, x: 0, y: 0 }], /must be compressive/],
    ['a pure couple', [{ P, x: 0, y: 100 }, { P: -P, x: 0, y: -100 }], /must be compressive/],
    ['no loads', [], /must be compressive/],
  ])('a load %s is overturning with null numbers and a message', (_n, loads, message) => {
    const r = solveContact(props, regions, ring, loads)
    expect(r.status).toBe('overturning')
    expect([r.area, r.peak, r.plane, r.liftOff]).toEqual([null, null, null, null])
    expect(r.message).toMatch(message)
  })
})

describe('solveContact: circular base', () => {
  const R = 1000
  const n = 2048
  const ring = ngon(n, R)
  // Notes §10 regular n-gon (exact for the polygon).
  const A = (n * R * R * Math.sin((2 * Math.PI) / n)) / 2
  const I = (n * R ** 4 * Math.sin((2 * Math.PI) / n) * (2 + Math.cos((2 * Math.PI) / n))) / 24
  const props: InertiaLike = { area: A, centroid: { x: 0, y: 0 }, Ixx: I, Iyy: I, Ixy: 0 }
  const regions = [{ n: 1, polygons: [[ring]] }]
  const P = 1e6

  /**
   * Independent 1-D solution for the exact circle: contact x > x0, q = k·(x - x0). The eccentricity
   * e = ∫(x - x0)·x dA / ∫(x - x0) dA over the segment is found by bisection on x0, integrating with
   * x = R·cos φ (width 2R sin φ) by Simpson's rule.
   */
  function circleContact(e: number): { x0: number; qmax: number } {
    const moments = (x0: number) => {
      const phi0 = Math.acos(Math.max(-1, Math.min(1, x0 / R)))
      const m = 4000
      let I0 = 0
      let I1 = 0
      for (let i = 0; i <= m; i++) {
        const phi = (phi0 * i) / m
        const w = i === 0 || i === m ? 1 : i % 2 === 1 ? 4 : 2
        const x = R * Math.cos(phi)
        const dA = 2 * R * Math.sin(phi) * R * Math.sin(phi) // width × dx/dφ
        I0 += w * (x - x0) * dA
        I1 += w * (x - x0) * x * dA
      }
      return { I0: (I0 * phi0) / (3 * m), I1: (I1 * phi0) / (3 * m) }
    }
    let lo = -R
    let hi = R * 0.999999
    for (let k = 0; k < 200; k++) {
      const mid = (lo + hi) / 2
      const { I0, I1 } = moments(mid)
      if (I1 / I0 < e) lo = mid
      else hi = mid
    }
    const { I0 } = moments(lo)
    return { x0: lo, qmax: (P / I0) * (R - lo) }
  }

  it('a load at e = 0.2R (inside the core of radius R/4, standard result) is full contact', () => {
    expect(solveContact(props, regions, ring, [{ P, x: 0.2 * R, y: 0 }]).status).toBe('full')
  })

  it.each([0.3, 0.5, 0.7, 0.9])('a load at e = %f·R matches the 1-D segment solution (independent bisection, 1e-4)', (f) => {
    const r = solveContact(props, regions, ring, [{ P, x: f * R, y: 0 }])
    expect(r.status).toBe('partial')
    expect(r.converged).toBe(true)
    const ref = circleContact(f * R)
    expectClose(-r.liftOff!.a / r.liftOff!.b, ref.x0, 1e-4, R)
    expectClose(r.peak!.value, ref.qmax, 1e-4)
    expect(Math.abs(r.liftOff!.c)).toBeLessThan(1e-6) // symmetric about the x axis
    for (const res of residuals(ring, r, [{ P, x: f * R, y: 0 }], [0, 0], R)) expect(Math.abs(res)).toBeLessThan(1e-9)
  })

  it('a load at an oblique e = 0.8R converges and is in equilibrium', () => {
    const load = { P, x: 0.8 * R * Math.cos(1), y: 0.8 * R * Math.sin(1) }
    const r = solveContact(props, regions, ring, [load])
    expect(r.converged).toBe(true)
    for (const res of residuals(ring, r, [load], [0, 0], R)) expect(Math.abs(res)).toBeLessThan(1e-9)
  })
})

describe('solveContact: sections with holes and re-entrant corners', () => {
  it.each([
    [0.6, 0],
    [0.5, 0.5],
    [-0.3, 0.75],
  ])('a tube (outline and hole, far from the origin) with the load at (%f, %f)·R is in equilibrium', (fx, fy) => {
    const R = 500
    const o: Point = [4_000_000, -1_500_000]
    const outer = ngon(256, R, o[0], o[1])
    const hole = [...ngon(256, 0.8 * R, o[0], o[1])].reverse()
    // Notes §10 regular n-gon formulas for A and I, outer minus inner.
    const s = Math.sin((2 * Math.PI) / 256)
    const k = 2 + Math.cos((2 * Math.PI) / 256)
    const A = (256 * s * (R ** 2 - (0.8 * R) ** 2)) / 2
    const I = (256 * s * k * (R ** 4 - (0.8 * R) ** 4)) / 24
    const props: InertiaLike = { area: A, centroid: { x: o[0], y: o[1] }, Ixx: I, Iyy: I, Ixy: 0 }
    const load = { P: 5e5, x: o[0] + fx * R, y: o[1] + fy * R }
    const r = solveContact(props, [{ n: 1, polygons: [[outer, hole]] }], outer, [load])
    expect(r.status).toBe('partial')
    expect(r.converged).toBe(true)
    expect(r.area!).toBeLessThan(A)
    for (const res of residuals([outer, hole], r, [load], o, R)) expect(Math.abs(res)).toBeLessThan(1e-9)
  })

  // Unequal angle L 150×90×10; centroid and inertia by the parallel-axis theorem by hand.
  const angle: Ring = [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]]
  const hull: Ring = [[0, 0], [90, 0], [90, 10], [10, 150], [0, 150]]
  const A1 = 1500
  const A2 = 800
  const xc = (A1 * 5 + A2 * 50) / (A1 + A2)
  const yc = (A1 * 75 + A2 * 5) / (A1 + A2)
  const Ixx = (10 * 150 ** 3) / 12 + A1 * (75 - yc) ** 2 + (80 * 10 ** 3) / 12 + A2 * (5 - yc) ** 2
  const Iyy = (150 * 10 ** 3) / 12 + A1 * (5 - xc) ** 2 + (10 * 80 ** 3) / 12 + A2 * (50 - xc) ** 2
  const Ixy = A1 * (5 - xc) * (75 - yc) + A2 * (50 - xc) * (5 - yc)
  const props: InertiaLike = { area: A1 + A2, centroid: { x: xc, y: yc }, Ixx, Iyy, Ixy }

  it.each([
    ['on the long leg', 2, 120],
    ['in the empty notch between the legs', 12.4, 118.1],
    ['at the toe of the short leg', 85, 5],
    ['near the heel', 1, 1],
  ])('an unequal angle with the load %s converges and is in equilibrium', (_n, x, y) => {
    const load = { P: 1e4, x, y }
    const r = solveContact(props, [{ n: 1, polygons: [[angle]] }], hull, [load])
    expect(r.status).toBe('partial')
    expect(r.converged).toBe(true)
    for (const res of residuals(angle, r, [load], [xc, yc], 150)) expect(Math.abs(res)).toBeLessThan(1e-9)
    const { a, b, c } = r.plane!
    expect(a + b * x + c * y).toBeGreaterThan(0) // the load stands on compressed material or between it
  })
})

describe('solveContact: regression sweep of loads near the hull (seeded, not random at run time)', () => {
  // A resultant close to the hull edge gives a sliver or corner of contact: the hardest starts for Newton.
  const tri: Ring = [[0, 0], [3000, 0], [500, 1000]]
  const props: InertiaLike = {
    area: 1.5e6, centroid: { x: 3500 / 3, y: 1000 / 3 }, // triangle: A = bh/2, centroid at the mean of the vertices
    Ixx: (3000 * 1000 ** 3) / 36, // b·h³/36 (closed form, README "Method")
    Iyy: (1000 * 3000 * (3000 ** 2 - 3000 * 500 + 500 ** 2)) / 36, // b·h·(b² - b·a + a²)/36 (closed form, from memory)
    Ixy: (1000 ** 2 * 3000 * (2 * 500 - 3000)) / 72, // b·h²·(2a - b)/72 for the apex at (a, h) (closed form, from memory)
  }
  it('converges to 1e-9 for 60 loads between 1e-6 and 0.5 of the way from a hull edge to the centroid', () => {
    let seed = 7
    const next = () => (seed = (seed * 16807) % 2147483647) / 2147483647
    for (let k = 0; k < 60; k++) {
      const i = k % 3
      const p = tri[i]!
      const q = tri[(i + 1) % 3]!
      const t = next()
      const f = 10 ** (-6 + 5.7 * next())
      const x = p[0] + t * (q[0] - p[0]) + f * (props.centroid.x - p[0] - t * (q[0] - p[0]))
      const y = p[1] + t * (q[1] - p[1]) + f * (props.centroid.y - p[1] - t * (q[1] - p[1]))
      const r = solveContact(props, [{ n: 1, polygons: [[tri]] }], tri, [{ P: 1e5, x, y }])
      expect(r.status === 'full' || r.converged, `load (${x}, ${y}): ${r.message}`).toBe(true)
      // Checked about the load itself, where a sliver's moments keep their digits.
      if (r.status === 'partial') for (const res of residuals(tri, r, [{ P: 1e5, x, y }], [x, y], 2000)) expect(Math.abs(res)).toBeLessThan(1e-9)
    }
  })
})

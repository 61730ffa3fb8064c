import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import type { Point, Polygon } from '../../../shared/geometry/types'
import { prepareSection } from '../../../shared/mechanics/prepare'
import { SectionError } from '../../../shared/mechanics/types'
import type { Material, PartInput, PreparedSection } from '../../../shared/mechanics/types'
import { expectClose } from '../../support/expect-close'

const steel: Material = { name: 'Steel', E: 200_000, fy: 355, density: 7850 }
const concrete: Material = { name: 'Concrete', E: 33_000, density: 2400 }

function rect(x: number, y: number, w: number, h: number): Point[] {
  return [[x, y], [x + w, y], [x + w, y + h], [x, y + h]]
}

function ngon(n: number, R: number): Point[] {
  return Array.from({ length: n }, (_, i): Point => [R * Math.cos((2 * Math.PI * i) / n), R * Math.sin((2 * Math.PI * i) / n)])
}

function netArea(polygons: readonly Polygon[]): number {
  return polygons.reduce((sum, polygon) => sum + polygon.reduce((s, ring) => s + ringArea(ring), 0), 0)
}

function sectionArea(prepared: PreparedSection): number {
  return prepared.regions.reduce((sum, region) => sum + netArea(region.polygons), 0)
}

function rejection(parts: PartInput[], options = {}): SectionError {
  try {
    prepareSection(parts, options)
  } catch (error) {
    expect(error).toBeInstanceOf(SectionError)
    return error as SectionError
  }
  throw new Error('expected prepareSection to throw a SectionError')
}

describe('prepareSection: normalised result', () => {
  it('outline CCW and holes CW, without closing vertex, whatever the input orientation', () => {
    const clockwise = rect(0, 0, 100, 60).reverse()
    const outline = [...clockwise, clockwise[0]!] // clockwise and closed
    const hole = rect(20, 20, 10, 10) // counter-clockwise
    const prepared = prepareSection([{ outline, holes: [hole] }])
    const [polygon] = prepared.regions[0]!.polygons
    expect(polygon).toHaveLength(2)
    expect(polygon![0]).toHaveLength(4)
    expect(ringArea(polygon![0]!)).toBe(6000)
    expect(ringArea(polygon![1]!)).toBe(-100)
  })

  it('origin is the bounding-box centre; bounds, hull, referenceE and default material are filled in', () => {
    const prepared = prepareSection([{ outline: [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]] }])
    expect(prepared.origin).toEqual([45, 75])
    expect(prepared.bounds).toEqual({ minX: 0, minY: 0, maxX: 90, maxY: 150 })
    expect(prepared.hull).toEqual([[0, 0], [90, 0], [90, 10], [10, 150], [0, 150]])
    expect(prepared.referenceE).toBe(200_000) // DEFAULT_MATERIAL, steel
    expect(prepared.regions[0]!.n).toBe(1)
    expect(prepared.parts[0]!.name).toBe('Part 1')
    expect(prepared.warnings).toEqual([])
  })

  it('referenceE option sets n = E / E_ref', () => {
    const prepared = prepareSection([{ outline: rect(0, 0, 10, 10), material: steel }], { referenceE: 100_000 })
    expect(prepared.regions[0]!.n).toBe(2)
    expect(prepared.parts[0]!.n).toBe(2)
  })
})

describe('prepareSection: Booleans', () => {
  it('a hole cuts its own part only: a bolt hole drawn on the plate leaves the flange below whole (by hand: 200·28 - 22·12)', () => {
    const d = 22
    const hole = rect(60, -1, d, 29) // drawn from below the flange to above the plate
    const prepared = prepareSection([
      { name: 'Plate', outline: rect(0, 16, 200, 12), notches: [hole], material: steel },
      { name: 'Flange', outline: rect(0, 0, 200, 16), material: steel },
    ])
    expectClose(sectionArea(prepared), 200 * 28 - d * 12, 1e-12)
    expectClose(netArea(prepared.parts[1]!.polygons), 200 * 16, 1e-12)
    expect(prepared.warnings).toEqual([]) // a notch is meant to cross the edge
  })

  it('a section-wide cut through a plate and the flange below cuts both parts: area falls by d·(t_plate + t_flange), listed per part', () => {
    const d = 22
    const prepared = prepareSection([
      { name: 'Plate', outline: rect(0, 16, 200, 12), material: steel },
      { name: 'Flange', outline: rect(0, 0, 200, 16), material: steel },
    ], { cuts: [rect(60, -1, d, 29)] })
    expectClose(sectionArea(prepared), 200 * 28 - d * 28, 1e-12)
    expectClose(netArea(prepared.parts[0]!.polygons), 200 * 12 - d * 12, 1e-12)
    expectClose(netArea(prepared.parts[1]!.polygons), 200 * 16 - d * 16, 1e-12)
    expect(prepared.regions).toHaveLength(1) // one material: unioned
    expect(prepared.parts.map(p => p.cuts)).toEqual([[0], [0]])
    expect(prepared.cuts).toHaveLength(1)
    expect(prepared.cuts[0]!.parts).toEqual([0, 1])
    expectClose(prepared.cuts[0]!.area, d * 28, 1e-12)
    expect(prepared.warnings).toEqual([])
  })

  it('box 300 x 300 x 10 drawn as one part with its void, plus a 10 x 300 stiffener across the void: A = 11 600 + 10·280 = 14 400 mm² (by hand)', () => {
    const box = { name: 'Box', outline: rect(-150, -150, 300, 300), holes: [rect(-140, -140, 280, 280)], material: steel }
    const stiffener = { name: 'Stiffener', outline: rect(-5, -150, 10, 300), material: steel }
    const prepared = prepareSection([box, stiffener])
    expectClose(sectionArea(prepared), 300 * 300 - 280 * 280 + 10 * 280, 1e-12)
    expect(prepared.warnings).toEqual([])
  })

  it('a plate drawn wholly inside a tube\'s void counts in full (by hand: 100² - 80² + 20·20)', () => {
    const prepared = prepareSection([
      { outline: rect(0, 0, 100, 100), holes: [rect(10, 10, 80, 80)], material: steel },
      { outline: rect(40, 40, 20, 20), material: steel },
    ])
    expectClose(sectionArea(prepared), 100 * 100 - 80 * 80 + 400, 1e-12)
  })

  it('a cut that overlaps no part is named in a warning; one that swallows a part removes it', () => {
    const apart = prepareSection([{ outline: rect(0, 0, 100, 100) }], { cuts: [rect(200, 0, 10, 10)] })
    expect(apart.warnings).toEqual(['Cut 1 overlaps no part and removes nothing.'])
    const swallowed = prepareSection([{ outline: rect(0, 0, 100, 100) }, { name: 'Pin', outline: rect(200, 0, 10, 10) }], { cuts: [rect(195, -5, 20, 20)] })
    expect(swallowed.warnings).toEqual(['Part 2 (Pin) is cut away entirely.'])
    expectClose(sectionArea(swallowed), 10_000, 1e-12)
  })

  it('a self-crossing cut is rejected naming the cut, not a part', () => {
    const error = rejection([{ outline: rect(0, 0, 100, 100) }], { cuts: [[[0, 0], [10, 10], [10, 0], [0, 10]]] })
    expect(error.message).toMatch(/^Cut 1: the edge from vertex/)
    expect(error.cut).toBe(0)
    expect(error.part).toBeNull()
  })

  it('the section-wide cut gives the same areas 5e6 mm from the origin (to 1e-9)', () => {
    const shift = (ring: Point[]): Point[] => ring.map((p): Point => [p[0] + 5e6, p[1] + 5e6])
    const prepared = prepareSection([
      { outline: shift(rect(0, 16, 200, 12)), material: steel },
      { outline: shift(rect(0, 0, 200, 16)), material: steel },
    ], { cuts: [shift(rect(60, -1, 22, 29))] })
    expectClose(sectionArea(prepared), 200 * 28 - 22 * 28, 1e-9)
    expect(prepared.origin).toEqual([5e6 + 100, 5e6 + 14])
  })

  it('two overlapping parts of one material count once: union area by hand (2·100·50 - 50·50)', () => {
    const prepared = prepareSection([
      { outline: rect(0, 0, 100, 50), material: steel },
      { outline: rect(50, 0, 100, 50), material: { ...steel } },
    ])
    expectClose(sectionArea(prepared), 100 * 50 + 100 * 50 - 50 * 50, 1e-12)
    expect(prepared.regions).toHaveLength(1)
    expect(prepared.regions[0]!.polygons).toHaveLength(1)
  })

  it('two overlapping parts of different materials are rejected, naming both', () => {
    const error = rejection([
      { outline: rect(0, 0, 100, 50), material: steel },
      { outline: rect(0, 0, 100, 50), material: steel },
      { outline: rect(50, 25, 100, 50), material: concrete },
    ])
    expect(error.message).toMatch(/^Part 1 and Part 3 overlap/)
    expect(error.message).toMatch(/different materials/)
  })

  it('parts of different materials that only share an edge are accepted as two regions', () => {
    const prepared = prepareSection([
      { outline: rect(0, 100, 200, 10), material: steel },
      { outline: rect(0, 0, 200, 100), material: concrete },
    ])
    expect(prepared.regions.map((region) => region.material.name)).toEqual(['Steel', 'Concrete'])
    expectClose(prepared.regions[1]!.n, 33_000 / 200_000, 1e-15)
  })

  it('a part lying wholly inside another part\'s hole fills it (concrete-filled tube) instead of being cut', () => {
    const prepared = prepareSection([
      { name: 'Tube', outline: ngon(72, 100), holes: [ngon(72, 90)], material: steel },
      { name: 'Core', outline: ngon(72, 90), material: concrete },
    ])
    expect(prepared.regions).toHaveLength(2)
    expectClose(netArea(prepared.parts[1]!.polygons), ringArea(ngon(72, 90)), 1e-12)
  })

  it('a hole partly outside its outline cuts the edge, with a warning', () => {
    const prepared = prepareSection([{ outline: rect(0, 0, 100, 100), holes: [rect(90, 40, 20, 20)] }])
    expectClose(sectionArea(prepared), 10_000 - 10 * 20, 1e-12)
    expect(prepared.warnings).toEqual(["Part 1, hole 1 extends beyond the part's outline; it cuts the edge as a notch (mark it a notch if that is meant)."])
    // The same ring given as a notch is meant to cross the edge: same area, no warning.
    const notch = prepareSection([{ outline: rect(0, 0, 100, 100), notches: [rect(90, 40, 20, 20)] }])
    expectClose(sectionArea(notch), 10_000 - 10 * 20, 1e-12)
    expect(notch.warnings).toEqual([])
  })

  it('a hole inside another hole cuts nothing more, with a warning', () => {
    const prepared = prepareSection([{ outline: rect(0, 0, 100, 100), holes: [rect(10, 10, 50, 50), rect(20, 20, 10, 10)] }])
    expectClose(sectionArea(prepared), 10_000 - 2500, 1e-12)
    expect(prepared.warnings).toEqual(['Part 1, hole 2 lies inside hole 1 and cuts nothing more.'])
  })

  it('overlapping holes are subtracted once', () => {
    const prepared = prepareSection([{ outline: rect(0, 0, 100, 100), holes: [rect(10, 10, 40, 40), rect(30, 30, 40, 40)] }])
    expectClose(sectionArea(prepared), 10_000 - (1600 + 1600 - 400), 1e-12)
  })
})

describe('prepareSection: rejections name the part, ring and vertex', () => {
  it('an empty section', () => {
    expect(rejection([]).message).toMatch(/no parts/)
  })

  it.each([
    ['fewer than 3 distinct vertices', [[0, 0], [10, 0], [10, 0]] as Point[], /^Part 1, outline: needs at least 3 distinct vertices/],
    ['a NaN coordinate', [[0, 0], [10, Number.NaN], [10, 10]] as Point[], /^Part 1, outline: vertex 2 has a coordinate that is not a finite number/],
    ['|x| > 1e9 mm', [[0, 0], [2e9, 0], [10, 10]] as Point[], /^Part 1, outline: vertex 2 lies beyond ±1e9 mm/],
    ['zero area (collinear vertices)', [[0, 0], [10, 10], [20, 20], [5, 5]] as Point[], /^Part 1, outline: encloses no area/],
  ])('%s', (_name, outline, message) => {
    expect(rejection([{ outline }]).message).toMatch(message)
  })

  it('a self-intersecting bow-tie, naming the part, the ring and the input vertices of both edges', () => {
    const error = rejection([
      { outline: rect(0, 0, 10, 10) },
      { outline: [[0, 0], [0, 0], [10, 10], [10, 0], [0, 10]] },
    ])
    expect(error.message).toBe(
      'Part 2, outline: the edge from vertex 1 to vertex 3 meets the edge from vertex 4 to vertex 5 near (5, 5); a ring must not cross or touch itself.',
    )
    expect({ part: error.part, ring: error.ring, vertex: error.vertex }).toEqual({ part: 1, ring: 0, vertex: 0 })
  })

  it('a self-intersecting hole names the hole', () => {
    const error = rejection([{ outline: rect(0, 0, 100, 100), holes: [rect(60, 60, 10, 10), [[10, 10], [30, 30], [30, 10], [10, 30]]] }])
    expect(error.message).toMatch(/^Part 1, hole 2: the edge from vertex 1 to vertex 2 meets the edge from vertex 3 to vertex 4/)
    expect(error.ring).toBe(2)
  })

  it.each([
    ['E = 0', { E: 0 }, /the modulus E \(MPa\) must be a positive number \(got 0\)/],
    ['E < 0', { E: -200_000 }, /the modulus E/],
    ['E = NaN', { E: Number.NaN }, /the modulus E \(MPa\) must be a positive number \(got NaN\)/],
    ['E = Infinity', { E: Infinity }, /the modulus E/],
    ['fy = 0', { E: 200_000, fy: 0 }, /the yield strength fy/],
    ['density < 0', { E: 200_000, density: -1 }, /the density/],
  ])('a material with %s', (_name, material, message) => {
    const error = rejection([{ outline: rect(0, 0, 10, 10) }, { outline: rect(20, 0, 10, 10), material: material as Material }])
    expect(error.message).toMatch(/^Part 2: /)
    expect(error.message).toMatch(message)
    expect(error.part).toBe(1)
  })

  it.each([[0], [-1], [Number.NaN]])('referenceE = %s', (referenceE) => {
    expect(rejection([{ outline: rect(0, 0, 10, 10) }], { referenceE }).message).toMatch(/reference modulus/)
  })

  it('a hole entirely outside its outline', () => {
    const error = rejection([{ outline: rect(0, 0, 10, 10), holes: [rect(20, 0, 5, 5)] }])
    expect(error.message).toBe("Part 1, hole 1 lies outside the part's outline (from its vertex 1 on); draw it inside the outline it cuts.")
    expect(error.ring).toBe(1)
    expect(error.vertex).toBe(0)
  })

  it('a hole that only touches its outline from outside counts as outside', () => {
    expect(rejection([{ outline: rect(0, 0, 10, 10), holes: [rect(10, 0, 5, 5)] }]).message).toMatch(/lies outside the part's outline/)
  })

  it('a hole covering the whole outline', () => {
    expect(rejection([{ outline: rect(0, 0, 10, 10), holes: [rect(-5, -5, 20, 20)] }]).message).toMatch(/covers the whole outline/)
  })

  it('a section cut away entirely', () => {
    expect(rejection([{ outline: rect(0, 0, 10, 10), holes: [rect(0, 0, 10, 10)] }]).message).toMatch(/Nothing is left/)
  })
})

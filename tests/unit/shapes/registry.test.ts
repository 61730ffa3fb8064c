import { describe, expect, it } from 'vitest'
import { ringArea } from '../../../shared/geometry/moments'
import { ShapeError } from '../../../shared/shapes/common'
import { buildShape, defaultShapeParams, isShapeKind, SHAPE_KINDS, SHAPES, shapeParamsSchema, validateShapeParams } from '../../../shared/shapes/registry'
import type { ShapeInput } from '../../../shared/shapes/registry'
import { centroidal, hasNoRepeatedVertex } from './centroidal'

describe('SHAPES', () => {
  it('lists the eight kinds with Kernwise labels', () => {
    expect(Object.keys(SHAPES)).toEqual([...SHAPE_KINDS])
    expect(SHAPE_KINDS.map((k) => SHAPES[k].label)).toEqual(['Plate', 'Round bar', 'Tube', 'Box tube', 'I or H', 'Channel', 'Angle', 'Tee'])
    for (const k of SHAPE_KINDS) expect(SHAPES[k].kind).toBe(k)
  })

  it('has the documented parameter keys per kind', () => {
    const keys = Object.fromEntries(SHAPE_KINDS.map((k) => [k, SHAPES[k].params.map((p) => p.key)]))
    expect(keys).toEqual({
      plate: ['b', 'h', 'vertical'],
      circle: ['d'],
      tube: ['d', 't'],
      rhs: ['b', 'h', 't', 'ro', 'ri'],
      ishape: ['h', 'b', 'tw', 'tf', 'r', 'r2', 'taper', 'tf_at', 'b_top', 'tf_top', 'b_bot', 'tf_bot'],
      channel: ['h', 'b', 'tw', 'tf', 'r', 'r2', 'taper', 'tf_at'],
      angle: ['h', 'b', 't', 'r', 'r2'],
      tee: ['h', 'b', 'tw', 'tf', 'r'],
    })
  })

  it.each(SHAPE_KINDS.map((k) => [k]))('%s: every parameter has a label, unit, help and a default inside its bounds (null only when optional)', (kind) => {
    for (const p of SHAPES[kind].params) {
      expect(p.label.length).toBeGreaterThan(0)
      expect(p.help.length).toBeGreaterThan(0)
      expect(['mm', 'deg', 'choice']).toContain(p.unit)
      if (p.default === null) {
        expect(p.optional).toBe(true)
        continue
      }
      expect(p.minExclusive ? p.default > p.min : p.default >= p.min).toBe(true)
      if (p.max !== null) expect(p.maxExclusive ? p.default < p.max : p.default <= p.max).toBe(true)
    }
  })

  it.each(SHAPE_KINDS.flatMap((k) => [[k, 0.5], [k, 0.05], [k, 0.005]] as const))(
    '%s built from its defaults at tol = %f: CCW outline, CW holes, no repeated or closing vertex, bbox centred',
    (kind, tol) => {
      const g = buildShape({ kind, params: defaultShapeParams(kind) } as ShapeInput, tol)
      expect(ringArea(g.outline)).toBeGreaterThan(0)
      expect(hasNoRepeatedVertex(g.outline)).toBe(true)
      for (const hole of g.holes) {
        expect(ringArea(hole)).toBeLessThan(0)
        expect(hasNoRepeatedVertex(hole)).toBe(true)
      }
      for (const ring of [g.outline, ...g.holes]) for (const [x, y] of ring) expect(Number.isFinite(x) && Number.isFinite(y)).toBe(true)
      const { bounds } = centroidal(g)
      expect(Math.abs(bounds.minX + bounds.maxX)).toBeLessThan(1e-9)
      expect(Math.abs(bounds.minY + bounds.maxY)).toBeLessThan(1e-9)
    },
  )

  it('defaultShapeParams(kind) gives the prefilled values, leaving derived ones out', () => {
    expect(defaultShapeParams('rhs')).toEqual({ b: 200, h: 100, t: 8, ro: 20 })
    expect(defaultShapeParams('ishape')).toEqual({ h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12, r2: 0, taper: 0 })
  })

  it('build passes the chord tolerance through: a finer tol gives a round bar more vertices', () => {
    const coarse = SHAPES.circle.build({ d: 50 }, 0.5)
    const fine = SHAPES.circle.build({ d: 50 }, 0.005)
    expect(fine.outline.length).toBeGreaterThan(coarse.outline.length)
  })
})

describe('validateShapeParams(kind, params)', () => {
  it('accepts the defaults and returns the typed input and the geometry', () => {
    const v = validateShapeParams('ishape', { h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12 })
    expect(v.ok).toBe(true)
    if (!v.ok) return
    expect(v.value.kind).toBe('ishape')
    // Omitted optional parameters take their defaults; derived ones stay undefined.
    expect(v.value.params).toEqual({ h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12, r2: 0, taper: 0 })
    expect(ringArea(v.geometry.outline)).toBeGreaterThan(0)
  })

  it('treats null as an omitted optional value (a blank form field)', () => {
    const v = validateShapeParams('rhs', { b: 200, h: 100, t: 8, ro: 20, ri: null })
    expect(v.ok && v.value.params).toEqual({ b: 200, h: 100, t: 8, ro: 20 })
  })

  it.each<[string, string, unknown, string, RegExp]>([
    ['unknown kind', 'zshape', {}, 'kind', /Unknown shape kind "zshape"; expected one of plate, circle/],
    ['missing depth', 'plate', { b: 100 }, 'h', /Thickness \(h\) is required/],
    ['string value', 'plate', { b: '100', h: 10 }, 'b', /Width \(b\) must be a number in mm/],
    ['NaN', 'circle', { d: Number.NaN }, 'd', /Diameter \(d\) must be a number in mm/],
    ['negative dimension', 'tube', { d: 100, t: -1 }, 't', /Wall thickness \(t\) must be greater than 0 mm/],
    ['negative radius', 'angle', { h: 100, b: 100, t: 10, r: -2, r2: 0 }, 'r', /Root radius \(r\) must be at least 0 mm/],
    ['taper of 50°', 'channel', { h: 200, b: 80, tw: 6, tf: 11, r: 13, taper: 50 }, 'taper', /Flange taper \(taper\) must be less than 45°/],
    ['unknown key', 'tee', { h: 100, b: 100, tw: 10, tf: 10, r: 10, tff: 3 }, 'tff', /Unknown parameter "tff" for Tee; expected h, b, tw, tf, r/],
    ['not an object', 'plate', 42, 'params', /Plate parameters must be an object of numbers/],
    ['flanges too thick', 'ishape', { h: 200, b: 100, tw: 5.6, tf: 120, r: 12 }, 'tf', /Flange thickness tf = 120 mm must be less than half the depth h = 200 mm/],
    ['root radius too large', 'ishape', { h: 200, b: 100, tw: 5.6, tf: 8.5, r: 60 }, 'r', /Root radius r = 60 mm must be at most 47.2 mm/],
  ])('%s gives a ShapeError on the field', (_name, kind, input, field, message) => {
    const v = validateShapeParams(kind, input)
    expect(v.ok).toBe(false)
    if (v.ok) return
    expect(v.error).toBeInstanceOf(ShapeError)
    expect(v.error.field).toBe(field)
    expect(v.error.message).toMatch(message)
  })

  it('reports a bad chord tolerance on "tol"', () => {
    const v = validateShapeParams('circle', { d: 10 }, 0)
    expect(!v.ok && v.error.field).toBe('tol')
  })

  it('isShapeKind recognises the kinds only', () => {
    expect(isShapeKind('angle')).toBe(true)
    expect(isShapeKind('toString')).toBe(false)
  })

  it('shapeParamsSchema(kind) parses a body for the route and refuses unknown keys', () => {
    const schema = shapeParamsSchema('plate')
    expect(schema.parse({ b: 10, h: 2 })).toEqual({ b: 10, h: 2 })
    expect(schema.safeParse({ b: 10, h: 2, x: 1 }).success).toBe(false)
    expect(schema.safeParse({ b: 10, h: Number.POSITIVE_INFINITY }).success).toBe(false)
  })
})

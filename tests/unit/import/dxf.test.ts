import { describe, expect, it } from 'vitest'
import { importDxf } from '../../../shared/import/dxf'
import { ringArea as signedArea } from '../../../shared/geometry/moments'
import { ImportError } from '../../../shared/import/types'
import { expectClose } from '../../support/expect-close'
import { arc, circle, dxf, line, lwpolyline } from './dxf-text'

const area = (ring: [number, number][]) => Math.abs(signedArea(ring))
const partArea = (p: { outline: [number, number][]; holes: [number, number][][] }) => area(p.outline) - p.holes.reduce((s, h) => s + area(h), 0)

describe('importDxf', () => {
  it('reads a closed LWPOLYLINE with bulges as a slot: area b·h + π·r² (closed form of a stadium)', () => {
    // 100 × 40 rectangle with semicircular ends of r = 20 (bulge 1 = a half circle).
    const text = dxf([lwpolyline('Outline', [[0, 0], [100, 0, 1], [100, 40], [0, 40, 1]])], { insunits: 4 })
    const r = importDxf(text, { chordTolerance: 0.005 })
    expect(r.parts).toHaveLength(1)
    expect(r.units).toBe('mm')
    // Inscribed chords fall short of the arc by about (4/3)·sagitta/r of the round's area (README "Method", arcs).
    expectClose(partArea(r.parts[0]!), 100 * 40 + Math.PI * 20 ** 2, 5e-4)
    // The bulge of +1 from (100, 0) to (100, 40) turns counter-clockwise, out to x = 120 (within the sagitta).
    const right = Math.max(...r.parts[0]!.outline.map(p => p[0]))
    expect(right).toBeLessThanOrEqual(120)
    expect(right).toBeGreaterThan(120 - 0.005)
  })

  it('reads a CIRCLE within 0.05 % of π·r² (closed form)', () => {
    const r = importDxf(dxf([circle('0', 10, 20, 50)]))
    expectClose(partArea(r.parts[0]!), Math.PI * 2500, 5e-4)
    expect(r.unitsFrom).toBe('default')
  })

  it('joins LINE and ARC entities, drawn in any direction, into one loop: a 60 × 40 box with a half round on top', () => {
    const text = dxf([
      line('L', 0, 0, 60, 0),
      line('L', 60, 40, 60, 0), // reversed on purpose
      arc('L', 30, 40, 30, 0, 180),
      line('L', 0, 40, 0, 0),
    ])
    const r = importDxf(text, { chordTolerance: 0.005 })
    expect(r.parts).toHaveLength(1)
    expect(r.skipped).toEqual([])
    // rectangle + half circle (closed form)
    expectClose(partArea(r.parts[0]!), 60 * 40 + (Math.PI * 900) / 2, 5e-4)
  })

  it('expands an INSERT with its position, scale and rotation', () => {
    // Block: a 10 × 20 rectangle at the origin; inserted at (100, 50), scale 2, rotated 90°.
    const block = [lwpolyline('0', [[0, 0], [10, 0], [10, 20], [0, 20]])]
    const insert: [number, string | number][] = [[0, 'INSERT'], [8, 'Plates'], [2, 'PL'], [10, 100], [20, 50], [41, 2], [42, 2], [50, 90]]
    const r = importDxf(dxf([insert], { blocks: { PL: block } }))
    expect(r.parts).toHaveLength(1)
    const p = r.parts[0]!
    expect(p.layer).toBe('Plates') // entities on layer 0 take the insert's layer (common practice)
    expectClose(partArea(p), 20 * 40, 1e-9) // scale 2 on both axes: area × 4
    const xs = p.outline.map(q => q[0]); const ys = p.outline.map(q => q[1])
    // (10, 0)·2 rotated 90° is (0, 20); (0, 20)·2 rotated is (-40, 0): x in [60, 100], y in [50, 70].
    expect(Math.min(...xs)).toBeCloseTo(60, 9); expect(Math.max(...xs)).toBeCloseTo(100, 9)
    expect(Math.min(...ys)).toBeCloseTo(50, 9); expect(Math.max(...ys)).toBeCloseTo(70, 9)
  })

  it('converts units from $INSUNITS (1 = inches) and lets the request override them', () => {
    const text = dxf([lwpolyline('0', [[0, 0], [2, 0], [2, 1], [0, 1]])], { insunits: 1 })
    const inches = importDxf(text)
    expect(inches.units).toBe('in')
    expect(inches.unitsFrom).toBe('file')
    expectClose(partArea(inches.parts[0]!), 2 * 1 * 25.4 ** 2, 1e-12) // 1 in = 25.4 mm exactly (NIST SP 811)
    const metres = importDxf(text, { units: 'm' })
    expect(metres.unitsFrom).toBe('request')
    expectClose(partArea(metres.parts[0]!), 2 * 1e6, 1e-12)
  })

  it('reads a drawing of mixed units: a block in a drawing of cm keeps the drawing unit for every entity', () => {
    const block = [circle('0', 0, 0, 1)]
    const insert: [number, string | number][] = [[0, 'INSERT'], [8, '0'], [2, 'B'], [10, 5], [20, 5]]
    const r = importDxf(dxf([lwpolyline('0', [[0, 0], [10, 0], [10, 10], [0, 10]]), insert], { insunits: 5, blocks: { B: block } }))
    expect(r.units).toBe('cm')
    expect(r.parts).toHaveLength(1)
    // 100 × 100 mm plate with a hole of r = 10 mm (1 cm): the hole is nested in the plate.
    expect(r.parts[0]!.holes).toHaveLength(1)
    expectClose(partArea(r.parts[0]!), 100 * 100 - Math.PI * 100, 1e-4)
  })

  it('nests holes: a plate with a hole holding an island of its own is two parts, the outer with one hole', () => {
    const r = importDxf(dxf([
      lwpolyline('A', [[0, 0], [100, 0], [100, 100], [0, 100]]),
      lwpolyline('A', [[20, 20], [80, 20], [80, 80], [20, 80]]),
      lwpolyline('A', [[40, 40], [60, 40], [60, 60], [40, 60]]),
    ]))
    expect(r.parts).toHaveLength(2)
    const outer = r.parts.find(p => p.holes.length === 1)!
    expect(partArea(outer)).toBeCloseTo(100 * 100 - 60 * 60, 9)
    expect(signedArea(outer.outline)).toBeGreaterThan(0) // outline counter-clockwise
    expect(signedArea(outer.holes[0]!)).toBeLessThan(0) // hole clockwise
    expect(r.parts.find(p => p.holes.length === 0)!.outline.length).toBe(4)
  })

  it('reports an open loop with its end points, unsupported entities and a duplicate', () => {
    const r = importDxf(dxf([
      line('Open', 0, 0, 10, 0),
      line('Open', 10, 0, 10, 10),
      circle('C', 0, 0, 5),
      circle('C', 0, 0, 5),
      [[0, 'TEXT'], [8, 'Notes'], [10, 0], [20, 0], [40, 2], [1, 'hello']],
    ]))
    const open = r.skipped.find(s => s.kind === 'open-loop')!
    expect(open.ends).toEqual([[0, 0], [10, 10]])
    expect(open.message).toContain('(0, 0) to (10, 10)')
    expect(r.skipped.find(s => s.kind === 'duplicate')?.layer).toBe('C')
    expect(r.skipped.find(s => s.kind === 'unsupported')?.entity).toBe('TEXT')
    expect(r.parts).toHaveLength(1)
  })

  it('refuses a broken file naming the line at fault', () => {
    const good = dxf([circle('0', 0, 0, 5)])
    const lines = good.split('\n')
    const at = lines.indexOf('40') + 1 // the radius value
    lines[at] = 'five'
    expect(() => importDxf(lines.join('\n'))).toThrow(ImportError)
    try { importDxf(lines.join('\n')) } catch (e) {
      expect((e as ImportError).line).toBe(at + 1)
      expect((e as Error).message).toContain(`Line ${at + 1}`)
    }
    expect(() => importDxf('0\nSECTION\n2\nENTITIES\nLINE\n')).toThrow(/Line 5: "LINE" should be a DXF group code/)
  })

  it('reads a full ELLIPSE within 0.1 % of π·a·b (closed form), turned by its major axis', () => {
    // a = 50 along (30, 40)/50, b = 0.4·a = 20.
    const e: [number, string | number][] = [[0, 'ELLIPSE'], [8, '0'], [10, 0], [20, 0], [11, 30], [21, 40], [40, 0.4], [41, 0], [42, 2 * Math.PI]]
    const r = importDxf(dxf([e]), { chordTolerance: 0.01 })
    expectClose(partArea(r.parts[0]!), Math.PI * 50 * 20, 1e-3)
    const far = Math.max(...r.parts[0]!.outline.map(p => Math.hypot(p[0], p[1])))
    expect(far).toBeCloseTo(50, 6) // the major vertex (30, 40) is on the ring
  })

  it('reads an old-style POLYLINE of VERTEX entities with a bulge: a half disc of r = 10 (area π·r²/2)', () => {
    const poly: [number, string | number][] = [[0, 'POLYLINE'], [8, 'P'], [66, 1], [70, 1], [0, 'VERTEX'], [8, 'P'], [10, 10], [20, 0], [42, 1], [0, 'VERTEX'], [8, 'P'], [10, -10], [20, 0], [0, 'SEQEND']]
    const r = importDxf(dxf([poly]), { chordTolerance: 0.001 })
    expect(r.parts).toHaveLength(1)
    expectClose(partArea(r.parts[0]!), (Math.PI * 100) / 2, 5e-4)
  })

  it('refuses an INSERT of a block the file does not define', () => {
    const insert: [number, string | number][] = [[0, 'INSERT'], [8, '0'], [2, 'Missing'], [10, 0], [20, 0]]
    expect(() => importDxf(dxf([insert]))).toThrow(/block "Missing"/)
  })
})

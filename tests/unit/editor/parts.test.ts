import { describe, expect, it } from 'vitest'
import type { SketchPart } from '#shared/sketch/document'
import { ringArea } from '#shared/geometry/moments'
import { rectangleRing } from '#shared/editor/transform'
import { copyParts, hollowPart, moveParts, partToHole, subtractOf, unionOf } from '#shared/editor/parts'
import { newId } from '#shared/editor/ids'

const steel = { name: 'Steel', E: 200000 }
const mk = (id: string, a: [number, number], b: [number, number]): SketchPart => ({ id, name: id, outline: rectangleRing(a, b), holes: [], material: steel, shape: null })
const netArea = (p: SketchPart) => ringArea(p.outline) + p.holes.reduce((s, h) => s + ringArea(h.ring), 0)

describe('part operations (areas by hand from rectangles)', () => {
  it('unionOf two overlapping 100 × 100 squares (50 overlap) gives one part of 15 000 mm²', () => {
    const out = unionOf([mk('a', [0, 0], [100, 100]), mk('b', [50, 0], [150, 100])], ['a', 'b'])
    expect(out).toHaveLength(1)
    expect(out[0]!.id).toBe('a')
    expect(netArea(out[0]!)).toBeCloseTo(15000, 9)
  })

  it('unionOf parts that do not touch is refused', () => {
    expect(() => unionOf([mk('a', [0, 0], [10, 10]), mk('b', [20, 0], [30, 10])], ['a', 'b'])).toThrow(/do not touch/)
  })

  it('subtractOf takes the others out of the first: 100 × 100 minus a 20 × 20 inside is 9600 mm² with a hole', () => {
    const out = subtractOf([mk('a', [0, 0], [100, 100]), mk('b', [40, 40], [60, 60])], ['a', 'b'])
    expect(out).toHaveLength(1)
    expect(out[0]!.holes).toHaveLength(1)
    expect(netArea(out[0]!)).toBeCloseTo(9600, 9)
  })

  it('subtractOf that splits the first part makes two parts', () => {
    const out = subtractOf([mk('a', [0, 0], [100, 10]), mk('b', [40, -5], [60, 15])], ['a', 'b'])
    expect(out.map(p => netArea(p)).sort()).toEqual([400, 400])
  })

  it('partToHole turns an inner square into a void of the part it lies in', () => {
    const { parts, target } = partToHole([mk('a', [0, 0], [100, 100]), mk('v', [40, 40], [60, 60])], 'v', 'void')
    expect(target).toBe('a')
    expect(parts).toHaveLength(1)
    expect(parts[0]!.holes[0]!.kind).toBe('void')
    expect(netArea(parts[0]!)).toBe(9600)
  })

  it('partToHole refuses a ring that overlaps nothing', () => {
    expect(() => partToHole([mk('a', [0, 0], [10, 10]), mk('v', [40, 40], [60, 60])], 'v', 'cut')).toThrow(/does not overlap/)
  })

  it('hollowPart of a 100 × 60 box with a 5 mm wall leaves 100·60 − 90·50 = 1500 mm²', () => {
    const p = hollowPart(mk('a', [0, 0], [100, 60]), 5)
    expect(netArea(p)).toBeCloseTo(1500, 6)
  })

  it('moveParts moves only the chosen parts and keeps the others as the same objects', () => {
    const a = mk('a', [0, 0], [1, 1])
    const b = mk('b', [0, 0], [1, 1])
    const out = moveParts([a, b], ['a'], 5, 0)
    expect(out[0]!.outline[0]).toEqual([5, 0])
    expect(out[1]).toBe(b)
  })

  it('copyParts gives new ids and moved rings', () => {
    const [c] = copyParts([mk('a', [0, 0], [1, 1])], ['a'], [10, 10])
    expect(c!.id).not.toBe('a')
    expect(c!.outline[0]).toEqual([10, 10])
  })

  it('newId is prefixed and random', () => {
    expect(newId('part')).toMatch(/^part-[0-9a-f]{12}$/)
    expect(newId('x')).not.toBe(newId('x'))
  })
})

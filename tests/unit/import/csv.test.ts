import { describe, expect, it } from 'vitest'
import { importCsv } from '../../../shared/import/csv'
import { detectFormat } from '../../../shared/import/detect'
import { ringArea as signedArea } from '../../../shared/geometry/moments'
import { ImportError } from '../../../shared/import/types'

const area = (ring: [number, number][]) => Math.abs(signedArea(ring))
const bytes = (s: string) => new TextEncoder().encode(s)

describe('importCsv', () => {
  it('reads x, y without a header, one ring per block split by a blank line: a plate with a hole', () => {
    const r = importCsv('0,0\n100,0\n100,50\n0,50\n\n10,10\n20,10\n20,20\n10,20\n')
    expect(r.parts).toHaveLength(1)
    expect(r.parts[0]!.holes).toHaveLength(1)
    expect(area(r.parts[0]!.outline) - area(r.parts[0]!.holes[0]!)).toBe(100 * 50 - 10 * 10) // rectangles (closed form)
  })

  it('reads a header naming ring, x and y columns in any order, one ring per ring value', () => {
    const r = importCsv('y,x,ring\n0,0,a\n0,30,a\n40,30,a\n40,0,a\n0,50,b\n0,60,b\n10,60,b\n')
    expect(r.parts).toHaveLength(2)
    expect(r.parts.map(p => area(p.outline)).sort((a, b) => a - b)).toEqual([50, 1200]) // triangle ½·10·10, rectangle 30·40
  })

  it('accepts decimal commas with semicolons and tabs, and converts the unit', () => {
    const semi = importCsv('x;y\n0;0\n2,5;0\n2,5;1,5\n0;1,5\n', 'in')
    expect(area(semi.parts[0]!.outline)).toBeCloseTo(2.5 * 1.5 * 25.4 ** 2, 9) // 1 in = 25.4 mm (NIST SP 811)
    const tabs = importCsv('0\t0\n0,5\t0\n0,5\t0,5\n')
    expect(area(tabs.parts[0]!.outline)).toBeCloseTo(0.125, 12)
  })

  it('drops a repeated closing vertex', () => {
    const r = importCsv('0 0\n10 0\n10 10\n0 10\n0 0\n')
    expect(r.parts[0]!.outline).toHaveLength(4)
  })

  it('refuses a cell that is not a number, naming the line', () => {
    expect(() => importCsv('x,y\n0,0\n1,abc\n1,1\n')).toThrow(/Line 3: "abc" is not a number/)
    expect(() => importCsv('0,0\n1,0\n')).toThrow(ImportError)
  })
})

describe('detectFormat', () => {
  it('tells DXF from CSV by content, and refuses binary and unknown files', () => {
    expect(detectFormat(bytes('999\nmade by hand\n  0\nSECTION\n  2\nENTITIES\n')).format).toBe('dxf')
    expect(detectFormat(bytes('x,y\n1,2\n')).format).toBe('csv')
    expect(() => detectFormat(bytes('AutoCAD Binary DXF\r\n\u001a\u0000'))).toThrow(/binary DXF/)
    expect(() => detectFormat(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0, 0, 0]))).toThrow(/binary/)
    expect(() => detectFormat(bytes('<html><body>hello</body></html>'))).toThrow(/neither/)
  })
})

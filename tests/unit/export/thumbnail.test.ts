import { describe, expect, it } from 'vitest'
import { thumbnailSvg } from '#shared/export/thumbnail'
import type { SketchPart } from '#shared/sketch/document'

const part = (outline: [number, number][], kind: 'solid' | 'cut' = 'solid', holes: [number, number][][] = []): SketchPart => ({
  id: 'p', name: 'P', kind, outline, holes: holes.map((ring, i) => ({ id: `h${i}`, kind: 'void', ring })), material: { name: 'Steel', E: 200000 } as SketchPart['material'], shape: null,
} as SketchPart)

function coords(svg: string): number[][] {
  const paths = [...svg.matchAll(/ d="([^"]*)"/g)].map(m => m[1]).join(' ')
  return [...paths.matchAll(/(-?[\d.]+),(-?[\d.]+)/g)].map(m => [Number(m[1]), Number(m[2])])
}

describe('thumbnailSvg', () => {
  it('fits a 300 x 20 plate across the square with its padding, y flipped (closed form: scale 84/300)', () => {
    const svg = thumbnailSvg({ parts: [part([[0, 0], [300, 0], [300, 20], [0, 20]])] }, 96, 6)
    const pts = coords(svg)
    expect(Math.min(...pts.map(p => p[0]!))).toBeCloseTo(6, 1)
    expect(Math.max(...pts.map(p => p[0]!))).toBeCloseTo(90, 1)
    // Centred vertically: 20 mm is 5.6 px tall, about the middle 48 px; y = 0 is the lower edge.
    expect(pts[0]![1]).toBeCloseTo(48 + 2.8, 1)
    expect(pts[2]![1]).toBeCloseTo(48 - 2.8, 1)
  })

  it('cuts holes with even-odd and draws an opening part dashed', () => {
    const svg = thumbnailSvg({ parts: [part([[0, 0], [100, 0], [100, 100], [0, 100]], 'solid', [[[40, 40], [60, 40], [60, 60], [40, 60]]]), part([[10, 10], [20, 10], [20, 20]], 'cut')] })
    expect(svg).toContain('fill-rule="evenodd"')
    expect((svg.match(/Z/g) ?? []).length).toBe(3)
    expect(svg).toContain('stroke-dasharray')
  })

  it('an empty sketch is an empty frame, with no NaN', () => {
    const svg = thumbnailSvg({ parts: [] })
    expect(svg).toMatch(/^<svg [^>]*><\/svg>\n$/)
    expect(svg).not.toContain('NaN')
  })
})

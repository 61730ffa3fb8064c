import { describe, expect, it } from 'vitest'
import { SketchDocumentSchema } from '#shared/sketch/document'
import { analyseSection } from '#shared/mechanics/analyze'
import { analysisRequestFor } from '#shared/editor/analysis-request'
import { AnalysisRequest } from '#shared/analysis/contract'
import { demoSketches } from '../../../server/database/demo-sketches'

const demos = demoSketches()

describe('demo sketches (the invented Millrace Yard scenario, README "Demo workspace")', () => {
  it('has the six sketches, one submitted and one approved', () => {
    expect(demos.map(d => d.title)).toEqual(['Crane column C3', 'Mezzanine post M1', 'Brick pier P2', 'Pad footing F4', 'Canopy strut S5', 'Fabricated T-stub T6'])
    expect(demos.filter(d => d.status === 'submitted')).toHaveLength(1)
    expect(demos.filter(d => d.status === 'approved')).toHaveLength(1)
  })

  it.each(demos.map(d => [d.title, d] as const))('%s parses with SketchDocumentSchema and analyses without error', (_, d) => {
    expect(() => SketchDocumentSchema.parse(d.document)).not.toThrow()
    const result = analyseSection(AnalysisRequest.parse(analysisRequestFor(d.document)))
    expect(result.properties.area).toBeGreaterThan(0)
  })

  it('the pier and the footing are in no-tension mode; loads are in N', () => {
    expect(demos[2]!.document.settings.noTension).toBe(true)
    expect(demos[3]!.document.settings.noTension).toBe(true)
    expect(demos[0]!.document.loads[0]!.P).toBe(320_000)
  })

  it('the mezzanine post loses four 22 mm bolt holes through a 10 mm plate and an 11.5 mm flange each (by hand: 4·22·21.5)', () => {
    const d = demos[1]!.document
    const gross = analyseSection(AnalysisRequest.parse(analysisRequestFor({ ...d, parts: d.parts.filter(p => p.kind !== 'cut') })))
    const net = analyseSection(AnalysisRequest.parse(analysisRequestFor(d)))
    expect(gross.properties.area - net.properties.area).toBeCloseTo(4 * 22 * (10 + 11.5), 6)
    // Each cut goes through a plate and a channel flange.
    expect(net.cuts.map(c => c.parts.length)).toEqual([2, 2, 2, 2])
  })

  it.each(demos.map(d => [d.title, d] as const))('%s shows no warning about holes or cuts', (_, d) => {
    const result = analyseSection(AnalysisRequest.parse(analysisRequestFor(d.document)))
    expect(result.warnings.filter(w => /hole|cut|notch/i.test(w))).toEqual([])
  })
})

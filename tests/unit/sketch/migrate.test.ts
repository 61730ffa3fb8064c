import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { AnalysisRequest } from '#shared/analysis/contract'
import { analysisRequestFor } from '#shared/editor/analysis-request'
import { analyseSection } from '#shared/mechanics/analyze'
import { DOCUMENT_SCHEMA, SketchDocumentSchema, migrateDocument } from '#shared/sketch/document'
import { expectClose } from '../../support/expect-close'

// A document saved in schema 1 (where a hole cut every part it overlapped): a bolt hole drawn on a
// cover plate that runs through the flange below, and a slot at the flange's edge.
const fixture = JSON.parse(readFileSync(new URL('../../fixtures/sketch-schema-1.json', import.meta.url), 'utf8'))

describe('migrateDocument: schema 1 → 2 keeps what a saved sketch meant', () => {
  const doc = SketchDocumentSchema.parse(migrateDocument(structuredClone(fixture)))

  it('upgrades to the current schema and validates', () => {
    expect(doc.schema).toBe(DOCUMENT_SCHEMA)
    expect(DOCUMENT_SCHEMA).toBe('kernwise.sketch/2')
  })

  it('a hole that cut another part becomes a section-wide cut; one that cut only its own edge becomes a notch', () => {
    expect(doc.parts.map(p => [p.id, p.kind])).toEqual([['plate', 'solid'], ['flange', 'solid'], ['bolt-cut', 'cut']])
    expect(doc.parts[0]!.holes).toEqual([])
    expect(doc.parts[1]!.holes.map(h => h.kind)).toEqual(['notch'])
  })

  it('the net area is the schema-1 area, by hand: 200·28 - 22·28 (bolt through both) - 20·8 (slot)', () => {
    const result = analyseSection(AnalysisRequest.parse(analysisRequestFor(doc)))
    expectClose(result.properties.area, 200 * 28 - 22 * 28 - 20 * 8, 1e-12)
    expect(result.warnings.filter(w => /hole|cut|notch/.test(w))).toEqual([])
  })

  it('one allowable becomes the same allowable in tension and compression; one effective length applies about both axes', () => {
    expect(doc.parts[0]!.material).toMatchObject({ allowableT: 150, allowableC: 150 })
    expect(doc.parts[0]!.material).not.toHaveProperty('allowable')
    expect(doc.settings.effectiveLength).toEqual({ u: 2400, v: 2400 })
    expect(doc.settings.shear).toEqual({ Vx: 0, Vy: 50000, lines: 1 })
  })

  it('the draft format (version 0) goes through both steps', () => {
    const draft = migrateDocument({ version: 0, parts: [], loads: [{ P: 1, x: 0, y: 0 }], settings: {} }) as { schema: string; loads: { caseId: string }[] }
    expect(draft.schema).toBe(DOCUMENT_SCHEMA)
    expect(draft.loads[0]!.caseId).toBe('case-1')
  })

  it('an unknown schema is refused with a readable message', () => {
    expect(() => migrateDocument({ schema: 'kernwise.sketch/9' })).toThrow(/Unknown document schema "kernwise.sketch\/9"/)
  })
})

import { describe, expect, it } from 'vitest'
import { emptyDocument, type SketchDocument } from '#shared/sketch/document'
import { analysisRequestFor, locateError, shownLoading } from '#shared/editor/analysis-request'
import { commandFor } from '#shared/editor/shortcuts'

function docWithLoads(): SketchDocument {
  const d = emptyDocument()
  return {
    ...d,
    parts: [{ id: 'p1', name: 'Plate', outline: [[0, 0], [10, 0], [10, 10]], holes: [{ id: 'h', kind: 'void', ring: [[1, 1], [2, 2], [2, 1]] }], material: { name: 'Steel', E: 200000, fy: 355 }, shape: null }],
    cases: [{ id: 'case-1', name: 'D', Mx: 10, My: 0 }, { id: 'case-2', name: 'W', Mx: 0, My: 4 }],
    loads: [{ id: 'l1', name: 'a', caseId: 'case-1', P: 1000, x: 1, y: 2 }, { id: 'l2', name: 'b', caseId: 'case-2', P: 500, x: 3, y: 4 }],
    combinations: [{ id: 'c1', name: 'ex', factors: { 'case-1': 1.35, 'case-2': 1.5 } }],
  }
}

describe('the analysis request of a document', () => {
  it('shows the first case by default', () => {
    expect(shownLoading(docWithLoads())).toEqual({ loads: [{ P: 1000, x: 1, y: 2 }], Mx: 10, My: 0 })
  })

  it('scales loads and moments by a combination\'s factors', () => {
    const d = docWithLoads()
    const r = shownLoading({ ...d, settings: { ...d.settings, show: { type: 'combination', id: 'c1' } } })
    expect(r.loads).toEqual([{ P: 1350, x: 1, y: 2 }, { P: 750, x: 3, y: 4 }])
    expect(r.Mx).toBeCloseTo(13.5, 12)
    expect(r.My).toBeCloseTo(6, 12)
  })

  it('analysisRequestFor maps parts, holes and materials, and is null for no parts', () => {
    const body = analysisRequestFor(docWithLoads())!
    expect(body.parts[0]!.holes).toEqual([[[1, 1], [2, 2], [2, 1]]])
    expect(body.parts[0]!.material).toMatchObject({ E: 200000, fy: 355 })
    expect(analysisRequestFor(emptyDocument())).toBeNull()
  })

  it('locateError maps the 0-based part index of a 422 to the part id', () => {
    expect(locateError(docWithLoads(), { part: 0, ring: 1, vertex: 2 })).toEqual({ partId: 'p1', ring: 1, vertex: 2 })
    expect(locateError(docWithLoads(), null)).toEqual({ partId: null, ring: null, vertex: null })
  })
})

describe('shortcuts', () => {
  const k = (key: string, mods: Partial<{ ctrlKey: boolean; shiftKey: boolean; metaKey: boolean; altKey: boolean }> = {}) =>
    commandFor({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...mods })
  it.each([
    [k('z', { ctrlKey: true }), 'undo'],
    [k('Z', { ctrlKey: true, shiftKey: true }), 'redo'],
    [k('y', { ctrlKey: true }), 'redo'],
    [k('d', { metaKey: true }), 'duplicate'],
    [k('a', { ctrlKey: true }), 'selectAll'],
    [k(']'), 'nextPart'],
    [k('['), 'prevPart'],
    [k('Delete'), 'delete'],
    [k('r'), 'rotate90'],
    [k('m'), 'mirrorX'],
    [k('M', { shiftKey: true }), 'mirrorY'],
    [k('f'), 'fit'],
    [k('?', { shiftKey: true }), 'help'],
    [k('Escape'), 'escape'],
    [k('ArrowUp', { shiftKey: true }), 'nudgeUp'],
    [k('q'), null],
  ])('commandFor gives %s', (got, want) => {
    expect(got).toBe(want)
  })
})

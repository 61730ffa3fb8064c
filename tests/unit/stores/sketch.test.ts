import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { watch } from 'vue'
import { emptyDocument, type SketchDocument } from '#shared/sketch/document'
import { ringArea } from '#shared/geometry/moments'
import { rectangleRing } from '#shared/editor/transform'
import { analysisRequestFor } from '#shared/editor/analysis-request'
import { AnalysisRequest } from '#shared/analysis/contract'
import { analyseSection } from '#shared/mechanics/analyze'
import { useSketchStore } from '../../../stores/sketch'

const net = (s: ReturnType<typeof useSketchStore>, id: string) => {
  const p = s.partById(id)!
  return ringArea(p.outline) + p.holes.reduce((a, h) => a + ringArea(h.ring), 0)
}

function fresh() {
  const s = useSketchStore()
  s.load({ id: 's1', title: 'T', project: '', description: '', status: 'draft', version: 1, ownerId: 'u', createdAt: '', updatedAt: '', partCount: 0, document: emptyDocument() })
  return s
}

/** Runs `act`, then checks undo restores the document exactly and redo re-applies it. */
function roundTrip(s: ReturnType<typeof useSketchStore>, act: () => void): { before: SketchDocument; after: SketchDocument } {
  const before = s.doc
  act()
  const after = s.doc
  expect(after).not.toBe(before)
  s.undo()
  expect(s.doc).toEqual(before)
  s.redo()
  expect(s.doc).toEqual(after)
  return { before, after }
}

describe('sketch store: parts, each action with its undo', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('load opens a document and clears the history', () => {
    const s = fresh()
    expect(s.meta?.title).toBe('T')
    expect(s.canUndo).toBe(false)
  })

  it('addPart orients the outline CCW and holes CW, steel by default; undo removes it', () => {
    const s = fresh()
    let id = ''
    roundTrip(s, () => { id = s.addPart({ outline: rectangleRing([0, 0], [10, 10]).reverse(), holes: [{ ring: rectangleRing([2, 2], [4, 4]) }] }) })
    const p = s.partById(id)!
    expect(ringArea(p.outline)).toBe(100)
    expect(ringArea(p.holes[0]!.ring)).toBe(-4)
    expect(p.material.E).toBe(200_000)
  })

  it('renamePart, removeParts and duplicateParts undo', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [10, 10]) })
    roundTrip(s, () => s.renamePart(id, 'Web'))
    expect(s.partById(id)!.name).toBe('Web')
    let copies: string[] = []
    roundTrip(s, () => { copies = s.duplicateParts([id], [20, 0]) })
    expect(s.partById(copies[0]!)!.outline[0]).toEqual([20, 0])
    roundTrip(s, () => s.removeParts([id]))
    expect(s.partById(id)).toBeUndefined()
  })

  it('moveParts, rotateParts (90° about the centre) and mirrorParts undo', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [20, 10]) })
    roundTrip(s, () => s.moveParts([id], 5, 5))
    expect(s.bounds).toEqual({ minX: 5, minY: 5, maxX: 25, maxY: 15 })
    roundTrip(s, () => s.rotateParts([id], 90))
    expect(s.bounds).toEqual({ minX: 10, minY: 0, maxX: 20, maxY: 20 })
    roundTrip(s, () => s.mirrorParts([id], 'y'))
    expect(ringArea(s.partById(id)!.outline)).toBe(200)
  })

  it('moveVertex, insertVertex and deleteVertex undo; a ring keeps 3 vertices', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [100, 100]) })
    roundTrip(s, () => s.moveVertex(id, 0, 2, [150, 100]))
    expect(net(s, id)).toBe(12500) // trapezoid (100 + 150)/2 × 100
    roundTrip(s, () => s.insertVertex(id, 0, 0, [50, -10]))
    expect(s.partById(id)!.outline).toHaveLength(5)
    roundTrip(s, () => s.deleteVertex(id, 0, 1))
    s.deleteVertex(id, 0, 0)
    expect(() => s.deleteVertex(id, 0, 0)).toThrow(/at least 3/)
  })

  it('makeHollow gives a wall; undo brings the solid back', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [100, 60]) })
    roundTrip(s, () => s.makeHollow(id, 5))
    expect(net(s, id)).toBeCloseTo(1500, 6) // 100·60 − 90·50
  })

  it('makeHole, setHoleKind and removeHole undo', () => {
    const s = fresh()
    const outer = s.addPart({ outline: rectangleRing([0, 0], [100, 100]) })
    const inner = s.addPart({ outline: rectangleRing([40, 40], [60, 60]) })
    roundTrip(s, () => { expect(s.makeHole(inner, 'void')).toBe(outer) })
    expect(s.parts).toHaveLength(1)
    expect(net(s, outer)).toBe(9600)
    const hole = s.partById(outer)!.holes[0]!.id
    roundTrip(s, () => s.setHoleKind(outer, hole, 'notch'))
    expect(s.partById(outer)!.holes[0]!.kind).toBe('notch')
    roundTrip(s, () => s.removeHole(outer, hole))
    expect(s.partById(outer)!.holes).toHaveLength(0)
  })

  it('setPartKind makes a part a cut through every part it overlaps, and undo restores it (by hand: 100·100 + 100·20 - 20·40)', () => {
    const s = fresh()
    const plate = s.addPart({ outline: rectangleRing([0, 0], [100, 100]) })
    s.addPart({ outline: rectangleRing([0, 100], [100, 120]) })
    const bolt = s.addPart({ outline: rectangleRing([40, 80], [60, 130]) })
    roundTrip(s, () => s.setPartKind(bolt, 'cut'))
    expect(s.partById(bolt)!.kind).toBe('cut')
    const request = analysisRequestFor(s.doc)!
    expect(request.parts).toHaveLength(2)
    expect(request.cuts).toHaveLength(1)
    const area = analyseSection(AnalysisRequest.parse(request)).properties.area
    expect(area).toBeCloseTo(100 * 100 + 100 * 20 - 20 * 40, 6)
    expect(s.partById(plate)!.kind).toBe('solid')
  })

  it('unionParts and subtractParts undo', () => {
    const s = fresh()
    const a = s.addPart({ outline: rectangleRing([0, 0], [100, 100]) })
    const b = s.addPart({ outline: rectangleRing([50, 0], [150, 100]) })
    roundTrip(s, () => s.unionParts([a, b]))
    expect(s.parts).toHaveLength(1)
    expect(net(s, a)).toBeCloseTo(15000, 9)
    s.undo()
    roundTrip(s, () => s.subtractParts([a, b]))
    expect(net(s, a)).toBeCloseTo(5000, 9)
  })

  it('setMaterial undoes', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [1, 1]) })
    roundTrip(s, () => s.setMaterial([id], { name: 'Aluminium', E: 70_000, fy: 240 }))
    expect(s.partById(id)!.material.E).toBe(70_000)
  })

  it('updateSettings and setShow undo', () => {
    const s = fresh()
    roundTrip(s, () => s.updateSettings({ units: 'US', gridMm: 25.4 }))
    expect(s.doc.settings.units).toBe('US')
    roundTrip(s, () => s.setShow({ type: 'envelope', id: null }))
    expect(s.doc.settings.show.type).toBe('envelope')
  })

  it('revision counts every change, undo and redo (autosave watches it)', () => {
    const s = fresh()
    s.addPart({ outline: rectangleRing([0, 0], [1, 1]) })
    s.undo()
    s.redo()
    expect(s.revision).toBe(3)
  })

  it('a synchronous watcher of the document already sees the new revision (the live analysis sends at once)', () => {
    const s = fresh()
    const seen: [number, number][] = []
    const stop = watch(() => s.doc, doc => seen.push([doc.parts.length, s.revision]), { flush: 'sync' })
    s.addPart({ outline: rectangleRing([0, 0], [1, 1]) })
    s.undo()
    stop()
    expect(seen).toEqual([[1, 1], [0, 2]])
  })

  it('moving a vertex re-runs readers of the parts only: settings, loads, cases and combinations are not triggered', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [100, 50]) })
    s.addLoad({ caseId: 'case-1', P: 1000, x: 50, y: 25 })
    const runs = { parts: 0, settings: 0, loads: 0, cases: 0, combinations: 0 }
    const stops = (Object.keys(runs) as (keyof typeof runs)[]).map(k => watch(() => s[k], () => { runs[k]++ }, { flush: 'sync' }))
    s.moveVertex(id, 0, 2, [120, 60])
    s.undo()
    s.updateLoad(s.doc.loads[0]!.id, { P: 2000 })
    stops.forEach(stop => stop())
    expect(runs).toEqual({ parts: 2, settings: 0, loads: 1, cases: 0, combinations: 0 })
  })

  it('a new change after undo truncates redo', () => {
    const s = fresh()
    const id = s.addPart({ outline: rectangleRing([0, 0], [1, 1]) })
    s.moveParts([id], 1, 0)
    s.undo()
    s.moveParts([id], 0, 1)
    expect(s.canRedo).toBe(false)
    expect(s.redo()).toBeNull()
  })
})

describe('sketch store: loads, cases and combinations, each with its undo', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('addLoad, updateLoad, moveLoad and removeLoad undo', () => {
    const s = fresh()
    let id = ''
    roundTrip(s, () => { id = s.addLoad({ P: 320_000, x: 20, y: 60 }) })
    expect(s.doc.loads[0]).toMatchObject({ caseId: 'case-1', P: 320_000, x: 20, y: 60 })
    roundTrip(s, () => s.updateLoad(id, { P: 100_000, name: 'Crane' }))
    roundTrip(s, () => s.moveLoad(id, 5, 6))
    expect(s.doc.loads[0]).toMatchObject({ name: 'Crane', P: 100_000, x: 5, y: 6 })
    roundTrip(s, () => s.removeLoad(id))
    expect(s.doc.loads).toHaveLength(0)
    expect(() => s.addLoad({ caseId: 'nope' })).toThrow(/does not exist/)
  })

  it('addCase, renameCase, setCaseMoments and removeCase undo; removing a case drops its loads and factors', () => {
    const s = fresh()
    let c = ''
    roundTrip(s, () => { c = s.addCase('Wind') })
    roundTrip(s, () => s.renameCase(c, 'Wind (example)'))
    roundTrip(s, () => s.setCaseMoments(c, 1e6, -2e6))
    expect(s.doc.cases[1]).toMatchObject({ name: 'Wind (example)', Mx: 1e6, My: -2e6 })
    s.addLoad({ caseId: c })
    const combo = s.addCombination('Example', { 'case-1': 1.2, [c]: 1.5 })
    roundTrip(s, () => s.removeCase(c))
    expect(s.doc.loads).toHaveLength(0)
    expect(s.doc.combinations.find(x => x.id === combo)!.factors).toEqual({ 'case-1': 1.2 })
    expect(() => s.removeCase('case-1')).toThrow(/at least one/)
  })

  it('addCombination, updateCombination and removeCombination undo', () => {
    const s = fresh()
    let id = ''
    roundTrip(s, () => { id = s.addCombination('C1', { 'case-1': 1.35 }) })
    roundTrip(s, () => s.updateCombination(id, { factors: { 'case-1': 1.0 } }))
    expect(s.doc.combinations[0]!.factors['case-1']).toBe(1)
    roundTrip(s, () => s.removeCombination(id))
    expect(s.doc.combinations).toHaveLength(0)
  })

  it('setMeta changes the title without touching the history', () => {
    const s = fresh()
    s.setMeta({ title: 'New' })
    expect(s.meta!.title).toBe('New')
    expect(s.canUndo).toBe(false)
  })
})

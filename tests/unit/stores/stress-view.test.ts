import { beforeEach, describe, expect, it } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { emptyDocument } from '#shared/sketch/document'
import { rectangleRing } from '#shared/editor/transform'
import { analysisRequestFor } from '#shared/editor/analysis-request'
import { AnalysisRequest } from '#shared/analysis/contract'
import { analyseSection } from '#shared/mechanics/analyze'
import { useSketchStore } from '../../../stores/sketch'
import { useAnalysisStore } from '../../../stores/analysis'
import { useStressViewStore } from '../../../stores/stress-view'

/**
 * A 100 × 50 mm steel rectangle (b along x) under P = 100 kN: A = 5 000 mm², Iyy = h·b³/12 =
 * 4.1667e6 mm⁴, core half-width b/6 = 16.7 mm (textbook closed forms). The analysis is the
 * engine's own, given to the store as the server's answer would be.
 */
function section(id = 's1') {
  const s = useSketchStore()
  s.load({ id, title: 'T', project: '', description: '', status: 'draft', version: 1, ownerId: 'u', createdAt: '', updatedAt: '', partCount: 0, document: emptyDocument() })
  s.addPart({ outline: rectangleRing([-50, -25], [50, 25]) })
  const loadId = s.addLoad({ P: 100_000, x: 0, y: 0 })
  const result = analyseSection(AnalysisRequest.parse(analysisRequestFor(s.doc)))
  useAnalysisStore().latest = { revision: s.revision, result, error: null, errorAt: null, ms: 1 }
  return { s, loadId }
}

describe('stress view store', () => {
  beforeEach(() => setActivePinia(createPinia()))

  it('a centred load gives −P/A everywhere (−20 MPa) and sits in the core', () => {
    section()
    const view = useStressViewStore()
    expect(view.frame.min!.value).toBeCloseTo(-20, 9)
    expect(view.frame.max!.value).toBeCloseTo(-20, 9)
    expect(view.frame.inKern).toBe(true)
  })

  it('a drag moves the load for the frame only: at e = 25 mm, σ = −P/A ∓ P·e·(b/2)/Iyy = −50 and +10 MPa; the store gets one move at the end', () => {
    const { s, loadId } = section()
    const view = useStressViewStore()
    const revision = s.revision
    view.setDrag(loadId, 25, 0)
    expect(view.frame.min!.value).toBeCloseTo(-50, 9)
    expect(view.frame.max!.value).toBeCloseTo(10, 9)
    expect(view.frame.inKern).toBe(false)
    expect(view.loads[0]!.x).toBe(25)
    expect(s.revision).toBe(revision)
    expect(view.endDrag()).toEqual({ id: loadId, x: 25, y: 0 })
    expect(view.drag).toBeNull()
  })

  it('opening another sketch forgets the cut line, cut mode, envelope side and a drag', () => {
    const { loadId } = section('s1')
    const view = useStressViewStore()
    view.cut = { p0: [0, 0], p1: [10, 10] }
    view.cutMode = true
    view.envelopeSide = 'tension'
    view.setDrag(loadId, 5, 5)
    section('s2')
    expect(view.cut).toBeNull()
    expect(view.cutMode).toBe(false)
    expect(view.envelopeSide).toBe('compression')
    expect(view.drag).toBeNull()
  })

  it('with a geometry error the view has no stresses (invalid), not those of the drawing before', () => {
    section()
    const view = useStressViewStore()
    const a = useAnalysisStore()
    a.latest = { ...a.latest, revision: a.latest.revision + 1, result: null, error: 'Part 1 crosses itself', errorAt: null }
    expect(view.invalid).toBe('Part 1 crosses itself')
    expect(view.section).toBeNull()
  })
})

import type { AnalysisRequestBody, GeometryErrorData } from '../analysis/contract'
import type { SketchDocument } from '../sketch/document'

/**
 * The loads and moments a document shows (its `settings.show`): one case as is, or a combination
 * with each case's loads and moments scaled by its factor. The envelope and an unknown id fall
 * back to the first combination, then the first case. P in N, moments in N·mm.
 */
export function shownLoading(doc: SketchDocument): { loads: { P: number; x: number; y: number }[]; Mx: number; My: number } {
  const { show } = doc.settings
  const combo = show.type !== 'case' ? (doc.combinations.find(c => c.id === show.id) ?? doc.combinations[0]) : undefined
  const factors: Record<string, number> = combo
    ? combo.factors
    : { [(doc.cases.find(c => c.id === show.id) ?? doc.cases[0])?.id ?? '']: 1 }
  let Mx = 0
  let My = 0
  for (const c of doc.cases) {
    const f = factors[c.id] ?? 0
    Mx += f * c.Mx
    My += f * c.My
  }
  const loads = doc.loads.filter(l => (factors[l.caseId] ?? 0) !== 0).map(l => ({ P: l.P * factors[l.caseId]!, x: l.x, y: l.y }))
  return { loads, Mx, My }
}

/** The parts that are material (kind 'solid'), in document order: the request's `parts`. */
export function solidParts(doc: SketchDocument): SketchDocument['parts'] {
  return doc.parts.filter(p => p.kind !== 'cut')
}

/** The section-wide cuts (parts of kind 'cut'), in document order: the request's `cuts`. */
export function cutParts(doc: SketchDocument): SketchDocument['parts'] {
  return doc.parts.filter(p => p.kind === 'cut')
}

/** The POST /api/analysis body for a document (mm, N, MPa), or null when it has no solid part. */
export function analysisRequestFor(doc: SketchDocument): AnalysisRequestBody | null {
  const solids = solidParts(doc)
  if (solids.length === 0) return null
  const { loads, Mx, My } = shownLoading(doc)
  const s = doc.settings
  const ring = (r: SketchDocument['parts'][number]['outline']) => r.map(q => [q[0], q[1]] as [number, number])
  const { u, v } = s.effectiveLength
  return {
    parts: solids.map(p => ({
      name: p.name,
      outline: ring(p.outline),
      holes: p.holes.filter(h => h.kind !== 'notch').map(h => ring(h.ring)),
      notches: p.holes.filter(h => h.kind === 'notch').map(h => ring(h.ring)),
      ...(p.shape ? { source: p.shape.kind } : {}),
      material: {
        name: p.material.name,
        E: p.material.E,
        fy: p.material.fy,
        density: p.material.density,
        fc: p.material.fc,
        stressBlock: p.material.stressBlock,
        ...(p.material.noTension ? { noTension: true } : {}),
      },
    })),
    cuts: cutParts(doc).map(p => ring(p.outline)),
    loads,
    moments: { Mx, My },
    shear: { Vx: s.shear.Vx, Vy: s.shear.Vy },
    noTension: s.noTension || solids.some(p => p.material.noTension === true),
    ...(s.referenceE ? { referenceE: s.referenceE } : {}),
    ...(u !== null || v !== null ? { effectiveLength: { u, v } } : {}),
  }
}

/** Where a server geometry error points in the document: part id, ring (0 outline, k hole k-1), vertex index. */
export interface ErrorLocation {
  partId: string | null
  ring: number | null
  vertex: number | null
}

/**
 * Maps the 0-based indexes of a 422 answer to the document: a part index counts solid parts only,
 * a cut index the cut parts; request rings list a part's voids before its notches.
 */
export function locateError(doc: SketchDocument, data: Partial<GeometryErrorData> | null | undefined): ErrorLocation {
  if (typeof data?.cut === 'number') {
    const cut = cutParts(doc)[data.cut]
    return { partId: cut?.id ?? null, ring: 0, vertex: data.vertex ?? null }
  }
  const part = typeof data?.part === 'number' ? solidParts(doc)[data.part] : undefined
  let ring = data?.ring ?? null
  if (part && typeof ring === 'number' && ring > 0) {
    const order = [...part.holes.map((h, k) => [h, k] as const).filter(([h]) => h.kind !== 'notch'), ...part.holes.map((h, k) => [h, k] as const).filter(([h]) => h.kind === 'notch')]
    const hit = order[ring - 1]
    ring = hit ? hit[1] + 1 : ring
  }
  return { partId: part?.id ?? null, ring, vertex: data?.vertex ?? null }
}

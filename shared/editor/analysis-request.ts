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

/** The POST /api/analysis body for a document (mm, N, MPa), or null when it has no part. */
export function analysisRequestFor(doc: SketchDocument): AnalysisRequestBody | null {
  if (doc.parts.length === 0) return null
  const { loads, Mx, My } = shownLoading(doc)
  const s = doc.settings
  return {
    parts: doc.parts.map(p => ({
      name: p.name,
      outline: p.outline.map(q => [q[0], q[1]] as [number, number]),
      holes: p.holes.map(h => h.ring.map(q => [q[0], q[1]] as [number, number])),
      material: { name: p.material.name, E: p.material.E, fy: p.material.fy, density: p.material.density },
    })),
    loads,
    moments: { Mx, My },
    shear: { Vx: s.shear.Vx, Vy: s.shear.Vy },
    noTension: s.noTension || doc.parts.some(p => p.material.noTension === true),
    ...(s.referenceE ? { referenceE: s.referenceE } : {}),
    ...(s.effectiveLength ? { effectiveLength: s.effectiveLength } : {}),
  }
}

/** Where a server geometry error points in the document: part id, ring (0 outline, k hole k-1), vertex index. */
export interface ErrorLocation {
  partId: string | null
  ring: number | null
  vertex: number | null
}

/** Maps the 0-based indexes of a 422 answer to the document's part id. */
export function locateError(doc: SketchDocument, data: Partial<GeometryErrorData> | null | undefined): ErrorLocation {
  const part = typeof data?.part === 'number' ? doc.parts[data.part] : undefined
  return { partId: part?.id ?? null, ring: data?.ring ?? null, vertex: data?.vertex ?? null }
}

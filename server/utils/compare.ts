import { AnalysisRequest } from '../../shared/analysis/contract'
import { analysisRequestFor } from '../../shared/editor/analysis-request'
import { analyseSection } from '../../shared/mechanics/analyze'
import { SectionError, type SectionProperties } from '../../shared/mechanics/types'
import type { SketchDocument } from '../../shared/sketch/document'

/** The properties a comparison lists: key, label and the unit kind of the value (model units: mm, mm², mm⁴, degrees). */
export const COMPARED: { key: string; label: string; unit: string; pick: (p: SectionProperties) => number }[] = [
  { key: 'area', label: 'Area A', unit: 'mm²', pick: p => p.area },
  { key: 'cx', label: 'Centroid x', unit: 'mm', pick: p => p.centroid.x },
  { key: 'cy', label: 'Centroid y', unit: 'mm', pick: p => p.centroid.y },
  { key: 'Ixx', label: 'Ix', unit: 'mm⁴', pick: p => p.Ixx },
  { key: 'Iyy', label: 'Iy', unit: 'mm⁴', pick: p => p.Iyy },
  { key: 'Ixy', label: 'Ixy', unit: 'mm⁴', pick: p => p.Ixy },
  { key: 'I1', label: 'I1 (major)', unit: 'mm⁴', pick: p => p.I1 },
  { key: 'I2', label: 'I2 (minor)', unit: 'mm⁴', pick: p => p.I2 },
  { key: 'theta', label: 'Principal angle', unit: '°', pick: p => p.theta },
  { key: 'Stop', label: 'Sx top', unit: 'mm³', pick: p => p.S.top },
  { key: 'Sbottom', label: 'Sx bottom', unit: 'mm³', pick: p => p.S.bottom },
]

function propertiesOf(doc: SketchDocument): { properties: SectionProperties | null; error: string | null } {
  const request = analysisRequestFor(doc)
  if (!request) return { properties: null, error: 'no parts' }
  try {
    return { properties: analyseSection(AnalysisRequest.parse(request)).properties, error: null }
  } catch (error) {
    if (error instanceof SectionError) return { properties: null, error: error.message }
    throw error
  }
}

/** The property rows of two documents: each value, the difference (b − a) and the change in per cent (null when a is 0 or either is missing). */
export function compareDocuments(a: SketchDocument, b: SketchDocument) {
  const pa = propertiesOf(a)
  const pb = propertiesOf(b)
  const rows = COMPARED.map(({ key, label, unit, pick }) => {
    const from = pa.properties ? pick(pa.properties) : null
    const to = pb.properties ? pick(pb.properties) : null
    const difference = from !== null && to !== null ? to - from : null
    const percent = difference !== null && from !== null && Math.abs(from) > 1e-12 ? (100 * difference) / Math.abs(from) : null
    return { key, label, unit, from, to, difference, percent }
  })
  return { rows, errors: { from: pa.error, to: pb.error }, parts: { from: a.parts.length, to: b.parts.length } }
}

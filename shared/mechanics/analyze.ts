import type { Ring } from '../geometry/types'
import { solveContact } from './contact'
import { kernPolygon } from './kern'
import { prepareSection } from './prepare'
import { sectionProperties } from './properties'
import { shearFlows } from './shear'
import { slenderness, type SlendernessResult } from './slenderness'
import { sectionStress } from './stress'
import { torsionAnalysis, type TorsionInput, type TorsionResult } from './torsion/analysis'
import type { AppliedMoments, ContactResult, PartInput, PointLoad, PreparedSection, SectionProperties, ShearFlowResult, StressResult } from './types'

/** Everything one analysis needs (mm, N, N·mm, MPa; P > 0 is compression). */
export interface AnalysisInput extends TorsionInput {
  parts: readonly PartInput[]
  loads?: readonly PointLoad[]
  moments?: AppliedMoments
  shear?: { Vx: number; Vy: number }
  noTension?: boolean
  referenceE?: number
  /** Effective length KL (mm) for the slenderness caution. */
  effectiveLength?: number
}

export interface AnalysisRegionOut {
  name: string
  E: number
  n: number
  fy: number | null
  polygons: Ring[][]
}

/**
 * The full answer of one analysis: what POST /api/analysis returns. The convex hull is not part of
 * it: `regionsHull(regions)` (shared/geometry/hull.ts) gives the same hull the engine used.
 */
export interface AnalysisOutput {
  properties: SectionProperties
  kern: Ring
  regions: AnalysisRegionOut[]
  stress: StressResult | null
  contact?: ContactResult
  shear: ShearFlowResult[]
  slenderness: SlendernessResult | null
  vertexCount: number
  warnings: string[]
  /** Saint-Venant torsion and shear, when the input asks for it (`torsion: true`). */
  torsion?: TorsionResult
}

/**
 * Runs the whole section analysis: prepare (normalise, validate, Booleans), properties, core,
 * stress under the loads and moments, no-tension contact when asked, shear flow per part and the
 * slenderness caution. Throws SectionError for invalid geometry (naming part and vertex).
 */
export function analyseSection(input: AnalysisInput): AnalysisOutput {
  const prepared: PreparedSection = prepareSection(input.parts, { referenceE: input.referenceE })
  const properties = sectionProperties(prepared)
  const hull = prepared.hull
  const kern = kernPolygon(properties, hull)
  const loads = input.loads ?? []
  const moments = input.moments ?? { Mx: 0, My: 0 }
  const warnings = [...prepared.warnings]
  const regions = prepared.regions.map((r, i) => ({ n: r.n, polygons: r.polygons, region: i }))

  const hasActions = loads.some(l => l.P !== 0) || moments.Mx !== 0 || moments.My !== 0
  const stress = hasActions ? sectionStress(properties, hull, regions, loads, moments) : null

  let contact: ContactResult | undefined
  if (input.noTension) {
    if (moments.Mx !== 0 || moments.My !== 0) warnings.push('No-tension contact uses the point loads only; the applied moments are not included in it.')
    contact = solveContact(properties, regions, hull, loads)
  }

  const Vx = input.shear?.Vx ?? 0
  const Vy = input.shear?.Vy ?? 0
  const shear = prepared.parts.length > 1 ? shearFlows(properties, prepared.parts, Vx, Vy) : []

  const P = loads.reduce((s, l) => s + l.P, 0)
  const slender = input.effectiveLength ? slenderness(properties, prepared.referenceE, input.effectiveLength, P) : null
  if (slender?.warning) warnings.push(slender.warning)

  let vertexCount = 0
  for (const r of prepared.regions) for (const poly of r.polygons) for (const ring of poly) vertexCount += ring.length

  return {
    properties,
    kern,
    regions: prepared.regions.map(r => ({
      name: r.material.name ?? 'Material',
      E: r.material.E,
      n: r.n,
      fy: r.material.fy ?? null,
      polygons: r.polygons as Ring[][],
    })),
    stress,
    contact,
    shear,
    slenderness: slender,
    vertexCount,
    warnings,
    ...(input.torsion ? { torsion: torsionAnalysis(prepared, { mesh: input.torsionMesh, study: input.torsionStudy, loads: input.torsionLoads }) } : {}),
  }
}

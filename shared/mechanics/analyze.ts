import type { Ring } from '../geometry/types'
import { checkTable, type CheckTable } from './check-table'
import { connectionShearFlows, type Connection } from './connections'
import { bearingChecks, bearingWarning, contactUnderActions } from './contact'
import { kernPolygon } from './kern'
import { materialKey, prepareSection } from './prepare'
import { sectionProperties } from './properties'
import { slenderness, type EffectiveLengths, type SlendernessResult } from './slenderness'
import { sectionStress } from './stress'
import { torsionAnalysis, type TorsionInput, type TorsionResult } from './torsion/analysis'
import type { AppliedMoments, ContactResult, PartInput, PointLoad, PreparedCut, PreparedSection, SectionProperties, StressResult } from './types'

/** Everything one analysis needs (mm, N, N·mm, MPa; P > 0 is compression). */
export interface AnalysisInput extends TorsionInput {
  parts: readonly PartInput[]
  /** Section-wide cuts (mm): openings through every part they overlap. */
  cuts?: readonly Ring[]
  loads?: readonly PointLoad[]
  moments?: AppliedMoments
  shear?: { Vx: number; Vy: number }
  noTension?: boolean
  referenceE?: number
  /** Effective length KL (mm) about both principal axes, or per axis {u, v}, for the slenderness caution. */
  effectiveLength?: EffectiveLengths
  /** Edges within this distance (mm) and collinear are one contact line between parts. */
  contactTolerance?: number
  /** Also build the check table (rows per part, hole, cut and overlap). */
  checkTable?: boolean
}

export interface AnalysisRegionOut {
  name: string
  E: number
  n: number
  fy: number | null
  /** Compression or bearing strength (MPa), checked against the no-tension pressure. */
  fc: number | null
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
  /** Where parts meet, with the shear flow each connection carries for `shear` (empty for one part). */
  connections: Connection[]
  /** The section-wide cuts and the parts each cuts. */
  cuts: PreparedCut[]
  slenderness: SlendernessResult | null
  /** The hand tabulation, when asked for. */
  checkTable?: CheckTable
  vertexCount: number
  warnings: string[]
  /** Saint-Venant torsion and shear, when the input asks for it (`torsion: true`). */
  torsion?: TorsionResult
}

/**
 * Runs the whole section analysis: prepare (normalise, validate, Booleans), properties, core,
 * stress under the loads and moments, no-tension contact (under the resultant of loads and moments)
 * when asked, shear flow per connection and the slenderness caution. Throws SectionError for invalid geometry (naming part and vertex).
 */
export function analyseSection(input: AnalysisInput): AnalysisOutput {
  const prepared: PreparedSection = prepareSection(input.parts, { referenceE: input.referenceE, cuts: input.cuts })
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
    contact = contactUnderActions(properties, regions, hull, loads, moments)
    const bearing = bearingChecks(contact, prepared.regions.map(r => ({ name: r.material.name ?? 'Material', n: r.n, rings: r.polygons.flat(), fc: r.material.fc ?? null })))
    contact = { ...contact, bearing }
    for (const check of bearing) {
      const w = bearingWarning(check)
      if (w) warnings.push(w)
    }
  }

  const Vx = input.shear?.Vx ?? 0
  const Vy = input.shear?.Vy ?? 0
  let connections: Connection[] = []
  if (prepared.parts.length > 1) {
    const found = connectionShearFlows(properties, prepared.parts.map(p => ({ index: p.index, name: p.name, n: p.n, materialKey: materialKey(p.material), polygons: p.polygons })), Vx, Vy, input.contactTolerance)
    connections = found.connections
    for (const k of found.isolated) warnings.push(`Part ${k + 1} (${prepared.parts[k]!.name}) touches no other part: the section properties assume it acts with the rest.`)
    if (connections.some(c => c.status === 'closed-cell')) {
      warnings.push(input.torsion
        ? 'Some connections close a cell: their shear flow is not statically determinate; it is given from the finite element shear solution (torsion.connections).'
        : 'Some connections close a cell: their shear flow is not statically determinate; ask for torsion to have it from the finite element shear solution.')
    }
  }

  const P = loads.reduce((s, l) => s + l.P, 0)
  const slender = input.effectiveLength !== undefined ? slenderness(properties, prepared.referenceE, input.effectiveLength, P) : null
  if (slender?.warning) warnings.push(slender.warning)
  if (properties.moduliNote) warnings.push(properties.moduliNote)

  const table = input.checkTable
    ? checkTable(input.parts, input.cuts ?? [], prepared, properties, input.parts.map(p => p.source ?? null))
    : undefined

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
      fc: r.material.fc ?? null,
      polygons: r.polygons as Ring[][],
    })),
    stress,
    contact,
    connections,
    cuts: [...prepared.cuts],
    slenderness: slender,
    ...(table ? { checkTable: table } : {}),
    vertexCount,
    warnings,
    ...(input.torsion ? { torsion: torsionWithConnections(prepared, input, connections, Vx, Vy) } : {}),
  }
}

/**
 * Torsion, and with it the shear flow across every connection from the finite element shear
 * solution for the input's Vx, Vy through the shear centre (`torsion.connections`, N/mm, positive
 * from the first part into the second), which closed cells need and trees check.
 */
function torsionWithConnections(prepared: PreparedSection, input: TorsionInput, connections: readonly Connection[], Vx: number, Vy: number): TorsionResult {
  const { lineFlows, ...torsion } = torsionAnalysis(prepared, { mesh: input.torsionMesh, study: input.torsionStudy, loads: input.torsionLoads, lines: connections.map(c => c.line) })
  if (!lineFlows) return torsion
  return { ...torsion, connections: connections.map((c, k) => ({ parts: c.parts, qVx: lineFlows[k]!.qVx, qVy: lineFlows[k]!.qVy, q: Vx * lineFlows[k]!.qVx + Vy * lineFlows[k]!.qVy })) }
}

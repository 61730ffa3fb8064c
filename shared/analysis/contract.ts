import { z } from 'zod'
import type { Ring } from '../geometry/types'
import type { ContactResult, SectionProperties, ShearFlowResult, StressResult } from '../mechanics/types'

const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`)
const Vertex = z.tuple([finite('x'), finite('y')], { error: 'A vertex is a pair [x, y] in mm' })
const RingIn = z.array(Vertex, { error: 'A ring is a list of [x, y] vertices' })

export const AnalysisMaterial = z.object({
  name: z.string().max(80).optional(),
  E: finite('E').refine(v => v > 0, 'E must be positive (MPa)').default(200_000),
  fy: finite('fy').refine(v => v > 0, 'fy must be positive (MPa)').optional(),
  density: finite('density').refine(v => v > 0, 'density must be positive (kg/m³)').optional(),
})

/** Body of POST /api/analysis (mm, N, MPa; P > 0 is compression). */
export const AnalysisRequest = z.object({
  parts: z.array(z.object({
    name: z.string().max(80).optional(),
    outline: RingIn,
    holes: z.array(RingIn).default([]),
    material: AnalysisMaterial.default({ E: 200_000 }),
  })).min(1, 'Send at least one part').max(500, 'At most 500 parts'),
  loads: z.array(z.object({ P: finite('P'), x: finite('x'), y: finite('y') })).max(1000).default([]),
  moments: z.object({ Mx: finite('Mx').default(0), My: finite('My').default(0) }).default({ Mx: 0, My: 0 }),
  shear: z.object({ Vx: finite('Vx').default(0), Vy: finite('Vy').default(0) }).default({ Vx: 0, Vy: 0 }),
  noTension: z.boolean().default(false),
  referenceE: finite('referenceE').refine(v => v > 0, 'referenceE must be positive (MPa)').optional(),
  effectiveLength: finite('effectiveLength').refine(v => v > 0, 'effectiveLength must be positive (mm)').optional(),
})
export type AnalysisRequestBody = z.input<typeof AnalysisRequest>

/** One material region of the answer, for drawing and per-material stress (n = E / E_ref). */
export interface AnalysisRegion {
  name: string
  E: number
  n: number
  fy: number | null
  polygons: Ring[][]
}

/** Answer of POST /api/analysis. */
export interface AnalysisResponse {
  properties: SectionProperties
  hull: Ring
  kern: Ring
  regions: AnalysisRegion[]
  /** null when there are no loads and no moments. */
  stress: StressResult | null
  /** Only in no-tension mode. */
  contact?: ContactResult
  shear: ShearFlowResult[]
  slenderness: { KLr: number; eulerLoad: number; ratio: number | null; warning: string | null } | null
  vertexCount: number
  chordTolerance: number | null
  warnings: string[]
}

/** Body of a geometry error (422): where the problem is. */
export interface GeometryErrorData {
  part: number | null
  ring: number | null
  vertex: number | null
}

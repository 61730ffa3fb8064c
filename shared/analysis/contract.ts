import { z } from 'zod'
import type { Ring } from '../geometry/types'
import type { Point } from '../geometry/types'
import type { AnalysisOutput } from '../mechanics/analyze'
import { PoissonRatio, TorsionRequestFields } from './torsion-contract'

const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`)
/**
 * A ring as [[x, y], ...]. Checked with one plain loop rather than a zod schema per vertex: a
 * 200 000-vertex request must validate in milliseconds. Geometry checks (finite, size,
 * self-intersection) with part and vertex numbers follow in prepareSection.
 */
const RingIn = z.array(z.unknown(), { error: 'A ring is a list of [x, y] vertices' }).superRefine((ring, ctx) => {
  for (let i = 0; i < ring.length; i++) {
    const v = ring[i]
    if (!Array.isArray(v) || v.length !== 2 || typeof v[0] !== 'number' || typeof v[1] !== 'number') {
      ctx.addIssue({ code: 'custom', path: [i], message: `vertex ${i + 1} must be a pair of numbers [x, y] in mm` })
      return
    }
  }
}).transform(ring => ring as unknown as Point[])

export const AnalysisMaterial = z.object({
  name: z.string().max(80).optional(),
  E: finite('E').refine(v => v > 0, 'E must be positive (MPa)').default(200_000),
  fy: finite('fy').refine(v => v > 0, 'fy must be positive (MPa)').optional(),
  density: finite('density').refine(v => v > 0, 'density must be positive (kg/m³)').optional(),
  fc: finite('fc').refine(v => v > 0, 'fc must be positive (MPa)').optional(),
  stressBlock: finite('stressBlock').refine(v => v > 0 && v <= 1, 'stressBlock lies in (0, 1]').optional(),
  noTension: z.boolean().optional(),
  nu: PoissonRatio,
})

/** Body of POST /api/analysis (mm, N, MPa; P > 0 is compression). */
export const AnalysisRequest = z.object({
  parts: z.array(z.object({
    name: z.string().max(80).optional(),
    outline: RingIn,
    holes: z.array(RingIn).default([]),
    notches: z.array(RingIn).default([]),
    material: AnalysisMaterial.default({ E: 200_000 }),
    /** The shape the part came from ("ishape", "channel"...), named in its check-table row. */
    source: z.string().max(80).optional(),
  })).min(1, 'Send at least one part').max(500, 'At most 500 parts'),
  /** Section-wide cuts: openings through every part they overlap (a bolt hole through a flange and its cover plate). */
  cuts: z.array(RingIn).max(500, 'At most 500 cuts').default([]),
  loads: z.array(z.object({ P: finite('P'), x: finite('x'), y: finite('y') })).max(1000).default([]),
  moments: z.object({ Mx: finite('Mx').default(0), My: finite('My').default(0) }).default({ Mx: 0, My: 0 }),
  shear: z.object({ Vx: finite('Vx').default(0), Vy: finite('Vy').default(0) }).default({ Vx: 0, Vy: 0 }),
  /** Length tolerance (mm) within which two part edges count as one contact line for shear flow. */
  contactTolerance: finite('contactTolerance').refine(v => v > 0 && v <= 10, 'contactTolerance lies in (0, 10] mm').optional(),
  noTension: z.boolean().default(false),
  /** Answer the check table too: a row per part, hole, cut and overlap with its parallel-axis terms. */
  checkTable: z.boolean().default(false),
  referenceE: finite('referenceE').refine(v => v > 0, 'referenceE must be positive (MPa)').optional(),
  /** K·L (mm): one number about both principal axes, or {u, v} about the major and minor axis. */
  effectiveLength: z.union([
    finite('effectiveLength').refine(v => v > 0, 'effectiveLength must be positive (mm)'),
    z.object({
      u: finite('effectiveLength.u').refine(v => v > 0, 'effectiveLength.u must be positive (mm)').nullable().optional(),
      v: finite('effectiveLength.v').refine(v => v > 0, 'effectiveLength.v must be positive (mm)').nullable().optional(),
    }),
  ], { error: 'effectiveLength is a length in mm or {u, v} in mm' }).optional(),
  /**
   * Parts of the answer the caller derives itself and need not be sent: `kern` (the core polygon,
   * `kernPolygon(properties, regionsHull(regions))`) and `vertexStresses` (`stress.vertices`, the
   * plane at each vertex). For a section of thousands of vertices they are most of the answer.
   */
  omit: z.array(z.enum(['kern', 'vertexStresses'], { error: 'omit lists "kern" and/or "vertexStresses"' })).max(2).default([]),
  ...TorsionRequestFields,
})
export type AnalysisRequestBody = z.input<typeof AnalysisRequest>

/**
 * Answer of POST /api/analysis (see shared/mechanics/analyze.ts): `kern` and `stress.vertices` are
 * absent when the request's `omit` names them.
 */
export type AnalysisResponse = Omit<AnalysisOutput, 'kern' | 'stress'> & {
  kern?: AnalysisOutput['kern']
  stress: (Omit<NonNullable<AnalysisOutput['stress']>, 'vertices'> & { vertices?: NonNullable<AnalysisOutput['stress']>['vertices'] }) | null
}
export type AnalysisRegion = AnalysisOutput['regions'][number]

/** Body of a geometry error (422): where the problem is. */
export interface GeometryErrorData {
  part: number | null
  ring: number | null
  vertex: number | null
  /** The section-wide cut at fault (0-based), when the problem is a cut. */
  cut: number | null
}

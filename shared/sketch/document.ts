import { z } from 'zod'
import { upgradeDocument } from './migrate'

/** The current Kernwise sketch document format. Bump it with a migration in `migrateDocument`. */
export const DOCUMENT_SCHEMA = 'kernwise.sketch/2'

/** Most vertices one sketch or one analysis request may carry (README "Limits"). */
export const MAX_VERTICES = 250_000

const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`)
const coord = finite('A coordinate').refine(v => Math.abs(v) <= 1e9, 'A coordinate must lie within ±1e9 mm')
const Vertex = z.tuple([coord, coord], { error: 'A vertex is a pair [x, y] in mm' }).readonly()
const RingSchema = z.array(Vertex).min(3, 'A ring needs at least 3 vertices')
const Id = z.string().min(1).max(64)
const EffectiveLength = finite('Effective length').refine(v => v > 0, 'The effective length must be positive').nullable().default(null)

export const MaterialSchema = z.object({
  name: z.string().max(80).default('Steel'),
  E: finite('E').refine(v => v > 0, 'E must be positive (MPa)'),
  fy: finite('fy').refine(v => v > 0, 'fy must be positive (MPa)').optional(),
  density: finite('Density').refine(v => v > 0, 'Density must be positive (kg/m³)').optional(),
  /** Allowable stresses for the utilisation check (MPa, magnitudes), typed by the user: in tension and in compression. */
  allowableT: finite('Allowable tension').refine(v => v > 0, 'The allowable tension must be positive (MPa)').optional(),
  allowableC: finite('Allowable compression').refine(v => v > 0, 'The allowable compression must be positive (MPa)').optional(),
  /** Compression strength (MPa) of a concrete-like material, for bearing and the plastic stress block. */
  fc: finite('fc').refine(v => v > 0, 'fc must be positive (MPa)').optional(),
  /** Stress-block factor applied to fc in plastic capacity (-); 0.85 when not given (common practice). */
  stressBlock: finite('Stress-block factor').refine(v => v > 0 && v <= 1, 'The stress-block factor lies in (0, 1]').optional(),
  noTension: z.boolean().optional(),
})

export const HoleSchema = z.object({
  id: Id,
  /**
   * A hole of its own part only: 'void' lies inside the outline; 'notch' crosses its edge (a slot,
   * a cope). An opening through several parts is a part of kind 'cut' instead.
   */
  kind: z.enum(['void', 'notch']).default('void'),
  ring: RingSchema,
})

export const PartSchema = z.object({
  id: Id,
  name: z.string().max(80).default('Part'),
  /**
   * 'solid' is material; 'cut' is an opening through every part it overlaps (a bolt hole through a
   * flange and its cover plate): its outline is subtracted, its holes and material are ignored.
   */
  kind: z.enum(['solid', 'cut']).default('solid'),
  outline: RingSchema,
  holes: z.array(HoleSchema).default([]),
  material: MaterialSchema,
  /** The parametric shape it came from, kept so the form can be reopened. */
  shape: z.object({ kind: z.string().max(32), params: z.record(z.string(), z.number()) }).nullable().default(null),
})

export const LoadSchema = z.object({
  id: Id,
  name: z.string().max(80).default('Load'),
  caseId: Id,
  /** N, positive in compression. */
  P: finite('P'),
  x: coord,
  y: coord,
})

export const LoadCaseSchema = z.object({
  id: Id,
  name: z.string().min(1).max(80),
  /** Applied moments of this case about the centroidal axes, N·mm. */
  Mx: finite('Mx').default(0),
  My: finite('My').default(0),
})

export const CombinationSchema = z.object({
  id: Id,
  name: z.string().min(1).max(80),
  /** Factor per load case id, typed by the user (no code's factors are built in). */
  factors: z.record(z.string(), finite('A factor')),
})

export const SettingsSchema = z.object({
  units: z.enum(['SI', 'US']).default('SI'),
  gridMm: finite('Grid').refine(v => v > 0, 'The grid must be positive').default(10),
  snap: z.boolean().default(true),
  chordTolerance: finite('Chord tolerance').refine(v => v > 0, 'The chord tolerance must be positive').default(0.05),
  referenceE: finite('Reference E').refine(v => v > 0, 'Reference E must be positive').nullable().default(null),
  noTension: z.boolean().default(false),
  /** Effective lengths K·L (mm) about the major (u) and minor (v) principal axes; null when not given. */
  effectiveLength: z.object({ u: EffectiveLength, v: EffectiveLength }).default({ u: null, v: null }),
  /** Shear forces (N) and the weld or fastener lines per connection that share the shear flow. */
  shear: z.object({ Vx: finite('Vx').default(0), Vy: finite('Vy').default(0), lines: z.union([z.literal(1), z.literal(2)]).default(1) }).default({ Vx: 0, Vy: 0, lines: 1 }),
  /** Display units of areas and second moments (the trade's choices); null follows the unit system. */
  areaUnit: z.enum(['mm2', 'cm2', 'm2', 'in2']).nullable().default(null),
  inertiaUnit: z.enum(['mm4', 'cm4', 'm4', 'in4']).nullable().default(null),
  /** What the stress view shows: a case, a combination, or the envelope of all combinations. */
  show: z.object({ type: z.enum(['case', 'combination', 'envelope']), id: z.string().nullable() }).default({ type: 'case', id: null }),
})

export const SketchDocumentSchema = z
  .object({
    schema: z.literal(DOCUMENT_SCHEMA, { error: `The document schema must be "${DOCUMENT_SCHEMA}"` }),
    parts: z.array(PartSchema).max(500, 'A sketch has at most 500 parts'),
    cases: z.array(LoadCaseSchema).min(1, 'A sketch needs at least one load case'),
    combinations: z.array(CombinationSchema).default([]),
    loads: z.array(LoadSchema).max(200, 'A sketch has at most 200 loads'),
    settings: SettingsSchema,
  })
  .superRefine((doc, ctx) => {
    const vertices = doc.parts.reduce((n, p) => n + p.outline.length + p.holes.reduce((m, h) => m + h.ring.length, 0), 0)
    if (vertices > MAX_VERTICES) ctx.addIssue({ code: 'custom', message: `The sketch has ${vertices} vertices; the limit is ${MAX_VERTICES}` })
    const caseIds = new Set(doc.cases.map(c => c.id))
    doc.loads.forEach((l, i) => {
      if (!caseIds.has(l.caseId)) ctx.addIssue({ code: 'custom', path: ['loads', i, 'caseId'], message: `Load "${l.name}" belongs to a load case that does not exist` })
    })
  })

export type SketchDocument = z.output<typeof SketchDocumentSchema>
export type SketchPart = z.output<typeof PartSchema>
export type SketchHole = z.output<typeof HoleSchema>
export type SketchLoad = z.output<typeof LoadSchema>
export type LoadCase = z.output<typeof LoadCaseSchema>
export type LoadCombination = z.output<typeof CombinationSchema>
export type SketchSettings = z.output<typeof SettingsSchema>
export type SketchMaterial = z.output<typeof MaterialSchema>

/** A new, empty document with one load case. */
export function emptyDocument(): SketchDocument {
  return SketchDocumentSchema.parse({
    schema: DOCUMENT_SCHEMA,
    parts: [],
    cases: [{ id: 'case-1', name: 'Case 1', Mx: 0, My: 0 }],
    combinations: [],
    loads: [],
    settings: {},
  })
}

/**
 * Brings a stored document of any known schema up to the current one, one step per schema
 * (see shared/sketch/migrate.ts). Throws with a readable message on an unknown schema.
 */
export function migrateDocument(raw: unknown): unknown {
  return upgradeDocument(raw, DOCUMENT_SCHEMA)
}

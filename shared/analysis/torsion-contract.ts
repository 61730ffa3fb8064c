import { z } from 'zod'

const finite = (what: string) => z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be a finite number`)

/** Poisson's ratio of a material (0 ≤ ν < 0.5); torsion takes G = E / (2 (1 + ν)), default ν = 0.3. */
export const PoissonRatio = finite('nu').refine(v => v >= 0 && v < 0.5, "Poisson's ratio nu must be at least 0 and below 0.5").optional()

/**
 * The torsion fields of POST /api/analysis: `torsion` asks for J, Cw, the shear centre and the
 * shear areas; `torsionMesh` the mesh density; `torsionStudy` a second, finer mesh for the mesh
 * study; `torsionLoads` (N, N·mm; V through the shear centre, T about it) the shear stress field.
 */
export const TorsionRequestFields = {
  torsion: z.boolean().default(false),
  torsionMesh: z.enum(['coarse', 'normal', 'fine'], { error: 'torsionMesh is "coarse", "normal" or "fine"' }).default('normal'),
  torsionStudy: z.boolean().default(false),
  torsionLoads: z.object({ Vx: finite('Vx').default(0), Vy: finite('Vy').default(0), T: finite('T').default(0) }).optional(),
}

import type { Polygon } from '../../geometry/types'
import { SectionError, type Material, type PreparedSection } from '../types'
import { meshSection } from './mesh'
import { solveSectionFe, type SectionSolution } from './section-fe'
import { shearStressField, type ShearStressField, type TorsionLoads } from './shear-stress'
import { lineShearFlows, type LineFlow, type LineSegment } from './line-flow'
import type { TorsionMeshDensity, TorsionPoint, TorsionRegion } from './types'

/** Poisson's ratio when a material gives none: 0.3, structural steel (common practice). */
export const DEFAULT_POISSON = 0.3
/** Most vertices the torsion mesh takes (the finite element solve grows with the boundary). */
export const TORSION_MAX_VERTICES = 20_000

/** Options of torsionAnalysis: mesh density, the two-density mesh study, loads for the shear stress field. */
export interface TorsionOptions {
  readonly mesh?: TorsionMeshDensity
  readonly study?: boolean
  readonly loads?: TorsionLoads
  /** Lines across the section (section coordinates, mm) whose shear flow per unit Vx and Vy is wanted (the connections). */
  readonly lines?: readonly (readonly LineSegment[])[]
}

/** The torsion fields of an analysis request (see shared/analysis/torsion-contract.ts). */
export interface TorsionInput {
  torsion?: boolean
  torsionMesh?: TorsionMeshDensity
  torsionStudy?: boolean
  torsionLoads?: TorsionLoads
}

/** J and the shear centre on one mesh, for the mesh study. */
export interface TorsionStudyRow {
  density: TorsionMeshDensity
  nodes: number
  elements: number
  J: number
  shearCentre: { x: number; y: number }
}

/**
 * Torsion and shear properties (mm, N, MPa), equivalent for the reference material when there
 * are several (G_ref = E_ref / (2 (1 + nu_ref))): J (mm⁴), Cw about the shear centre (mm⁶), the
 * shear centre in section coordinates (mm), the shear areas for shear along x and y (mm²).
 */
export interface TorsionResult {
  J: number
  Cw: number
  shearCentre: { x: number; y: number }
  shearAreas: { x: number; y: number }
  /**
   * Largest |τ| per unit torque T about the shear centre (MPa per N·mm, i.e. 1/mm³) and where it is
   * (section coordinates, mm): τ_max = value · T for uniform torsion.
   */
  torsionStress: TorsionPoint
  /** Poisson's ratio used by the flexure functions (E·A-weighted mean of the materials). */
  nu: number
  referenceG: number
  equivalent: boolean
  mesh: { nodes: number; elements: number; density: TorsionMeshDensity; size: number; minAngle: number }
  /** True when every linear solve reached its tolerance. */
  converged: boolean
  iterations: number
  study?: { rows: TorsionStudyRow[]; difference: { J: number; shearCentre: number } }
  stress?: ShearStressField
  /** Shear flow per unit Vx and Vy across each of `options.lines`, in their order (N/mm per N). */
  lineFlows?: LineFlow[]
  /**
   * Per connection (analyze.ts), from the finite element shear solution for Vx, Vy through the shear
   * centre: q across its line (N/mm, positive from the first part into the second) and per unit Vx, Vy (1/mm).
   */
  connections?: { parts: [number, number]; q: number; qVx: number; qVy: number }[]
  warnings: string[]
}

/** The other density of the mesh study: the next coarser one (coarse pairs with normal). */
const STUDY_PAIR: Record<TorsionMeshDensity, TorsionMeshDensity> = { coarse: 'normal', normal: 'coarse', fine: 'normal' }

/**
 * Saint-Venant torsion and shear of a prepared section by the finite element method on the
 * section (six-node triangles; see section-fe.ts). Elastic, uniform torsion only. Throws
 * SectionError when the section has more than TORSION_MAX_VERTICES vertices or a material's
 * Poisson's ratio is outside 0 ≤ ν < 0.5.
 */
export function torsionAnalysis(prepared: PreparedSection, options: TorsionOptions = {}): TorsionResult {
  let vertices = 0
  for (const r of prepared.regions) for (const poly of r.polygons) for (const ring of poly) vertices += ring.length
  if (vertices > TORSION_MAX_VERTICES) {
    throw new SectionError(`Torsion takes at most ${TORSION_MAX_VERTICES} vertices (this section has ${vertices}); use a coarser chord tolerance for arcs.`)
  }
  const [ox, oy] = prepared.origin
  const nuOf = (m: Material) => (m as Material & { nu?: number }).nu ?? DEFAULT_POISSON
  for (const r of prepared.regions) {
    const nu = nuOf(r.material)
    if (!(nu >= 0 && nu < 0.5)) throw new SectionError(`${r.material.name ?? 'A material'}: Poisson's ratio nu must be at least 0 and below 0.5 (got ${String(nu)}).`)
  }
  const ref = prepared.regions.find(r => r.material.E === prepared.referenceE)
  const referenceG = prepared.referenceE / (2 * (1 + (ref ? nuOf(ref.material) : DEFAULT_POISSON)))
  const regions: TorsionRegion[] = prepared.regions.map(r => ({
    polygons: r.polygons.map(poly => poly.map(ring => ring.map(([x, y]) => [x - ox, y - oy] as const))) as Polygon[],
    E: r.material.E,
    nu: nuOf(r.material),
    n: r.n,
    m: r.material.E / (2 * (1 + nuOf(r.material))) / referenceG,
  }))
  const density = options.mesh ?? 'normal'
  const mesh = meshSection(regions, density)
  const sol = solveSectionFe(mesh, regions)
  const warnings: string[] = []
  if (sol.pieces > 1) warnings.push(`The section is ${sol.pieces} separate pieces: J is their sum, and the shear centre and Cw treat them as acting together.`)
  const result: TorsionResult = {
    ...summary(sol, ox, oy),
    torsionStress: shearStressField(sol, { Vx: 0, Vy: 0, T: 1 }, ox, oy).max,
    nu: sol.nu,
    referenceG,
    equivalent: prepared.regions.length > 1,
    mesh: { nodes: mesh.xy.length / 2, elements: mesh.elements.length / 6, density, size: mesh.size, minAngle: mesh.minAngle },
    converged: sol.solves.every(s => s.converged),
    iterations: sol.solves.reduce((n, s) => n + s.iterations, 0),
    warnings,
  }
  if (!result.converged) warnings.push('The torsion solver stopped before its tolerance: treat J, Cw and the shear centre as approximate.')
  if (options.study) {
    const other = STUDY_PAIR[density]
    const otherMesh = meshSection(regions, other)
    const otherSol = solveSectionFe(otherMesh, regions)
    const rows: TorsionStudyRow[] = [
      { density, nodes: mesh.xy.length / 2, elements: mesh.elements.length / 6, ...pick(summary(sol, ox, oy)) },
      { density: other, nodes: otherMesh.xy.length / 2, elements: otherMesh.elements.length / 6, ...pick(summary(otherSol, ox, oy)) },
    ]
    rows.sort((a, b) => a.elements - b.elements)
    const [a, b] = rows as [TorsionStudyRow, TorsionStudyRow]
    result.study = {
      rows,
      difference: { J: Math.abs(b.J - a.J) / b.J, shearCentre: Math.hypot(b.shearCentre.x - a.shearCentre.x, b.shearCentre.y - a.shearCentre.y) },
    }
  }
  if (options.loads) result.stress = shearStressField(sol, options.loads, ox, oy)
  if (options.lines?.length) result.lineFlows = lineShearFlows(sol, options.lines, ox, oy)
  return result
}

function summary(sol: SectionSolution, ox: number, oy: number) {
  return {
    J: sol.J,
    Cw: sol.Cw,
    shearCentre: { x: ox + sol.cx + sol.xs, y: oy + sol.cy + sol.ys },
    shearAreas: { x: sol.Asx, y: sol.Asy },
  }
}

function pick(s: ReturnType<typeof summary>): { J: number; shearCentre: { x: number; y: number } } {
  return { J: s.J, shearCentre: s.shearCentre }
}

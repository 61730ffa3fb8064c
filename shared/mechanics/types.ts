import type { Bounds, Line, Point, Polygon, Ring } from '../geometry/types'

/** A material: E and fy in MPa, density in kg/m³. */
export interface Material {
  readonly name?: string
  readonly E: number
  readonly fy?: number
  readonly density?: number
}

/** Default material: structural steel, E = 200 000 MPa (common practice). */
export const DEFAULT_MATERIAL: Material = { name: 'Steel', E: 200_000, fy: 355, density: 7850 }

/** One part of a section as drawn: an outline, optional holes (voids or cuts), a material. */
export interface PartInput {
  readonly name?: string
  readonly outline: Ring
  readonly holes?: readonly Ring[]
  readonly material?: Material
}

/** A compressive point load: P in N (positive = compression) at (x, y) in mm. */
export interface PointLoad {
  readonly P: number
  readonly x: number
  readonly y: number
}

/** Applied moments about the centroidal axes, N·mm. Mx gives stress varying with y, My with x. */
export interface AppliedMoments {
  readonly Mx: number
  readonly My: number
}

/**
 * A section after normalisation and Booleans, ready for integration. Regions are grouped by
 * material; every polygon has a CCW outline and CW holes. `n` is E / E_ref.
 */
export interface PreparedSection {
  readonly regions: readonly PreparedRegion[]
  readonly referenceE: number
  /** Local origin (bounding-box centre) used for all sums. */
  readonly origin: Point
  readonly bounds: Bounds
  /** Convex hull of all material, CCW. */
  readonly hull: Ring
  /** Per input part, its own net polygons (after its holes and any section-wide cut), for shear flow. */
  readonly parts: readonly PreparedPart[]
  readonly warnings: readonly string[]
}

export interface PreparedRegion {
  readonly material: Material
  readonly n: number
  readonly polygons: readonly Polygon[]
}

export interface PreparedPart {
  readonly index: number
  readonly name: string
  readonly material: Material
  readonly n: number
  readonly polygons: readonly Polygon[]
}

/** Properties of a section (mm, mm², mm⁴...). Equivalent (transformed) when several materials. */
export interface SectionProperties {
  area: number
  centroid: { x: number; y: number }
  /** Second moments about centroidal axes parallel to x and y, and the product moment (mm⁴). */
  Ixx: number
  Iyy: number
  Ixy: number
  /** Principal second moments, I1 >= I2, and theta in degrees from +x to the major axis. */
  I1: number
  I2: number
  theta: number
  rx: number
  ry: number
  r1: number
  r2: number
  /** Elastic section moduli to the extreme fibres (mm³). */
  S: { top: number; bottom: number; left: number; right: number }
  /** Plastic section moduli (mm³) and the plastic neutral axes: y of the PNA for Zx, x for Zy. */
  Z: { x: number; y: number }
  pna: { y: number; x: number }
  /** Polar second moment Ixx + Iyy about the centroid. Not the torsion constant. */
  Ip: number
  bounds: Bounds
  perimeter: number
  /** kg/m, or null when some part lacks a density. */
  massPerMetre: number | null
  equivalent: boolean
  referenceE: number
}

/** The stress plane sigma = a + b·x + c·y over section coordinates (MPa, tension-positive). */
export interface StressPlane {
  readonly a: number
  readonly b: number
  readonly c: number
}

export interface StressPoint {
  value: number
  x: number
  y: number
}

/** The stresses (MPa, tension-positive) at the vertices of one ring of a material region. */
export interface VertexStresses {
  region: number
  polygon: number
  ring: number
  values: number[]
}

export interface StressResult {
  /** Axial force, tension-positive (N), and total moments about the centroid (N·mm). */
  N: number
  Mx: number
  My: number
  plane: StressPlane
  max: StressPoint
  min: StressPoint
  neutralAxis: Line | null
  inKern: boolean
  /**
   * Stress at every vertex (MPa), one list per ring: `values[i]` belongs to vertex i of ring `ring`
   * of polygon `polygon` of material region `region` (ring 0 the outline, then its holes). Per
   * region the stress is n times the equivalent plane.
   */
  vertices: VertexStresses[]
}

export type ContactStatus = 'full' | 'partial' | 'overturning'

export interface ContactResult {
  status: ContactStatus
  /** Contact area (mm²), or null when overturning. */
  area: number | null
  /** Peak pressure (MPa, compression-positive) and its point. */
  peak: StressPoint | null
  /** Lift-off line, null for full contact or overturning. */
  liftOff: Line | null
  /** Compressed plane q = a + b·x + c·y (compression-positive), null when overturning. */
  plane: StressPlane | null
  iterations: number
  converged: boolean
  message: string
}

export interface ShearFlowResult {
  part: number
  name: string
  /** Shear flow across the interface separating the part from the rest (N/mm). */
  q: number
  /** First moments of the part about the centroid (mm³, equivalent). */
  Qx: number
  Qy: number
}

/** A geometry or input problem that names where it is. */
export class SectionError extends Error {
  readonly part: number | null
  readonly vertex: number | null
  readonly ring: number | null
  constructor(message: string, where: { part?: number | null; ring?: number | null; vertex?: number | null } = {}) {
    super(message)
    this.name = 'SectionError'
    this.part = where.part ?? null
    this.ring = where.ring ?? null
    this.vertex = where.vertex ?? null
  }
}

import type { Bounds, Line, Point, Polygon, Ring } from '../geometry/types'
import type { PlasticResult } from './plastic'

/** A material: E and fy in MPa, density in kg/m³. */
export interface Material {
  readonly name?: string
  readonly E: number
  readonly fy?: number
  readonly density?: number
  /** Compression strength (MPa) of a concrete-like material, used with `stressBlock` in plastic capacity. */
  readonly fc?: number
  /** Stress-block factor on fc (-), 0.85 when not given (common practice). */
  readonly stressBlock?: number
  /** A material that carries no tension (masonry, plain concrete, soil). */
  readonly noTension?: boolean
}

/**
 * One part of a section as drawn: an outline, its own holes and a material. `holes` are voids
 * inside the outline; `notches` are openings meant to cross its edge (a slot, a cope). Both cut
 * this part only; an opening through several parts is a section-wide cut (PrepareOptions.cuts).
 */
export interface PartInput {
  readonly name?: string
  readonly outline: Ring
  readonly holes?: readonly Ring[]
  readonly notches?: readonly Ring[]
  readonly material?: Material
  /** The shape the part came from, named in its check-table row. */
  readonly source?: string
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
  /** Per section-wide cut, the parts it cuts (0-based) and the area it removes (mm², real). */
  readonly cuts: readonly PreparedCut[]
  readonly warnings: readonly string[]
}

export interface PreparedCut {
  readonly index: number
  readonly parts: readonly number[]
  readonly area: number
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
  /** The section-wide cuts (0-based) that cut this part. */
  readonly cuts: readonly number[]
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
  /**
   * Elastic moduli about the principal axes u (major) and v (minor) to the extreme fibre on each
   * side (mm³): pos on the +v (for Su) or +u (for Sv) side. M/S about u or v IS the extreme stress.
   */
  Su: { pos: number; neg: number }
  Sv: { pos: number; neg: number }
  /** Set when Ixy ≠ 0: M/S about x or y is then not the extreme stress. */
  moduliNote: string | null
  /**
   * Plastic section moduli (mm³) about x, y and the principal axes u, v: geometric for one material,
   * "equivalent, for fy of the reference material" for several; null when a strength is missing.
   * The plastic neutral axes: y of the PNA for Zx, x for Zy.
   */
  Z: { x: number | null; y: number | null; u: number | null; v: number | null }
  pna: { y: number; x: number }
  /** The plastic analysis in full: method, note, Mp (N·mm) in both senses per axis. */
  plastic: PlasticResult
  /** Z / S_min about x and y (-), one material only. */
  shapeFactor: { x: number | null; y: number | null }
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
  /** Per material with a compression or bearing strength: its peak pressure against it (server answer). */
  bearing?: BearingCheck[]
}

/** The peak contact pressure of one material against its strength (MPa, compression-positive). */
export interface BearingCheck {
  name: string
  /** Highest pressure on this material and where (the plane's maximum lies on a vertex). */
  peak: number
  x: number
  y: number
  strength: number
  /** peak / strength (-): over 1 the pressure exceeds what the material can bear. */
  ratio: number
}

/** A geometry or input problem that names where it is. */
export class SectionError extends Error {
  readonly part: number | null
  readonly vertex: number | null
  readonly ring: number | null
  /** The section-wide cut (0-based) at fault, when it is a cut and not a part. */
  readonly cut: number | null
  constructor(message: string, where: { part?: number | null; ring?: number | null; vertex?: number | null; cut?: boolean } = {}) {
    super(message)
    this.name = 'SectionError'
    this.cut = where.cut ? (where.part ?? null) : null
    this.part = where.cut ? null : (where.part ?? null)
    this.ring = where.ring ?? null
    this.vertex = where.vertex ?? null
  }
}

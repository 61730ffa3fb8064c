import type { Polygon } from '../../geometry/types'

/** Mesh density asked for: `normal` is the default; `coarse` and `fine` halve and double the elements through the thinnest wall. */
export type TorsionMeshDensity = 'coarse' | 'normal' | 'fine'

/**
 * One material region as the torsion core takes it (after holes, cuts and unions): polygons with
 * a CCW outline and CW holes (mm, in the local frame of the section), `n` = E / E_ref and
 * `m` = G / G_ref, with G = E / (2 (1 + nu)).
 */
export interface TorsionRegion {
  readonly polygons: readonly Polygon[]
  readonly E: number
  readonly nu: number
  readonly n: number
  readonly m: number
}

/**
 * A six-node triangle mesh: `xy` holds x0, y0, x1, y1, ... (mm); `elements` 6 node indices per
 * element (corners counter-clockwise, then the mid-side nodes of edges 0-1, 1-2, 2-0); `region`
 * the region index of each element. `corners` is the number of corner (vertex) nodes, which come
 * first in `xy`.
 */
export interface TriMesh {
  readonly xy: Float64Array
  readonly elements: Uint32Array
  readonly region: Uint16Array
  readonly corners: number
  /** Smallest angle of any element, degrees. */
  readonly minAngle: number
  /** Target edge length the mesh was built for (mm). */
  readonly size: number
}

/** A point value with where it is (section coordinates, mm). */
export interface TorsionPoint {
  value: number
  x: number
  y: number
}

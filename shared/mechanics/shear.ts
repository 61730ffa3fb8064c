import { polygonMoments, zeroMoments } from '../geometry/moments'
import type { Polygon } from '../geometry/types'
import { SectionError } from './types'
import type { ShearFlowResult } from './types'
import type { InertiaLike } from './stress'

/** One part of a built-up section for {@link shearFlows}: its index and name, n = E / E_ref, and its polygons (mm). */
export interface ShearPart {
  readonly index: number
  readonly name: string
  readonly n: number
  readonly polygons: readonly Polygon[]
}

/**
 * Shear flow (N/mm) across the interface that separates each part from the rest of the section, for
 * shear forces Vx, Vy (N) on the centroidal axes (notes §8, general unsymmetric form):
 * q = [(Vy·Iyy - Vx·Ixy)·Qx + (Vx·Ixx - Vy·Ixy)·Qy] / D, D = Ixx·Iyy - Ixy², with Qx = ∫(y - y_c)·n dA and
 * Qy = ∫(x - x_c)·n dA of the part (mm³, equivalent). Sign: positive q for a part on the positive side of
 * the centroid under positive V; the connection must carry |q|. Throws SectionError for degenerate properties.
 */
export function shearFlows(props: InertiaLike, parts: readonly ShearPart[], Vx: number, Vy: number): ShearFlowResult[] {
  const { Ixx, Iyy, Ixy } = props
  const D = Ixx * Iyy - Ixy * Ixy
  if (!(props.area > 0) || !(Ixx > 0) || !(Iyy > 0) || !(D > 1e-12 * Ixx * Iyy)) {
    throw new SectionError('The section has no area or no bending stiffness, so no shear flow can be computed.')
  }
  if (!Number.isFinite(Vx) || !Number.isFinite(Vy)) throw new SectionError('The shear forces must be finite numbers.')
  const origin = [props.centroid.x, props.centroid.y] as const
  const kx = (Vy * Iyy - Vx * Ixy) / D
  const ky = (Vx * Ixx - Vy * Ixy) / D
  return parts.map((part) => {
    // Moments about the centroid itself: the first moments are then the statical moments wanted.
    const m = zeroMoments()
    for (const polygon of part.polygons) polygonMoments(polygon, origin, part.n, m)
    return { part: part.index, name: part.name, q: kx * m.Qx + ky * m.Qy, Qx: m.Qx, Qy: m.Qy }
  })
}

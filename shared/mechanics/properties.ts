import { polygonMoments, zeroMoments } from '../geometry/moments'
import type { Bounds, Ring } from '../geometry/types'
import { plasticModuli, type PlasticResult } from './plastic'
import { SectionError } from './types'
import type { PreparedSection, SectionProperties } from './types'

/** Below this fraction of the mean second moment the principal axes are undefined: theta = 0. */
const ISOTROPY_TOLERANCE = 1e-12

/**
 * Section properties (mm, mm², mm³, mm⁴; kg/m) of a prepared section, y up. Every region's
 * moments are weighted by n = E / E_ref and summed about prepared.origin, then moved to the
 * centroid. Ixy = ∫xy dA (positive when material lies in the first and third quadrants).
 * theta (degrees, in (-90, 90], counter-clockwise from +x) is the direction of the major axis,
 * the axis about which the second moment is I1 = max: theta = 1/2·atan2(-2·Ixy, Ixx - Iyy);
 * 0 when I1 = I2. Area, I and S are equivalent (transformed) values when `equivalent`; Su, Sv are
 * the moduli about the principal axes to each side; Z, Mp and the PNAs come from plasticModuli
 * (area halves for one material, yield-force balance for several: never weighted by E). massPerMetre uses the real area of each region. The perimeter sums every ring of
 * every region, so an interface between two materials counts once per side. Throws SectionError
 * if the area is not positive.
 */
export function sectionProperties(prepared: PreparedSection): SectionProperties {
  const { regions, origin, bounds, referenceE } = prepared
  const m = zeroMoments()
  let perimeter = 0
  let mass: number | null = 0
  for (const region of regions) {
    const before = m.A
    for (const polygon of region.polygons) {
      polygonMoments(polygon, origin, region.n, m)
      for (const ring of polygon) perimeter += ringLength(ring)
    }
    const realArea = (m.A - before) / region.n
    const density = region.material.density
    mass = mass === null || typeof density !== 'number' ? null : mass + realArea * 1e-6 * density
  }
  const A = m.A
  if (!(A > 0)) throw new SectionError('The section has no area.')
  const xLocal = m.Qy / A
  const yLocal = m.Qx / A
  const Ixx = m.Jxx - A * yLocal * yLocal
  const Iyy = m.Jyy - A * xLocal * xLocal
  const Ixy = m.Jxy - A * xLocal * yLocal
  const mean = (Ixx + Iyy) / 2
  const radius = Math.hypot((Ixx - Iyy) / 2, Ixy)
  const I1 = mean + radius
  const I2 = mean - radius
  const theta = radius <= ISOTROPY_TOLERANCE * mean ? 0 : principalAngle(Ixx, Iyy, Ixy)
  const x = origin[0] + xLocal
  const y = origin[1] + yLocal
  const plastic = plasticModuli(prepared, theta)
  const gyration = (I: number): number => Math.sqrt(Math.max(I, 0) / A)
  return {
    area: A,
    centroid: { x, y },
    Ixx,
    Iyy,
    Ixy,
    I1,
    I2,
    theta,
    rx: gyration(Ixx),
    ry: gyration(Iyy),
    r1: gyration(I1),
    r2: gyration(I2),
    S: {
      top: Ixx / (bounds.maxY - y),
      bottom: Ixx / (y - bounds.minY),
      left: Iyy / (x - bounds.minX),
      right: Iyy / (bounds.maxX - x),
    },
    ...principalModuli(prepared.hull, x, y, theta, I1, I2),
    Z: { x: plastic.x.Z, y: plastic.y.Z, u: plastic.u.Z, v: plastic.v.Z },
    pna: { y: plastic.pnaY, x: plastic.pnaX },
    plastic,
    shapeFactor: shapeFactors(plastic, Ixx, Iyy, bounds, x, y),
    moduliNote: Math.abs(Ixy) > PRODUCT_TOLERANCE * Math.sqrt(Ixx * Iyy)
      ? 'Ixy ≠ 0: M/S about x or y is not the extreme stress of this unsymmetric section; use the principal moduli Su, Sv or the stress view.'
      : null,
    Ip: Ixx + Iyy,
    bounds,
    perimeter,
    massPerMetre: mass,
    equivalent: new Set(regions.map((region) => region.material.E)).size > 1 || regions.some((region) => region.n !== 1),
    referenceE,
  }
}

/** |Ixy| below this fraction of sqrt(Ixx·Iyy) is round-off: the x and y moduli are then the extreme ones. */
const PRODUCT_TOLERANCE = 1e-9

/**
 * Elastic moduli about the principal axes (mm³) to the extreme fibre on each side: Su = I1 / v_max
 * with v = -sin θ·(x - x_c) + cos θ·(y - y_c) the distance from the major axis u (pos: v > 0 side),
 * Sv = I2 / u_max with u = cos θ·(x - x_c) + sin θ·(y - y_c). The extremes lie on the convex hull.
 */
function principalModuli(hull: Ring, xc: number, yc: number, theta: number, I1: number, I2: number): Pick<SectionProperties, 'Su' | 'Sv'> {
  const t = (theta * Math.PI) / 180
  const c = Math.cos(t)
  const s = Math.sin(t)
  let uMin = 0
  let uMax = 0
  let vMin = 0
  let vMax = 0
  for (const p of hull) {
    const dx = p[0] - xc
    const dy = p[1] - yc
    const u = c * dx + s * dy
    const v = -s * dx + c * dy
    if (u < uMin) uMin = u
    if (u > uMax) uMax = u
    if (v < vMin) vMin = v
    if (v > vMax) vMax = v
  }
  return { Su: { pos: I1 / vMax, neg: I1 / -vMin }, Sv: { pos: I2 / uMax, neg: I2 / -uMin } }
}

/** Shape factors Z / S_min about x and y (-) for one material; null when Z is equivalent or unknown. */
function shapeFactors(plastic: PlasticResult, Ixx: number, Iyy: number, bounds: Bounds, x: number, y: number): { x: number | null; y: number | null } {
  if (plastic.method !== 'geometric') return { x: null, y: null }
  const Sx = Ixx / Math.max(bounds.maxY - y, y - bounds.minY)
  const Sy = Iyy / Math.max(bounds.maxX - x, x - bounds.minX)
  return { x: plastic.x.Z === null ? null : plastic.x.Z / Sx, y: plastic.y.Z === null ? null : plastic.y.Z / Sy }
}

/** Major-axis angle in degrees, (-90, 90], counter-clockwise from +x (notes section 4). */
function principalAngle(Ixx: number, Iyy: number, Ixy: number): number {
  const theta = (0.5 * Math.atan2(-2 * Ixy, Ixx - Iyy) * 180) / Math.PI
  return theta <= -90 ? theta + 180 : theta + 0 // + 0 turns -0 into 0
}

/** Length of a closed ring (mm). */
function ringLength(ring: Ring): number {
  let length = 0
  let previous = ring[ring.length - 1]!
  for (const p of ring) {
    const dx = p[0] - previous[0]
    const dy = p[1] - previous[1]
    length += Math.sqrt(dx * dx + dy * dy) // no overflow within ±1e9 mm, and faster than Math.hypot
    previous = p
  }
  return length
}

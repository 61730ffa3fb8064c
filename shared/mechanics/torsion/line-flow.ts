import type { SectionSolution } from './section-fe'
import { stressEvaluator } from './shear-stress'

/**
 * A straight piece of a line across the section (mm, section coordinates): from (x1, y1) to
 * (x2, y2); the flow is counted positive along the right-hand normal (y2 − y1, −(x2 − x1)) / length.
 */
export type LineSegment = readonly [number, number, number, number]

/** Shear flow across one line per unit shear force (N/mm per N, i.e. 1/mm) for Vx and Vy through the shear centre. */
export interface LineFlow {
  qVx: number
  qVy: number
}

/** Gauss-Legendre points and weights on [0, 1], three points (exact for degree 5). */
const GAUSS3: readonly (readonly [number, number])[] = [
  [0.5 - Math.sqrt(0.15), 5 / 18],
  [0.5, 8 / 18],
  [0.5 + Math.sqrt(0.15), 5 / 18],
]

/**
 * The shear flow q = ∫ τ·n ds (N/mm) across each line of `lines` from the finite element shear
 * solution, per unit Vx and per unit Vy through the shear centre (no torque). (ox, oy) is the mesh
 * frame's origin in section coordinates.
 *
 * A connection line usually ends at re-entrant corners, where τ is singular and the line integral
 * converges slowly. So the flow is read on parallel lines a little way into the part whose free
 * faces bound the line's ends (a strip with no other flow in or out), and carried back to the line
 * by the strip's exact equilibrium: div τ = −n·(kx·(y − yc) + ky·(x − xc)) of the Saint-Venant
 * flexure problem, kx = (Vy·Iyy − Vx·Ixy)/D, ky = (Vx·Ixx − Vy·Ixy)/D. Where no such strip fits,
 * the line itself is integrated. Each line integral takes three-point Gauss rules on pieces no
 * longer than half the mesh size; τ at a point on an element edge is the mean of its elements.
 */
export function lineShearFlows(sol: SectionSolution, lines: readonly (readonly LineSegment[])[], ox: number, oy: number): LineFlow[] {
  const forVx = stressEvaluator(sol, { Vx: 1, Vy: 0, T: 0 })
  const forVy = stressEvaluator(sol, { Vx: 0, Vy: 1, T: 0 })
  const locate = elementLocator(sol)
  const step = sol.mesh.size / 2
  const { Ixx, Iyy, Ixy, cx, cy } = sol
  const D = Ixx * Iyy - Ixy * Ixy
  const inside = (x: number, y: number) => locate(x, y).length > 0

  /** ∫ τ·n ds along the segment (mesh frame), for unit Vx and unit Vy. */
  const integrate = (x1: number, y1: number, x2: number, y2: number, nx: number, ny: number): [number, number] => {
    const dx = x2 - x1
    const dy = y2 - y1
    const length = Math.hypot(dx, dy)
    const pieces = Math.max(1, Math.ceil(length / step))
    let qVx = 0
    let qVy = 0
    for (let k = 0; k < pieces; k++) {
      for (const [t, w] of GAUSS3) {
        const s = (k + t) / pieces
        const hits = locate(x1 + s * dx, y1 + s * dy)
        if (hits.length === 0) continue
        let ax = 0; let ay = 0; let bx = 0; let by = 0
        for (const [e, L0, L1, L2] of hits) {
          const a = forVx(e, L0, L1, L2)
          const b = forVy(e, L0, L1, L2)
          ax += a[0]; ay += a[1]; bx += b[0]; by += b[1]
        }
        const ds = (w * length) / pieces / hits.length
        qVx += (ax * nx + ay * ny) * ds
        qVy += (bx * nx + by * ny) * ds
      }
    }
    return [qVx, qVy]
  }

  /** Depth (mm) of a strip on side `sign` (+1: along n) whose sides are free faces, or 0 when none fits. */
  const stripDepth = (x1: number, y1: number, x2: number, y2: number, nx: number, ny: number, sign: number): number => {
    const length = Math.hypot(x2 - x1, y2 - y1)
    const tx = (x2 - x1) / length; const ty = (y2 - y1) / length
    const eps = 1e-3 * Math.min(length, sol.mesh.size)
    for (let h = length / 2; h > length / 20; h /= 2) {
      let ok = true
      for (const f of [0.25, 0.5, 1]) {
        const d = sign * f * h
        // Inside just within both ends, outside just beyond them, and inside at the middle.
        ok &&= inside(x1 + d * nx + eps * tx, y1 + d * ny + eps * ty) && inside(x2 + d * nx - eps * tx, y2 + d * ny - eps * ty)
        ok &&= !inside(x1 + d * nx - eps * tx, y1 + d * ny - eps * ty) && !inside(x2 + d * nx + eps * tx, y2 + d * ny + eps * ty)
        ok &&= inside((x1 + x2) / 2 + d * nx, (y1 + y2) / 2 + d * ny)
        if (!ok) break
      }
      if (ok) return h
    }
    return 0
  }

  return lines.map((segments) => {
    let qVx = 0
    let qVy = 0
    for (const [sx1, sy1, sx2, sy2] of mergeCollinear(segments)) {
      const x1 = sx1 - ox; const y1 = sy1 - oy; const x2 = sx2 - ox; const y2 = sy2 - oy
      const length = Math.hypot(x2 - x1, y2 - y1)
      if (!(length > 0)) continue
      const nx = (y2 - y1) / length
      const ny = -(x2 - x1) / length
      let sign = 1
      let h = stripDepth(x1, y1, x2, y2, nx, ny, 1)
      if (h === 0) { sign = -1; h = stripDepth(x1, y1, x2, y2, nx, ny, -1) }
      if (h === 0) {
        const [a, b] = integrate(x1, y1, x2, y2, nx, ny)
        qVx += a; qVy += b
        continue
      }
      const mx = (x1 + x2) / 2 - cx; const my = (y1 + y2) / 2 - cy
      const hit = locate((x1 + x2) / 2 + sign * (h / 2) * nx, (y1 + y2) / 2 + sign * (h / 2) * ny)[0]
      const n = hit ? sol.regions[sol.mesh.region[hit[0]]!]!.n : 1
      // Lines at depths h/4 .. h (away from the corners at the line's ends), three Gauss depths.
      for (const [t, w] of GAUSS3) {
        const d = h / 4 + (3 * h / 4) * t
        const o = sign * d
        const [a, b] = integrate(x1 + o * nx, y1 + o * ny, x2 + o * nx, y2 + o * ny, nx, ny)
        // First moments of the strip between the line and this one (mm³, E-weighted).
        const Qx = n * length * (d * my + (sign * d * d * ny) / 2)
        const Qy = n * length * (d * mx + (sign * d * d * nx) / 2)
        // F(line) = F(offset) + sign·(kx·Qx + ky·Qy), for unit Vx (kx = −Ixy/D, ky = Ixx/D) and unit Vy (kx = Iyy/D, ky = −Ixy/D).
        qVx += w * (a + (sign * (-Ixy * Qx + Ixx * Qy)) / D)
        qVy += w * (b + (sign * (Iyy * Qx - Ixy * Qy)) / D)
      }
    }
    return { qVx, qVy }
  })
}

/** Joins pieces of one straight line that follow each other end to start (a contact line split at the other ring's vertices). */
function mergeCollinear(segments: readonly LineSegment[]): LineSegment[] {
  const out: [number, number, number, number][] = segments.map(s => [s[0], s[1], s[2], s[3]])
  let joined = true
  while (joined) {
    joined = false
    for (let i = 0; i < out.length && !joined; i++) {
      for (let j = 0; j < out.length && !joined; j++) {
        if (i === j) continue
        const a = out[i]!; const b = out[j]!
        const la = Math.hypot(a[2] - a[0], a[3] - a[1]); const lb = Math.hypot(b[2] - b[0], b[3] - b[1])
        const tol = 1e-9 * Math.max(la, lb)
        const dot = ((a[2] - a[0]) * (b[2] - b[0]) + (a[3] - a[1]) * (b[3] - b[1])) / (la * lb)
        if (dot > 1 - 1e-9 && Math.hypot(a[2] - b[0], a[3] - b[1]) <= tol) {
          out[i] = [a[0], a[1], b[2], b[3]]
          out.splice(j, 1)
          joined = true
        }
      }
    }
  }
  return out
}

/**
 * Point location on the mesh by a uniform grid of element boxes: the elements holding (x, y)
 * (mesh frame, mm) with the point's barycentric coordinates (all ≥ −1e-9).
 */
function elementLocator(sol: SectionSolution): (x: number, y: number) => [number, number, number, number][] {
  const { xy, elements } = sol.mesh
  const ne = elements.length / 6
  let minX = Infinity; let minY = Infinity; let maxX = -Infinity; let maxY = -Infinity
  for (let i = 0; i < sol.mesh.corners; i++) {
    minX = Math.min(minX, xy[2 * i]!); maxX = Math.max(maxX, xy[2 * i]!)
    minY = Math.min(minY, xy[2 * i + 1]!); maxY = Math.max(maxY, xy[2 * i + 1]!)
  }
  const side = Math.max(1, Math.ceil(Math.sqrt(ne)))
  const cw = (maxX - minX) / side || 1
  const ch = (maxY - minY) / side || 1
  const cells: number[][] = Array.from({ length: side * side }, () => [])
  const cell = (v: number, min: number, size: number) => Math.min(side - 1, Math.max(0, Math.floor((v - min) / size)))
  for (let e = 0; e < ne; e++) {
    let ex0 = Infinity; let ey0 = Infinity; let ex1 = -Infinity; let ey1 = -Infinity
    for (let k = 0; k < 3; k++) {
      const n = elements[6 * e + k]!
      ex0 = Math.min(ex0, xy[2 * n]!); ex1 = Math.max(ex1, xy[2 * n]!)
      ey0 = Math.min(ey0, xy[2 * n + 1]!); ey1 = Math.max(ey1, xy[2 * n + 1]!)
    }
    for (let i = cell(ex0, minX, cw); i <= cell(ex1, minX, cw); i++) {
      for (let j = cell(ey0, minY, ch); j <= cell(ey1, minY, ch); j++) cells[j * side + i]!.push(e)
    }
  }
  return (x, y) => {
    const found: [number, number, number, number][] = []
    if (x < minX - cw || x > maxX + cw || y < minY - ch || y > maxY + ch) return found
    for (const e of cells[cell(y, minY, ch) * side + cell(x, minX, cw)]!) {
      const a = elements[6 * e]!; const b = elements[6 * e + 1]!; const c = elements[6 * e + 2]!
      const x0 = xy[2 * a]!; const y0 = xy[2 * a + 1]!
      const x1 = xy[2 * b]!; const y1 = xy[2 * b + 1]!
      const x2 = xy[2 * c]!; const y2 = xy[2 * c + 1]!
      const twoA = (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0)
      const L1 = ((x - x0) * (y2 - y0) - (x2 - x0) * (y - y0)) / twoA
      const L2 = ((x1 - x0) * (y - y0) - (x - x0) * (y1 - y0)) / twoA
      const L0 = 1 - L1 - L2
      if (L0 >= -1e-9 && L1 >= -1e-9 && L2 >= -1e-9) found.push([e, L0, L1, L2])
    }
    return found
  }
}

import type { SectionSolution } from './section-fe'
import { grad } from './section-fe'
import { shapeEvaluator } from './tri6'
import type { TorsionPoint } from './types'

/** Shear force along x and y through the shear centre (N) and torque about it (N·mm). */
export interface TorsionLoads {
  readonly Vx: number
  readonly Vy: number
  readonly T: number
}

/**
 * The shear stress field over the mesh (MPa): corner nodes (x, y in section coordinates, mm),
 * triangles (corner indices, three per element) and per element τ = (τzx, τzy) at its centroid;
 * `max` is the largest |τ| at any element corner, with where it is.
 */
export interface ShearStressField {
  nodes: number[]
  triangles: number[]
  tau: number[]
  max: TorsionPoint
}

/**
 * τ = (τzx, τzy) (MPa) in element e at barycentric (L0, L1, L2), with the point (mesh frame, mm):
 * torsion m·T/J·(∇ω − (y, −x)) plus flexure n·[Vx (∇Ψ − ν/2·d) + Vy (∇Φ − ν/2·h)] /
 * (2(1+ν)(Ixx·Iyy − Ixy²)) (Pilkey 2002), with n and m the element's E and G ratios.
 */
export function stressEvaluator(sol: SectionSolution, loads: TorsionLoads): (e: number, L0: number, L1: number, L2: number) => [number, number, number, number] {
  const { mesh, regions, cx, cy, Ixx, Iyy, Ixy, nu, J } = sol
  const shape = shapeEvaluator(mesh)
  const deltaS = 2 * (1 + nu) * (Ixx * Iyy - Ixy * Ixy)
  return (e: number, L0: number, L1: number, L2: number): [number, number, number, number] => {
    const s = shape.at(e, L0, L1, L2, 1)
    const r = regions[mesh.region[e]!]!
    const x = s.x - cx; const y = s.y - cy
    const rr = x * x - y * y; const q = 2 * x * y
    const [wx, wy] = grad(s.dx, s.dy, sol.omega, mesh.elements, e)
    const [px, py] = grad(s.dx, s.dy, sol.psi, mesh.elements, e)
    const [fx, fy] = grad(s.dx, s.dy, sol.phi, mesh.elements, e)
    const tx = (r.m * loads.T * (wx - y)) / J +
      (r.n * (loads.Vx * (px - (nu / 2) * (Ixx * rr - Ixy * q)) + loads.Vy * (fx - (nu / 2) * (-Ixy * rr + Iyy * q)))) / deltaS
    const ty = (r.m * loads.T * (wy + x)) / J +
      (r.n * (loads.Vx * (py - (nu / 2) * (Ixy * rr + Ixx * q)) + loads.Vy * (fy - (nu / 2) * (-Iyy * rr - Ixy * q)))) / deltaS
    return [tx, ty, s.x, s.y]
  }
}

/**
 * τ from Vx, Vy (through the shear centre) and T (about it): torsion m·T/J·(∇ω − (y, −x)) plus
 * flexure n·[Vx (∇Ψ − ν/2·d) + Vy (∇Φ − ν/2·h)] / (2(1+ν)(Ixx·Iyy − Ixy²)) (Pilkey 2002), with n
 * and m the element's E and G ratios; (ox, oy) is added to report section coordinates.
 */
export function shearStressField(sol: SectionSolution, loads: TorsionLoads, ox: number, oy: number): ShearStressField {
  const { mesh, cx, cy } = sol
  const at = stressEvaluator(sol, loads)
  const ne = mesh.elements.length / 6
  const tau: number[] = new Array(2 * ne)
  const max: TorsionPoint = { value: 0, x: ox + cx, y: oy + cy }
  for (let e = 0; e < ne; e++) {
    const [tx, ty] = at(e, 1 / 3, 1 / 3, 1 / 3)
    tau[2 * e] = tx
    tau[2 * e + 1] = ty
    // |τ| of a linear field peaks at a corner.
    for (const [L0, L1, L2] of [[1, 0, 0], [0, 1, 0], [0, 0, 1]] as const) {
      const [ax, ay, x, y] = at(e, L0, L1, L2)
      const v = Math.hypot(ax, ay)
      if (v > max.value) { max.value = v; max.x = x + ox; max.y = y + oy }
    }
  }
  const nodes: number[] = new Array(2 * mesh.corners)
  for (let i = 0; i < mesh.corners; i++) { nodes[2 * i] = mesh.xy[2 * i]! + ox; nodes[2 * i + 1] = mesh.xy[2 * i + 1]! + oy }
  const triangles: number[] = new Array(3 * ne)
  for (let e = 0; e < ne; e++) for (let k = 0; k < 3; k++) triangles[3 * e + k] = mesh.elements[6 * e + k]!
  return { nodes, triangles, tau, max }
}

import { lusolve } from 'mathjs'
import { describe, expect, it } from 'vitest'
import { boundaryGraph } from '../../../../shared/mechanics/torsion/boundary'
import { envelopeCholesky } from '../../../../shared/mechanics/torsion/envelope'
import { meshSection } from '../../../../shared/mechanics/torsion/mesh'
import { conjugateGradients, incompleteCholesky } from '../../../../shared/mechanics/torsion/pcg'
import { simplifyRing } from '../../../../shared/mechanics/torsion/simplify'
import { csrAddElement, csrPattern, csrPin } from '../../../../shared/mechanics/torsion/sparse'
import { GAUSS6, shapeEvaluator } from '../../../../shared/mechanics/torsion/tri6'
import type { TorsionRegion } from '../../../../shared/mechanics/torsion/types'
import { expectClose } from '../../../support/expect-close'
import { rectRing } from '../../../support/sections'

const region = (polygons: TorsionRegion['polygons']): TorsionRegion => ({ polygons, E: 1, nu: 0.3, n: 1, m: 1 })

describe('boundaryGraph', () => {
  it('joins a shared edge once and splits an edge at a vertex lying on it (a plate on part of a flange)', () => {
    const flange = region([[rectRing([0, 0, 100, 10])]])
    const plate = region([[rectRing([30, 10, 70, 20])]])
    const g = boundaryGraph([flange, plate])
    // 8 distinct corners; the flange's top edge splits at x = 30 and x = 70 into three pieces,
    // the middle one shared with the plate: 4 + 2 (flange top split) + 3 (plate's other sides).
    expect(g.xy.length / 2).toBe(8)
    expect(g.seg.length / 2).toBe(9)
  })
})

describe('meshSection', () => {
  it('covers the section exactly: element areas sum to the polygon area (straight-sided elements)', () => {
    const ring = [[0, 0], [120, 0], [120, 8], [64, 8], [64, 200], [56, 200], [56, 8], [0, 8]] as const
    const mesh = meshSection([region([[ring as never]])], 'normal')
    const shape = shapeEvaluator(mesh)
    let area = 0
    for (let e = 0; e < mesh.elements.length / 6; e++) area += shape.area(e)
    expectClose(area, 120 * 8 + 8 * 192, 1e-9)
    expect(mesh.minAngle).toBeGreaterThanOrEqual(20)
  })

  it('gets finer with the density setting', () => {
    const counts = (['coarse', 'normal', 'fine'] as const).map(d => meshSection([region([[rectRing([0, 0, 60, 20])]])], d).elements.length)
    expect(counts[0]!).toBeLessThan(counts[1]!)
    expect(counts[1]!).toBeLessThan(counts[2]!)
  })
})

describe('simplifyRing', () => {
  it('thins a finely drawn circle to the deviation asked and keeps its orientation', () => {
    const n = 2000
    const ring = Array.from({ length: n }, (_, i) => [50 * Math.cos((2 * Math.PI * i) / n), 50 * Math.sin((2 * Math.PI * i) / n)] as const)
    const out = simplifyRing(ring, 0.01, 5)
    expect(out.length).toBeLessThan(n / 4)
    expect(out.length).toBeGreaterThan(30)
    // Chord sagitta c²/(8R) of every kept edge within the tolerance (circle geometry).
    for (let i = 0; i < out.length; i++) {
      const [ax, ay] = out[i]!; const [bx, by] = out[(i + 1) % out.length]!
      expect(Math.hypot(bx - ax, by - ay) ** 2 / (8 * 50)).toBeLessThanOrEqual(0.0101)
      expect(ax * by - ay * bx).toBeGreaterThan(0)
    }
  })
})

describe('linear solvers', () => {
  // A pinned Laplacian on a small six-node mesh: symmetric positive definite.
  function system() {
    const mesh = meshSection([region([[rectRing([0, 0, 30, 10])]])], 'coarse')
    const n = mesh.xy.length / 2
    const a = csrPattern(n, mesh.elements, 6)
    const shape = shapeEvaluator(mesh)
    const ke = new Float64Array(36)
    for (let e = 0; e < mesh.elements.length / 6; e++) {
      ke.fill(0)
      for (const [L0, L1, L2, w] of GAUSS6) {
        const s = shape.at(e, L0, L1, L2, w)
        for (let i = 0; i < 6; i++) for (let j = 0; j < 6; j++) ke[i * 6 + j]! += s.wA * (s.dx[i]! * s.dx[j]! + s.dy[i]! * s.dy[j]!)
      }
      csrAddElement(a, mesh.elements.subarray(6 * e, 6 * e + 6), ke)
    }
    const b = new Float64Array(n).map((_, i) => Math.sin(i))
    csrPin(a, [0], [b])
    return { a, b, n }
  }

  it('the envelope Cholesky and IC(0) conjugate gradients agree with mathjs lusolve (an npm library as an outside check)', () => {
    const { a, b, n } = system()
    const dense: number[][] = Array.from({ length: n }, () => new Array(n).fill(0))
    for (let i = 0; i < n; i++) for (let p = a.rowPtr[i]!; p < a.rowPtr[i + 1]!; p++) dense[i]![a.col[p]!] = a.val[p]!
    const ref = (lusolve(dense, Array.from(b)) as number[][]).map(r => r[0]!)
    const direct = new Float64Array(n)
    const info = envelopeCholesky(a)!(b, direct)
    const iterative = new Float64Array(n)
    const cg = conjugateGradients(a, b, iterative, incompleteCholesky(a), 1e-12)
    expect(info.converged && cg.converged).toBe(true)
    const scale = Math.max(...ref.map(Math.abs))
    for (let i = 0; i < n; i++) {
      expect(Math.abs(direct[i]! - ref[i]!)).toBeLessThan(1e-8 * scale)
      expect(Math.abs(iterative[i]! - ref[i]!)).toBeLessThan(1e-8 * scale)
    }
  })
})

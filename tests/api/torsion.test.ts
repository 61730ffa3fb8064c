import { beforeAll, describe, expect, it } from 'vitest'
import { expectClose } from '../support/expect-close'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
let c: Client
const rect = (b: number, h: number, x0 = 0, y0 = 0) => [[x0, y0], [x0 + b, y0], [x0 + b, y0 + h], [x0, y0 + h]]

beforeAll(async () => {
  c = new Client(() => server.url)
  await c.post('/api/auth/register', { email: 'torsion@analysis.test', password: 'correct-horse-battery', name: 'Torsion' })
})

describe('POST /api/analysis with torsion', () => {
  it('answers J, Cw, the shear centre, the shear areas and the mesh for a 40 × 20 rectangle (Timoshenko & Goodier β = 0.229)', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(40, 20, 100, 50) }], torsion: true, torsionMesh: 'coarse' })
    expect(r.status).toBe(200)
    const t = r.body.torsion
    expect(Math.abs(t.J / (40 * 20 ** 3) - 0.229)).toBeLessThan(2e-3)
    // A doubly symmetric section: the shear centre is the centroid (symmetry).
    expectClose(t.shearCentre.x, 120, 1e-6)
    expectClose(t.shearCentre.y, 60, 1e-6)
    expect(t.Cw).toBeGreaterThan(0)
    expect(t.shearAreas.x).toBeGreaterThan(0)
    expect(t.mesh.nodes).toBeGreaterThan(t.mesh.elements)
    expect(t.converged).toBe(true)
    expect(t.stress).toBeUndefined()
  })

  it('leaves torsion out unless asked', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(40, 20) }] })
    expect(r.status).toBe(200)
    expect(r.body.torsion).toBeUndefined()
  })

  it('gives the mesh study and the shear stress field when asked (circle: τmax = 16T/πD³, elementary torsion)', async () => {
    const n = 128
    const outline = Array.from({ length: n }, (_, i) => [50 * Math.cos((2 * Math.PI * i) / n), 50 * Math.sin((2 * Math.PI * i) / n)])
    const T = 2e6
    const r = await c.post('/api/analysis', { parts: [{ outline }], torsion: true, torsionMesh: 'coarse', torsionStudy: true, torsionLoads: { T } })
    expect(r.status).toBe(200)
    const t = r.body.torsion
    expect(t.study.rows).toHaveLength(2)
    expect(t.study.difference.J).toBeLessThan(0.01)
    expectClose(t.stress.max.value, (16 * T) / (Math.PI * 100 ** 3), 0.01)
    expect(t.stress.triangles.length).toBe(3 * t.mesh.elements)
  })

  it('rejects a bad mesh density or Poisson ratio with 400 and a message', async () => {
    const bad = await c.post('/api/analysis', { parts: [{ outline: rect(40, 20) }], torsion: true, torsionMesh: 'ultra' })
    expect(bad.status).toBe(400)
    expect(JSON.stringify(bad.body)).toMatch(/torsionMesh/)
    const nu = await c.post('/api/analysis', { parts: [{ outline: rect(40, 20), material: { E: 200_000, nu: 0.7 } }], torsion: true })
    expect(nu.status).toBe(400)
    expect(JSON.stringify(nu.body)).toMatch(/Poisson/)
  })

  it('signed out is 401 before any torsion work', async () => {
    const r = await new Client(() => server.url).post('/api/analysis', { parts: [{ outline: rect(40, 20) }], torsion: true })
    expect(r.status).toBe(401)
  })
})

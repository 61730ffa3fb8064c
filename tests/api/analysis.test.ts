import { beforeAll, describe, expect, it } from 'vitest'
import { expectClose } from '../support/expect-close'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
let c: Client
const rect = (b: number, h: number, x0 = 0, y0 = 0) => [[x0, y0], [x0 + b, y0], [x0 + b, y0 + h], [x0, y0 + h]]

beforeAll(async () => {
  c = new Client(() => server.url)
  await c.post('/api/auth/register', { email: 'analyst@analysis.test', password: 'correct-horse-battery', name: 'Analyst' })
})

/** Recursively true when every number is finite. */
function finiteEverywhere(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v)
  if (Array.isArray(v)) return v.every(finiteEverywhere)
  if (v && typeof v === 'object') return Object.values(v).every(finiteEverywhere)
  return true
}

describe('POST /api/analysis', () => {
  it('signed out is 401', async () => {
    const r = await new Client(() => server.url).post('/api/analysis', { parts: [{ outline: rect(100, 100) }] })
    expect(r.status).toBe(401)
  })

  it('a 200 x 100 rectangle: A = bh, Ixx = bh³/12, S = bh²/6, Z = bh²/4, core rhombus b/6 by h/6 (closed forms)', async () => {
    const b = 200
    const h = 100
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(b, h) }] })
    expect(r.status).toBe(200)
    const p = r.body.properties
    expectClose(p.area, b * h)
    expectClose(p.centroid.x, b / 2)
    expectClose(p.centroid.y, h / 2)
    expectClose(p.Ixx, (b * h ** 3) / 12)
    expectClose(p.Iyy, (h * b ** 3) / 12)
    expect(Math.abs(p.Ixy)).toBeLessThan(1e-6 * p.Ixx)
    expectClose(p.S.top, (b * h ** 2) / 6)
    expectClose(p.Z.x, (b * h ** 2) / 4, 1e-6)
    const xs = r.body.kern.map((v: number[]) => v[0] - b / 2)
    const ys = r.body.kern.map((v: number[]) => v[1] - h / 2)
    expectClose(Math.max(...xs), b / 6, 1e-9)
    expectClose(Math.max(...ys), h / 6, 1e-9)
    expect(r.body.stress).toBeNull()
  })

  it('an eccentric load on a rectangle: σ = −P/A (1 ± 6e/b), tension-positive (closed form, notes §5)', async () => {
    const b = 300
    const h = 200
    const P = 600_000
    const e = 40
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(b, h) }], loads: [{ P, x: b / 2 + e, y: h / 2 }] })
    expect(r.status).toBe(200)
    const s = r.body.stress
    expectClose(s.N, -P)
    expectClose(s.min.value, (-P / (b * h)) * (1 + (6 * e) / b), 1e-9)
    expectClose(s.max.value, (-P / (b * h)) * (1 - (6 * e) / b), 1e-9)
    expect(s.inKern).toBe(true) // e = 40 < b/6 = 50
    // Stress at every vertex, paired with the region's own ring: σ = −P/A (1 + 12 e (x − b/2) / b²) (same closed form).
    const outline = r.body.regions[0].polygons[0][0] as number[][]
    expect(s.vertices).toEqual([{ region: 0, polygon: 0, ring: 0, values: expect.any(Array) }])
    expect(s.vertices[0].values).toHaveLength(outline.length)
    outline.forEach(([x], i) => expectClose(s.vertices[0].values[i], (-P / (b * h)) * (1 + (12 * e * (x! - b / 2)) / b ** 2), 1e-9))
    const out = await c.post('/api/analysis', { parts: [{ outline: rect(b, h) }], loads: [{ P, x: b / 2 + 60, y: h / 2 }] })
    expect(out.body.stress.inKern).toBe(false)
    expect(out.body.stress.max.value).toBeGreaterThan(0)
  })

  it('no-tension footing, load at e > L/6: contact length 3(L/2 − e), q_max = 2P/(3B(L/2 − e)) (notes §7)', async () => {
    const L = 2400
    const B = 1800
    const P = 900_000
    const e = 600
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(L, B) }], loads: [{ P, x: L / 2 + e, y: B / 2 }], noTension: true })
    expect(r.status).toBe(200)
    expect(r.body.contact.status).toBe('partial')
    expectClose(r.body.contact.area, 3 * (L / 2 - e) * B, 1e-7)
    expectClose(r.body.contact.peak.value, (2 * P) / (3 * B * (L / 2 - e)), 1e-7)
  })

  it('a load outside the hull in no-tension mode is overturning, with no numbers', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(440, 440) }], loads: [{ P: 1000, x: 600, y: 220 }], noTension: true })
    expect(r.status).toBe(200)
    expect(r.body.contact.status).toBe('overturning')
    expect(r.body.contact.area).toBeNull()
    expect(r.body.contact.peak).toBeNull()
  })

  it('omit leaves the core and the vertex stresses out of the answer, and changes nothing else', async () => {
    const body = { parts: [{ outline: rect(300, 200) }], loads: [{ P: 600_000, x: 190, y: 100 }] }
    const full = await c.post('/api/analysis', body)
    const lean = await c.post('/api/analysis', { ...body, omit: ['kern', 'vertexStresses'] })
    expect(lean.status).toBe(200)
    expect(full.body.kern).toHaveLength(4)
    expect(full.body.stress.vertices).toHaveLength(1)
    expect(lean.body).not.toHaveProperty('kern')
    expect(lean.body.stress).not.toHaveProperty('vertices')
    const { kern: _k, stress: { vertices: _v, ...fullStress }, ...fullRest } = full.body
    const { stress: leanStress, ...leanRest } = lean.body
    expect(leanStress).toEqual(fullStress)
    expect(leanRest).toEqual(fullRest)
    expect(lean.text.length).toBeLessThan(full.text.length)
  })

  it('omit keeps what it does not name, and with no loads there is no stress to trim', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(100, 100) }], omit: ['vertexStresses'] })
    expect(r.status).toBe(200)
    expect(r.body.kern).toHaveLength(4)
    expect(r.body.stress).toBeNull()
  })

  it.each([
    [{ parts: [{ outline: rect(10, 10) }], omit: ['regions'] }, 400, /omit lists "kern" and\/or "vertexStresses"/],
    [{ parts: [{ outline: rect(10, 10) }], omit: 'kern' }, 400, /omit/],
    [{ parts: [] }, 400, /at least one part/],
    [{ parts: [{ outline: [[0, 0], [1, 0]] }] }, 422, /part 1/i],
    [{ parts: [{ outline: [[0, 0], [10, 10], [10, 0], [0, 10]] }] }, 422, /part 1.*(intersect|cross)/i],
    [{ parts: [{ outline: [[0, 0], ['a', 0], [1, 1]] }] }, 400, /vertex 2/],
    [{ parts: [{ outline: [[0, 0], [2e9, 0], [0, 1]] }] }, 422, /1e9|too far|absurd|coordinate/i],
    [{ parts: [{ outline: [[0, 0], [5, 0], [10, 0]] }] }, 422, /zero area|collinear|area/i],
    [{ parts: [{ outline: rect(10, 10), material: { E: -1 } }] }, 400, /E must be positive/],
    [{ parts: [{ outline: rect(10, 10) }], loads: [{ P: 'x', x: 0, y: 0 }] }, 400, /P/],
    [{ parts: [{ outline: rect(10, 10), material: { E: 200000 } }, { outline: rect(10, 10, 5, 0), material: { E: 70000 } }] }, 422, /part 1 and part 2 overlap/i],
  ])('bad input %j answers %i with a message', async (body, status, reason) => {
    const r = await c.post('/api/analysis', body)
    expect(r.status).toBe(status)
    expect(r.body.statusCode).toBe(status)
    expect(r.body.message).toMatch(reason)
  })

  it('NaN and Infinity cannot be sent (JSON has no such numbers) and never come back', async () => {
    const bad = await c.request('POST', '/api/analysis', '{"parts":[{"outline":[[0,0],[NaN,0],[1,1]]}]}', { 'content-type': 'application/json' })
    expect(bad.status).toBe(400)
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(100, 10) }], loads: [{ P: 1000, x: 100, y: 10 }], moments: { Mx: 1e6, My: 0 }, shear: { Vx: 0, Vy: 1000 }, noTension: true, effectiveLength: 3000 })
    expect(r.status).toBe(200)
    expect(finiteEverywhere(r.body)).toBe(true)
    expect(r.text).not.toMatch(/NaN|Infinity/)
  })

  it('more vertices than the limit answer 413', async () => {
    const n = 250_001
    const ring = Array.from({ length: n }, (_, i) => [Math.cos((2 * Math.PI * i) / n) * 1000, Math.sin((2 * Math.PI * i) / n) * 1000].map(v => Math.round(v * 1000) / 1000))
    const r = await c.post('/api/analysis', { parts: [{ outline: ring }] })
    expect(r.status).toBe(413)
    expect(r.body.message).toMatch(/limit is 250000/)
  })
})

describe('POST /api/shapes/:kind', () => {
  it('a plate 240 x 15 gives a rectangle of area 3600 mm² (closed form)', async () => {
    const r = await c.post('/api/shapes/plate', { b: 240, h: 15 })
    expect(r.status).toBe(200)
    const ring: number[][] = r.body.outline
    let a = 0
    for (let i = 0; i < ring.length; i++) {
      const p = ring[i]!
      const q = ring[(i + 1) % ring.length]!
      a += p[0]! * q[1]! - q[0]! * p[1]!
    }
    expectClose(a / 2, 240 * 15)
  })

  it.each([
    ['hexagon', {}, /kind is one of/],
    ['ishape', { h: 200, b: 100, tw: 5.6, tf: 120, r: 12 }, /tf/],
    ['plate', { b: -1, h: 10 }, /b/],
    ['plate', { b: 10, h: 10, colour: 3 }, /Unknown parameter "colour"/],
  ])('%s with bad parameters is 400', async (kind, params, reason) => {
    const r = await c.post(`/api/shapes/${kind}`, params)
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(reason)
  })
})

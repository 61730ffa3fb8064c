import { beforeAll, describe, expect, it } from 'vitest'
import { expectClose } from '../support/expect-close'
import { Client } from './support/client'
import { useTestServer } from './support/server'

// The numbers a checker signs (issue: five wrong results), through the HTTP API.
const server = useTestServer()
let c: Client
const rect = (b: number, h: number, x0 = 0, y0 = 0) => [[x0, y0], [x0 + b, y0], [x0 + b, y0 + h], [x0, y0 + h]]

beforeAll(async () => {
  c = new Client(() => server.url)
  await c.post('/api/auth/register', { email: 'checker@analysis.test', password: 'correct-horse-battery', name: 'Checker' })
})

describe('POST /api/analysis: holes, cuts, contact, shear flow, moduli, plastic', () => {
  it('a box with its void and a stiffener across the void: A = 300² - 280² + 10·280 = 14 400 mm² (by hand), no warning', async () => {
    const r = await c.post('/api/analysis', {
      parts: [{ outline: rect(300, 300, -150, -150), holes: [rect(280, 280, -140, -140)] }, { outline: rect(10, 300, -5, -150) }],
    })
    expect(r.status).toBe(200)
    expectClose(r.body.properties.area, 14_400, 1e-12)
    expect(r.body.warnings.filter((w: string) => /hole|cut/.test(w))).toEqual([])
  })

  it('top-level cuts subtract from every part they overlap and are listed per part (by hand: 22·(12 + 16))', async () => {
    const r = await c.post('/api/analysis', {
      parts: [{ name: 'Plate', outline: rect(200, 12, 0, 16) }, { name: 'Flange', outline: rect(200, 16) }],
      cuts: [rect(22, 30, 60, -1)],
    })
    expect(r.status).toBe(200)
    expectClose(r.body.properties.area, 200 * 28 - 22 * 28, 1e-12)
    expect(r.body.cuts).toHaveLength(1)
    expect(r.body.cuts[0].parts).toEqual([0, 1])
    expectClose(r.body.cuts[0].area, 22 * 28, 1e-12)
  })

  it('a self-crossing cut answers 422 naming the cut', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(100, 100) }], cuts: [[[0, 0], [10, 10], [10, 0], [0, 10]]] })
    expect(r.status).toBe(422)
    expect(r.body.message).toMatch(/^Cut 1/)
    expect(r.body.data).toMatchObject({ cut: 0, part: null })
  })

  it('no-tension contact takes the applied moments: footing 1000², P = 1000 kN, Mx = -300 kN·m → 0.6 m², 3.33 MPa (standard footing result)', async () => {
    const r = await c.post('/api/analysis', {
      parts: [{ outline: rect(1000, 1000, -500, -500), material: { E: 50 } }],
      loads: [{ P: 1e6, x: 0, y: 0 }],
      moments: { Mx: -300e6, My: 0 },
      noTension: true,
    })
    expect(r.status).toBe(200)
    expect(r.body.contact.status).toBe('partial')
    expectClose(r.body.contact.area, 600_000, 1e-9)
    expectClose(r.body.contact.peak.value, (2 * 1e6) / (3 * 1000 * 200), 1e-9)
  })

  it('three-plate I: connections with contact length and q = Vy·Q_flange/Ixx (parallel axes by hand)', async () => {
    const r = await c.post('/api/analysis', {
      parts: [{ name: 'Top', outline: rect(200, 20, -100, 130) }, { name: 'Web', outline: rect(10, 260, -5, -130) }, { name: 'Bottom', outline: rect(200, 20, -100, -150) }],
      shear: { Vx: 0, Vy: 100_000 },
    })
    expect(r.status).toBe(200)
    expect(r.body).not.toHaveProperty('shear')
    const Ixx = (200 * 300 ** 3 - 190 * 260 ** 3) / 12
    expect(r.body.connections).toHaveLength(2)
    for (const conn of r.body.connections) {
      expect(conn.status).toBe('tree')
      expectClose(conn.length, 10, 1e-12)
      expectClose(Math.abs(conn.q), (100_000 * 200 * 20 * 140) / Ixx, 1e-9)
    }
  })

  it('a single S355 rectangle 100 x 200 with referenceE 210 000: Zx = bh²/4 = 1 000 000 mm³ (closed form), method geometric', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(100, 200), material: { E: 200_000, fy: 355 } }], referenceE: 210_000 })
    expect(r.status).toBe(200)
    expectClose(r.body.properties.Z.x, 1_000_000, 1e-12)
    expect(r.body.properties.plastic.method).toBe('geometric')
    expectClose(r.body.properties.plastic.x.Mp, 355e6, 1e-12)
  })

  it('an unequal angle gives principal moduli and a note that M/S about x is not the stress', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: [[0, 0], [90, 0], [90, 10], [10, 10], [10, 150], [0, 150]] }] })
    expect(r.status).toBe(200)
    const p = r.body.properties
    expect(p.Su.pos).toBeGreaterThan(0)
    expect(p.Sv.neg).toBeGreaterThan(0)
    expect(p.moduliNote).toMatch(/not the extreme stress/)
    expect(r.body.warnings).toContain(p.moduliNote)
  })

  it('effective lengths per principal axis: KL/r about u and v, the minor governing here (Euler π²EI/(KL)², closed form)', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(200, 100) }], effectiveLength: { u: 3000, v: 1500 }, loads: [{ P: 1e5, x: 100, y: 50 }] })
    expect(r.status).toBe(200)
    const s = r.body.slenderness
    const I1 = (100 * 200 ** 3) / 12
    const I2 = (200 * 100 ** 3) / 12
    expectClose(s.u.eulerLoad, (Math.PI ** 2 * 200_000 * I1) / 3000 ** 2, 1e-9)
    expectClose(s.v.eulerLoad, (Math.PI ** 2 * 200_000 * I2) / 1500 ** 2, 1e-9)
    expect(s.governing).toBe('v')
    expect(s.torsionalNote).toMatch(/Flexural-torsional/)
  })

  it('a bad effective length answers 400 with a message', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(200, 100) }], effectiveLength: { u: -1 } })
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(/effectiveLength/)
  })
})

describe('POST /api/sketches with a schema-1 document', () => {
  it('is upgraded on the way in, keeping its meaning (the fixture of the old format)', async () => {
    const { readFileSync } = await import('node:fs')
    const old = JSON.parse(readFileSync(new URL('../fixtures/sketch-schema-1.json', import.meta.url), 'utf8'))
    const r = await c.post('/api/sketches', { title: 'Old format', document: old })
    expect(r.status).toBe(201)
    expect(r.body.document.schema).toBe('kernwise.sketch/2')
    expect(r.body.document.parts.map((p: { kind: string }) => p.kind)).toEqual(['solid', 'solid', 'cut'])
  })
})

describe('POST /api/analysis with checkTable: true', () => {
  it('answers rows per part, hole and cut and sums equal to the properties (by hand: 200·120 - 40·30 - 2·20·20)', async () => {
    const r = await c.post('/api/analysis', {
      parts: [{ name: 'Plate', outline: rect(200, 100), holes: [rect(40, 30, 20, 20)] }, { name: 'Flange', outline: rect(200, 20, 0, 100) }],
      cuts: [rect(20, 50, 150, 80)],
      checkTable: true,
    })
    expect(r.status).toBe(200)
    const t = r.body.checkTable
    expect(t.rows.map((row: { name: string; sign: number }) => [row.name, row.sign])).toEqual([['Plate', 1], ['Plate: hole 1', -1], ['Cut 1 through Plate', -1], ['Flange', 1], ['Cut 1 through Flange', -1]])
    for (const key of ['name', 'sign', 'n', 'A', 'x', 'y', 'Ax', 'Ay', 'Ixx0', 'Iyy0', 'Ixy0', 'dx', 'dy']) expect(t.rows[0]).toHaveProperty(key)
    expectClose(t.sums.A, 200 * 120 - 1200 - 800, 1e-12)
    expectClose(t.sums.Ixx, r.body.properties.Ixx, 1e-12)
  })

  it('is left out unless asked', async () => {
    const r = await c.post('/api/analysis', { parts: [{ outline: rect(100, 100) }] })
    expect(r.body).not.toHaveProperty('checkTable')
  })
})

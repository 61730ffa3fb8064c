import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
let owner: Client
let other: Client
const anon = () => new Client(() => server.url)

// A 300 x 20 plate (mm) as a Kernwise document.
const plateDoc = {
  schema: 'kernwise.sketch/1',
  parts: [{ id: 'p1', name: 'Plate', outline: [[0, 0], [300, 0], [300, 20], [0, 20]], holes: [], material: { name: 'Steel', E: 200000 }, shape: null }],
  cases: [{ id: 'dead', name: 'Dead', Mx: 0, My: 0 }],
  combinations: [],
  loads: [{ id: 'l1', name: 'Column', caseId: 'dead', P: 100000, x: 150, y: 10 }],
  settings: {},
}

beforeAll(async () => {
  owner = new Client(() => server.url)
  other = new Client(() => server.url)
  await owner.post('/api/auth/register', { email: 'owner@sketch.test', password: PASSWORD, name: 'Owner' })
  await other.post('/api/auth/register', { email: 'other@sketch.test', password: PASSWORD, name: 'Other' })
})

describe('sketch routes', () => {
  it('POST makes a sketch with a random UUID id and version 1; GET returns its document', async () => {
    const made = await owner.post('/api/sketches', { title: 'Crane column', project: 'Millrace', document: plateDoc })
    expect(made.status).toBe(201)
    expect(made.body.id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/)
    expect(made.body).toMatchObject({ title: 'Crane column', project: 'Millrace', version: 1, status: 'draft' })
    const got = await owner.get(`/api/sketches/${made.body.id}`)
    expect(got.status).toBe(200)
    expect(got.body.document.parts[0].outline).toEqual(plateDoc.parts[0]!.outline)
    expect(got.body.document.settings.units).toBe('SI')
  })

  it('without a document a new sketch gets an empty one', async () => {
    const made = await owner.post('/api/sketches', { title: 'Blank' })
    expect(made.status).toBe(201)
    expect(made.body.document).toMatchObject({ schema: 'kernwise.sketch/2', parts: [], loads: [] })
    expect(made.body.document.cases).toHaveLength(1)
  })

  it("someone else's sketch answers 404 for every verb; signed out answers 401", async () => {
    const made = await owner.post('/api/sketches', { title: 'Private' })
    const id = made.body.id
    expect((await other.get(`/api/sketches/${id}`)).status).toBe(404)
    expect((await other.patch(`/api/sketches/${id}`, { version: 1, title: 'Mine now' })).status).toBe(404)
    expect((await other.delete(`/api/sketches/${id}`)).status).toBe(404)
    expect((await other.post(`/api/sketches/${id}/duplicate`)).status).toBe(404)
    expect((await other.get('/api/sketches')).body.sketches.map((s: any) => s.id)).not.toContain(id)
    expect((await anon().get(`/api/sketches/${id}`)).status).toBe(401)
    expect((await anon().get('/api/sketches')).status).toBe(401)
    expect((await owner.get(`/api/sketches/${id}`)).body.title).toBe('Private')
  })

  it('PATCH with the current version saves and answers the next version; a stale version is 409 and changes nothing', async () => {
    const made = await owner.post('/api/sketches', { title: 'Versioned', document: plateDoc })
    const id = made.body.id
    const first = await owner.patch(`/api/sketches/${id}`, { version: 1, title: 'Versioned A' })
    expect(first.status).toBe(200)
    expect(first.body.version).toBe(2)
    const stale = await owner.patch(`/api/sketches/${id}`, { version: 1, title: 'Versioned B' })
    expect(stale.status).toBe(409)
    expect(stale.body.message).toMatch(/saved elsewhere/)
    expect(stale.body.data.currentVersion).toBe(2)
    const now = await owner.get(`/api/sketches/${id}`)
    expect(now.body).toMatchObject({ title: 'Versioned A', version: 2 })
  })

  it.each([
    [{ version: 1, document: { ...plateDoc, schema: 'other/9' } }, /schema/],
    [{ version: 1, document: { ...plateDoc, parts: [{ ...plateDoc.parts[0], outline: [[0, 0], [1, 1]] }] } }, /at least 3 vertices/],
    [{ version: 1, document: { ...plateDoc, loads: [{ ...plateDoc.loads[0], caseId: 'ghost' }] } }, /load case that does not exist/],
    [{ version: 1, document: { ...plateDoc, parts: [{ ...plateDoc.parts[0], material: { E: -5 } }] } }, /E must be positive/],
    [{ title: 'no version' }, /version/],
    [{ version: 1, title: '' }, /title/],
  ])('PATCH with a bad body %# is 400 and changes nothing', async (body, reason) => {
    const made = await owner.post('/api/sketches', { title: 'Guarded', document: plateDoc })
    const r = await owner.patch(`/api/sketches/${made.body.id}`, body)
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(reason)
    const after = await owner.get(`/api/sketches/${made.body.id}`)
    expect(after.body).toMatchObject({ title: 'Guarded', version: 1 })
  })

  it('a malformed id is 400, an unknown one 404', async () => {
    expect((await owner.get('/api/sketches/123')).status).toBe(400)
    expect((await owner.get('/api/sketches/00000000-0000-4000-8000-000000000000')).status).toBe(404)
  })

  it('DELETE hides a sketch; restore brings it back; duplicate makes a copy', async () => {
    const made = await owner.post('/api/sketches', { title: 'Binned' })
    const id = made.body.id
    expect((await owner.delete(`/api/sketches/${id}`)).status).toBe(200)
    expect((await owner.get(`/api/sketches/${id}`)).status).toBe(404)
    expect((await owner.get('/api/sketches')).body.sketches.map((s: any) => s.id)).not.toContain(id)
    expect((await owner.post(`/api/sketches/${id}/restore`)).status).toBe(200)
    expect((await owner.get(`/api/sketches/${id}`)).status).toBe(200)
    const copy = await owner.post(`/api/sketches/${id}/duplicate`)
    expect(copy.status).toBe(201)
    expect(copy.body.title).toBe('Binned (copy)')
    expect(copy.body.id).not.toBe(id)
  })

  it('search and sort the list', async () => {
    await owner.post('/api/sketches', { title: 'Zeta strut', project: 'Canopy' })
    await owner.post('/api/sketches', { title: 'Alpha pier', project: 'Canopy' })
    const found = await owner.get('/api/sketches?q=canopy&sort=title')
    expect(found.status).toBe(200)
    expect(found.body.sketches.map((s: any) => s.title)).toEqual(['Alpha pier', 'Zeta strut'])
    expect((await owner.get('/api/sketches?sort=colour')).status).toBe(400)
  })
})

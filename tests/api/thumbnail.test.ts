import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
let owner: Client
let other: Client

// A 300 x 20 plate (mm).
const plateDoc = {
  schema: 'kernwise.sketch/2',
  parts: [{ id: 'p1', name: 'Plate', outline: [[0, 0], [300, 0], [300, 20], [0, 20]], holes: [], material: { name: 'Steel', E: 200000 }, shape: null }],
  cases: [{ id: 'dead', name: 'Dead', Mx: 0, My: 0 }],
  combinations: [],
  loads: [],
  settings: {},
}

beforeAll(async () => {
  owner = new Client(() => server.url)
  other = new Client(() => server.url)
  await owner.post('/api/auth/register', { email: 'owner@thumb.test', password: PASSWORD, name: 'Owner' })
  await other.post('/api/auth/register', { email: 'other@thumb.test', password: PASSWORD, name: 'Other' })
})

describe('GET /api/sketches/:id/thumbnail.svg', () => {
  it('draws my sketch as SVG with the version as ETag; the same ETag back is 304, a save changes it', async () => {
    const made = await owner.post('/api/sketches', { title: 'Plate', document: plateDoc })
    const url = `/api/sketches/${made.body.id}/thumbnail.svg`
    const first = await owner.get(url)
    expect(first.status).toBe(200)
    expect(first.headers.get('content-type')).toMatch(/^image\/svg\+xml/)
    expect(first.text).toMatch(/^<svg /)
    expect(first.text).toContain('<path d="M')
    const etag = first.headers.get('etag')!
    expect(etag).toContain('-v1"')
    const again = await owner.request('GET', url, undefined, { 'if-none-match': etag })
    expect(again.status).toBe(304)
    expect(again.text).toBe('')

    const saved = await owner.patch(`/api/sketches/${made.body.id}`, { version: 1, document: { ...plateDoc, parts: [] } })
    expect(saved.status).toBe(200)
    const after = await owner.request('GET', url, undefined, { 'if-none-match': etag })
    expect(after.status).toBe(200)
    expect(after.headers.get('etag')).toContain('-v2"')
    expect(after.text).not.toContain('<path')
  })

  it("someone else's sketch is 404, signed out 401, a malformed id 400", async () => {
    const made = await owner.post('/api/sketches', { title: 'Private', document: plateDoc })
    expect((await other.get(`/api/sketches/${made.body.id}/thumbnail.svg`)).status).toBe(404)
    expect((await new Client(() => server.url).get(`/api/sketches/${made.body.id}/thumbnail.svg`)).status).toBe(401)
    expect((await owner.get('/api/sketches/not-an-id/thumbnail.svg')).status).toBe(400)
  })
})

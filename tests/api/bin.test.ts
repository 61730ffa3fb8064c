import { join } from 'node:path'
import sqlite3 from 'sqlite3'
import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
let owner: Client

beforeAll(async () => {
  owner = new Client(() => server.url)
  await owner.post('/api/auth/register', { email: 'bin@sketch.test', password: 'correct-horse-battery', name: 'Bin' })
})

/** Moves a sketch's deletion date back by `days`, straight in the database (the bin's age is the only thing tested). */
function age(id: string, days: number): Promise<void> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(join(server.dir, 'test.sqlite'))
    const when = new Date()
    when.setUTCDate(when.getUTCDate() - days)
    db.run('UPDATE sketches SET deletedAt = ? WHERE id = ?', [when.toISOString().replace('T', ' ').replace('Z', ' +00:00'), id], (error) => {
      db.close()
      if (error) reject(error)
      else resolve()
    })
  })
}

describe('recently deleted sketches', () => {
  it('GET /api/sketches?deleted=true lists what I deleted, newest first, with deletedAt; the normal list does not', async () => {
    const a = (await owner.post('/api/sketches', { title: 'First' })).body
    const b = (await owner.post('/api/sketches', { title: 'Second' })).body
    const beforeDelete = new Date()
    expect((await owner.delete(`/api/sketches/${a.id}`)).status).toBe(200)
    expect((await owner.delete(`/api/sketches/${b.id}`)).status).toBe(200)
    const bin = await owner.get('/api/sketches?deleted=true')
    expect(bin.status).toBe(200)
    expect(bin.body.sketches.map((s: { title: string }) => s.title)).toEqual(['Second', 'First'])
    // deletedAt is when the delete happened: not before the test asked for it (to the second, as stored).
    expect(Date.parse(bin.body.sketches[0].deletedAt)).toBeGreaterThanOrEqual(beforeDelete.getTime() - 1000)
    const list = await owner.get('/api/sketches')
    expect(list.body.sketches.map((s: { id: string }) => s.id)).not.toContain(a.id)
    expect((await owner.post(`/api/sketches/${a.id}/restore`)).status).toBe(200)
    expect((await owner.get('/api/sketches')).body.sketches.map((s: { id: string }) => s.id)).toContain(a.id)
  })

  it('after 30 days a deleted sketch leaves the list and cannot be restored (404 saying so)', async () => {
    const c = (await owner.post('/api/sketches', { title: 'Old' })).body
    await owner.delete(`/api/sketches/${c.id}`)
    await age(c.id, 31)
    const bin = await owner.get('/api/sketches?deleted=true')
    expect(bin.body.sketches.map((s: { id: string }) => s.id)).not.toContain(c.id)
    const r = await owner.post(`/api/sketches/${c.id}/restore`)
    expect(r.status).toBe(404)
    expect(r.body.message).toMatch(/over 30 days ago/)
  })

  it('a bad deleted value answers 400', async () => {
    const r = await owner.get('/api/sketches?deleted=maybe')
    expect(r.status).toBe(400)
    expect(r.body.message).toMatch(/deleted is true or false/)
  })
})

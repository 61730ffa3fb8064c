import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
const as: Record<string, Client> = {}
const ids: Record<string, string> = {}

beforeAll(async () => {
  for (const role of ['admin', 'engineer', 'checker', 'viewer']) {
    const c = new Client(() => server.url)
    const r = await c.post('/api/auth/register', { email: `${role}@roles.test`, password: PASSWORD, name: role })
    expect(r.status).toBe(201)
    as[role] = c
    ids[role] = r.body.user.id
  }
  for (const role of ['checker', 'viewer']) {
    const r = await as.admin!.patch(`/api/members/${ids[role]}`, { role })
    expect(r.status).toBe(200)
  }
})

describe('roles', () => {
  it.each([
    ['admin', 200],
    ['engineer', 403],
    ['checker', 403],
    ['viewer', 403],
  ])('GET /api/members as %s answers %i', async (role, status) => {
    const r = await as[role]!.get('/api/members')
    expect(r.status).toBe(status)
    if (status === 403) expect(r.body.message).toMatch(/does not allow/)
  })

  it.each([
    ['admin', 201],
    ['engineer', 201],
    ['checker', 403],
    ['viewer', 403],
  ])('POST /api/sketches as %s answers %i', async (role, status) => {
    const r = await as[role]!.post('/api/sketches', { title: `by ${role}` })
    expect(r.status).toBe(status)
  })

  it('signed out, a protected route answers 401', async () => {
    expect((await new Client(() => server.url).get('/api/members')).status).toBe(401)
    expect((await new Client(() => server.url).post('/api/sketches', { title: 'x' })).status).toBe(401)
  })

  it('a role change counts at once for the existing session', async () => {
    expect((await as.checker!.get('/api/auth/me')).body.user.role).toBe('checker')
    await as.admin!.patch(`/api/members/${ids.checker}`, { role: 'engineer' })
    expect((await as.checker!.post('/api/sketches', { title: 'promoted' })).status).toBe(201)
    await as.admin!.patch(`/api/members/${ids.checker}`, { role: 'checker' })
    expect((await as.checker!.post('/api/sketches', { title: 'demoted' })).status).toBe(403)
  })

  it('rejects an unknown role with 400 and the last admin cannot be demoted (409)', async () => {
    const bad = await as.admin!.patch(`/api/members/${ids.viewer}`, { role: 'owner' })
    expect(bad.status).toBe(400)
    expect(bad.body.message).toMatch(/admin, engineer, checker, viewer/)
    const last = await as.admin!.patch(`/api/members/${ids.admin}`, { role: 'viewer' })
    expect(last.status).toBe(409)
    const missing = await as.admin!.patch('/api/members/00000000-0000-4000-8000-000000000000', { role: 'viewer' })
    expect(missing.status).toBe(404)
    const junk = await as.admin!.patch('/api/members/not-a-uuid', { role: 'viewer' })
    expect(junk.status).toBe(400)
  })
})

describe('personal API tokens', () => {
  it('create, list, use as bearer, revoke: a revoked token gets 401 at once', async () => {
    const made = await as.engineer!.post('/api/tokens', { name: 'load script' })
    expect(made.status).toBe(201)
    expect(made.body).toMatchObject({ name: 'load script' })
    expect(made.body.token).toMatch(/^kw_[A-Za-z0-9_-]{40,}$/)

    const list = await as.engineer!.get('/api/tokens')
    expect(list.status).toBe(200)
    expect(list.body.tokens).toHaveLength(1)
    expect(JSON.stringify(list.body)).not.toContain(made.body.token)

    const bearer = new Client(() => server.url).withToken(made.body.token)
    const me = await bearer.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.user.email).toBe('engineer@roles.test')
    expect((await bearer.post('/api/sketches', { title: 'scripted' })).status).toBe(201)

    const gone = await as.engineer!.delete(`/api/tokens/${made.body.id}`)
    expect(gone.status).toBe(200)
    expect((await bearer.get('/api/auth/me')).status).toBe(401)
    expect((await bearer.get('/api/sketches')).status).toBe(401)
  })

  it('a token of someone else cannot be revoked (404); a nameless token is 400; a malformed header is 401', async () => {
    const made = await as.admin!.post('/api/tokens', { name: 'admin script' })
    expect((await as.engineer!.delete(`/api/tokens/${made.body.id}`)).status).toBe(404)
    expect((await as.engineer!.post('/api/tokens', { name: '  ' })).status).toBe(400)
    const odd = await new Client(() => server.url).request('GET', '/api/auth/me', undefined, { authorization: 'Token abc' })
    expect(odd.status).toBe(401)
    const random = await new Client(() => server.url).withToken('kw_not-a-real-token').get('/api/auth/me')
    expect(random.status).toBe(401)
  })
})

describe('request limits', () => {
  it('a body over 5 MB answers 413', async () => {
    const big = JSON.stringify({ name: 'x'.repeat(5 * 1024 * 1024 + 10) })
    const r = await as.engineer!.request('POST', '/api/tokens', big, { 'content-type': 'application/json' })
    expect(r.status).toBe(413)
  })
})

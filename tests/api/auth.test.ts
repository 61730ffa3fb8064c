import { describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const client = () => new Client(() => server.url)
const PASSWORD = 'correct-horse-battery'

describe('accounts and sign-in', () => {
  it('GET /api/health answers ok only after a real query', async () => {
    const res = await client().get('/api/health')
    expect(res.status).toBe(200)
    expect(res.body).toEqual({ status: 'ok', db: 'ok' })
  })

  it('the first account on an empty database becomes admin, later ones engineers', async () => {
    const first = await client().post('/api/auth/register', { email: 'First@Example.test ', password: PASSWORD, name: 'First' })
    expect(first.status).toBe(201)
    expect(first.body.user).toMatchObject({ email: 'first@example.test', role: 'admin', name: 'First' })
    expect(first.body.user.passwordHash).toBeUndefined()
    const second = await client().post('/api/auth/register', { email: 'second@example.test', password: PASSWORD, name: 'Second' })
    expect(second.status).toBe(201)
    expect(second.body.user.role).toBe('engineer')
  })

  it('register signs in: the session cookie works for /api/auth/me', async () => {
    const c = client()
    await c.post('/api/auth/register', { email: 'third@example.test', password: PASSWORD, name: 'Third' })
    const me = await c.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.body.user.email).toBe('third@example.test')
  })

  it('a duplicate e-mail (any case) is 409', async () => {
    const res = await client().post('/api/auth/register', { email: 'FIRST@example.test', password: PASSWORD, name: 'Again' })
    expect(res.status).toBe(409)
    expect(res.body.message).toMatch(/already exists/)
  })

  it.each([
    [{ email: 'weak@example.test', password: 'short', name: 'Weak' }, /at least 10 characters/],
    [{ email: 'not-an-email', password: PASSWORD, name: 'Bad' }, /valid e-mail/],
    [{ email: 'noname@example.test', password: PASSWORD, name: '' }, /Enter your name/],
    [{}, /e-mail/],
  ])('bad registration %j is 400 with the reason', async (body, reason) => {
    const res = await client().post('/api/auth/register', body)
    expect(res.status).toBe(400)
    expect(res.body).toMatchObject({ statusCode: 400 })
    expect(res.body.message).toMatch(reason)
  })

  it('a body that is not JSON is 400, not 500', async () => {
    const res = await client().request('POST', '/api/auth/login', '{not json', { 'content-type': 'application/json' })
    expect(res.status).toBe(400)
  })

  it('login with the right password answers the user; logout ends the session', async () => {
    const c = client()
    const login = await c.post('/api/auth/login', { email: 'second@example.test', password: PASSWORD })
    expect(login.status).toBe(200)
    expect(login.body.user.email).toBe('second@example.test')
    expect((await c.get('/api/auth/me')).status).toBe(200)
    expect((await c.post('/api/auth/logout')).status).toBe(200)
    expect((await c.get('/api/auth/me')).status).toBe(401)
  })

  it('a wrong password and an unknown e-mail get the same 401 message', async () => {
    const wrong = await client().post('/api/auth/login', { email: 'third@example.test', password: 'not-the-password' })
    const unknown = await client().post('/api/auth/login', { email: 'nobody@example.test', password: 'not-the-password' })
    expect(wrong.status).toBe(401)
    expect(unknown.status).toBe(401)
    expect(wrong.body.message).toBe(unknown.body.message)
    expect(wrong.body.message).not.toMatch(/password is wrong|no account|unknown/i)
  })
})

import { describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

// The real default (not the open default other test servers use): invitation only once an admin exists.
const server = useTestServer({ NUXT_REGISTRATION_DEFAULT: '' })
const body = (email: string, extra: Record<string, string> = {}) => ({ email, password: 'correct-horse-battery', name: email.split('@')[0], ...extra })

describe('open registration or invitation only (admin setting)', () => {
  const admin = new Client(() => server.url)

  it('an empty workspace registers its first account (the admin); after that the default is invitation only', async () => {
    expect((await new Client(() => server.url).get('/api/auth/registration')).body.registration).toBe('open')
    expect((await admin.post('/api/auth/register', body('admin@reg.test'))).status).toBe(201)
    expect((await admin.get('/api/settings')).body.registration).toBe('invitation')
    const refused = await new Client(() => server.url).post('/api/auth/register', body('walk-in@reg.test'))
    expect(refused.status).toBe(403)
    expect(refused.body.message).toMatch(/invitation only/)
  })

  it('the admin opens registration, and closes it again', async () => {
    expect((await admin.patch('/api/settings', { registration: 'open' })).body.registration).toBe('open')
    expect((await new Client(() => server.url).post('/api/auth/register', body('open@reg.test'))).status).toBe(201)
    expect((await admin.patch('/api/settings', { registration: 'invitation' })).body.registration).toBe('invitation')
    expect((await new Client(() => server.url).post('/api/auth/register', body('closed@reg.test'))).status).toBe(403)
    expect((await admin.patch('/api/settings', { registration: 'sometimes' })).status).toBe(400)
  })

  it('only an admin reads or changes the settings', async () => {
    const engineer = new Client(() => server.url)
    await engineer.post('/api/auth/login', { email: 'open@reg.test', password: 'correct-horse-battery' })
    expect((await engineer.get('/api/settings')).status).toBe(403)
    expect((await engineer.patch('/api/settings', { registration: 'open' })).status).toBe(403)
    expect((await new Client(() => server.url).get('/api/settings')).status).toBe(401)
  })

  it('an invitation lets its address register once; another address or a second use is refused', async () => {
    expect((await admin.post('/api/invitations', { email: 'invited@reg.test' })).status).toBe(201)
    const mail = ((await admin.get('/api/outbox')).body as any[]).find(m => m.to === 'invited@reg.test')
    const token = /invitation=([\w-]+)/.exec(mail.text)![1]!
    expect((await new Client(() => server.url).post('/api/auth/register', body('someone-else@reg.test', { invitation: token }))).status).toBe(403)
    expect((await new Client(() => server.url).post('/api/auth/register', body('invited@reg.test', { invitation: token }))).status).toBe(201)
    expect((await new Client(() => server.url).post('/api/auth/register', body('invited2@reg.test', { invitation: token }))).status).toBe(403)
    expect((await admin.post('/api/invitations', { email: 'invited@reg.test' })).status).toBe(409)
  })
})

import { readdirSync, statSync } from 'node:fs'
import { join, relative } from 'node:path'
import { fileURLToPath } from 'node:url'
import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'
import { account, pause, plateDoc, setRole } from './support/team'

// The access matrix, generated from the route files: every file under server/api/sketches and
// server/api/links is asked by every kind of caller, and the answer must follow its rule. A route
// file without a rule here fails the first test, so a new route cannot skip the access check.

const server = useTestServer()
const apiDir = fileURLToPath(new URL('../../server/api/', import.meta.url))

/** Route files as "sketches/[id]/shares/index.post". */
function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name)
    if (statSync(path).isDirectory()) return routeFiles(path)
    return name.endsWith('.ts') ? [relative(apiDir, path).replace(/\.ts$/, '')] : []
  })
}
const ROUTES = [...routeFiles(join(apiDir, 'sketches')), ...routeFiles(join(apiDir, 'links'))].sort()

/** What one matrix sketch holds, for building a request. */
interface Fixture { id: string; version: number; shareId: string; linkId: string; commentId: string; token: string; checker: string }
type Need = 'view' | 'comment' | 'edit' | 'manage' | 'checker' | 'signed-in' | 'create' | 'copy' | 'bin' | 'public'
interface Rule {
  need: Need
  /** The state the sketch is put in first: a draft with revision 1 (default), submitted to the checker, or in the bin. */
  state?: 'draft' | 'submitted' | 'deleted'
  request: (f: Fixture) => [method: string, path: string, body?: unknown]
}

const S = (f: Fixture) => `/api/sketches/${f.id}`
const RULES: Record<string, Rule> = {
  'sketches/index.get': { need: 'signed-in', request: () => ['GET', '/api/sketches?scope=shared'] },
  'sketches/index.post': { need: 'create', request: () => ['POST', '/api/sketches', { title: 'Matrix new' }] },
  'sketches/[id].get': { need: 'view', request: f => ['GET', S(f)] },
  'sketches/[id].patch': { need: 'edit', request: f => ['PATCH', S(f), { version: f.version, title: 'Matrix changed' }] },
  'sketches/[id].delete': { need: 'manage', request: f => ['DELETE', S(f)] },
  'sketches/[id]/activity.get': { need: 'view', request: f => ['GET', `${S(f)}/activity`] },
  'sketches/[id]/duplicate.post': { need: 'copy', request: f => ['POST', `${S(f)}/duplicate`] },
  'sketches/[id]/report.pdf.get': { need: 'view', request: f => ['GET', `${S(f)}/report.pdf?revision=1`] },
  'sketches/[id]/restore.post': { need: 'bin', state: 'deleted', request: f => ['POST', `${S(f)}/restore`] },
  'sketches/[id]/thumbnail.svg.get': { need: 'view', request: f => ['GET', `${S(f)}/thumbnail.svg`] },
  'sketches/[id]/shares/index.get': { need: 'manage', request: f => ['GET', `${S(f)}/shares`] },
  'sketches/[id]/shares/index.post': { need: 'manage', request: f => ['POST', `${S(f)}/shares`, { email: 'colleague@matrix.test', access: 'view' }] },
  'sketches/[id]/shares/[shareId].patch': { need: 'manage', request: f => ['PATCH', `${S(f)}/shares/${f.shareId}`, { access: 'comment' }] },
  'sketches/[id]/shares/[shareId].delete': { need: 'manage', request: f => ['DELETE', `${S(f)}/shares/${f.shareId}`] },
  'sketches/[id]/links/index.get': { need: 'manage', request: f => ['GET', `${S(f)}/links`] },
  'sketches/[id]/links/index.post': { need: 'manage', request: f => ['POST', `${S(f)}/links`, {}] },
  'sketches/[id]/links/[linkId].delete': { need: 'manage', request: f => ['DELETE', `${S(f)}/links/${f.linkId}`] },
  'sketches/[id]/revisions/index.get': { need: 'view', request: f => ['GET', `${S(f)}/revisions`] },
  'sketches/[id]/revisions/index.post': { need: 'edit', request: f => ['POST', `${S(f)}/revisions`, { note: 'Matrix' }] },
  'sketches/[id]/revisions/compare.get': { need: 'view', request: f => ['GET', `${S(f)}/revisions/compare?from=1&to=1`] },
  'sketches/[id]/revisions/[number].get': { need: 'view', request: f => ['GET', `${S(f)}/revisions/1`] },
  'sketches/[id]/revisions/[number].patch': { need: 'edit', request: f => ['PATCH', `${S(f)}/revisions/1`, { note: 'Matrix note' }] },
  'sketches/[id]/revisions/[number]/restore.post': { need: 'edit', request: f => ['POST', `${S(f)}/revisions/1/restore`] },
  'sketches/[id]/comments/index.get': { need: 'view', request: f => ['GET', `${S(f)}/comments`] },
  'sketches/[id]/comments/index.post': { need: 'comment', request: f => ['POST', `${S(f)}/comments`, { body: 'Matrix comment', at: { x: 10, y: 5 } }] },
  'sketches/[id]/comments/[commentId].patch': { need: 'comment', request: f => ['PATCH', `${S(f)}/comments/${f.commentId}`, { resolved: true }] },
  'sketches/[id]/review/index.post': { need: 'manage', request: f => ['POST', `${S(f)}/review`, { revision: 1, checker: f.checker }] },
  'sketches/[id]/review/approve.post': { need: 'checker', state: 'submitted', request: f => ['POST', `${S(f)}/review/approve`] },
  'sketches/[id]/review/return.post': { need: 'checker', state: 'submitted', request: f => ['POST', `${S(f)}/review/return`, { comment: 'Matrix: back to you' }] },
  'links/[token].get': { need: 'public', request: f => ['GET', `/api/links/${f.token}`] },
  'links/[token]/drawing.svg.get': { need: 'public', request: f => ['GET', `/api/links/${f.token}/drawing.svg`] },
}

type Actor = 'owner' | 'admin' | 'editor' | 'commenter' | 'viewer' | 'checker' | 'stranger' | 'signed-out' | 'link' | 'expired-link' | 'revoked-link'
const ACTORS: Actor[] = ['owner', 'admin', 'editor', 'commenter', 'viewer', 'checker', 'stranger', 'signed-out', 'link', 'expired-link', 'revoked-link']
/** The access each signed-in actor has to a matrix sketch (shares made in `fixture`; the checker's is capped to comment by its role). */
const LEVEL: Partial<Record<Actor, 0 | 1 | 2 | 3 | 4>> = { owner: 4, admin: 4, editor: 3, commenter: 2, checker: 2, viewer: 1, stranger: 0 }
const NEED_LEVEL = { view: 1, comment: 2, edit: 3, manage: 4 } as const
const EMAIL: Partial<Record<Actor, string>> = {
  admin: 'admin@matrix.test', owner: 'owner@matrix.test', editor: 'editor@matrix.test', commenter: 'commenter@matrix.test',
  viewer: 'viewer@matrix.test', checker: 'checker@matrix.test', stranger: 'stranger@matrix.test',
}

/**
 * The expected answer: a status class ('ok' is any 2xx) or an exact status. Sketch routes: signed
 * out 401 (a link token is not a sign-in), no access 404, too little 403. Link routes answer
 * everyone the same: a live link works, an expired or revoked one is 404.
 */
function expected(rule: Rule, actor: Actor): 'ok' | number {
  const token = actor === 'link' || actor === 'expired-link' || actor === 'revoked-link'
  if (rule.need === 'public') return actor === 'expired-link' || actor === 'revoked-link' ? 404 : 'ok'
  if (actor === 'signed-out' || token) return 401
  const level = LEVEL[actor]!
  switch (rule.need) {
    case 'signed-in': return 'ok'
    case 'create': return actor === 'checker' ? 403 : 'ok'
    case 'bin': return actor === 'owner' ? 'ok' : 404
    case 'copy': return level === 0 ? 404 : actor === 'checker' ? 403 : 'ok'
    case 'checker':
      if (level === 0) return 404
      if (actor === 'checker') return 'ok'
      return actor === 'owner' ? 409 : 403
    default: return level === 0 ? 404 : level >= NEED_LEVEL[rule.need] ? 'ok' : 403
  }
}

const clients = {} as Record<Actor, Client>
let liveToken = ''
let expiredToken = ''
let revokedToken = ''

beforeAll(async () => {
  clients.admin = await account(server, EMAIL.admin!, 'Matrix Admin')
  for (const actor of ['owner', 'editor', 'commenter', 'viewer', 'checker', 'stranger'] as const) clients[actor] = await account(server, EMAIL[actor]!, `Matrix ${actor}`)
  await setRole(clients.admin, EMAIL.checker!, 'checker')
  for (const actor of ['signed-out', 'link', 'expired-link', 'revoked-link'] as const) clients[actor] = new Client(() => server.url)
  // The tokens of the link actors: one live, one expired (made to expire 1.5 s later), one revoked.
  const f = await fixture('draft')
  liveToken = f.token
  const short = await clients.owner.post(`/api/sketches/${f.id}/links`, { expiresAt: new Date(Date.now() + 1500).toISOString() })
  expiredToken = String(short.body.url).split('/l/')[1]!
  const revoked = await clients.owner.post(`/api/sketches/${f.id}/links`, {})
  revokedToken = String(revoked.body.url).split('/l/')[1]!
  expect((await clients.owner.delete(`/api/sketches/${f.id}/links/${revoked.body.id}`)).status).toBe(200)
  await pause(1600)
}, 120_000)

/** A fresh sketch of the owner: shared edit/comment/view/comment with editor, commenter, viewer and checker; revision 1; a comment; a link. */
async function fixture(state: Rule['state'] = 'draft'): Promise<Fixture> {
  const owner = clients.owner
  const made = await owner.post('/api/sketches', { title: 'Matrix sketch', document: plateDoc() })
  const id = made.body.id as string
  let shareId = ''
  for (const [actor, access] of [['editor', 'edit'], ['commenter', 'comment'], ['viewer', 'view'], ['checker', 'comment']] as const) {
    const r = await owner.post(`/api/sketches/${id}/shares`, { email: EMAIL[actor], access })
    if (actor === 'viewer') shareId = r.body.id
  }
  expect((await owner.post(`/api/sketches/${id}/revisions`, { note: 'Matrix revision' })).status).toBe(201)
  const comment = await owner.post(`/api/sketches/${id}/comments`, { body: 'Matrix thread', at: { x: 1, y: 1 } })
  const link = await owner.post(`/api/sketches/${id}/links`, {})
  if (state === 'submitted') expect((await owner.post(`/api/sketches/${id}/review`, { revision: 1, checker: EMAIL.checker })).status).toBe(201)
  if (state === 'deleted') expect((await owner.delete(`/api/sketches/${id}`)).status).toBe(200)
  return { id, version: made.body.version, shareId, linkId: link.body.id, commentId: comment.body.id, token: String(link.body.url).split('/l/')[1]!, checker: EMAIL.checker! }
}

const BLANK: Fixture = { id: '', version: 0, shareId: '', linkId: '', commentId: '', token: '', checker: '' }
const readFixtures = new Map<string, Promise<Fixture>>()
function shared(state: Rule['state'] = 'draft'): Promise<Fixture> {
  if (!readFixtures.has(state)) readFixtures.set(state, fixture(state))
  return readFixtures.get(state)!
}

describe('the access matrix', () => {
  it('every sketch and link route file has an access rule (a new route must add one here)', () => {
    expect(ROUTES.length).toBeGreaterThan(25)
    expect(ROUTES.filter(r => !RULES[r])).toEqual([])
  })

  describe.each(ROUTES.filter(r => RULES[r]))('%s', (route) => {
    const rule = RULES[route]!
    it.each(ACTORS)('as %s', async (actor) => {
      // A read cannot change the sketch, so reads share one fixture per state; every write gets a fresh one.
      const f = { ...(rule.request(BLANK)[0] === 'GET' ? await shared(rule.state) : await fixture(rule.state)) }
      if (actor === 'link') f.token = liveToken
      if (actor === 'expired-link') f.token = expiredToken
      if (actor === 'revoked-link') f.token = revokedToken
      const [method, path, body] = rule.request(f)
      const r = await clients[actor].request(method, path, body)
      const want = expected(rule, actor)
      const got = want === 'ok' ? (r.status >= 200 && r.status < 300 ? 'ok' : r.status) : r.status
      expect(got, `${method} ${path} as ${actor}: ${r.text.slice(0, 200)}`).toBe(want)
      if (r.status === 404 && rule.need !== 'public' && rule.need !== 'bin') expect(r.body.message).toBe('Sketch not found')
    })
  })
})

import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'
import { account, pause, plateDoc, setRole } from './support/team'

const server = useTestServer()
let admin: Client
let owner: Client
let checker: Client
let checker2: Client
let engineer: Client
let viewerRole: Client
const anon = () => new Client(() => server.url)

beforeAll(async () => {
  admin = await account(server, 'admin@team.test', 'Tia Admin')
  owner = await account(server, 'owner@team.test', 'Otto Owner')
  checker = await account(server, 'checker@team.test', 'Chen Checker')
  checker2 = await account(server, 'checker2@team.test', 'Chloe Second')
  engineer = await account(server, 'engineer@team.test', 'Ena Engineer')
  viewerRole = await account(server, 'viewer@team.test', 'Vera Viewer')
  await setRole(admin, 'checker@team.test', 'checker')
  await setRole(admin, 'checker2@team.test', 'checker')
  await setRole(admin, 'viewer@team.test', 'viewer')
  await admin.patch('/api/settings', { workspaceName: 'Harbour Works' })
})

async function sketch(title = 'Team sketch', doc = plateDoc()): Promise<string> {
  const r = await owner.post('/api/sketches', { title, document: doc })
  expect(r.status).toBe(201)
  return r.body.id
}

async function outbox(to: string) {
  const r = await admin.get('/api/outbox')
  expect(r.status).toBe(200)
  return (r.body as { to: string; subject: string; text: string; html: string | null; received: boolean; kind: string }[]).filter(m => m.to === to)
}

describe('sharing and the role cap', () => {
  it('POST shares answers 201 {id, email, access}; the account role caps what the share grants', async () => {
    const id = await sketch('Capped')
    const toViewer = await owner.post(`/api/sketches/${id}/shares`, { email: 'VIEWER@team.test', access: 'edit' })
    expect(toViewer.status).toBe(201)
    expect(toViewer.body).toMatchObject({ email: 'viewer@team.test', access: 'edit' })
    await owner.post(`/api/sketches/${id}/shares`, { email: 'checker@team.test', access: 'edit' })
    // A viewer account reads only, whatever the share says.
    const got = await viewerRole.get(`/api/sketches/${id}`)
    expect(got.status).toBe(200)
    expect(got.body.access).toBe('view')
    expect((await viewerRole.patch(`/api/sketches/${id}`, { version: 1, title: 'Viewer edit' })).status).toBe(403)
    expect((await viewerRole.post(`/api/sketches/${id}/comments`, { body: 'Hello' })).status).toBe(403)
    // A checker account comments but does not save.
    expect((await checker.get(`/api/sketches/${id}`)).body.access).toBe('comment')
    expect((await checker.post(`/api/sketches/${id}/comments`, { body: 'Looks fine' })).status).toBe(201)
    const save = await checker.patch(`/api/sketches/${id}`, { version: 1, title: 'Checker edit' })
    expect(save.status).toBe(403)
    expect(save.body.message).toMatch(/edit access/)
    const list = await owner.get(`/api/sketches/${id}/shares`)
    expect(list.body.shares.map((s: any) => [s.email, s.access, s.effective])).toEqual([['viewer@team.test', 'edit', 'view'], ['checker@team.test', 'edit', 'comment']])
  })

  it('an edit share saves with the version (409 when stale); removing the share makes the sketch 404', async () => {
    const id = await sketch('Edited by two')
    const share = await owner.post(`/api/sketches/${id}/shares`, { email: 'engineer@team.test', access: 'edit' })
    const saved = await engineer.patch(`/api/sketches/${id}`, { version: 1, title: 'Edited by a colleague' })
    expect(saved.status).toBe(200)
    expect(saved.body.version).toBe(2)
    expect((await engineer.patch(`/api/sketches/${id}`, { version: 1, title: 'Stale' })).status).toBe(409)
    expect((await engineer.get(`/api/sketches/${id}/shares`)).status).toBe(403)
    expect((await owner.patch(`/api/sketches/${id}/shares/${share.body.id}`, { access: 'view' })).body.access).toBe('view')
    expect((await engineer.patch(`/api/sketches/${id}`, { version: 2, title: 'Now view only' })).status).toBe(403)
    expect((await owner.delete(`/api/sketches/${id}/shares/${share.body.id}`)).status).toBe(200)
    const gone = await engineer.get(`/api/sketches/${id}`)
    expect(gone.status).toBe(404)
    expect(gone.body.message).toBe('Sketch not found')
  })

  it('bad share bodies are 400 and change nothing; sharing with the owner is 409', async () => {
    const id = await sketch('Bad shares')
    expect((await owner.post(`/api/sketches/${id}/shares`, { email: 'not-an-address', access: 'view' })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/shares`, { email: 'x@team.test', access: 'own' })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/shares`, { email: 'owner@team.test', access: 'view' })).status).toBe(409)
    expect((await owner.get(`/api/sketches/${id}/shares`)).body.shares).toEqual([])
  })

  it('scope=mine|shared|review lists what I own, what is shared with me and what waits for my check, with counts', async () => {
    const id = await sketch('Listed for the checker')
    await owner.post(`/api/sketches/${id}/revisions`, { note: 'For check' })
    await owner.post(`/api/sketches/${id}/review`, { revision: 1, checker: 'checker2@team.test' })
    const review = await checker2.get('/api/sketches?scope=review')
    expect(review.body.sketches.map((s: any) => s.title)).toEqual(['Listed for the checker'])
    expect(review.body.sketches[0].owner).toBe('Otto Owner')
    const shared = await checker2.get('/api/sketches?scope=shared')
    expect(shared.body.sketches.map((s: any) => s.id)).toContain(id)
    expect(shared.body.counts).toMatchObject({ toCheck: 1, shared: shared.body.sketches.length })
    expect((await checker2.get('/api/sketches')).body.sketches).toEqual([])
    expect((await owner.get('/api/sketches?scope=review')).body.sketches).toEqual([])
    expect((await owner.get('/api/sketches?scope=everything')).status).toBe(400)
  })
})

describe('invitations through the local SMTP server', () => {
  it('sharing with an unknown address mails an invitation (text and HTML, workspace name, link); registering with it applies the share', async () => {
    const id = await sketch('For the newcomer')
    const r = await owner.post(`/api/sketches/${id}/shares`, { email: 'newcomer@team.test', access: 'comment' })
    expect(r.status).toBe(201)
    expect(r.body.invited).toBe(true)
    const [mail] = await outbox('newcomer@team.test')
    expect(mail).toBeDefined()
    // received: the local SMTP server took it and mailparser read it back.
    expect(mail!.received).toBe(true)
    expect(mail!.kind).toBe('invitation')
    expect(mail!.text).toContain('Harbour Works')
    expect(mail!.html).toContain('Harbour Works')
    expect(mail!.html).toContain('<a href=')
    const link = /(http:\/\/\S+\/register\?invitation=[\w-]+&email=\S+)/.exec(mail!.text)?.[1]
    expect(link).toBeDefined()
    const url = new URL(link!)
    expect(url.origin).toBe(server.url)
    // The link's page works.
    expect((await fetch(link!)).status).toBe(200)
    const newcomer = new Client(() => server.url)
    const reg = await newcomer.post('/api/auth/register', { email: 'newcomer@team.test', password: 'correct-horse-battery', name: 'Nia New', invitation: url.searchParams.get('invitation') })
    expect(reg.status).toBe(201)
    const got = await newcomer.get(`/api/sketches/${id}`)
    expect(got.status).toBe(200)
    expect(got.body.access).toBe('comment')
    expect((await newcomer.get('/api/sketches?scope=shared')).body.sketches.map((s: any) => s.id)).toEqual([id])
  })

  it('the outbox is admin only and newest first: [{to, subject, text, createdAt}]', async () => {
    expect((await owner.get('/api/outbox')).status).toBe(403)
    expect((await anon().get('/api/outbox')).status).toBe(401)
    const all = (await admin.get('/api/outbox')).body as { to: string; subject: string; text: string; createdAt: string }[]
    expect(all.length).toBeGreaterThan(1)
    for (const m of all) expect(Object.keys(m)).toEqual(expect.arrayContaining(['to', 'subject', 'text', 'createdAt']))
    const times = all.map(m => Date.parse(m.createdAt))
    expect([...times].sort((a, b) => b - a)).toEqual(times)
  })
})

describe('revisions', () => {
  it('POST revisions answers 201 {number} counting 1, 2…; a revision keeps its document when the sketch changes; restore is a new save', async () => {
    const id = await sketch('Revised', plateDoc(300, 20))
    const r1 = await owner.post(`/api/sketches/${id}/revisions`, { note: 'First' })
    expect(r1.status).toBe(201)
    expect(r1.body.number).toBe(1)
    const saved = await owner.patch(`/api/sketches/${id}`, { version: 1, document: plateDoc(300, 40) })
    expect(saved.status).toBe(200)
    expect((await owner.post(`/api/sketches/${id}/revisions`, { note: 'Thicker' })).body.number).toBe(2)
    const one = await owner.get(`/api/sketches/${id}/revisions/1`)
    expect(one.body.document.parts[0].outline).toEqual(plateDoc(300, 20).parts[0]!.outline)
    const list = await owner.get(`/api/sketches/${id}/revisions`)
    expect(list.body.revisions.map((r: any) => [r.number, r.note])).toEqual([[2, 'Thicker'], [1, 'First']])
    const restored = await owner.post(`/api/sketches/${id}/revisions/1/restore`)
    expect(restored.status).toBe(200)
    expect(restored.body.version).toBe(3)
    expect(restored.body.document.parts[0].outline).toEqual(plateDoc(300, 20).parts[0]!.outline)
    // The history is not rewritten: revision 2 is still the 40 mm plate.
    expect((await owner.get(`/api/sketches/${id}/revisions/2`)).body.document.parts[0].outline).toEqual(plateDoc(300, 40).parts[0]!.outline)
    expect((await owner.get(`/api/sketches/${id}/revisions/9`)).status).toBe(404)
    expect((await owner.get(`/api/sketches/${id}/revisions/abc`)).status).toBe(400)
  })

  it('compare lists property changes with differences (closed form: A = b·h, Ix = b·h³/12)', async () => {
    const id = await sketch('Compared', plateDoc(300, 20))
    await owner.post(`/api/sketches/${id}/revisions`, { note: '20 mm' })
    await owner.patch(`/api/sketches/${id}`, { version: 1, document: plateDoc(300, 40) })
    await owner.post(`/api/sketches/${id}/revisions`, { note: '40 mm' })
    const c = await owner.get(`/api/sketches/${id}/revisions/compare?from=1&to=2`)
    expect(c.status).toBe(200)
    const row = (key: string) => c.body.rows.find((r: any) => r.key === key)
    expect(row('area')).toMatchObject({ from: 6000, to: 12000, difference: 6000, percent: 100 })
    // 300·20³/12 = 200 000 mm⁴; 300·40³/12 = 1 600 000 mm⁴: eight times.
    expect(row('Ixx').from).toBeCloseTo(200_000, 3)
    expect(row('Ixx').to).toBeCloseTo(1_600_000, 3)
    expect(row('Ixx').percent).toBeCloseTo(700, 6)
    expect(c.body.from.document.parts[0].outline[2]).toEqual([300, 20])
    expect(c.body.to.document.parts[0].outline[2]).toEqual([300, 40])
    expect((await owner.get(`/api/sketches/${id}/revisions/compare?from=1&to=7`)).status).toBe(404)
    expect((await owner.get(`/api/sketches/${id}/revisions/compare?from=x&to=1`)).status).toBe(400)
  })
})

describe('comments', () => {
  it('pinned and sketch-wide comments, one level of replies, resolve and reopen; text is kept as typed', async () => {
    const id = await sketch('Commented')
    await owner.post(`/api/sketches/${id}/shares`, { email: 'checker@team.test', access: 'comment' })
    const pinned = await checker.post(`/api/sketches/${id}/comments`, { body: '<b>Check</b> this weld & <script>x</script>', at: { x: 150, y: 10 } })
    expect(pinned.status).toBe(201)
    expect(pinned.body).toMatchObject({ body: '<b>Check</b> this weld & <script>x</script>', at: { x: 150, y: 10 }, author: 'Chen Checker', resolved: false })
    const whole = await checker.post(`/api/sketches/${id}/comments`, { body: 'On the whole sketch' })
    expect(whole.body.at).toBeNull()
    const reply = await owner.post(`/api/sketches/${id}/comments`, { body: 'Done', parentId: pinned.body.id })
    expect(reply.status).toBe(201)
    expect((await owner.post(`/api/sketches/${id}/comments`, { body: 'Nested', parentId: reply.body.id })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/comments`, { body: 'Pinned reply', parentId: pinned.body.id, at: { x: 1, y: 1 } })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/comments`, { body: '' })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/comments`, { body: 'Far', at: { x: 1e9, y: 0 } })).status).toBe(400)
    expect((await owner.patch(`/api/sketches/${id}/comments/${reply.body.id}`, { resolved: true })).status).toBe(409)
    const resolved = await owner.patch(`/api/sketches/${id}/comments/${pinned.body.id}`, { resolved: true })
    expect(resolved.body).toMatchObject({ resolved: true, resolvedBy: 'Otto Owner' })
    const reopened = await checker.patch(`/api/sketches/${id}/comments/${pinned.body.id}`, { resolved: false })
    expect(reopened.body).toMatchObject({ resolved: false, resolvedBy: null })
    const list = await owner.get(`/api/sketches/${id}/comments`)
    expect(list.body.comments.map((c: any) => [c.body, c.parentId === pinned.body.id])).toEqual([
      ['<b>Check</b> this weld & <script>x</script>', false], ['On the whole sketch', false], ['Done', true],
    ])
  })
})

describe('read-only links', () => {
  it('a link has a token of at least 128 bits, shows its revision without account data, and is 404 once revoked or expired', async () => {
    const id = await sketch('Linked', plateDoc(200, 10))
    expect((await owner.post(`/api/sketches/${id}/links`, {})).status).toBe(409) // no revision yet
    await owner.post(`/api/sketches/${id}/revisions`, { note: 'For the fabricator' })
    await owner.patch(`/api/sketches/${id}`, { version: 1, document: plateDoc(400, 10) })
    const made = await owner.post(`/api/sketches/${id}/links`, {})
    expect(made.status).toBe(201)
    const token = String(made.body.url).split('/l/')[1]!
    // base64url: 6 bits a character; 22 characters would already be 132 bits.
    expect(token.length * 6).toBeGreaterThanOrEqual(128)
    const page = await anon().get(`/api/links/${token}`)
    expect(page.status).toBe(200)
    expect(page.body.revision.number).toBe(1)
    // The revision it was made for (200 wide), not the later working state (400 wide).
    expect(page.body.document.parts[0].outline[1]).toEqual([200, 0])
    expect(page.body.analysis.properties.area).toBeCloseTo(2000, 6) // 200 × 10
    for (const secret of ['owner@team.test', 'Otto Owner', id]) expect(page.text).not.toContain(secret)
    const svg = await fetch(`${server.url}/api/links/${token}/drawing.svg`)
    expect(svg.headers.get('content-type')).toMatch(/image\/svg\+xml/)
    expect((await owner.delete(`/api/sketches/${id}/links/${made.body.id}`)).status).toBe(200)
    expect((await anon().get(`/api/links/${token}`)).status).toBe(404)
    const listed = await owner.get(`/api/sketches/${id}/links`)
    expect(listed.body.links[0]).toMatchObject({ live: false, revision: 1 })
  })

  it('an expiring link works until then and is 404 after; a past or too distant expiry is 400', async () => {
    const id = await sketch('Expiring')
    await owner.post(`/api/sketches/${id}/revisions`, {})
    expect((await owner.post(`/api/sketches/${id}/links`, { expiresAt: '2001-01-01T00:00:00Z' })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/links`, { expiresAt: new Date(Date.now() + 400 * 86_400_000).toISOString() })).status).toBe(400)
    expect((await owner.post(`/api/sketches/${id}/links`, { expiresAt: 'tomorrow' })).status).toBe(400)
    const made = await owner.post(`/api/sketches/${id}/links`, { expiresAt: new Date(Date.now() + 1200).toISOString() })
    const token = String(made.body.url).split('/l/')[1]!
    expect((await anon().get(`/api/links/${token}`)).status).toBe(200)
    await pause(1400)
    expect((await anon().get(`/api/links/${token}`)).status).toBe(404)
    expect((await anon().get('/api/links/not-a-real-token-at-all-000000')).status).toBe(404)
  })
})

describe('activity', () => {
  it('keeps who did what: created, shared, revision, comment, link made and revoked', async () => {
    const id = await sketch('Watched')
    await owner.post(`/api/sketches/${id}/shares`, { email: 'checker@team.test', access: 'comment' })
    await owner.post(`/api/sketches/${id}/revisions`, { note: 'R1' })
    await checker.post(`/api/sketches/${id}/comments`, { body: 'Seen' })
    const link = await owner.post(`/api/sketches/${id}/links`, {})
    await owner.delete(`/api/sketches/${id}/links/${link.body.id}`)
    const a = await checker.get(`/api/sketches/${id}/activity`)
    expect(a.status).toBe(200)
    expect(a.body.activity.map((x: any) => [x.action, x.actor]).reverse()).toEqual([
      ['created', 'Otto Owner'], ['shared', 'Otto Owner'], ['revision', 'Otto Owner'], ['comment', 'Chen Checker'], ['link made', 'Otto Owner'], ['link revoked', 'Otto Owner'],
    ])
  })
})

import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'
import { account, plateDoc, setRole } from './support/team'

const server = useTestServer()
let admin: Client
let owner: Client
let checker: Client
let other: Client
let engineer: Client

beforeAll(async () => {
  admin = await account(server, 'admin@review.test', 'Rae Admin')
  owner = await account(server, 'owner@review.test', 'Ode Owner')
  checker = await account(server, 'checker@review.test', 'Cai Checker')
  other = await account(server, 'other@review.test', 'Oli Otherchecker')
  engineer = await account(server, 'engineer@review.test', 'Eve Engineer')
  await setRole(admin, 'checker@review.test', 'checker')
  await setRole(admin, 'other@review.test', 'checker')
})

async function withRevision(title: string): Promise<string> {
  const id = (await owner.post('/api/sketches', { title, document: plateDoc() })).body.id
  expect((await owner.post(`/api/sketches/${id}/revisions`, { note: 'For check' })).status).toBe(201)
  return id
}

const submit = (id: string, revision = 1, to = 'checker@review.test') => owner.post(`/api/sketches/${id}/review`, { revision, checker: to })

describe('check and approval', () => {
  it('submit → return with a comment → new revision → submit → approve: the approved revision names who and when', async () => {
    const id = await withRevision('Full round')
    const s = await submit(id)
    expect(s.status).toBe(201)
    // The checker got comment access with the request and a mail.
    const seen = await checker.get(`/api/sketches/${id}`)
    expect(seen.body).toMatchObject({ status: 'submitted', access: 'comment', reviewRevision: 1, isChecker: true })
    const mails = ((await admin.get('/api/outbox')).body as any[]).filter(m => m.to === 'checker@review.test' && m.kind === 'review-request')
    expect(mails).toHaveLength(1)
    expect(mails[0].text).toContain(`/sketches/${id}`)
    const back = await checker.post(`/api/sketches/${id}/review/return`, { comment: 'Add the crane case' })
    expect(back.status).toBe(200)
    expect((await owner.get(`/api/sketches/${id}`)).body.status).toBe('returned')
    expect((await owner.get('/api/sketches')).body.counts.returned).toBe(1)
    const comments = (await owner.get(`/api/sketches/${id}/comments`)).body.comments
    expect(comments.map((c: any) => c.body)).toEqual(['Returned revision 1: Add the crane case'])
    await owner.patch(`/api/sketches/${id}`, { version: 1, title: 'Full round, answered' })
    expect((await owner.post(`/api/sketches/${id}/revisions`, { note: 'Answered' })).body.number).toBe(2)
    expect((await submit(id, 2)).status).toBe(201)
    // The approval time is the moment of the approval: between the request going out and its answer
    // (the database keeps whole seconds on some engines, so the lower bound is the second before).
    const asked = Math.floor(Date.now() / 1000) * 1000
    const ok = await checker.post(`/api/sketches/${id}/review/approve`)
    const answered = Date.now()
    expect(ok.status).toBe(200)
    const got = await owner.get(`/api/sketches/${id}`)
    expect(got.body).toMatchObject({ status: 'approved', approvedBy: 'Cai Checker' })
    expect(Date.parse(got.body.approvedAt)).toBeGreaterThanOrEqual(asked)
    expect(Date.parse(got.body.approvedAt)).toBeLessThanOrEqual(answered)
    const revisions = (await owner.get(`/api/sketches/${id}/revisions`)).body.revisions
    expect(revisions.map((r: any) => [r.number, r.status, r.approvedBy])).toEqual([[2, 'approved', 'Cai Checker'], [1, 'returned', null]])
    const outcome = ((await admin.get('/api/outbox')).body as any[]).filter(m => m.to === 'owner@review.test').map(m => m.kind)
    expect(outcome).toEqual(['review-approved', 'review-returned'])
  })

  it('a later edit starts a new working state as a draft while the approved revision stays approved and unchanged', async () => {
    const id = await withRevision('Edited after approval')
    await submit(id)
    await checker.post(`/api/sketches/${id}/review/approve`)
    const edited = await owner.patch(`/api/sketches/${id}`, { version: 1, document: plateDoc(500, 30) })
    expect(edited.status).toBe(200)
    expect(edited.body).toMatchObject({ status: 'draft', approvedBy: null, approvedRevision: { number: 1, approvedBy: 'Cai Checker' } })
    const rev = await owner.get(`/api/sketches/${id}/revisions/1`)
    expect(rev.body.status).toBe('approved')
  })

  it('a rename, or a save of the same drawing, keeps an approved sketch approved', async () => {
    const id = await withRevision('Renamed after approval')
    await submit(id)
    await checker.post(`/api/sketches/${id}/review/approve`)
    const renamed = await owner.patch(`/api/sketches/${id}`, { version: 1, title: 'Renamed, same drawing', document: plateDoc() })
    expect(renamed.status).toBe(200)
    expect(renamed.body).toMatchObject({ status: 'approved', approvedBy: 'Cai Checker' })
  })

  it('the approved revision keeps its document after a later edit', async () => {
    const id = await withRevision('Edited twice after approval')
    await submit(id)
    await checker.post(`/api/sketches/${id}/review/approve`)
    await owner.patch(`/api/sketches/${id}`, { version: 1, document: plateDoc(500, 30) })
    const rev = await owner.get(`/api/sketches/${id}/revisions/1`)
    expect(rev.body).toMatchObject({ status: 'approved', approvedBy: 'Cai Checker' })
    expect(rev.body.document.parts[0].outline).toEqual(plateDoc().parts[0]!.outline)
  })

  describe('every transition that makes no sense is refused with 409 and a message, and changes nothing', () => {
    it('approving or returning a draft', async () => {
      const id = await withRevision('Draft only')
      await owner.post(`/api/sketches/${id}/shares`, { email: 'checker@review.test', access: 'comment' })
      for (const verb of ['approve', 'return']) {
        const r = await checker.post(`/api/sketches/${id}/review/${verb}`, { comment: 'x' })
        expect(r.status).toBe(409)
        expect(r.body.message).toMatch(/draft that was not submitted/)
      }
      expect((await owner.get(`/api/sketches/${id}`)).body.status).toBe('draft')
    })

    it('approving or returning one’s own sketch', async () => {
      const id = await withRevision('Own')
      await submit(id)
      for (const verb of ['approve', 'return']) {
        const r = await owner.post(`/api/sketches/${id}/review/${verb}`, { comment: 'x' })
        expect(r.status).toBe(409)
        expect(r.body.message).toMatch(/your own sketch/)
      }
      expect((await owner.get(`/api/sketches/${id}`)).body.status).toBe('submitted')
    })

    it('submitting to oneself, to an account that does not check, or while one is waiting', async () => {
      const id = await withRevision('Odd submissions')
      expect((await submit(id, 1, 'owner@review.test')).status).toBe(409)
      const toEngineer = await submit(id, 1, 'engineer@review.test')
      expect(toEngineer.status).toBe(409)
      expect(toEngineer.body.message).toMatch(/only checkers and admins/)
      expect((await submit(id, 1, 'nobody@review.test')).status).toBe(422)
      expect((await submit(id, 5)).status).toBe(404)
      expect((await owner.post(`/api/sketches/${id}/review`, { revision: 'one', checker: 'checker@review.test' })).status).toBe(400)
      expect((await owner.get(`/api/sketches/${id}`)).body.status).toBe('draft')
      expect((await submit(id)).status).toBe(201)
      const again = await submit(id)
      expect(again.status).toBe(409)
      expect(again.body.message).toMatch(/already waiting/)
    })

    it('approving twice, returning an approved sketch, submitting an approved revision, editing an approved revision', async () => {
      const id = await withRevision('Approved once')
      await submit(id)
      expect((await checker.post(`/api/sketches/${id}/review/approve`)).status).toBe(200)
      const twice = await checker.post(`/api/sketches/${id}/review/approve`)
      expect(twice.status).toBe(409)
      expect(twice.body.message).toMatch(/approved already/)
      expect((await checker.post(`/api/sketches/${id}/review/return`, { comment: 'late' })).status).toBe(409)
      const resubmit = await submit(id)
      expect(resubmit.status).toBe(409)
      expect(resubmit.body.message).toMatch(/approved already/)
      const note = await owner.patch(`/api/sketches/${id}/revisions/1`, { note: 'Rewritten' })
      expect(note.status).toBe(409)
      expect(note.body.message).toMatch(/approved and locked/)
      expect((await owner.get(`/api/sketches/${id}/revisions/1`)).body).toMatchObject({ note: 'For check', status: 'approved' })
    })

    it('changing the note of a revision under check; returning a returned sketch', async () => {
      const id = await withRevision('Under check')
      await submit(id)
      expect((await owner.patch(`/api/sketches/${id}/revisions/1`, { note: 'Sneaky' })).status).toBe(409)
      await checker.post(`/api/sketches/${id}/review/return`, { comment: 'No' })
      const again = await checker.post(`/api/sketches/${id}/review/return`, { comment: 'No again' })
      expect(again.status).toBe(409)
      expect(again.body.message).toMatch(/returned and not submitted again/)
      // A returned revision's note may be corrected (it is not approved).
      expect((await owner.patch(`/api/sketches/${id}/revisions/1`, { note: 'Corrected' })).status).toBe(200)
    })

    it('a checker other than the named one cannot decide (403); a return needs a comment (400)', async () => {
      const id = await withRevision('Named checker')
      await owner.post(`/api/sketches/${id}/shares`, { email: 'other@review.test', access: 'comment' })
      await submit(id)
      expect((await other.post(`/api/sketches/${id}/review/approve`)).status).toBe(403)
      expect((await engineer.post(`/api/sketches/${id}/review/approve`)).status).toBe(404)
      expect((await checker.post(`/api/sketches/${id}/review/return`, { comment: '  ' })).status).toBe(400)
      expect((await owner.get(`/api/sketches/${id}`)).body.status).toBe('submitted')
    })
  })
})

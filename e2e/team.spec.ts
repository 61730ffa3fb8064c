import { expect, test, type Browser, type Page } from '@playwright/test'
import { canvasTransform, open, ORIGIN, SAME_ORIGIN, shot, signIn } from './support/helpers'

// Team work across browser contexts: each context is its own browser profile (own cookies), so
// the engineer, the checker and the link's reader are three separate people.

const plate = {
  schema: 'kernwise.sketch/2',
  parts: [{ id: 'p1', name: 'Plate', outline: [[0, 0], [300, 0], [300, 20], [0, 20]], holes: [], material: { name: 'Steel', E: 200000 }, shape: null }],
  cases: [{ id: 'dead', name: 'Dead', Mx: 0, My: 0 }],
  combinations: [],
  loads: [{ id: 'l1', name: 'Column', caseId: 'dead', P: 100000, x: 150, y: 10 }],
  settings: {},
}

async function person(browser: Browser, email: string | null): Promise<Page> {
  const context = await browser.newContext()
  const page = await context.newPage()
  if (email) await signIn(page, email)
  return page
}

async function openTeam(page: Page, tab: string): Promise<void> {
  if (!(await page.getByTestId('team-drawer').isVisible())) await page.getByTestId('open-team').click()
  await page.getByTestId(`team-tab-${tab}`).click()
}

test('engineer shares and submits; the checker pins a comment and returns it; the engineer answers and resubmits; the checker approves; a read-only link opens without signing in', async ({ browser }) => {
  const engineer = await person(browser, 'engineer@millrace.test')
  const made = await engineer.request.post('/api/sketches', { data: { title: `Team flow plate ${Date.now()}`, project: 'Millrace', document: plate }, headers: SAME_ORIGIN })
  expect(made.status()).toBe(201)
  const { id, title } = await made.json() as { id: string; title: string }

  // The engineer shares with the checker and submits revision 1.
  await open(engineer, `/sketches/${id}`)
  await openTeam(engineer, 'share')
  await engineer.getByTestId('share-email').fill('checker@millrace.test')
  await engineer.getByTestId('share-access').selectOption('comment')
  await engineer.getByTestId('share-send').click()
  await expect(engineer.getByTestId('share-list')).toContainText('checker@millrace.test')
  await openTeam(engineer, 'revisions')
  await engineer.getByTestId('revision-note').fill('For check')
  await engineer.getByTestId('revision-make').click()
  await expect(engineer.getByTestId('revision-row')).toHaveCount(1)
  await openTeam(engineer, 'review')
  await engineer.getByTestId('review-checker').fill('checker@millrace.test')
  await engineer.getByTestId('review-submit').click()
  await expect(engineer.getByTestId('sketch-status')).toHaveText(/submitted/)
  await shot(engineer, 'team-1-engineer-submitted')

  // The checker finds it under "To check", opens it read-only and pins a comment on the plate.
  const checker = await person(browser, 'checker@millrace.test')
  await expect(checker.getByTestId('dash-to-check')).toContainText(title)
  await shot(checker, 'team-2-checker-dashboard')
  await checker.getByTestId('dash-to-check').getByRole('link', { name: title }).click()
  await expect(checker.getByTestId('read-only')).toContainText('can comment')
  await openTeam(checker, 'comments')
  await checker.getByTestId('comment-pin').click()
  const at = await canvasTransform(checker)
  const p = at(60, 10)
  await checker.mouse.click(p.x, p.y)
  await expect(checker.getByTestId('comment-pinned-at')).toContainText('mm')
  await checker.getByTestId('comment-body').fill('Weld <b>size</b>? Show it on the drawing.')
  await checker.getByTestId('comment-add').click()
  const thread = checker.getByTestId('comment-thread').first()
  // Text stays text: the tags are shown, not applied.
  await expect(thread.getByTestId('comment-text')).toHaveText('Weld <b>size</b>? Show it on the drawing.')
  await expect(thread.getByLabel('Marker 1')).toBeVisible()
  // The pin is where the click was, in section coordinates (within a few mm of the click's point).
  const listed = await (await checker.request.get(`/api/sketches/${id}/comments`)).json() as { comments: { at: { x: number; y: number } | null }[] }
  expect(Math.abs(listed.comments[0]!.at!.x - 60)).toBeLessThan(3)
  expect(Math.abs(listed.comments[0]!.at!.y - 10)).toBeLessThan(3)
  await shot(checker, 'team-3-checker-comment-pinned')
  // A click on the marker on the drawing focuses its thread in the list.
  await expect(thread).toHaveAttribute('data-focused', 'false')
  const m = (await canvasTransform(checker))(listed.comments[0]!.at!.x, listed.comments[0]!.at!.y)
  await checker.mouse.click(m.x, m.y)
  await expect(thread).toHaveAttribute('data-focused', 'true')
  await openTeam(checker, 'review')
  await checker.getByTestId('review-return-comment').fill('Show the weld size, then resubmit.')
  await checker.getByTestId('review-return').click()
  await expect(checker.getByTestId('sketch-status')).toHaveText(/returned/)

  // The engineer answers the comment, makes revision 2 and submits it again.
  await engineer.reload()
  await expect(engineer.getByTestId('sketch-status')).toHaveText(/returned/)
  await openTeam(engineer, 'comments')
  const pinned = engineer.getByTestId('comment-thread').filter({ hasText: 'Show it on the drawing' })
  await pinned.getByTestId('comment-reply-body').fill('8 mm fillet, both sides.')
  await pinned.getByTestId('comment-reply-send').click()
  await expect(pinned.getByTestId('comment-reply')).toContainText('8 mm fillet')
  await shot(engineer, 'team-4-engineer-answers')
  await openTeam(engineer, 'revisions')
  await engineer.getByTestId('revision-note').fill('Weld size shown')
  await engineer.getByTestId('revision-make').click()
  await expect(engineer.getByTestId('revision-row')).toHaveCount(2)
  await openTeam(engineer, 'review')
  await expect(engineer.getByTestId('review-revision')).toHaveValue('2')
  await engineer.getByTestId('review-submit').click()
  await expect(engineer.getByTestId('sketch-status')).toHaveText(/submitted/)

  // The checker approves.
  await checker.reload()
  await openTeam(checker, 'review')
  await checker.getByTestId('review-approve').click()
  await expect(checker.getByTestId('sketch-status')).toHaveText(/approved/)

  // The engineer sees the approved badge with the checker's name.
  await engineer.reload()
  await expect(engineer.getByTestId('sketch-status')).toHaveText(/approved/)
  await expect(engineer.getByTestId('sketch-status')).toHaveAttribute('title', /Approved by Cora Vint/)
  await openTeam(engineer, 'revisions')
  await expect(engineer.getByTestId('revision-row').first()).toContainText('Approved by Cora Vint')
  await shot(engineer, 'team-5-engineer-approved')
  // Compare the two revisions: outlines over each other and the property table (the same plate: no change).
  for (const row of await engineer.getByTestId('revision-row').all()) await row.getByRole('checkbox').check()
  await engineer.getByTestId('revision-compare').click()
  await expect(engineer.getByTestId('compare-table').locator('tr[data-key="area"]')).toContainText('6000')
  await shot(engineer, 'team-5b-compare')

  // A read-only link, opened by someone who is not signed in.
  await openTeam(engineer, 'share')
  await engineer.getByTestId('link-make').click()
  const url = (await engineer.getByTestId('link-url').textContent())!.trim()
  expect(url.startsWith(`${ORIGIN}/l/`)).toBe(true)
  const outsider = await person(browser, null)
  await outsider.goto(url)
  await expect(outsider.getByTestId('link-title')).toHaveText(title)
  await expect(outsider.getByTestId('link-revision')).toHaveText('Revision 2')
  await expect(outsider.getByTestId('link-status')).toContainText('approved')
  await expect(outsider.getByTestId('link-drawing')).toBeVisible()
  await expect(outsider.getByTestId('link-properties')).toContainText('Area A6000mm²') // 300 × 20 mm plate (closed form)
  await expect(outsider.locator('body')).not.toContainText('Eli Brandt')
  await expect(outsider.locator('body')).not.toContainText('engineer@millrace.test')
  await shot(outsider, 'team-6-read-only-link')
  // Activity shows the whole story.
  await openTeam(engineer, 'activity')
  await expect(engineer.getByTestId('team-activity')).toContainText('approved')
  await expect(engineer.getByTestId('team-activity')).toContainText('link made')
  await shot(engineer, 'team-7-activity')
})

test('an invitation mail arrives through the local SMTP server and its link registers the invited person, who finds the shared sketch', async ({ browser }) => {
  const engineer = await person(browser, 'engineer@millrace.test')
  const made = await engineer.request.post('/api/sketches', { data: { title: `Invited plate ${Date.now()}`, document: plate }, headers: SAME_ORIGIN })
  const { id, title } = await made.json() as { id: string; title: string }
  const address = `new${Date.now() % 1_000_000}@millrace.test`
  const shared = await engineer.request.post(`/api/sketches/${id}/shares`, { data: { email: address, access: 'view' }, headers: SAME_ORIGIN })
  expect((await shared.json()).invited).toBe(true)

  const admin = await person(browser, 'admin@millrace.test')
  await open(admin, '/outbox')
  await admin.getByTestId('outbox-row').filter({ hasText: address }).first().click()
  await expect(admin.getByTestId('outbox-html')).toBeVisible()
  await shot(admin, 'team-8-outbox')
  const mails = await (await admin.request.get('/api/outbox')).json() as { to: string; text: string; received: boolean }[]
  const mail = mails.find(m => m.to === address)!
  expect(mail.received).toBe(true)
  const link = /(http:\/\/\S+\/register\?invitation=\S+)/.exec(mail.text)![1]!

  const newcomer = await person(browser, null)
  await open(newcomer, link.replace(ORIGIN, ''))
  await expect(newcomer.getByTestId('register-invited')).toBeVisible()
  await expect(newcomer.getByLabel('E-mail')).toHaveValue(address)
  await newcomer.getByLabel('Name').fill('Nell Newcomer')
  await newcomer.getByLabel('Password').fill('a-long-enough-password')
  await shot(newcomer, 'team-9-register-invited')
  await newcomer.getByRole('button', { name: /Create/ }).click()
  await expect(newcomer.getByTestId('dash-shared')).toContainText(title)
  await newcomer.getByTestId('dash-shared').getByRole('link', { name: title }).click()
  await expect(newcomer.getByTestId('read-only')).toContainText('can view')
  await expect(newcomer.getByTestId('open-import')).toHaveCount(0)
  await shot(newcomer, 'team-10-read-only-editor')
})

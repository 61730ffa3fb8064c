import { createHash, randomBytes } from 'node:crypto'
import type { Transaction } from 'sequelize'
import type { Db, Sketch } from '../models'
import { teamMail } from '../utils/team-mail'

/** The demo workspace's name (mails, the calculation sheet). */
export const DEMO_WORKSPACE = 'Millrace Yard retrofit'

/** Where demo mails point: KERNWISE_ORIGIN, else the local server npm start serves. */
function demoOrigin(): string {
  return process.env.KERNWISE_ORIGIN || `http://127.0.0.1:${process.env.PORT || 3000}`
}

/**
 * The team side of the demo: Mezzanine post M1 submitted to the checker with two comments (one
 * answered), Crane column C3 with revision 1 approved and a read-only link for the fabricator,
 * Canopy strut S5 shared with the viewer, and the mails those steps sent in the outbox.
 * `ids` maps roles to account ids; `sketches` maps titles to the freshly made demo sketches.
 */
export async function seedDemoTeam(db: Db, ids: Record<string, string>, sketches: Map<string, Sketch>, emails: Record<string, string>, transaction: Transaction): Promise<void> {
  const engineer = ids.engineer!
  const checker = ids.checker!
  const at = (minutesAgo: number) => new Date(Date.now() - minutesAgo * 60_000)
  const t = { transaction }
  await db.Setting.upsert({ key: 'workspaceName', value: JSON.stringify(DEMO_WORKSPACE) }, t)
  await db.OutboxMail.destroy({ where: { to: Object.values(emails), kind: ['share', 'review-request', 'review-approved', 'review-returned', 'invitation'] }, ...t })
  const mail = async (kind: string, to: string, subject: string, paragraphs: string[], sketch: Sketch, createdAt: Date) => {
    const parts = teamMail({ workspace: DEMO_WORKSPACE, heading: subject, paragraphs, link: `${demoOrigin()}/sketches/${sketch.id}`, linkLabel: `Open “${sketch.title}”` })
    await db.OutboxMail.create({ kind, to, subject: `${subject} (${DEMO_WORKSPACE})`, ...parts, sentAt: null, error: null, createdAt }, t)
  }
  const activity = (sketchId: string, actorId: string, action: string, detail: string, createdAt: Date) =>
    db.Activity.create({ sketchId, actorId, action, detail, createdAt }, t)

  const m1 = sketches.get('Mezzanine post M1')!
  await db.Revision.create({ sketchId: m1.id, number: 1, note: 'For check: net section at the bolt line', title: m1.title, document: m1.document, status: 'submitted', createdBy: engineer, checkerId: checker, createdAt: at(180) }, t)
  await db.Share.create({ sketchId: m1.id, email: emails.checker!, access: 'comment', createdBy: engineer }, t)
  await m1.update({ status: 'submitted', checkerId: checker, reviewRevision: 1 }, { ...t, silent: true })
  const pinned = await db.Comment.create({ sketchId: m1.id, parentId: null, authorId: checker, body: 'Confirm the 22 mm holes are drilled, not punched', x: -112.5, y: 105, createdAt: at(120) }, t)
  await db.Comment.create({ sketchId: m1.id, parentId: pinned.id, authorId: engineer, body: 'Drilled: the fabricator confirmed it for all four holes.', x: null, y: null, createdAt: at(90) }, t)
  await db.Comment.create({ sketchId: m1.id, parentId: null, authorId: checker, body: 'Add the second load case for the crane bracket side', x: null, y: null, createdAt: at(110) }, t)
  await activity(m1.id, engineer, 'created', '', at(300))
  await activity(m1.id, engineer, 'revision', 'revision 1: For check: net section at the bolt line', at(180))
  await activity(m1.id, engineer, 'submitted', 'revision 1 to Cora Vint (checker)', at(179))
  await activity(m1.id, checker, 'comment', 'Confirm the 22 mm holes are drilled, not punched', at(120))
  await activity(m1.id, checker, 'comment', 'Add the second load case for the crane bracket side', at(110))
  await activity(m1.id, engineer, 'comment', 'Drilled: the fabricator confirmed it for all four holes.', at(90))
  await mail('review-request', emails.checker!, `Eli Brandt (engineer) asks you to check “${m1.title}”, revision 1`, [`Revision 1 (“For check: net section at the bolt line”) of “${m1.title}” in Millrace Yard retrofit waits for your check.`], m1, at(179))

  const c3 = sketches.get('Crane column C3')!
  const approvedAt = at(240)
  await db.Revision.create({ sketchId: c3.id, number: 1, note: 'Issued for fabrication', title: c3.title, document: c3.document, status: 'approved', createdBy: engineer, checkerId: checker, approvedBy: checker, approvedAt, createdAt: at(360) }, t)
  await db.Share.create({ sketchId: c3.id, email: emails.checker!, access: 'comment', createdBy: engineer }, t)
  await c3.update({ status: 'approved', checkerId: checker, reviewRevision: 1 }, { ...t, silent: true })
  // The token of the demo's read-only link is not kept (only its hash), as for every link.
  const tokenHash = createHash('sha256').update(randomBytes(32).toString('base64url')).digest('hex')
  await db.Link.create({ sketchId: c3.id, tokenHash, revision: 1, expiresAt: null, createdBy: engineer, createdAt: at(230) }, t)
  await activity(c3.id, engineer, 'created', '', at(420))
  await activity(c3.id, engineer, 'revision', 'revision 1: Issued for fabrication', at(360))
  await activity(c3.id, engineer, 'submitted', 'revision 1 to Cora Vint (checker)', at(359))
  await activity(c3.id, checker, 'approved', 'revision 1', approvedAt)
  await activity(c3.id, engineer, 'link made', 'revision 1', at(230))
  await mail('review-approved', emails.engineer!, `Cora Vint (checker) approved “${c3.title}”, revision 1`, ['Revision 1 is approved and locked. A later edit starts a new working state as a draft; the approved revision stays as it is.'], c3, approvedAt)

  const s5 = sketches.get('Canopy strut S5')!
  await db.Share.create({ sketchId: s5.id, email: emails.viewer!, access: 'view', createdBy: engineer }, t)
  await activity(s5.id, engineer, 'created', '', at(200))
  await activity(s5.id, engineer, 'shared', `${emails.viewer}: view`, at(60))
  await mail('share', emails.viewer!, `Eli Brandt (engineer) shared “${s5.title}” with you`, [`You can read “${s5.title}” (Millrace Yard retrofit).`], s5, at(60))
}

/**
 * What the workspace sent (admin only), newest first: recipient, subject, the plain-text part and
 * when. With the local SMTP server, `text` and `html` are what that server received and parsed
 * (`received`); otherwise what was handed to SMTP. `sentAt` or `error` tell how delivery went.
 */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  const db = await useDb()
  const mails = await db.OutboxMail.findAll({ order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: 500 })
  const received = mails.length ? await db.MailboxMail.findAll({ where: { outboxId: mails.map(m => m.id) } }) : []
  const byOutbox = new Map(received.map(r => [r.outboxId, r]))
  return mails.map((m) => {
    const got = byOutbox.get(m.id)
    return {
      id: m.id,
      kind: m.kind,
      to: m.to,
      subject: got?.subject || m.subject,
      text: got?.text ?? m.text,
      html: got?.html ?? m.html ?? null,
      createdAt: m.createdAt.toISOString(),
      sentAt: m.sentAt ? m.sentAt.toISOString() : null,
      error: m.error,
      received: !!got,
    }
  })
})

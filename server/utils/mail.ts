import nodemailer, { type Transporter } from 'nodemailer'

/** One mail to send: plain text, to one address; `kind` names what it is for in the outbox. */
export interface OutgoingMail {
  kind: string
  to: string
  subject: string
  text: string
}

let transport: Transporter | null | undefined

/** The SMTP transport from runtime config `smtpUrl` (NUXT_SMTP_URL), or null when none is set. */
function smtp(): Transporter | null {
  if (transport !== undefined) return transport
  const url = String(useRuntimeConfig().smtpUrl || '')
  transport = url ? nodemailer.createTransport(url) : null
  return transport
}

/**
 * Sends a mail the one way the app sends mail: it is recorded in the outbox table first, then
 * handed to SMTP when NUXT_SMTP_URL is set (the outbox row gets `sentAt`, or the error). Without
 * SMTP (the default) the outbox is where it stays, for an admin to read from the database.
 * Never throws for a delivery failure: the caller's action has happened; the failure is logged.
 */
export async function sendMail(mail: OutgoingMail): Promise<{ id: string; sent: boolean }> {
  const db = await useDb()
  const row = await db.OutboxMail.create({ kind: mail.kind, to: mail.to, subject: mail.subject.slice(0, 200), text: mail.text })
  const t = smtp()
  if (!t) return { id: row.id, sent: false }
  try {
    await t.sendMail({ from: String(useRuntimeConfig().mailFrom), to: mail.to, subject: mail.subject, text: mail.text })
    await row.update({ sentAt: new Date() })
    return { id: row.id, sent: true }
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error)
    console.error(`[kernwise] mail ${row.id} (${mail.kind}) to ${mail.to} was not delivered: ${message}`)
    await row.update({ error: message.slice(0, 500) })
    return { id: row.id, sent: false }
  }
}

import nodemailer, { type Transporter } from 'nodemailer'
import { OUTBOX_HEADER, startFakeSmtp } from './fake-smtp'

/** One mail to send, to one address, with a plain-text and (optionally) an HTML part; `kind` names what it is for in the outbox. */
export interface OutgoingMail {
  kind: string
  to: string
  subject: string
  text: string
  html?: string
}

let transport: Promise<Transporter> | undefined

/**
 * The SMTP transport: runtime config `smtpUrl` (NUXT_SMTP_URL) when set, else the local SMTP
 * server on loopback (server/utils/fake-smtp.ts), so mail always goes through SMTP and real
 * delivery is only a configuration change.
 */
function smtp(): Promise<Transporter> {
  transport ??= (async () => {
    const url = String(useRuntimeConfig().smtpUrl || '')
    if (url) return nodemailer.createTransport(url)
    const port = await startFakeSmtp()
    return nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true })
  })()
  transport.catch(() => { transport = undefined })
  return transport
}

/**
 * Sends a mail the one way the app sends mail: it is recorded in the outbox table first, then
 * handed to SMTP (the configured server, or the local one); the outbox row gets `sentAt`, or the
 * error. Never throws for a delivery failure: the caller's action has happened; the failure is
 * logged and kept on the row.
 */
export async function sendMail(mail: OutgoingMail): Promise<{ id: string; sent: boolean }> {
  const db = await useDb()
  const row = await db.OutboxMail.create({ kind: mail.kind, to: mail.to, subject: mail.subject.slice(0, 200), text: mail.text, html: mail.html ?? null })
  try {
    const t = await smtp()
    await t.sendMail({
      from: String(useRuntimeConfig().mailFrom),
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      ...(mail.html ? { html: mail.html } : {}),
      headers: { [OUTBOX_HEADER]: row.id },
    })
    await row.update({ sentAt: new Date() })
    return { id: row.id, sent: true }
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error)
    console.error(`[kernwise] mail ${row.id} (${mail.kind}) to ${mail.to} was not delivered: ${message}`)
    await row.update({ error: message.slice(0, 500) })
    return { id: row.id, sent: false }
  }
}

import type { AddressInfo } from 'node:net'
import { simpleParser, type AddressObject } from 'mailparser'
import { SMTPServer } from 'smtp-server'

/** The header that names the outbox row a mail came from, so the received copy can be matched to it. */
export const OUTBOX_HEADER = 'x-kernwise-outbox'

let started: Promise<number> | null = null

/**
 * A local SMTP server on loopback for a workspace without NUXT_SMTP_URL: every mail the app sends
 * goes through real SMTP (nodemailer → smtp-server), is parsed with mailparser and kept in the
 * `mailbox` table, where the admin's Outbox page reads it. Nothing leaves the machine. Started
 * once, on a free port; resolves to that port.
 */
export function startFakeSmtp(): Promise<number> {
  started ??= new Promise<number>((resolve, reject) => {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      banner: 'Kernwise local mail (nothing is delivered beyond this machine)',
      size: 2 * 1024 * 1024,
      logger: false,
      onData(stream, _session, callback) {
        simpleParser(stream)
          .then(async (mail) => {
            const db = await useDb()
            const outboxId = String(mail.headers.get(OUTBOX_HEADER) ?? '') || null
            await db.MailboxMail.create({
              outboxId,
              from: addresses(mail.from).slice(0, 254),
              to: addresses(mail.to).slice(0, 254),
              subject: (mail.subject ?? '').slice(0, 200),
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : null,
            })
            callback()
          })
          .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))))
      },
    })
    server.on('error', error => console.error('[kernwise] local SMTP server:', error.message))
    server.listen(0, '127.0.0.1', () => {
      const port = (server.server.address() as AddressInfo).port
      console.log(`[kernwise] no NUXT_SMTP_URL: mail goes to the local SMTP server on 127.0.0.1:${port} (read it on the Outbox page)`)
      resolve(port)
    })
    server.server.once('error', reject)
    server.server.unref()
  })
  started.catch(() => { started = null })
  return started
}

function addresses(value: AddressObject | AddressObject[] | undefined): string {
  if (!value) return ''
  return (Array.isArray(value) ? value : [value]).map(a => a.text).join(', ')
}

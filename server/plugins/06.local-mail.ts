import { startFakeSmtp } from '../utils/fake-smtp'

/** Without NUXT_SMTP_URL the local SMTP server starts with the server (not at the first mail), so its port is in the start-up log. */
export default defineNitroPlugin(() => {
  if (String(useRuntimeConfig().smtpUrl || '')) return
  startFakeSmtp().catch(error => console.error('[kernwise] the local SMTP server did not start:', error instanceof Error ? error.message : error))
})

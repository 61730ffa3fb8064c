import { STATUS_CODES } from 'node:http'

/**
 * An error thrown without a statusMessage would go out as "Server Error" whatever its status:
 * give it the standard reason phrase of its own status (404 "Not Found", 401 "Unauthorized").
 * The error hook runs synchronously before the error handler renders the answer.
 */
export default defineNitroPlugin((nitroApp) => {
  nitroApp.hooks.hook('error', (error) => {
    const e = error as { statusCode?: number; statusMessage?: string }
    if (e.statusCode && e.statusCode < 500 && !e.statusMessage) e.statusMessage = STATUS_CODES[e.statusCode] ?? 'Error'
  })
})

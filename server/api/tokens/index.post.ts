import { randomBytes } from 'node:crypto'
import { TokenBody } from '../../../shared/auth/schemas'

/** Makes a personal API token (from a browser session only, never with another token); the token text is in this answer only. */
export default defineEventHandler(async (event) => {
  const user = await requireBrowserSession(event, 'Making an API token')
  const body = await readBodyAs(event, TokenBody)
  const db = await useDb()
  const count = await db.ApiToken.count({ where: { userId: user.id } })
  if (count >= 50) throw createError({ statusCode: 400, message: 'You have 50 tokens already; revoke one you no longer use first.' })
  const token = `kw_${randomBytes(32).toString('base64url')}`
  const expiresAt = body.expiresInDays ? new Date(Date.now() + body.expiresInDays * 86_400_000) : null
  const row = await db.ApiToken.create({ userId: user.id, name: body.name, tokenHash: hashToken(token), prefix: token.slice(0, 10), expiresAt })
  setResponseStatus(event, 201)
  return { id: row.id, name: row.name, prefix: row.prefix, createdAt: row.createdAt, expiresAt: row.expiresAt, token }
})

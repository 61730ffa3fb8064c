import type { H3Event } from 'h3'
import type { User } from '../models'

/** Starts a fresh sealed session for `user` (only the id is trusted later; see requireUser). */
export async function signIn(event: H3Event, user: User) {
  const pub = user.toPublic()
  await replaceUserSession(event, { user: pub, loggedInAt: new Date().toISOString() })
  return pub
}

import type { H3Event } from 'h3'
import { LinkTokenParams } from '../../shared/team/access'
import type { Revision, Sketch } from '../models'

/** The sketch and revision a read-only link token shows; 404 when unknown, revoked, expired or the sketch is deleted. */
export async function resolveLink(event: H3Event): Promise<{ sketch: Sketch; revision: Revision }> {
  const { token } = await paramsAs(event, LinkTokenParams)
  const db = await useDb()
  const link = await db.Link.findOne({ where: { tokenHash: hashToken(token) } })
  const gone = createError({ statusCode: 404, message: 'This link does not work: it was revoked, it expired, or it never existed. Ask whoever sent it for a new one.' })
  if (!link || link.revokedAt || (link.expiresAt && link.expiresAt.getTime() <= Date.now())) throw gone
  const sketch = await db.Sketch.findByPk(link.sketchId)
  if (!sketch || sketch.deletedAt) throw gone
  const revision = await db.Revision.findOne({ where: { sketchId: sketch.id, number: link.revision } })
  if (!revision) throw gone
  setResponseHeaders(event, { 'cache-control': 'private, no-store', 'referrer-policy': 'no-referrer' })
  return { sketch, revision }
}

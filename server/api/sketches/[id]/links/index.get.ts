import { IdParams } from '../../../../../shared/auth/schemas'

/** The read-only links of a sketch (owner or admin), live and past; their tokens are not kept, so not shown. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'manage')
  const db = await useDb()
  const links = await db.Link.findAll({ where: { sketchId: sketch.id }, order: [['createdAt', 'DESC']] })
  const now = Date.now()
  return {
    links: links.map(l => ({
      id: l.id,
      revision: l.revision,
      createdAt: l.createdAt.toISOString(),
      expiresAt: l.expiresAt ? l.expiresAt.toISOString() : null,
      revokedAt: l.revokedAt ? l.revokedAt.toISOString() : null,
      live: !l.revokedAt && (!l.expiresAt || l.expiresAt.getTime() > now),
    })),
  }
})

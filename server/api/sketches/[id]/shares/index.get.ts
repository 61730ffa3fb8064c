import { IdParams } from '../../../../../shared/auth/schemas'
import { cappedAccess } from '../../../../../shared/team/access'

/** Who this sketch is shared with (owner or admin): e-mail, the access given, the access it yields for that account's role, and whether the account exists yet. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'manage')
  const db = await useDb()
  const shares = await db.Share.findAll({ where: { sketchId: sketch.id }, order: [['createdAt', 'ASC']] })
  const users = shares.length ? await db.User.findAll({ where: { email: shares.map(s => s.email) } }) : []
  const byEmail = new Map(users.map(u => [u.email, u]))
  return {
    shares: shares.map((s) => {
      const account = byEmail.get(s.email)
      return {
        id: s.id,
        email: s.email,
        access: s.access,
        name: account?.name ?? null,
        role: account?.role ?? null,
        effective: account ? cappedAccess(s.access, account.role) : null,
        invited: !account,
      }
    }),
  }
})

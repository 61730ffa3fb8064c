import { Op } from 'sequelize'
import type { RegistrationMode } from '../../shared/team/settings'
import type { Invitation } from '../models'

/**
 * The registration mode: the admin's choice, else invitation only once the workspace has an
 * admin (an empty workspace stays open, so its first account, the admin, can register).
 * NUXT_REGISTRATION_DEFAULT=open makes the unset default open (test servers use it).
 */
export async function registrationMode(): Promise<RegistrationMode> {
  const chosen = await readSetting<RegistrationMode | null>('registration', null)
  if (chosen === 'open' || chosen === 'invitation') return chosen
  if (String(useRuntimeConfig().registrationDefault || '') === 'open') return 'open'
  const db = await useDb()
  return (await db.User.count({ where: { role: 'admin' } })) > 0 ? 'invitation' : 'open'
}

/** The live invitation for `email` named by `token`, or null. */
export async function liveInvitation(email: string, token: string | undefined): Promise<Invitation | null> {
  if (!token) return null
  const db = await useDb()
  return db.Invitation.findOne({ where: { tokenHash: hashToken(token), email, acceptedAt: { [Op.is]: null }, expiresAt: { [Op.gt]: new Date() } } })
}

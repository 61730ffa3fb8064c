import { SettingsBody } from '../../../shared/team/settings'

/** Changes the workspace settings (admin only): `workspaceName`, `registration` (open or invitation). */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  const body = await readBodyAs(event, SettingsBody)
  if (body.workspaceName !== undefined) await writeSetting('workspaceName', body.workspaceName)
  if (body.registration !== undefined) await writeSetting('registration', body.registration)
  return { workspaceName: await workspaceName(), registration: await registrationMode() }
})

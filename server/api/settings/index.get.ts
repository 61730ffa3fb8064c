/** The workspace settings (admin only): its name and who may register. */
export default defineEventHandler(async (event) => {
  await requireRole(event, 'manageMembers')
  return { workspaceName: await workspaceName(), registration: await registrationMode() }
})

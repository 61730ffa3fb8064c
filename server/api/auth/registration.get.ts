/** Whether anyone may register here or only invited people (public: the register page asks). */
export default defineEventHandler(async () => {
  return { registration: await registrationMode(), workspaceName: await workspaceName() }
})

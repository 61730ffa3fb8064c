import { can, type Capability } from '#shared/auth/roles'

const PUBLIC = new Set(['/sign-in', '/register', '/forgot-password', '/reset-password'])

/**
 * Sends signed-out visitors to sign-in and keeps pages that need a capability (page meta
 * `capability`) to the roles that hold it. The server checks every request again: this only
 * spares people a page they cannot use.
 */
export default defineNuxtRouteMiddleware(async (to) => {
  // A read-only link (/l/<token>) opens for anyone, signed in or not; the token is the access.
  if (to.path.startsWith('/l/')) return
  const { loggedIn, user, fetch } = useUserSession()
  if (import.meta.client && !loggedIn.value) await fetch()
  if (PUBLIC.has(to.path)) {
    if (loggedIn.value) return navigateTo('/')
    return
  }
  if (!loggedIn.value) return navigateTo({ path: '/sign-in', query: to.fullPath !== '/' ? { next: to.fullPath } : {} })
  const needed = to.meta.capability as Capability | undefined
  if (needed && !can(user.value?.role, needed)) {
    return abortNavigation(createError({ statusCode: 403, message: 'Your role does not give access to this page.' }))
  }
})

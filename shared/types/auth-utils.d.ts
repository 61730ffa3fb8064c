import type { Role } from '../auth/roles'

declare module '#auth-utils' {
  interface User {
    id: string
    email: string
    name: string
    role: Role
  }
  interface UserSession {
    loggedInAt?: string
  }
}

export {}

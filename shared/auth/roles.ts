/** The four roles of a Kernwise workspace, from most to least powerful in practice. */
export const ROLES = ['admin', 'engineer', 'checker', 'viewer'] as const
export type Role = (typeof ROLES)[number]

/** What each role is for, in the product's words (members page, README). */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin: manages members and roles',
  engineer: 'Engineer: creates and edits sketches',
  checker: 'Checker: reviews and approves',
  viewer: 'Viewer: reads what is shared',
}

/** Who may do what. Every server check goes through this table (via requireRole). */
export const CAPABILITIES = {
  manageMembers: ['admin'],
  editSketches: ['admin', 'engineer'],
  reviewSketches: ['admin', 'checker'],
  analyse: ['admin', 'engineer', 'checker', 'viewer'],
} as const satisfies Record<string, readonly Role[]>

export type Capability = keyof typeof CAPABILITIES

/** True when `role` holds `capability`. */
export function can(role: Role | undefined | null, capability: Capability): boolean {
  return !!role && (CAPABILITIES[capability] as readonly Role[]).includes(role)
}

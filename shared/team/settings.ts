import { z } from 'zod'

/** Who may create an account: anyone who opens the register page, or only people holding an invitation. */
export const REGISTRATION_MODES = ['open', 'invitation'] as const
export type RegistrationMode = (typeof REGISTRATION_MODES)[number]

export const SettingsBody = z.object({
  workspaceName: z.string({ error: 'workspaceName must be text' }).trim().min(1, 'Name the workspace').max(120, 'A workspace name has at most 120 characters').optional(),
  registration: z.enum(REGISTRATION_MODES, { error: 'registration is open or invitation' }).optional(),
})

export const InvitationBody = z.object({
  email: z.string({ error: 'Enter an e-mail address' }).trim().toLowerCase().max(254).pipe(z.email({ error: 'Enter a valid e-mail address, such as name@example.com' })),
})

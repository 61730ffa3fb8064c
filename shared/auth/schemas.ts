import { z } from 'zod'
import { ROLES } from './roles'

/** Minimum password length (also shown on the register page). */
export const MIN_PASSWORD = 10

/** E-mail as typed; stored trimmed and lower-cased so one person has one account. */
export const Email = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .max(254, 'An e-mail address has at most 254 characters')
  .pipe(z.email({ error: 'Enter a valid e-mail address, such as name@example.com' }))

/** A new password: 10 to 200 characters. */
export const NewPassword = z
  .string({ error: 'Choose a password' })
  .min(MIN_PASSWORD, `The password is too short: use at least ${MIN_PASSWORD} characters`)
  .max(200, 'The password is too long: use at most 200 characters')

export const RegisterBody = z.object({
  email: Email,
  password: NewPassword,
  name: z.string({ error: 'Enter your name' }).trim().min(1, 'Enter your name').max(120, 'A name has at most 120 characters'),
  /** The token of an invitation link (needed when registration is by invitation only). */
  invitation: z.string({ error: 'The invitation link is incomplete: open it from the mail again' }).max(100, 'The invitation link is incomplete: open it from the mail again').optional(),
})

export const LoginBody = z.object({
  email: Email,
  password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(200),
})

/** Longest token lifetime that can be chosen (days); no expiry is also allowed. */
export const MAX_TOKEN_DAYS = 366

export const TokenBody = z.object({
  name: z.string({ error: 'Name the token' }).trim().min(1, 'Name the token, e.g. "laptop scripts"').max(80, 'A token name has at most 80 characters'),
  /** Days until the token stops working; null or absent: no expiry. */
  expiresInDays: z
    .number({ error: 'expiresInDays must be a whole number of days' })
    .int('expiresInDays must be a whole number of days')
    .min(1, 'A token lives at least 1 day')
    .max(MAX_TOKEN_DAYS, `A token lives at most ${MAX_TOKEN_DAYS} days`)
    .nullish(),
})

export const ResetRequestBody = z.object({ email: Email })

export const ResetBody = z.object({
  token: z.string({ error: 'The reset link is incomplete: open it from the mail again' }).min(20, 'The reset link is incomplete: open it from the mail again').max(100),
  password: NewPassword,
})

export const PasswordChangeBody = z.object({
  currentPassword: z.string({ error: 'Enter your current password' }).min(1, 'Enter your current password').max(200),
  newPassword: NewPassword,
})

export const RoleBody = z.object({
  role: z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(', ')}` }),
})

export const IdParams = z.object({
  id: z.uuid({ error: 'That id is not a valid identifier' }),
})

/** The account as the API shows it. */
export interface PublicUser {
  id: string
  email: string
  name: string
  role: (typeof ROLES)[number]
  createdAt: string
}

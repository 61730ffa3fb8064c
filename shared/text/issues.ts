import type { z } from 'zod'

/** Turns zod issues into one sentence a person can act on: "email: Enter a valid e-mail address". */
export function describeIssues(error: z.ZodError): string {
  return error.issues
    .slice(0, 5)
    .map((issue) => {
      const path = issue.path.map(String).join('.')
      return path ? `${path}: ${issue.message}` : issue.message
    })
    .join('; ')
}

import { z } from 'zod'

/** The browser storage key of one user's workspace: the panel group open, the legend's place. */
export function workspaceKey(userId: string): string {
  return `kw-workspace:${userId}`
}

/** What the editor remembers per user between visits (never sent to the server). */
export const WorkspacePrefsSchema = z.object({
  group: z.string().max(32).default('section'),
  legendCollapsed: z.boolean().default(false),
  /** The legend's offset from the canvas's top right corner, CSS px (right, top). */
  legendAt: z.object({ right: z.number().finite().min(0).max(4000), top: z.number().finite().min(0).max(4000) }).default({ right: 12, top: 12 }),
})
export type WorkspacePrefs = z.output<typeof WorkspacePrefsSchema>

/** Reads stored prefs; anything unreadable (old, edited by hand, another app's) gives the defaults. */
export function readWorkspacePrefs(text: string | null): WorkspacePrefs {
  if (text) {
    try {
      const parsed = WorkspacePrefsSchema.safeParse(JSON.parse(text))
      if (parsed.success) return parsed.data
    } catch { /* not JSON: the defaults */ }
  }
  return WorkspacePrefsSchema.parse({})
}

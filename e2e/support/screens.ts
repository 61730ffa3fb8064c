import { expect, type Page } from '@playwright/test'
import { open, SAME_ORIGIN, signIn } from './helpers'

/** One screen of the app: who looks at it (null: signed out) and how to reach it. */
export interface Screen {
  name: string
  as: string | null
  /** The path, or a function that finds it (a sketch's id) once signed in. */
  path: string | ((page: Page) => Promise<string>)
  /** The editor: wait for its analysis before looking. */
  editor?: boolean
}

async function sketchPath(page: Page, title: string): Promise<string> {
  const res = await page.request.get('/api/sketches')
  const { sketches } = await res.json() as { sketches: { id: string; title: string }[] }
  const s = sketches.find(x => x.title === title)
  if (!s) throw new Error(`no sketch "${title}"`)
  return `/sketches/${s.id}`
}

/** Every screen: the signed-out pages, the dashboard, the editor (loaded, in contact, empty), account, members, errors. */
export const SCREENS: Screen[] = [
  { name: 'sign-in', as: null, path: '/sign-in' },
  { name: 'register', as: null, path: '/register' },
  { name: 'forgot-password', as: null, path: '/forgot-password' },
  { name: 'reset-password', as: null, path: '/reset-password?token=not-a-real-token' },
  { name: 'dashboard', as: 'engineer@millrace.test', path: '/' },
  { name: 'editor', as: 'engineer@millrace.test', path: p => sketchPath(p, 'Crane column C3'), editor: true },
  { name: 'editor-contact', as: 'engineer@millrace.test', path: p => sketchPath(p, 'Brick pier P2'), editor: true },
  {
    name: 'editor-empty', as: 'engineer@millrace.test', editor: true,
    path: async (p) => {
      const res = await p.request.post('/api/sketches', { data: { title: 'Empty for a look', project: '' }, headers: SAME_ORIGIN })
      return `/sketches/${(await res.json() as { id: string }).id}`
    },
  },
  { name: 'sketch-missing', as: 'engineer@millrace.test', path: '/sketches/00000000-0000-4000-8000-000000000000' },
  { name: 'account', as: 'engineer@millrace.test', path: '/account' },
  { name: 'members', as: 'admin@millrace.test', path: '/members' },
  { name: 'not-found', as: 'engineer@millrace.test', path: '/no-such-page' },
]

/** Opens a screen as its user (signing in once per user and page) and waits until it has settled. */
export async function openScreen(page: Page, s: Screen, signedInAs: { who: string | null }): Promise<void> {
  if (s.as !== signedInAs.who) {
    await page.context().clearCookies()
    if (s.as) await signIn(page, s.as)
    signedInAs.who = s.as
  }
  const path = typeof s.path === 'string' ? s.path : await s.path(page)
  await open(page, path)
  if (s.editor) {
    await expect(page.getByTestId('sketch-canvas')).toBeVisible()
    await expect(page.getByTestId('properties-panel')).toHaveAttribute('data-state', /ready|error/)
    // The stress layer paints on the next frame.
    await page.waitForTimeout(300)
  }
}

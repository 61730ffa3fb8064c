import { Client } from './client'
import type { TestServer } from './server'

export const PASSWORD = 'correct-horse-battery'

/** A w × h plate (mm) with its centroid load, as a Kernwise document. */
export function plateDoc(w = 300, h = 20) {
  return {
    schema: 'kernwise.sketch/2',
    parts: [{ id: 'p1', name: 'Plate', outline: [[0, 0], [w, 0], [w, h], [0, h]], holes: [], material: { name: 'Steel', E: 200000 }, shape: null }],
    cases: [{ id: 'dead', name: 'Dead', Mx: 0, My: 0 }],
    combinations: [],
    loads: [{ id: 'l1', name: 'Column', caseId: 'dead', P: 100000, x: w / 2, y: h / 2 }],
    settings: {},
  }
}

/** Registers an account and returns its signed-in client (the first account of a workspace is its admin). */
export async function account(server: TestServer, email: string, name: string): Promise<Client> {
  const c = new Client(() => server.url)
  const r = await c.post('/api/auth/register', { email, password: PASSWORD, name })
  if (r.status !== 201) throw new Error(`register ${email}: ${r.status} ${JSON.stringify(r.body)}`)
  return c
}

/** Gives `email` the role `role` through the admin's members API. */
export async function setRole(admin: Client, email: string, role: string): Promise<void> {
  const members = await admin.get('/api/members')
  const list = (members.body.members ?? members.body) as { id: string; email: string }[]
  const m = list.find(x => x.email === email)
  if (!m) throw new Error(`no member ${email}`)
  const r = await admin.patch(`/api/members/${m.id}`, { role })
  if (r.status !== 200) throw new Error(`role ${email}: ${r.status} ${JSON.stringify(r.body)}`)
}

/** Waits `ms` (to let a link expire). */
export const pause = (ms: number) => new Promise(resolve => setTimeout(resolve, ms))

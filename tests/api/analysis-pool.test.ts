import { beforeAll, describe, expect, it } from 'vitest'
import { Client } from './support/client'
import { useTestServer } from './support/server'

// Analyses run in worker threads: a heavy one no longer holds the event loop, so a health check
// sent after it is answered before it; the queue and the per-account limit answer 429 with
// Retry-After. Ordering and counts only: no timing is asserted (speed is npm run bench:load).
const pooled = useTestServer({ NUXT_ANALYSIS_PER_ACCOUNT: '3', NUXT_ANALYSIS_INLINE_VERTICES: '-1' })
const tight = useTestServer({ NUXT_ANALYSIS_WORKERS: '1', NUXT_ANALYSIS_QUEUE: '1', NUXT_ANALYSIS_PER_ACCOUNT: '50', NUXT_ANALYSIS_TIMEOUT_MS: '60000' })
const slow = useTestServer({ NUXT_ANALYSIS_TIMEOUT_MS: '300', NUXT_ANALYSIS_INLINE_VERTICES: '-1' })
const PASSWORD = 'correct-horse-battery'

/** A wavy ring of n vertices around (cx, cy): simple, not convex (mm). */
function ring(n: number, r: number, cx = 0, cy = 0): [number, number][] {
  return Array.from({ length: n }, (_, i) => {
    const t = (2 * Math.PI * i) / n
    const rr = r * (1 + 0.05 * Math.sin(7 * t))
    return [cx + rr * Math.cos(t), cy + rr * Math.sin(t)] as [number, number]
  })
}

/** About 40 000 vertices in 40 separate parts: a second or so of work for the analysis. */
const heavy = { parts: Array.from({ length: 40 }, (_, i) => ({ outline: ring(1000, 40, (i % 8) * 100, Math.floor(i / 8) * 100) })), loads: [{ P: 1000, x: 350, y: 200 }] }
/** About 80 000 vertices (3 MB of JSON): well over 300 ms of work. */
const heavier = { parts: Array.from({ length: 80 }, (_, i) => ({ outline: ring(1000, 40, (i % 10) * 100, Math.floor(i / 10) * 100) })) }
/** A 100 x 200 rectangle: A = 20 000 mm² (b·h). */
const small = { parts: [{ outline: [[0, 0], [100, 0], [100, 200], [0, 200]] }] }

const clients: Record<string, Client> = {}
beforeAll(async () => {
  for (const [name, server] of [['pooled', pooled], ['tight', tight], ['tight2', tight], ['slow', slow]] as const) {
    const c = new Client(() => server.url)
    expect((await c.post('/api/auth/register', { email: `${name}@pool.test`, password: PASSWORD, name }, )).status).toBe(201)
    clients[name] = c
  }
})

describe('analyses in worker threads', () => {
  it('answer the same as before: a rectangle has A = b·h, a bad ring is a 422 naming its vertex', async () => {
    const r = await clients.pooled!.post('/api/analysis', small)
    expect(r.status).toBe(200)
    expect(r.body.properties.area).toBeCloseTo(20_000, 6) // b·h, closed form
    const bad = await clients.pooled!.post('/api/analysis', { parts: [{ outline: [[0, 0], [100, 100], [100, 0], [0, 100]] }] })
    expect(bad.status).toBe(422)
    expect(bad.body.data).toMatchObject({ part: 0 })
  })

  it('a health check sent while heavy analyses run is answered before them', async () => {
    const order: string[] = []
    const analyses = [0, 1].map(i => clients.pooled!.post('/api/analysis', heavy).then((r) => { order.push(`analysis ${r.status}`); return r }))
    await new Promise(r => setTimeout(r, 150)) // let both bodies arrive and start
    const health = fetch(`${pooled.url}/api/health`).then((r) => { order.push(`health ${r.status}`) })
    await Promise.all([...analyses, health])
    expect(order[0]).toBe('health 200')
    expect(order.slice(1).sort()).toEqual(['analysis 200', 'analysis 200'])
  })

  it('one account gets at most 3 analyses in flight here; the rest are 429 with Retry-After', async () => {
    const answers = await Promise.all(Array.from({ length: 6 }, () => clients.pooled!.post('/api/analysis', heavy)))
    const refused = answers.filter(a => a.status === 429)
    expect(answers.filter(a => a.status === 200)).toHaveLength(3)
    expect(refused).toHaveLength(3)
    for (const a of refused) {
      expect(Number(a.headers.get('retry-after'))).toBeGreaterThan(0)
      expect(a.body.message).toMatch(/limit is 3/)
    }
  })

  it('a full queue answers 429 to anyone, and the server recovers', async () => {
    const answers = await Promise.all([
      ...Array.from({ length: 2 }, () => clients.tight!.post('/api/analysis', heavy)),
      ...Array.from({ length: 2 }, () => clients.tight2!.post('/api/analysis', heavy)),
    ])
    const statuses = answers.map(a => a.status)
    expect(statuses.filter(s => s === 200).length).toBeGreaterThanOrEqual(2)
    expect(statuses.filter(s => s === 429).length).toBeGreaterThanOrEqual(1)
    expect(answers.find(a => a.status === 429)!.body.message).toMatch(/busy/)
    expect((await clients.tight!.post('/api/analysis', heavy)).status).toBe(200)
  })

  it('an analysis over the time limit is stopped with a 422, and the next one runs on a fresh worker', async () => {
    expect((await clients.slow!.post('/api/analysis', small)).status).toBe(200) // the worker is up
    const stopped = await clients.slow!.post('/api/analysis', heavier)
    expect(stopped.status).toBe(422)
    expect(stopped.body.message).toMatch(/took longer than 300 ms and was stopped/)
    await new Promise(r => setTimeout(r, 1500)) // let the replacement worker load
    const next = await clients.slow!.post('/api/analysis', small)
    expect(next.status).toBe(200)
    expect(next.body.properties.area).toBeCloseTo(20_000, 6) // b·h
  })
})

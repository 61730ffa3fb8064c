// npm run bench:load: autocannon on loopback against the built server with a temporary database.
// Prints requests/s and latency percentiles for health, a sketch list and 1 000-vertex analyses
// (10 connections, so the server is saturated: this is throughput, npm run bench has the latency).
// BENCH_CPU_PROF=dir writes the server's CPU profiles there (node --cpu-prof, main thread and
// workers); BENCH_ONLY=analysis runs only the 1 000-vertex analyses (1, 4 and 10 clients).
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import autocannon from 'autocannon'
import { buildIfStale, freePort, startServer } from './lib.mjs'

const DURATION = Number(process.env.BENCH_SECONDS || 8)

/** A wavy ring of n vertices (simple, not convex, so the full self-intersection sweep runs), full-precision coordinates (mm). */
function ring(n, r) {
  const pts = []
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n
    const rr = r * (1 + 0.05 * Math.sin(7 * t))
    pts.push([rr * Math.cos(t), rr * Math.sin(t)])
  }
  return pts
}

/** CPU time (ms, user + system) of the server: its main thread (the event loop) and all its threads, from /proc (Linux); null elsewhere. */
function serverCpu(pid) {
  const ticks = (file) => {
    // Fields after the command name: utime and stime are the 12th and 13th (proc(5)).
    const f = readFileSync(file, 'utf8').split(') ').pop().split(' ')
    return (Number(f[11]) + Number(f[12])) * (1000 / 100) // USER_HZ = 100 on Linux
  }
  if (!pid || !existsSync(`/proc/${pid}/stat`)) return null
  let threads = 0
  for (const t of readdirSync(`/proc/${pid}/task`)) {
    try { threads += ticks(`/proc/${pid}/task/${t}/stat`) } catch { /* a thread that ended */ }
  }
  return { main: ticks(`/proc/${pid}/task/${pid}/stat`), total: Math.max(threads, ticks(`/proc/${pid}/stat`)) }
}

let serverPid = 0

/**
 * One autocannon run; besides requests/s it prints the CPU each request cost the server's event
 * loop, the whole server and this load generator (ms per request). On a shared machine the
 * requests/s move with the other load; the CPU per request does not, and from it the throughput on
 * two idle cores follows: at most 1000/main (the event loop is one thread) and at most
 * 2000/(server + client) (two cores for everything).
 */
async function run(url, title, opts) {
  const before = serverCpu(serverPid)
  const client0 = process.cpuUsage()
  const result = await autocannon({ url, connections: 10, duration: DURATION, ...opts })
  const after = serverCpu(serverPid)
  const client = process.cpuUsage(client0)
  const l = result.latency
  const n = Math.max(1, result.requests.total)
  let cpu = ''
  if (before && after) {
    const main = (after.main - before.main) / n
    const total = (after.total - before.total) / n
    const gen = (client.user + client.system) / 1000 / n
    const capacity = Math.min(1000 / Math.max(main, 1e-9), 2000 / Math.max(total + gen, 1e-9))
    cpu = ` cpu_ms_per_req main=${main.toFixed(3)} server=${total.toFixed(3)} client=${gen.toFixed(3)} two_idle_cores_req_per_s=${capacity.toFixed(0)}`
  }
  console.log(`${title} req_per_s=${result.requests.average.toFixed(0)} p50_ms=${l.p50} p99_ms=${l.p99} errors=${result.errors + result.non2xx}${cpu}`)
  return result
}

buildIfStale()
const dir = mkdtempSync(join(tmpdir(), 'kernwise-load-'))
const port = await freePort()
const profile = process.env.BENCH_CPU_PROF
const only = process.env.BENCH_ONLY
const { child, url } = await startServer({ PORT: String(port), NUXT_DB_PATH: join(dir, 'load.sqlite'), NUXT_SESSION_PASSWORD: 'bench-only-session-password-0123456789abcdef',
  // One bench account drives up to 10 connections: lift the per-account analysis limit (default 4) for it.
  NUXT_ANALYSIS_PER_ACCOUNT: '16' }, { nodeArgs: profile ? ['--cpu-prof', `--cpu-prof-dir=${profile}`] : [] })
serverPid = child.pid
try {
  const reg = await fetch(`${url}/api/auth/register`, { method: 'POST', headers: { 'content-type': 'application/json', origin: url }, body: JSON.stringify({ email: 'bench@load.test', password: 'bench-password-123', name: 'Bench' }) })
  const cookie = reg.headers.getSetCookie().map(c => c.split(';')[0]).join('; ')
  const tok = await (await fetch(`${url}/api/tokens`, { method: 'POST', headers: { 'content-type': 'application/json', origin: url, cookie }, body: JSON.stringify({ name: 'bench' }) })).json()
  const auth = { authorization: `Bearer ${tok.token}`, 'content-type': 'application/json' }
  for (let i = 0; i < 20; i++) await fetch(`${url}/api/sketches`, { method: 'POST', headers: auth, body: JSON.stringify({ title: `Bench ${i}` }) })
  const body = JSON.stringify({ parts: [{ outline: ring(1000, 200), holes: [], material: { E: 200000 } }], loads: [{ P: 320000, x: 40, y: 25 }] })

  if (only === 'analysis') {
    await run(`${url}/api/analysis`, 'analysis-1000-vertices-1-client', { method: 'POST', headers: auth, body, connections: 1 })
    await run(`${url}/api/analysis`, 'analysis-1000-vertices-4-clients', { method: 'POST', headers: auth, body, connections: 4 })
    await run(`${url}/api/analysis`, 'analysis-1000-vertices', { method: 'POST', headers: auth, body })
  } else {
    await all(url, auth, body)
  }
} finally {
  child.kill('SIGTERM')
  // Give --cpu-prof time to write its profiles on exit.
  if (profile) await new Promise(r => child.once('exit', r))
  rmSync(dir, { recursive: true, force: true })
}

/** Every figure: health, the sketch list, analyses at 1, 10 and 4 clients, and health during heavy analyses. */
async function all(url, auth, body) {
  const one = await run(`${url}/api/analysis`, 'analysis-1000-vertices-1-client', { method: 'POST', headers: auth, body, connections: 1 })
  const health = await run(`${url}/api/health`, 'health')
  await run(`${url}/api/sketches`, 'sketch-list', { headers: auth })
  const analysis = await run(`${url}/api/analysis`, 'analysis-1000-vertices', { method: 'POST', headers: auth, body })
  const four = await run(`${url}/api/analysis`, 'analysis-1000-vertices-4-clients', { method: 'POST', headers: auth, body, connections: 4 })
  // Health while four heavy analyses (500-vertex parts x 40, about 20 000 vertices) keep the server busy.
  const heavy = JSON.stringify({ parts: Array.from({ length: 40 }, (_, i) => ({ outline: ring(500, 40).map(([x, y]) => [x + (i % 8) * 100, y + Math.floor(i / 8) * 100]), holes: [], material: { E: 200000 } })), loads: [{ P: 1000, x: 350, y: 200 }] })
  const busy = autocannon({ url: `${url}/api/analysis`, connections: 4, duration: DURATION, method: 'POST', headers: auth, body: heavy })
  await new Promise(r => setTimeout(r, 500))
  const during = await run(`${url}/api/health`, 'health-during-4-heavy-analyses', { connections: 1, duration: Math.max(1, DURATION - 2) })
  const heavyResult = await busy
  console.log(`heavy-analyses req_per_s=${heavyResult.requests.average.toFixed(1)} p50_ms=${heavyResult.latency.p50} non2xx=${heavyResult.non2xx}`)
  console.log(`summary analysis_1_client_req_per_s=${one.requests.average.toFixed(0)} analysis_4_clients_req_per_s=${four.requests.average.toFixed(0)} four_over_one=${(four.requests.average / one.requests.average).toFixed(2)} health_p99_during_heavy_ms=${during.latency.p99}`)
  const ratio = health.latency.p50 > 0 ? analysis.latency.p50 / health.latency.p50 : NaN
  console.log(`analysis-vs-health p50_ratio=${Number.isFinite(ratio) ? ratio.toFixed(2) : 'n/a'} (a 1 000-vertex analysis costs this many health checks)`)
}

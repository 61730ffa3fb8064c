// npm run bench:ui — how long one drag frame of the live stress view takes in headless chromium.
// Builds if stale, starts the built server on a free port with a temporary database, signs in as
// the demo engineer, creates a sketch with an N-vertex section (N = 200, 2 000, 20 000) and one
// load through the API, drags the load across the core with page.mouse, and reads the
// 'drag-update' performance measures the stress overlay records around each update (derive the
// frame from the properties, let Vue patch the Konva nodes, draw the layer).
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { chromium } from '@playwright/test'
import { buildIfStale, freePort, startServer } from './lib.mjs'

const SIZES = (process.env.BENCH_VERTICES || '200,2000,20000').split(',').map(Number)
const STEPS = Number(process.env.BENCH_STEPS || 240)
// The page that hosts the stress overlay (`ID` is replaced by the sketch id): by default the editor
// page when the stress panels are wired into it, else the stress development page.
const PAGE = process.env.BENCH_PAGE || null
const EMAIL = 'engineer@millrace.test'
const PASSWORD = 'millrace-demo-2026'

/** A regular N-gon of circumradius R (mm), counter-clockwise, with a shallow notch so it is not symmetric. */
function section(n, R = 300) {
  const ring = []
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n
    const r = R * (1 - 0.15 * Math.max(0, Math.cos(t - 0.6)) ** 8)
    ring.push([r * Math.cos(t), r * Math.sin(t)])
  }
  return ring
}

/**
 * BENCH_TRACE=1: a Chromium trace of the vertex edits, summed by event name on the page's main
 * thread (inclusive times, so nested events count in their parents too): where the time after
 * an answer goes (script, style, layout, paint).
 */
function printTrace(buffer) {
  const { traceEvents } = JSON.parse(buffer.toString('utf8'))
  const main = traceEvents.find(e => e.name === 'thread_name' && e.args?.name === 'CrRendererMain')
  const total = new Map()
  for (const e of traceEvents) {
    if (!main || e.pid !== main.pid || e.tid !== main.tid || e.ph !== 'X' || !e.dur) continue
    total.set(e.name, (total.get(e.name) ?? 0) + e.dur / 1000)
  }
  for (const [k, v] of [...total].sort((a, b) => b[1] - a[1]).slice(0, 25)) console.log(`  ${v.toFixed(1).padStart(8)} ms  ${k}`)
}

/** BENCH_PROFILE=1: the 25 functions with the most self time during the drag (for finding hot spots). */
function printProfile(profile) {
  const self = new Map()
  const dt = new Map()
  for (let i = 0; i < profile.samples.length; i++) dt.set(profile.samples[i], (dt.get(profile.samples[i]) ?? 0) + (profile.timeDeltas[i] ?? 0))
  for (const node of profile.nodes) {
    const f = node.callFrame
    const key = `${f.functionName || '(anon)'} ${f.url.split('/').pop()}:${f.lineNumber}`
    self.set(key, (self.get(key) ?? 0) + (dt.get(node.id) ?? 0) / 1000)
  }
  for (const [k, v] of [...self].sort((a, b) => b[1] - a[1]).slice(0, 25)) console.log(`  ${v.toFixed(1).padStart(8)} ms  ${k}`)
}

function quantile(sorted, q) {
  if (sorted.length === 0) return NaN
  const pos = (sorted.length - 1) * q
  const lo = Math.floor(pos)
  const hi = Math.ceil(pos)
  return sorted[lo] + (sorted[hi] - sorted[lo]) * (pos - lo)
}

/**
 * The sketcher on the same section: pointer move → next painted frame while a vertex is dragged,
 * and pointer up → the properties panel showing the new area (debounce + /api/analysis + render).
 */
async function benchVertexDrag(page, at, n, cdp, browser) {
  await page.evaluate(() => {
    const w = window
    w.kwFrames = []
    w.kwFollow = []
    const canvas = document.querySelector('[data-testid="sketch-canvas"]')
    canvas.addEventListener('pointermove', () => {
      if (!w.kwDragging) return
      const t = performance.now()
      requestAnimationFrame(() => w.kwFrames.push(performance.now() - t))
    })
    canvas.addEventListener('pointerdown', () => { w.kwDragging = true })
    window.addEventListener('pointerup', () => { w.kwDragging = false; w.kwUp = performance.now(); performance.mark('kw-up') }, true)
    const area = document.querySelector('[data-testid="prop-area"]')
    w.kwSplit = []
    new MutationObserver(() => {
      if (!w.kwUp) return
      const now = performance.now()
      performance.mark('kw-area')
      w.kwFollow.push(now - w.kwUp)
      const req = performance.getEntriesByType('resource').filter(e => e.name.includes('/api/analysis') && e.startTime >= w.kwUp).pop()
      if (req) w.kwSplit.push({ up: w.kwUp, now, start: req.startTime, end: req.responseEnd, server: req.serverTiming?.find(t => t.name === 'analysis')?.duration ?? NaN })
      w.kwUp = 0
    })
      .observe(area, { attributes: true, attributeFilter: ['data-value'] })
  })
  const [px, py] = at(-120, -80)
  await page.mouse.click(px, py) // pick the part (away from the load on the centroid)
  // The first edits after opening run cold code (JIT) on both sides: WARMUP edits are made but not counted.
  const REPS = Number(process.env.BENCH_EDITS || 20)
  const WARMUP = 3
  if (cdp) { await cdp.send('Profiler.enable'); await cdp.send('Profiler.start') }
  if (process.env.BENCH_TRACE) await browser.startTracing(page, { categories: ['devtools.timeline', 'blink', 'blink.user_timing', 'v8.execute', 'disabled-by-default-devtools.timeline'] })
  for (let rep = 0; rep < WARMUP + REPS; rep++) {
    if (rep === WARMUP) await page.evaluate(() => { window.kwFrames = []; window.kwFollow = []; window.kwSplit = [] })
    // Where vertex 0 is now (snapping moves it off the pointer's path), from the vertex table (mm).
    // The table writes the true minus sign (U+2212), as every number on screen.
    const num = text => Number(text.replace('\u2212', '-'))
    const v = [num(await page.getByTestId('vertex-0-x').inputValue()), num(await page.getByTestId('vertex-0-y').inputValue())]
    const [sx, sy] = at(v[0], v[1])
    const seen = await page.evaluate(() => window.kwFollow.length)
    await page.mouse.move(sx, sy)
    // Alt holds snapping off: a snap onto a neighbouring corner would merge the two (one vertex
    // fewer) and the next press would pick another vertex.
    await page.keyboard.down('Alt')
    await page.mouse.down()
    // Vertex 0 sits at angle 0 on the ring: out 15 px along +x, then back 10 px, so the moved corner
    // never crosses its neighbours (on 20 000 vertices they are 0.09 mm apart, and a drag along the
    // ring made it cross itself: a 422, no new area, an edit not counted) and never lands back among
    // them (where the next press would pick a neighbour instead).
    for (let k = 1; k <= 10; k++) await page.mouse.move(sx + (rep % 2 ? -k : 1.5 * k), sy)
    await page.mouse.up()
    await page.keyboard.up('Alt')
    await page.waitForFunction(count => window.kwFollow.length > count, seen, { timeout: 3_000 }).catch(() => {}) // a drag that missed the vertex changes nothing: move on
  }
  if (cdp) printProfile((await cdp.send('Profiler.stop')).profile)
  if (process.env.BENCH_TRACE) { const b = await browser.stopTracing(); if (process.env.BENCH_TRACE_FILE) (await import('node:fs')).writeFileSync(process.env.BENCH_TRACE_FILE, b); printTrace(b) }
  const frames = (await page.evaluate(() => window.kwFrames)).sort((a, b) => a - b)
  const follow = (await page.evaluate(() => window.kwFollow)).sort((a, b) => a - b)
  console.log(`vertex-drag-frame p50_ms=${quantile(frames, 0.5).toFixed(2)} p95_ms=${quantile(frames, 0.95).toFixed(2)} vertices=${n} (pointer move to the next painted frame)`)
  // Each edit's answer: request start and end, the server's own time, and when the page took it in
  // ('analysis-apply' runs from the parsed answer to the end of Vue's update of every reader).
  const split = await page.evaluate(() => {
    const applies = performance.getEntriesByName('analysis-apply')
    return window.kwSplit.map((r) => {
      const a = applies.find(e => e.startTime >= r.end && e.startTime <= r.now)
      return [r.start - r.up, r.end - r.start, r.now - r.end, a ? a.startTime - r.end : NaN, a ? a.duration : NaN, r.server]
    })
  })
  const med = i => quantile(split.map(r => r[i]).sort((a, b) => a - b), 0.5).toFixed(1)
  if (split.length) console.log(`properties-follow-split before_request_ms=${med(0)} request_ms=${med(1)} (server_ms=${med(5)}) after_response_ms=${med(2)} (parse_ms=${med(3)} apply_ms=${med(4)}) vertices=${n} (medians)`)
  console.log(`properties-follow p50_ms=${quantile(follow, 0.5).toFixed(1)} p95_ms=${quantile(follow, 0.95).toFixed(1)} max_ms=${follow[follow.length - 1]?.toFixed(1)} vertices=${n} edits=${follow.length}/${REPS} after ${WARMUP} warm-up edits (pointer up to the new area in the panel)`)
}

async function main() {
  buildIfStale()
  const port = await freePort()
  const dir = mkdtempSync(join(tmpdir(), 'kernwise-bench-ui-'))
  const { child, url } = await startServer({
    PORT: String(port),
    NUXT_DB_PATH: join(dir, 'bench.sqlite'),
    NUXT_SEED_DEMO: 'true',
    NUXT_SESSION_PASSWORD: 'bench-only-session-password-0123456789abcdef',
  })
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
  })
  try {
    const context = await browser.newContext({ baseURL: url, viewport: { width: 1440, height: 900 } })
    const page = await context.newPage()
    const login = await page.request.post('/api/auth/login', { headers: { origin: url }, data: { email: EMAIL, password: PASSWORD } })
    if (!login.ok()) throw new Error(`sign-in failed: ${login.status()}`)
    for (const n of SIZES) {
      const document = {
        schema: 'kernwise.sketch/1',
        parts: [{ id: 'part-1', name: `Bench ${n}`, holes: [], shape: null, outline: section(n), material: { name: 'Steel', E: 200000, fy: 355 } }],
        cases: [{ id: 'case-1', name: 'Dead', Mx: 0, My: 0 }],
        combinations: [],
        loads: [{ id: 'load-1', name: 'G', caseId: 'case-1', P: 1e6, x: 0, y: 0 }],
        // BENCH_NO_TENSION=1 drags in the no-tension (partial contact, Newton per frame) view instead.
        settings: { noTension: !!process.env.BENCH_NO_TENSION },
      }
      const res = await page.request.post('/api/sketches', { headers: { origin: url }, data: { title: `bench-ui ${n}`, document } })
      if (res.status() !== 201) throw new Error(`creating the sketch failed: ${res.status()} ${await res.text()}`)
      const { id } = await res.json()
      const path = PAGE ? PAGE.replace('ID', id) : `/sketches/${id}`
      await page.goto(path)
      await page.waitForSelector('html[data-hydrated="true"]')
      await page.waitForSelector('[data-testid="sketch-canvas"]')
      await page.waitForSelector('[data-testid="analysis-state"][data-analysis="ready"], [data-testid="tension-panel"][data-state="inside"]', { state: 'attached', timeout: 60_000 })
      const canvas = page.getByTestId('sketch-canvas')
      const box = await canvas.boundingBox()
      const zoom = Number(await canvas.getAttribute('data-zoom'))
      const panX = Number(await canvas.getAttribute('data-pan-x'))
      const panY = Number(await canvas.getAttribute('data-pan-y'))
      // The load sits on the centroid; find it from the section's properties via the load panel (x, y = 0).
      const at = (x, y) => [box.x + panX + zoom * x, box.y + panY - zoom * y]
      await page.evaluate(() => performance.clearMeasures('drag-update'))
      const [x0, y0] = at(0, 0)
      await page.mouse.move(x0, y0)
      await page.mouse.down()
      // BENCH_PROFILE=1 profiles the load drag, BENCH_PROFILE=vertex the vertex edits.
      const cdp = process.env.BENCH_PROFILE ? await context.newCDPSession(page) : null
      const profileLoad = cdp && process.env.BENCH_PROFILE !== 'vertex' ? cdp : null
      if (profileLoad) { await cdp.send('Profiler.enable'); await cdp.send('Profiler.start') }
      // Out across the core edge and round a loop, back towards the centroid (no snapping on most steps).
      for (let k = 1; k <= STEPS; k++) {
        const t = k / STEPS
        const r = 220 * Math.sin(Math.PI * t)
        const a = 2.4 * Math.PI * t + 0.3
        const [sx, sy] = at(r * Math.cos(a) + 7, r * Math.sin(a) + 5)
        await page.mouse.move(sx, sy)
      }
      await page.mouse.up()
      if (profileLoad) printProfile((await cdp.send('Profiler.stop')).profile)
      const durations = await page.evaluate(() => performance.getEntriesByName('drag-update').map(e => e.duration))
      durations.sort((a, b) => a - b)
      if (durations.length < STEPS / 2) console.warn(`[bench-ui] only ${durations.length} drag updates were measured for ${n} vertices`)
      if (n === SIZES[0]) console.log(`[bench-ui] page ${path.replace(id, ':id')}`)
      console.log(`drag-update p50_ms=${quantile(durations, 0.5).toFixed(2)} p95_ms=${quantile(durations, 0.95).toFixed(2)} vertices=${n}${process.env.BENCH_NO_TENSION ? ' view=no-tension' : ''}`)
      await benchVertexDrag(page, at, n, cdp && !profileLoad ? cdp : null, browser)
    }
  } finally {
    await browser.close()
    child.kill()
    rmSync(dir, { recursive: true, force: true })
  }
}

main().catch((err) => {
  console.error(err)
  process.exit(1)
})

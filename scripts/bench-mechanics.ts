// npm run bench: mechanics timings for 1 000, 100 000 and 1 000 000 vertices, then 200 000 vertices
// end to end through POST /api/analysis on the built server (loopback), then torsion.
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { performance } from 'node:perf_hooks'
import { findSelfIntersection } from '../shared/geometry/intersections'
import { polygonMoments, zeroMoments } from '../shared/geometry/moments'
import type { Point } from '../shared/geometry/types'
import { solveContact } from '../shared/mechanics/contact'
import { kernPolygon } from '../shared/mechanics/kern'
import { prepareSection } from '../shared/mechanics/prepare'
import { sectionProperties } from '../shared/mechanics/properties'
// @ts-expect-error plain ESM helper without types
import { buildIfStale, freePort, startServer } from './lib.mjs'

/** A star-free wavy ring of n vertices (simple, not convex), radius about r mm. */
function wavyRing(n: number, r: number): Point[] {
  const pts: Point[] = []
  for (let i = 0; i < n; i++) {
    const t = (2 * Math.PI * i) / n
    const rr = r * (1 + 0.05 * Math.sin(7 * t))
    // Rounded to 1 µm so that 200 000 vertices fit the 5 MB body limit as JSON.
    pts.push([Math.round(rr * Math.cos(t) * 1000) / 1000, Math.round(rr * Math.sin(t) * 1000) / 1000])
  }
  return pts
}

/** Median time (ms) of `fn` over repeated runs, at least `minRuns` and about `budgetMs` in all. */
function time(fn: () => unknown, minRuns = 3, budgetMs = 1500): number {
  const times: number[] = []
  const start = performance.now()
  while (times.length < minRuns || (performance.now() - start < budgetMs && times.length < 50)) {
    const t0 = performance.now()
    fn()
    times.push(performance.now() - t0)
  }
  times.sort((a, b) => a - b)
  return times[Math.floor(times.length / 2)]!
}

const fmt = (ms: number) => ms.toFixed(ms < 10 ? 3 : 1)

for (const n of (process.env.BENCH_SIZES || "1000,100000,1000000").split(",").map(Number)) {
  const ring = wavyRing(n, 500)
  const parts = [{ outline: ring, material: { E: 200_000 } }]
  const prepared = prepareSection(parts)
  const props = sectionProperties(prepared)
  const regions = prepared.regions.map(r => ({ n: r.n, polygons: r.polygons }))
  const polygons = prepared.regions.flatMap(r => r.polygons)
  const tMoments = time(() => {
    const acc = zeroMoments()
    for (const poly of polygons) polygonMoments(poly, prepared.origin, 1, acc)
    return acc
  })
  const tProps = time(() => sectionProperties(prepared))
  const tPrepare = time(() => prepareSection(parts), 2)
  const tCheck = time(() => findSelfIntersection(ring), 2)
  const tKern = time(() => kernPolygon(props, prepared.hull))
  // A load outside the core but inside the hull: partial contact.
  const loads = [{ P: 1e6, x: props.centroid.x + 300, y: props.centroid.y + 120 }]
  const tContact = time(() => solveContact(props, regions, prepared.hull, loads), 2)
  const mvps = n / (tMoments / 1000) / 1e6
  console.log(`mechanics vertices=${n} moments_pass_ms=${fmt(tMoments)} moments_Mvertex_per_s=${mvps.toFixed(1)} all_properties_ms=${fmt(tProps)} self_intersection_ms=${fmt(tCheck)} prepare_ms=${fmt(tPrepare)} kern_ms=${fmt(tKern)} no_tension_ms=${fmt(tContact)}`)
}

// End to end: 200 000 vertices through the API (JSON encode, HTTP, validate, prepare, analyse, answer).
buildIfStale()
const dir = mkdtempSync(join(tmpdir(), 'kernwise-bench-'))
const port = await freePort()
const { child, url } = await startServer({ PORT: String(port), NUXT_DB_PATH: join(dir, 'bench.sqlite'), NUXT_SESSION_PASSWORD: 'bench-only-session-password-0123456789abcdef' })
try {
  const reg = await fetch(`${url}/api/auth/register`, { method: 'POST', headers: { 'content-type': 'application/json', origin: url }, body: JSON.stringify({ email: 'bench@mech.test', password: 'bench-password-123', name: 'Bench' }) })
  const cookie = reg.headers.getSetCookie().map(c => c.split(';')[0]).join('; ')
  const post = async (body: string) => {
    const t0 = performance.now()
    const res = await fetch(`${url}/api/analysis`, { method: 'POST', headers: { 'content-type': 'application/json', origin: url, cookie }, body })
    await res.text()
    if (res.status !== 200) throw new Error(`analysis answered ${res.status}`)
    return performance.now() - t0
  }
  const health = async () => {
    const t0 = performance.now()
    await (await fetch(`${url}/api/health`)).text()
    return performance.now() - t0
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!
  // A 1 000-vertex analysis against a health check (one database round trip): both warmed up,
  // then each timed in its own block (a health check right after an analysis would pay for the
  // analysis's garbage and look dearer), before the large runs grow the server's heap.
  const small = JSON.stringify({ parts: [{ outline: wavyRing(1_000, 500) }], loads: [{ P: 320_000, x: 40, y: 25 }], noTension: true })
  for (let i = 0; i < 50; i++) { await post(small); await health() }
  const hs: number[] = []
  for (let i = 0; i < 100; i++) hs.push(await health())
  const runs: number[] = []
  for (let i = 0; i < 100; i++) runs.push(await post(small))
  console.log(`api-analysis vertices=1000 median_ms=${fmt(median(runs))} max_ms=${fmt(Math.max(...runs))}`)
  console.log(`api-health median_ms=${fmt(median(hs))}`)
  console.log(`api-analysis-vs-health vertices=1000 ratio=${(median(runs) / median(hs)).toFixed(2)} (a 1 000-vertex analysis costs this many health checks, sequential on loopback)`)
  const big = JSON.stringify({ parts: [{ outline: wavyRing(200_000, 500) }], loads: [{ P: 320_000, x: 40, y: 25 }], noTension: true })
  await post(big) // warm-up
  const bigRuns: number[] = []
  for (let i = 0; i < 5; i++) bigRuns.push(await post(big))
  console.log(`api-analysis vertices=200000 median_ms=${fmt(median(bigRuns))} max_ms=${fmt(Math.max(...bigRuns))}`)
} finally {
  child.kill('SIGTERM')
  rmSync(dir, { recursive: true, force: true })
}

// Torsion (finite elements on the section), after the server runs so its meshes do not weigh on
// the figures above: a thin tube and a wavy solid of 2 000 vertices, and a
// rolled I with root fillets, at each mesh density: vertex, node and element counts, times.
// Loaded here, not at the top: the figures above then run with the same modules as before torsion.
const { torsionAnalysis } = await import('../shared/mechanics/torsion/analysis')
const { ishape } = await import('../shared/shapes/ishape')
const tubeOf = (n: number, r: number, t: number) => [wavyRing(n / 2, r).map(([x, y]) => [x, y] as Point), wavyRing(n / 2, r - t).map(([x, y]) => [x, y] as Point).reverse()]
const ipe = ishape({ h: 200, b: 100, tw: 5.6, tf: 8.5, r: 12 })
const torsionCases: [string, { outline: Point[]; holes?: Point[][] }][] = [
  ['thin-tube', { outline: tubeOf(2000, 500, 10)[0]!, holes: [tubeOf(2000, 500, 10)[1]!] }],
  ['wavy-solid', { outline: wavyRing(2000, 50) }],
  ['rolled-I', { outline: ipe.outline as Point[], holes: ipe.holes as Point[][] }],
]
// BENCH_TORSION=0 skips these.
for (const [name, part] of process.env.BENCH_TORSION === '0' ? [] : torsionCases) {
  const prepared = prepareSection([{ ...part, material: { E: 200_000 } }])
  const vertices = part.outline.length + (part.holes ?? []).reduce((n, h) => n + h.length, 0)
  for (const mesh of ['coarse', 'normal', 'fine'] as const) {
    let out = torsionAnalysis(prepared, { mesh })
    const ms = time(() => { out = torsionAnalysis(prepared, { mesh }) }, 2, 3000)
    console.log(`torsion section=${name} vertices=${vertices} mesh=${mesh} nodes=${out.mesh.nodes} elements=${out.mesh.elements} total_ms=${fmt(ms)} J=${out.J.toPrecision(5)}`)
  }
}

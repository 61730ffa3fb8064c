import { existsSync } from 'node:fs'
import { availableParallelism } from 'node:os'
import { dirname, join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { Worker } from 'node:worker_threads'
import type { H3Event } from 'h3'
import { analyseSection } from '../../shared/mechanics/analyze'
import type { AnalysisJob, AnalysisReply } from '../workers/analysis.worker'

type Input = Parameters<typeof analyseSection>[0]
type Output = ReturnType<typeof analyseSection>

/** A worker's answer: the finished answer as UTF-8 JSON (finite-checked, `omit` applied), ready to send. */
export interface WorkerAnswer {
  json: Buffer
}

interface Pending {
  job: AnalysisJob
  account: string
  resolve: (value: WorkerAnswer) => void
  reject: (error: unknown) => void
}

interface Slot {
  worker: Worker
  /** The worker has loaded its bundle (its start-up does not count against a job's time limit). */
  ready: boolean
  busy: Pending | null
  timer: ReturnType<typeof setTimeout> | null
}

/**
 * Pool settings (runtime config, NUXT_ANALYSIS_*): workers (default: the core count), queue
 * length, per-account limit, time limit (ms), and the section size (vertices) up to which an
 * analysis may run in-line (negative: never). Measured (npm run bench:load, --cpu-prof): for a
 * 1 000-vertex analysis the event loop spent as long on JSON.parse, the body checks and
 * JSON.stringify of the answer as on the analysis itself, so under concurrent load every analysis
 * goes to a worker as bytes and comes back as bytes (`analyseBodyInPool`); a lone small one stays
 * in-line (`aloneInFlight`), where the thread hop would only add to its latency.
 */
function settings() {
  const c = useRuntimeConfig().analysis as Record<string, unknown> | undefined
  const n = (v: unknown, fallback: number) => (Number(v) > 0 ? Math.floor(Number(v)) : fallback)
  return {
    inlineVertices: Number(c?.inlineVertices) < 0 ? -1 : n(c?.inlineVertices, 2000),
    workers: n(c?.workers, Math.max(1, availableParallelism())),
    queue: n(c?.queue, 16),
    perAccount: n(c?.perAccount, 4),
    timeoutMs: n(c?.timeoutMs, 30_000),
  }
}

let config: ReturnType<typeof settings> | null = null
let workerFile: string | null | undefined
const slots: Slot[] = []
const queue: Pending[] = []
const perAccount = new Map<string, number>()
let nextId = 1
/** An analysis request in progress; `overlapped` once another started while it was in flight. */
interface InFlight {
  overlapped: boolean
}
/** Analysis requests between the start of their handler and their answer (reading the body included). */
const inFlight = new Set<InFlight>()
const requests = new WeakMap<H3Event, InFlight>()
/** When the last analysis answer was handed to its connection (performance.now() ms), and which connection. */
let lastAnswer: { socket: unknown; at: number } | null = null
/**
 * A request from another connection that starts this soon (ms) after an answer went out was
 * already waiting behind it: a client's own next request needs at least a loopback round trip.
 */
const BACK_TO_BACK_MS = 0.15

/** Runs an analysis request's handler, counted in `inFlight` while it runs. */
export async function countedAnalysis<T>(event: H3Event, handle: () => Promise<T>): Promise<T> {
  const socket = event.node.req.socket
  const waited = lastAnswer !== null && lastAnswer.socket !== socket && performance.now() - lastAnswer.at < BACK_TO_BACK_MS
  const mine: InFlight = { overlapped: inFlight.size > 0 || waited }
  for (const other of inFlight) other.overlapped = true
  inFlight.add(mine)
  requests.set(event, mine)
  event.node.res.once('finish', () => { lastAnswer = { socket, at: performance.now() } })
  try {
    return await handle()
  } finally {
    inFlight.delete(mine)
  }
}

/**
 * True when no other analysis request was in progress at any time since this one started (nor
 * waiting for the one before it to be answered), and the pool is idle (and in-line runs are allowed): a small analysis may then run on the event
 * loop, as nothing waits behind it and a thread hop would only add to its latency. Requests that
 * overlap (several clients, or one client's live and torsion requests) go to the workers.
 */
export function aloneInFlight(event: H3Event): boolean {
  config ??= settings()
  const mine = requests.get(event)
  return config.inlineVertices >= 0 && mine !== undefined && !mine.overlapped && queue.length === 0 && !slots.some(s => s.busy)
}

/** The bundled worker beside the built server (.output/server/workers/analysis.mjs), or null (development: run in-line). */
function findWorkerFile(): string | null {
  if (workerFile !== undefined) return workerFile
  workerFile = null
  const starts = [process.argv[1] ? dirname(process.argv[1]) : '', dirname(fileURLToPath(import.meta.url))]
  for (const start of starts) {
    let dir = start
    for (let up = 0; dir && up < 4; up++, dir = dirname(dir)) {
      const file = join(dir, 'workers', 'analysis.mjs')
      if (existsSync(file)) return (workerFile = file)
    }
  }
  console.warn('[kernwise] analysis worker bundle not found: analyses run on the event loop (development).')
  return workerFile
}

function release(p: Pending): void {
  const left = (perAccount.get(p.account) ?? 1) - 1
  if (left > 0) perAccount.set(p.account, left)
  else perAccount.delete(p.account)
}

function spawn(file: string): Slot {
  const slot: Slot = { worker: new Worker(file), ready: false, busy: null, timer: null }
  slot.worker.on('message', (reply: AnalysisReply) => finish(slot, reply))
  slot.worker.on('error', (error) => fail(slot, error))
  slot.worker.on('exit', () => fail(slot, new Error('the analysis worker stopped')))
  slot.worker.unref()
  return slot
}

/** Replaces a worker that failed or ran out of time, answering its job with `error`. */
function fail(slot: Slot, error: unknown): void {
  const i = slots.indexOf(slot)
  if (i < 0) return
  if (slot.timer) clearTimeout(slot.timer)
  const p = slot.busy
  slot.busy = null
  slots.splice(i, 1)
  slot.worker.removeAllListeners()
  void slot.worker.terminate()
  slots.push(spawn(workerFile!))
  if (p) {
    release(p)
    p.reject(error)
  }
  pump()
}

function finish(slot: Slot, reply: AnalysisReply): void {
  if ('ready' in reply) {
    slot.ready = true
    if (slot.busy && !slot.timer) arm(slot)
    return
  }
  const p = slot.busy
  if (!p || p.job.id !== reply.id) return
  if (slot.timer) clearTimeout(slot.timer)
  slot.timer = null
  slot.busy = null
  release(p)
  if ('json' in reply) p.resolve({ json: Buffer.from(reply.json.buffer, reply.json.byteOffset, reply.json.byteLength) })
  else if ('invalid' in reply) {
    const e = reply.invalid
    p.reject(createError({ statusCode: e.status, statusMessage: e.status === 413 ? 'Payload Too Large' : 'Bad Request', message: e.message, data: e.data }))
  }
  else if ('sectionError' in reply) {
    const e = reply.sectionError
    p.reject(createError({ statusCode: 422, statusMessage: 'Unprocessable Geometry', message: e.message, data: { part: e.part, ring: e.ring, vertex: e.vertex, cut: e.cut ?? null } }))
  } else {
    console.error('[kernwise] analysis failed in its worker:', reply.failure)
    p.reject(createError({ statusCode: 500, statusMessage: 'Internal Server Error', message: 'The analysis failed on the server. It has been logged; try again or simplify the section.' }))
  }
  pump()
}

function pump(): void {
  for (const slot of slots) {
    if (slot.busy) continue
    const p = queue.shift()
    if (!p) return
    slot.busy = p
    // A worker still loading holds the job in its port; the time limit starts once it is ready.
    if (slot.ready) arm(slot)
    slot.worker.postMessage(p.job, [p.job.body.buffer as ArrayBuffer])
  }
}

/** Starts the time limit of the slot's job. */
function arm(slot: Slot): void {
  slot.timer = setTimeout(() => fail(slot, createError({
    statusCode: 422,
    statusMessage: 'Unprocessable Entity',
    message: `The analysis took longer than ${config!.timeoutMs >= 1000 ? `${Math.round(config!.timeoutMs / 1000)} s` : `${config!.timeoutMs} ms`} and was stopped. Simplify the section: a coarser chord tolerance for arcs, or fewer parts.`,
  })), config!.timeoutMs)
}

function busy(event: H3Event, message: string): never {
  setResponseHeader(event, 'Retry-After', '2')
  throw createError({ statusCode: 429, statusMessage: 'Too Many Requests', message, data: { retryAfter: 2 } })
}

/**
 * Runs analyseSection (shared/mechanics/analyze.ts) in a pool of worker threads, so a heavy
 * section never blocks other requests and every core is used. At most `perAccount` analyses of
 * one account are in flight and at most `queue` wait for a worker; beyond either the answer is
 * 429 with Retry-After. A geometry error is the same 422 as in-line; an analysis over the time
 * limit is stopped (its worker replaced) and answers 422. A section of at most `inlineVertices`
 * vertices runs in-line unless it asks for torsion (a finite-element solve), and so does
 * everything without the worker bundle (nuxt dev). `text` is `input` as the JSON a client sent.
 */
export async function analyseInPool(event: H3Event, input: Input, text: string): Promise<Output | WorkerAnswer> {
  config ??= settings()
  const file = findWorkerFile()
  let vertices = 0
  for (const part of input.parts) vertices += part.outline.length + (part.holes ?? []).reduce((n, h) => n + h.length, 0)
  // Torsion meshes and solves (up to a second or two) whatever the vertex count: always in a worker.
  const heavy = input.torsion === true || vertices > config.inlineVertices
  if (!file || !heavy) return withSectionErrors(() => analyseSection(input))
  return toWorker(event, file, Buffer.from(text, 'utf8'))
}

/** A body this large (bytes of JSON, about 2 000 vertices, where the pool starts anyway) never runs in-line. */
export const WORKER_BODY_BYTES = 64 * 1024

/**
 * The analysis of a request body (its raw bytes), read, checked, analysed and encoded in a worker:
 * the event loop neither parses nor stringifies it. Null when there is no worker (development), so
 * the caller reads the body itself.
 */
export async function analyseBodyInPool(event: H3Event, body: Uint8Array): Promise<WorkerAnswer | null> {
  config ??= settings()
  const file = findWorkerFile()
  if (!file) return null
  return toWorker(event, file, body)
}

function toWorker(event: H3Event, file: string, body: Uint8Array): Promise<WorkerAnswer> {
  while (slots.length < config!.workers) slots.push(spawn(file))
  const account = String((event.context.kwUser as { id?: string } | undefined)?.id ?? clientAddress(event))
  const mine = perAccount.get(account) ?? 0
  if (mine >= config!.perAccount) busy(event, `You have ${mine} analyses running already (the limit is ${config!.perAccount}); wait for one to finish.`)
  if (queue.length >= config!.queue) busy(event, 'The server is busy with other analyses; try again in 2 s.')
  perAccount.set(account, mine + 1)
  return new Promise<WorkerAnswer>((resolve, reject) => {
    // A copy the worker can own (the body may sit in Node's shared buffer pool): moved, not cloned.
    const bytes = new Uint8Array(body.byteLength)
    bytes.set(body)
    queue.push({ job: { id: nextId++, body: bytes }, account, resolve, reject })
    pump()
  })
}

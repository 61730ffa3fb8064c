// The analysis worker thread (bundled on its own into .output/server/workers/analysis.mjs by the
// build, see nuxt.config.ts): runs shared/mechanics' analyseSection on one request at a time,
// off the server's event loop. It takes the request body's UTF-8 bytes and answers the answer's
// UTF-8 bytes, both moved (transferred), not copied: the event loop neither parses, checks nor
// encodes JSON, and a large section's rings never cross the thread boundary as cloned arrays
// (measured with npm run bench:load: JSON.parse, the checks and JSON.stringify cost the main
// thread as much as the analysis itself). Bad geometry comes back as the SectionError's fields.
import { parentPort } from 'node:worker_threads'
import { analysisAnswer, NOT_FINITE_MESSAGE, readAnalysisText, type BodyProblem } from '../../shared/analysis/answer'
import { analyseSection } from '../../shared/mechanics/analyze'
import { SectionError } from '../../shared/mechanics/types'

/** A job from the pool: an id to answer with and the request body as UTF-8 JSON (read and checked here as the route would). */
export interface AnalysisJob {
  id: number
  body: Uint8Array
}

/** What the worker answers: the answer as UTF-8 JSON, a geometry error, or an unexpected failure. */
export type AnalysisReply =
  | { ready: true; id?: undefined }
  | { id: number; json: Uint8Array }
  | { id: number; invalid: BodyProblem }
  | { id: number; sectionError: { message: string; part: number | null; ring: number | null; vertex: number | null; cut?: number | null } }
  | { id: number; failure: string }

const decoder = new TextDecoder('utf-8', { fatal: true })
const encoder = new TextEncoder()

parentPort?.on('message', (job: AnalysisJob) => {
  let reply: AnalysisReply
  try {
    let text: string | null = null
    try {
      text = decoder.decode(job.body)
    } catch {
      text = null
    }
    const read = text === null ? { ok: false as const, problem: { status: 400 as const, message: 'The request body is not valid UTF-8 text.' } } : readAnalysisText(text)
    const answer = read.ok ? analysisAnswer(analyseSection(read.body), read.body.omit) : null
    reply = !read.ok
      ? { id: job.id, invalid: read.problem }
      : answer
      ? { id: job.id, json: encoder.encode(JSON.stringify(answer)) }
      : { id: job.id, sectionError: { message: NOT_FINITE_MESSAGE, part: null, ring: null, vertex: null } }
  } catch (error) {
    reply = error instanceof SectionError
      ? { id: job.id, sectionError: { message: error.message, part: error.part, ring: error.ring, vertex: error.vertex, cut: error.cut } }
      : { id: job.id, failure: error instanceof Error ? (error.stack ?? error.message) : String(error) }
  }
  parentPort!.postMessage(reply, 'json' in reply ? [reply.json.buffer as ArrayBuffer] : [])
})

// Loaded: the pool sends work (and starts a job's time limit) only from here on.
parentPort?.postMessage({ ready: true })

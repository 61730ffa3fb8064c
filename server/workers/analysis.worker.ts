// The analysis worker thread (bundled on its own into .output/server/workers/analysis.mjs by the
// build, see nuxt.config.ts): runs shared/mechanics' analyseSection on one request at a time,
// off the server's event loop. Bad geometry comes back as the SectionError's fields.
import { parentPort } from 'node:worker_threads'
import { analyseSection } from '../../shared/mechanics/analyze'
import { SectionError } from '../../shared/mechanics/types'

/** A job from the pool: an id to answer with and the validated request body. */
export interface AnalysisJob {
  id: number
  input: Parameters<typeof analyseSection>[0]
}

/** What the worker answers: the result, a geometry error, or an unexpected failure. */
export type AnalysisReply =
  | { id: number; result: ReturnType<typeof analyseSection> }
  | { id: number; sectionError: { message: string; part: number | null; ring: number | null; vertex: number | null } }
  | { id: number; failure: string }

parentPort?.on('message', (job: AnalysisJob) => {
  let reply: AnalysisReply
  try {
    reply = { id: job.id, result: analyseSection(job.input) }
  } catch (error) {
    reply = error instanceof SectionError
      ? { id: job.id, sectionError: { message: error.message, part: error.part, ring: error.ring, vertex: error.vertex } }
      : { id: job.id, failure: error instanceof Error ? (error.stack ?? error.message) : String(error) }
  }
  parentPort!.postMessage(reply)
})

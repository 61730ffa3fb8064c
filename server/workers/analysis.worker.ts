// The analysis worker thread (bundled on its own into .output/server/workers/analysis.mjs by the
// build, see nuxt.config.ts): runs shared/mechanics' analyseSection on one request at a time,
// off the server's event loop. It takes the request's JSON text and answers JSON text: a large
// section's rings cross the thread boundary as one string, not as hundreds of thousands of
// cloned arrays. Bad geometry comes back as the SectionError's fields.
import { parentPort } from 'node:worker_threads'
import { analysisAnswer, NOT_FINITE_MESSAGE, readAnalysisText, type BodyProblem } from '../../shared/analysis/answer'
import { analyseSection } from '../../shared/mechanics/analyze'
import { SectionError } from '../../shared/mechanics/types'

/** A job from the pool: an id to answer with and the request body as JSON text (read and checked here as the route would). */
export interface AnalysisJob {
  id: number
  text: string
}

/** What the worker answers: the answer as JSON text, a geometry error, or an unexpected failure. */
export type AnalysisReply =
  | { id: number; json: string }
  | { id: number; invalid: BodyProblem }
  | { id: number; sectionError: { message: string; part: number | null; ring: number | null; vertex: number | null; cut?: number | null } }
  | { id: number; failure: string }

parentPort?.on('message', (job: AnalysisJob) => {
  let reply: AnalysisReply
  try {
    const read = readAnalysisText(job.text)
    const answer = read.ok ? analysisAnswer(analyseSection(read.body), read.body.omit) : null
    reply = !read.ok
      ? { id: job.id, invalid: read.problem }
      : answer
      ? { id: job.id, json: JSON.stringify(answer) }
      : { id: job.id, sectionError: { message: NOT_FINITE_MESSAGE, part: null, ring: null, vertex: null } }
  } catch (error) {
    reply = error instanceof SectionError
      ? { id: job.id, sectionError: { message: error.message, part: error.part, ring: error.ring, vertex: error.vertex, cut: error.cut } }
      : { id: job.id, failure: error instanceof Error ? (error.stack ?? error.message) : String(error) }
  }
  parentPort!.postMessage(reply)
})

import type { H3Event } from 'h3'
import type { z } from 'zod'
import { findUnsafeText } from '../../shared/text/safe-text'

import { describeIssues } from '../../shared/text/issues'

/** Turns zod issues into one sentence a person can act on (shared with the analysis worker). */
export { describeIssues }

/** Parses `value` with `schema` or throws a 400 `{statusCode, message}` naming each bad field. */
export function parseOr400<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value)
  if (!result.success) {
    throw createError({ statusCode: 400, statusMessage: 'Bad Request', message: describeIssues(result.error) })
  }
  return result.data
}

/**
 * The request body parsed as JSON ({} when empty); a 400 naming the problem when it is not JSON.
 * Plain JSON.parse on the raw text: an analysis body can hold 200 000 vertices, and a key named
 * `__proto__` only becomes an own property that the zod schemas then drop.
 */
export async function readJsonBody(event: H3Event): Promise<unknown> {
  const raw = await readRawBody(event, 'utf8')
  if (!raw || !raw.trim()) return {}
  let value: unknown
  try {
    value = JSON.parse(raw)
  } catch (error) {
    const detail = error instanceof SyntaxError ? ` (${error.message})` : ''
    throw createError({ statusCode: 400, statusMessage: 'Bad Request', message: `The request body is not valid JSON${detail}.` })
  }
  // Every text field at once: no control characters or unpaired surrogates reach the database.
  const unsafe = findUnsafeText(value)
  if (unsafe) throw createError({ statusCode: 400, statusMessage: 'Bad Request', message: `${unsafe.path || 'The body'}: ${unsafe.problem}.`, data: { path: unsafe.path } })
  return value
}

/** The JSON body checked with `schema`, with Kernwise's error messages; an unreadable body is a 400 too. */
export async function readBodyAs<S extends z.ZodType>(event: H3Event, schema: S): Promise<z.output<S>> {
  return parseOr400(schema, (await readJsonBody(event)) ?? {})
}

/** getValidatedRouterParams with Kernwise's error messages. */
export async function paramsAs<S extends z.ZodType>(event: H3Event, schema: S): Promise<z.output<S>> {
  return getValidatedRouterParams(event, params => parseOr400(schema, params))
}

/** getValidatedQuery with Kernwise's error messages. */
export async function queryAs<S extends z.ZodType>(event: H3Event, schema: S): Promise<z.output<S>> {
  return getValidatedQuery(event, query => parseOr400(schema, query))
}

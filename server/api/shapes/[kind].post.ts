import { z } from 'zod'
import { DEFAULT_CHORD_TOLERANCE } from '../../../shared/shapes/arc'
import { SHAPE_KINDS, validateShapeParams } from '../../../shared/shapes/registry'

const Params = z.object({ kind: z.enum(SHAPE_KINDS, { error: `The shape kind is one of: ${SHAPE_KINDS.join(', ')}` }) })
const Query = z.object({
  tol: z.coerce.number({ error: 'tol is the chord tolerance in mm' }).positive('tol must be positive (mm)').max(50, 'tol is at most 50 mm').optional(),
})

/** Turns shape parameters (mm, degrees for a taper) into rings: `{outline, holes, chordTolerance}`. */
export default defineEventHandler(async (event) => {
  await requireUser(event)
  const { kind } = await paramsAs(event, Params)
  const { tol } = await queryAs(event, Query)
  const body = await readBodyAs(event, z.record(z.string(), z.unknown(), { error: 'The body must be a JSON object of shape parameters' }))
  const result = validateShapeParams(kind, body, tol)
  if (!result.ok) throw createError({ statusCode: 400, message: result.error.message, data: { field: result.error.field } })
  return { kind, params: result.value.params, chordTolerance: tol ?? DEFAULT_CHORD_TOLERANCE, ...result.geometry }
})

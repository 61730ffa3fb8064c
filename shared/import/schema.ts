import { z } from 'zod'
import { LENGTH_UNITS } from './units'
import type { LengthUnit } from './types'

/** The text fields of POST /api/imports (multipart): units override, chord tolerance (mm), the sketch to keep the file with, or a stored file to read again. */
export const ImportFields = z.object({
  units: z.enum(LENGTH_UNITS as [LengthUnit, ...LengthUnit[]], { error: `units must be one of: ${LENGTH_UNITS.join(', ')}` }).optional(),
  chordTolerance: z.coerce.number({ error: 'chordTolerance must be a number of mm' }).refine(v => Number.isFinite(v) && v >= 0.001 && v <= 10, 'chordTolerance lies between 0.001 and 10 mm').optional(),
  sketchId: z.uuid({ error: 'sketchId is not a valid sketch id' }).optional(),
  hash: z.string().regex(/^[0-9a-f]{64}$/, 'hash is the SHA-256 of a file imported before').optional(),
})

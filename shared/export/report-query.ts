import { z } from 'zod'

/** The query of GET /api/sketches/:id/report.pdf: paper A4 (default) or Letter, an optional revision, inline for a browser preview. */
export const ReportQuery = z.object({
  paper: z.string().optional().transform(p => (p ?? 'A4').toUpperCase()).pipe(z.enum(['A4', 'LETTER'], { error: 'paper is A4 or Letter' })),
  revision: z.string().regex(/^[1-9]\d{0,8}$/, 'revision is a revision number (1, 2, …)').optional(),
  download: z.enum(['0', '1']).optional(),
})

import type { AnalysisOutput } from '../../../shared/mechanics/analyze'
import type { SketchDocument } from '../../../shared/sketch/document'

/** Paper sizes of the calculation sheet. */
export type Paper = 'A4' | 'LETTER'

/** The approval of a revision, once revisions exist; null marks the working state ("not checked"). */
export interface ReportApproval {
  revision: number
  approvedBy: string
  approvedAt: Date
}

/** Everything one calculation sheet needs: identity for the title block, the document, its analysis and the fonts. */
export interface ReportInput {
  paper: Paper
  workspace: string
  project: string
  title: string
  engineer: string
  /** The checker's name, or null ("—") while nobody has checked it. */
  checker: string | null
  approval: ReportApproval | null
  /** The revision the sheet prints (`?revision=N`) and its review status; null or absent for the working state. */
  revision?: { number: number; status: string } | null
  date: Date
  doc: SketchDocument
  /** The analysis of `doc` under its shown loading (with `checkTable`, and `torsion` with its mesh study for the torsion page), or null with `analysisError`. */
  analysis: AnalysisOutput | null
  analysisError: string | null
  /** Why `analysis.torsion` is missing when the torsion solve refused the section (the sheet says so); null otherwise. */
  torsionError?: string | null
  fonts: { regular: Uint8Array; bold: Uint8Array }
}

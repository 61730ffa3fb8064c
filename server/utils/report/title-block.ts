import type PDFDocument from 'pdfkit'
import { pdfText } from './text'
import type { ReportInput } from './types'

type Doc = InstanceType<typeof PDFDocument>

/** Top of the content area (pt): below the title block. */
export const CONTENT_TOP = 112

/**
 * The status line of the title block: an approved revision names who approved it and when; any
 * other revision (frozen, submitted, returned) and the working state are "not checked".
 */
export function statusText(input: ReportInput): string {
  if (input.approval) return `Approved by ${input.approval.approvedBy} on ${input.approval.approvedAt.toISOString().slice(0, 10)}`
  const r = input.revision
  if (!r) return 'NOT CHECKED (working state)'
  // The checker has a cell of its own; the status says where the review stands, short enough for its cell.
  const state = r.status === 'submitted' ? 'submitted' : r.status === 'returned' ? 'returned' : 'frozen'
  return `NOT CHECKED (revision ${r.number}, ${state})`
}

/** The revision cell: the approved or printed revision's number, else "working state". */
export function revisionText(input: ReportInput): string {
  const n = input.approval?.revision ?? input.revision?.number
  return n === undefined ? 'working state' : String(n)
}

/**
 * Draws the title block at the top of page `index` (0-based) of `count`: workspace, project,
 * sketch, revision, engineer, checker, status, date and page x of y, and the "not checked"
 * mark at the foot of every page of a working state.
 */
export function drawTitleBlock(doc: Doc, input: ReportInput, index: number, count: number): void {
  const left = doc.page.margins.left
  const width = doc.page.width - left - doc.page.margins.right
  const top = 28
  const rowH = 22
  const cells: [string, string][][] = [
    [['Workspace', input.workspace], ['Project', input.project || '—'], ['Sketch', input.title]],
    [['Revision', revisionText(input)], ['Engineer', input.engineer], ['Checker', input.checker ?? '—']],
    [['Status', statusText(input)], ['Date', input.date.toISOString().slice(0, 10)], ['Page', `${index + 1} of ${count}`]],
  ]
  const colW = width / 3
  doc.save()
  doc.lineWidth(0.6).strokeColor('#444')
  doc.rect(left, top, width, rowH * 3).stroke()
  cells.forEach((row, r) => {
    row.forEach(([label, value], c) => {
      const x = left + c * colW
      const y = top + r * rowH
      if (c > 0) doc.moveTo(x, y).lineTo(x, y + rowH).stroke()
      doc.font('regular').fontSize(6).fillColor('#666').text(label.toUpperCase(), x + 4, y + 3, { lineBreak: false })
      const alert = label === 'Status' && !input.approval
      doc.font('bold').fontSize(8.5).fillColor(alert ? '#b3261e' : '#111').text(pdfText(value), x + 4, y + 11, { width: colW - 8, lineBreak: false, ellipsis: true })
    })
    if (r > 0) doc.moveTo(left, top + r * rowH).lineTo(left + width, top + r * rowH).stroke()
  })
  // The foot of the page: the mark of a working state, and Kernwise's name.
  const footY = doc.page.height - 36
  // Text below the bottom margin would start a new page: lift the margin while writing the foot.
  const margin = doc.page.margins.bottom
  doc.page.margins.bottom = 0
  doc.font('regular').fontSize(7).fillColor('#666')
    .text(pdfText(`Kernwise calculation sheet · ${input.title}`), left, footY, { width: width / 2, lineBreak: false })
  if (!input.approval) {
    doc.font('bold').fontSize(8).fillColor('#b3261e').text('NOT CHECKED', left + width / 2, footY, { width: width / 2, align: 'right', lineBreak: false })
  }
  doc.page.margins.bottom = margin
  doc.restore()
}

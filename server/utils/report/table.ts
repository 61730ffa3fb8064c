import type PDFDocument from 'pdfkit'
import { pdfText } from './text'

type Doc = InstanceType<typeof PDFDocument>

/** A table column: heading, width in pt and alignment of its cells. */
export interface Column {
  header: string
  width: number
  align?: 'left' | 'right'
}

const ROW = 11

/** Starts a section heading at the cursor, on a new page when fewer than `needs` pt remain. */
export function heading(doc: Doc, text: string, needs = 60): void {
  if (doc.y + needs > doc.page.height - doc.page.margins.bottom) doc.addPage()
  doc.moveDown(0.6).font('bold').fontSize(10.5).fillColor('#111').text(pdfText(text), doc.page.margins.left, doc.y)
  doc.moveDown(0.25)
}

/** A paragraph in the body font. */
export function para(doc: Doc, text: string, size = 8.5): void {
  doc.font('regular').fontSize(size).fillColor('#222').text(pdfText(text), doc.page.margins.left, doc.y, { width: doc.page.width - doc.page.margins.left - doc.page.margins.right })
  doc.moveDown(0.3)
}

/**
 * A table at the cursor that runs over as many pages as it needs, repeating its heading row
 * (marked "continued") on each new page. Cells are one line each, cut with an ellipsis.
 */
export function table(doc: Doc, columns: Column[], rows: string[][], title?: string): void {
  const left = doc.page.margins.left
  const bottom = () => doc.page.height - doc.page.margins.bottom
  const head = (continued: boolean) => {
    let x = left
    doc.font('bold').fontSize(7.5).fillColor('#333')
    if (continued && title) {
      doc.text(pdfText(`${title} (continued)`), left, doc.y)
    }
    const y = doc.y
    for (const c of columns) {
      doc.text(pdfText(c.header), x + 2, y, { width: c.width - 4, align: c.align ?? 'left', lineBreak: false })
      x += c.width
    }
    doc.moveTo(left, y + ROW).lineTo(x, y + ROW).lineWidth(0.5).strokeColor('#888').stroke()
    doc.y = y + ROW + 2
  }
  if (doc.y + 3 * ROW > bottom()) doc.addPage()
  head(false)
  rows.forEach((row, r) => {
    if (doc.y + ROW > bottom()) {
      doc.addPage()
      head(true)
    }
    const y = doc.y
    if (r % 2 === 1) doc.rect(left, y - 1, columns.reduce((s, c) => s + c.width, 0), ROW).fillColor('#f3f4f4').fill()
    let x = left
    doc.font('regular').fontSize(7.5).fillColor('#111')
    row.forEach((cell, i) => {
      const c = columns[i]!
      doc.text(pdfText(cell), x + 2, y, { width: c.width - 4, height: ROW, align: c.align ?? 'left', lineBreak: false, ellipsis: true })
      x += c.width
    })
    doc.y = y + ROW
  })
  doc.x = left
  doc.moveDown(0.4)
}

import { IdParams } from '../../../../../shared/auth/schemas'
import { CompareQuery } from '../../../../../shared/team/review'
import { compareDocuments } from '../../../../utils/compare'

/**
 * Compares two revisions: both documents (the page draws their outlines over each other) and a
 * table of the section properties of each, with the difference (to − from) and its percentage.
 */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch } = await requireSketchAccess(event, id, 'view')
  const query = await queryAs(event, CompareQuery)
  const [from, to] = [await findRevision(sketch.id, query.from), await findRevision(sketch.id, query.to)]
  const a = readDocument(from.document)
  const b = readDocument(to.document)
  return {
    from: { number: from.number, note: from.note, document: a },
    to: { number: to.number, note: to.note, document: b },
    ...compareDocuments(a, b),
  }
})

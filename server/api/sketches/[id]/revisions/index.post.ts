import { IdParams } from '../../../../../shared/auth/schemas'
import { RevisionBody } from '../../../../../shared/team/review'

/** Freezes the working state as the next numbered revision with a note (edit access). 201 `{number}`. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, user } = await requireSketchAccess(event, id, 'edit')
  const body = await readBodyAs(event, RevisionBody)
  const db = await useDb()
  const revision = await db.sequelize.transaction(async (transaction) => {
    const max = await db.Revision.max('number', { where: { sketchId: sketch.id }, transaction })
    const number = (typeof max === 'number' ? max : 0) + 1
    return db.Revision.create({ sketchId: sketch.id, number, note: body.note, title: sketch.title, document: sketch.document, createdBy: user.id }, { transaction })
  })
  await recordActivity(sketch.id, user.id, 'revision', `revision ${revision.number}${body.note ? `: ${body.note}` : ''}`)
  setResponseStatus(event, 201)
  return { number: revision.number, note: revision.note, status: revision.status, createdAt: revision.createdAt.toISOString() }
})

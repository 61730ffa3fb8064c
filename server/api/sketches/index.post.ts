import { CreateSketchBody } from '../../../shared/sketch/api'
import { emptyDocument } from '../../../shared/sketch/document'

/** Creates a sketch (an empty document unless one is sent). */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, 'editSketches')
  const body = await readBodyAs(event, CreateSketchBody)
  const db = await useDb()
  const sketch = await db.Sketch.create({
    ownerId: user.id,
    title: body.title,
    project: body.project,
    description: body.description,
    document: JSON.stringify(body.document ?? emptyDocument()),
  })
  await recordActivity(sketch.id, user.id, 'created')
  setResponseStatus(event, 201)
  return sketchJson(sketch, true)
})

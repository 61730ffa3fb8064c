import { IdParams } from '../../../../shared/auth/schemas'

/** Copies a sketch I can read into a new draft of mine ("… (copy)"); my role must allow editing sketches. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch: source, user } = await requireSketchAccess(event, id, 'view')
  await requireRole(event, 'editSketches')
  const db = await useDb()
  const copy = await db.Sketch.create({
    ownerId: user.id,
    title: `${source.title} (copy)`.slice(0, 160),
    project: source.project,
    description: source.description,
    document: source.document,
  })
  await recordActivity(copy.id, user.id, 'created', `copied from “${source.title}”`)
  setResponseStatus(event, 201)
  return sketchJson(copy, true)
})

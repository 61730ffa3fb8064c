import { IdParams } from '../../../../shared/auth/schemas'

/** Copies one of my sketches into a new draft ("… (copy)"). */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, 'editSketches')
  const { id } = await paramsAs(event, IdParams)
  const source = await findOwnSketch(event, user, id)
  const db = await useDb()
  const copy = await db.Sketch.create({
    ownerId: user.id,
    title: `${source.title} (copy)`.slice(0, 160),
    project: source.project,
    description: source.description,
    document: source.document,
  })
  setResponseStatus(event, 201)
  return sketchJson(copy, true)
})

import { IdParams } from '../../../shared/auth/schemas'

/** One of my sketches, with its document. */
export default defineEventHandler(async (event) => {
  const user = await requireUser(event)
  const { id } = await paramsAs(event, IdParams)
  return sketchJson(await findOwnSketch(event, user, id), true)
})

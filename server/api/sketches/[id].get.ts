import { IdParams } from '../../../shared/auth/schemas'

/** One sketch I have access to, with its document, my access, the review and the approval. */
export default defineEventHandler(async (event) => {
  const { id } = await paramsAs(event, IdParams)
  const { sketch, access, user } = await requireSketchAccess(event, id, 'view')
  return sketchDetail(sketch, access, user)
})

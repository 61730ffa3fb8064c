/** Opens, migrates (and, for npm start, seeds) the database as the server starts, not on first request. */
export default defineNitroPlugin(() => {
  useDb()
    .then(() => console.log('[kernwise] database ready'))
    .catch(error => console.error('[kernwise] database failed to open:', error))
})

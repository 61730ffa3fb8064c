/** Liveness with a real database round trip. */
export default defineEventHandler(async (event) => {
  try {
    const db = await useDb()
    const [rows] = await db.sequelize.query('SELECT 1 AS one')
    const one = (rows as { one: number }[])[0]?.one
    if (one !== 1) throw new Error('unexpected answer')
    return { status: 'ok', db: 'ok' }
  } catch (error) {
    console.error('[kernwise] health check failed:', error)
    setResponseStatus(event, 503)
    return { status: 'degraded', db: 'unavailable' }
  }
})

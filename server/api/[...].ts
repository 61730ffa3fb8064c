/** Any /api path no route serves: 404 JSON for everyone (signed in or not), never the sign-in page. */
export default defineEventHandler((event) => {
  throw createError({ statusCode: 404, statusMessage: 'Not Found', message: `There is no API route ${event.method} ${event.path.split('?')[0]}. See the README's API section.` })
})

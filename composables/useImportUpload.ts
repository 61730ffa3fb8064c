import type { ImportResult, LengthUnit } from '#shared/import/types'

/**
 * Uploads a file to POST /api/imports with upload progress (XMLHttpRequest: fetch reports none).
 * `progress` runs 0..1 while sending; `error` holds the server's message on a refused file.
 */
export function useImportUpload() {
  const progress = ref<number | null>(null)
  const error = ref<string | null>(null)
  const busy = ref(false)

  function send(file: Blob, name: string, fields: { units?: LengthUnit | null; sketchId?: string; chordTolerance?: number }): Promise<ImportResult | null> {
    const form = new FormData()
    form.set('file', file, name)
    if (fields.units) form.set('units', fields.units)
    if (fields.sketchId) form.set('sketchId', fields.sketchId)
    if (fields.chordTolerance) form.set('chordTolerance', String(fields.chordTolerance))
    busy.value = true
    error.value = null
    progress.value = 0
    return new Promise((resolve) => {
      const xhr = new XMLHttpRequest()
      xhr.open('POST', '/api/imports')
      xhr.responseType = 'json'
      xhr.setRequestHeader('accept', 'application/json')
      xhr.upload.onprogress = (e) => { if (e.lengthComputable) progress.value = e.loaded / e.total }
      xhr.onload = () => {
        busy.value = false
        progress.value = null
        const body = xhr.response as (ImportResult & { message?: string }) | null
        if (xhr.status >= 200 && xhr.status < 300 && body) return resolve(body)
        error.value = body?.message ?? `The import failed (HTTP ${xhr.status}).`
        resolve(null)
      }
      xhr.onerror = () => {
        busy.value = false
        progress.value = null
        error.value = 'The server could not be reached. Check the connection and try again.'
        resolve(null)
      }
      xhr.send(form)
    })
  }

  return { progress, error, busy, send }
}

/** C0 and C1 control characters and DEL, except tab, line feed and carriage return (allowed in descriptions). */
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/
/** A high surrogate not followed by a low one, or a low one not preceded by a high one. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/

/** What is wrong with one string: a control character or an unpaired surrogate (with its 1-based position and code), or null. */
export function textProblem(text: string): string | null {
  const control = CONTROL.exec(text)
  if (control) return `contains a control character (U+${control[0].charCodeAt(0).toString(16).toUpperCase().padStart(4, '0')}) at character ${control.index + 1}; remove it`
  const lone = LONE_SURROGATE.exec(text)
  if (lone) return `contains half of a character (an unpaired UTF-16 surrogate) at character ${lone.index + 1}; retype that character`
  return null
}

/**
 * The first string (key or value) in a parsed JSON value that holds a control character or an
 * unpaired surrogate, as `{path, problem}` (path like "document.parts.2.name"), or null if none.
 * Arrays of numbers (the bulk of a section) are skipped quickly.
 */
export function findUnsafeText(value: unknown, path: string[] = []): { path: string; problem: string } | null {
  if (typeof value === 'string') {
    const problem = textProblem(value)
    return problem ? { path: path.join('.'), problem } : null
  }
  if (value === null || typeof value !== 'object') return null
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const v = value[i]
      if (v === null || typeof v === 'number' || typeof v === 'boolean') continue
      const hit = findUnsafeText(v, [...path, String(i)])
      if (hit) return hit
    }
    return null
  }
  for (const key of Object.keys(value)) {
    const keyProblem = textProblem(key)
    if (keyProblem) return { path: [...path, key].join('.'), problem: `has a field name that ${keyProblem}` }
    const hit = findUnsafeText((value as Record<string, unknown>)[key], [...path, key])
    if (hit) return hit
  }
  return null
}

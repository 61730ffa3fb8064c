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

/** Walks `value`; on a bad string returns its problem and fills `path` (leaf first) on the way back. */
function walk(value: unknown, path: string[]): string | null {
  if (typeof value === 'string') return textProblem(value)
  if (value === null || typeof value !== 'object') return null
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const v = value[i]
      if (v === null || typeof v !== 'object' && typeof v !== 'string') continue
      const problem = walk(v, path)
      if (problem) { path.push(String(i)); return problem }
    }
    return null
  }
  for (const key in value) {
    const keyProblem = textProblem(key)
    if (keyProblem) { path.push(key); return `has a field name that ${keyProblem}` }
    const problem = walk((value as Record<string, unknown>)[key], path)
    if (problem) { path.push(key); return problem }
  }
  return null
}

/**
 * The first string (key or value) in a parsed JSON value that holds a control character or an
 * unpaired surrogate, as `{path, problem}` (path like "document.parts.2.name"), or null if none.
 * Numbers (the bulk of a section) cost one type check each; no path is built unless one is found.
 */
export function findUnsafeText(value: unknown): { path: string; problem: string } | null {
  const path: string[] = []
  const problem = walk(value, path)
  return problem ? { path: path.reverse().join('.'), problem } : null
}

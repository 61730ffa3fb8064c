/**
 * A new random id for a part, hole, load, case or combination: `prefix-` and 12 hex digits from
 * the platform's UUID generator (random, never a counter, so copies and merges never collide).
 */
export function newId(prefix: string): string {
  const uuid = globalThis.crypto?.randomUUID?.() ?? fallbackUuid()
  return `${prefix}-${uuid.replace(/-/g, '').slice(0, 12)}`
}

// Only for very old runtimes without crypto.randomUUID; ids need to be unique, not secret.
function fallbackUuid(): string {
  let s = ''
  for (let i = 0; i < 32; i++) s += Math.floor(Math.random() * 16).toString(16)
  return s
}

import { ImportError } from './types'

/** Largest import file (bytes): 10 MB. */
export const MAX_IMPORT_BYTES = 10 * 1024 * 1024

/**
 * What a file is by its content (never its name): an ASCII DXF starts with group code 0 and
 * SECTION (after optional 999 comments); coordinates are text of numbers and delimiters.
 * Throws ImportError for a binary DXF, a binary or unknown file.
 */
export function detectFormat(bytes: Uint8Array): { format: 'dxf' | 'csv'; text: string } {
  const head = new TextDecoder('latin1').decode(bytes.subarray(0, 32))
  if (head.startsWith('AutoCAD Binary DXF')) throw new ImportError('This is a binary DXF; save the drawing as an ASCII DXF and import that.')
  if (bytes.subarray(0, 8192).includes(0)) throw new ImportError('The file is binary: Kernwise imports ASCII DXF drawings and coordinates as CSV or text.')
  let text: string
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes)
  } catch {
    text = new TextDecoder('latin1').decode(bytes)
  }
  text = text.replace(/^\uFEFF/, '')
  if (/^\s*0\s*\r?\n\s*SECTION\s*$/m.test(text.replace(/^(\s*999\r?\n[^\n]*\n)*/, '').split('\n').slice(0, 2).join('\n'))) return { format: 'dxf', text }
  if (/^[\s\d.,;:+\-eE\t]*$/.test(text.slice(0, 4096).split(/\r?\n/).slice(1).join('\n')) && /\d/.test(text)) return { format: 'csv', text }
  throw new ImportError('The file is neither an ASCII DXF drawing nor coordinates (CSV or text of x, y numbers).')
}

import { ImportError } from './types'

/**
 * Checks the group-code / value pairs of an ASCII DXF before dxf-parser reads it (which only
 * warns on a broken pair): every code line a whole number, every coordinate or real (codes 10-59,
 * 140-149, 210-239) a number. Throws ImportError naming the 1-based line at fault.
 */
export function scanDxf(text: string): void {
  const lines = text.split(/\r?\n/)
  // A trailing newline leaves one empty line at the end.
  if (lines[lines.length - 1] === '') lines.pop()
  let sawEntities = false
  for (let i = 0; i < lines.length; i += 2) {
    const raw = lines[i]!
    if (!/^\s*-?\d{1,4}\s*$/.test(raw)) {
      throw new ImportError(`Line ${i + 1}: "${clip(raw)}" should be a DXF group code (a whole number); the file is broken or not an ASCII DXF.`, i + 1)
    }
    if (i + 1 >= lines.length) throw new ImportError(`Line ${i + 1}: group code ${raw.trim()} has no value; the file ends early.`, i + 1)
    const code = Number(raw)
    const value = lines[i + 1]!
    if (isReal(code) && !/^\s*[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?\s*$/.test(value)) {
      throw new ImportError(`Line ${i + 2}: "${clip(value)}" should be a number (group code ${code}).`, i + 2)
    }
    if (code === 2 && value.trim() === 'ENTITIES') sawEntities = true
  }
  if (!sawEntities) throw new ImportError('The DXF has no ENTITIES section: there is nothing to import.')
}

function isReal(code: number): boolean {
  return (code >= 10 && code <= 59) || (code >= 140 && code <= 149) || (code >= 210 && code <= 239)
}

function clip(s: string): string {
  return s.length > 40 ? `${s.slice(0, 40)}…` : s
}

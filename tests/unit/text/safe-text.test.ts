import { describe, expect, it } from 'vitest'
import { findUnsafeText, textProblem } from '../../../shared/text/safe-text'

// Code points from the Unicode Standard: C0 controls U+0000-001F, DEL U+007F, C1 controls
// U+0080-009F; surrogates U+D800-DBFF (high) and U+DC00-DFFF (low) only valid as a pair.
describe('textProblem(text)', () => {
  it.each([
    ['NUL', 'a\u0000b', /U\+0000\) at character 2/],
    ['bell', '\u0007', /U\+0007/],
    ['DEL', 'x\u007F', /U\+007F/],
    ['C1 NEL', '\u0085', /U\+0085/],
    ['lone high surrogate', 'ab\uD800', /unpaired .* at character 3/],
    ['lone low surrogate', '\uDC00', /unpaired/],
  ])('names %s', (_name, text, message) => {
    expect(textProblem(text)).toMatch(message)
  })

  it.each([['plain', 'Crane column C3'], ['tab and newlines', 'a\tb\nc\r\nd'], ['a surrogate pair (emoji)', '😀'], ['accents', 'Ærø déjà']])('accepts %s', (_name, text) => {
    expect(textProblem(text)).toBeNull()
  })
})

describe('findUnsafeText(value)', () => {
  it('gives the dotted path of the first bad string, keys included', () => {
    expect(findUnsafeText({ title: 'ok', document: { parts: [{ name: 'ok' }, { name: 'bad\u0001' }] } })?.path).toBe('document.parts.1.name')
    expect(findUnsafeText({ ['k\u0002']: 1 })?.problem).toMatch(/field name/)
  })

  it('passes numbers, booleans and nulls, however many', () => {
    expect(findUnsafeText({ outline: Array.from({ length: 1000 }, (_, i) => [i, -i]), on: true, n: null })).toBeNull()
  })
})

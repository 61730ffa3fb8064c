import { describe, expect, it } from 'vitest'
import { DARK_CANVAS, LIGHT_CANVAS, type CanvasPalette } from '#shared/canvas/palette'

/** WCAG 2.1 relative luminance and contrast ratio of two opaque sRGB colours (the standard's formula). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map(i => parseInt(hex.slice(i, i + 2), 16) / 255).map(c => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4))
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x)
  return (hi! + 0.05) / (lo! + 0.05)
}

// Roles drawn as text or lines on the background; the key is each one's contrast in the light theme.
const TEXT: (keyof CanvasPalette)[] = ['ink', 'inkSoft', 'alarm', 'core', 'onset', 'lifted', 'resultantIn', 'resultantOut', 'accentText']
const LINES: (keyof CanvasPalette)[] = ['partStroke', 'selectedStroke', 'fault', 'opening', 'accent', 'principal', 'helper', 'torsion', 'loadFill']

describe('canvas palettes', () => {
  it('both palettes name the same roles', () => {
    expect(Object.keys(DARK_CANVAS).sort()).toEqual(Object.keys(LIGHT_CANVAS).sort())
  })

  it.each(TEXT)('dark %s text meets WCAG AA (4.5:1) on the dark canvas, as the light one does on white', (role) => {
    expect(contrast(LIGHT_CANVAS[role] as string, LIGHT_CANVAS.background)).toBeGreaterThanOrEqual(4.5)
    expect(contrast(DARK_CANVAS[role] as string, DARK_CANVAS.background)).toBeGreaterThanOrEqual(4.5)
  })

  it.each(LINES)('dark %s lines keep at least the 3:1 of WCAG 1.4.11 (graphics) and about the light contrast', (role) => {
    const light = contrast(LIGHT_CANVAS[role] as string, LIGHT_CANVAS.background)
    const dark = contrast(DARK_CANVAS[role] as string, DARK_CANVAS.background)
    expect(dark).toBeGreaterThanOrEqual(3)
    expect(dark).toBeGreaterThanOrEqual(Math.min(light, 4.5) * 0.8)
  })

  it('the halo behind labels is the background, so text reads over lines in both themes', () => {
    expect(LIGHT_CANVAS.halo).toBe(LIGHT_CANVAS.background)
    expect(DARK_CANVAS.halo).toBe(DARK_CANVAS.background)
  })

  it('compression stays darker than tension in both field ramps (apart in greyscale, not by hue alone)', () => {
    for (const p of [LIGHT_CANVAS, DARK_CANVAS]) expect(luminance(p.field.compression)).toBeLessThan(luminance(p.field.tension))
  })
})

import { canvasPalette, type CanvasPalette } from '#shared/canvas/palette'

/** The drawing's colours for the theme in use (stores/theme.ts), as one reactive palette. */
export function useCanvasPalette(): ComputedRef<CanvasPalette> {
  const theme = useThemeStore()
  return computed(() => canvasPalette(theme.dark))
}

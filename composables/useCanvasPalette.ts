import { canvasPalette, type CanvasPalette } from '#shared/canvas/palette'

/** The drawing's colours for the theme in use (the layout's `kw-dark` state), as one reactive palette. */
export function useCanvasPalette(): ComputedRef<CanvasPalette> {
  const dark = useState('kw-dark', () => false)
  return computed(() => canvasPalette(dark.value))
}

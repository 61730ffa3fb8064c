import { stressScale, type StressScale } from '#shared/stress/scale'

/** The stress colour scale of the current frame in the theme's field colours (canvas and legend share it). */
export function useFieldScale(): ComputedRef<StressScale> {
  const view = useStressViewStore()
  const pal = useCanvasPalette()
  return computed(() => stressScale(view.frame.limit, pal.value.field))
}

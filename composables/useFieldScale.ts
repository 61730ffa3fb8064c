import { stressScale, type StressScale } from '#shared/stress/scale'

/** The last scale made, by its limit and ramp: readers in one frame (canvas, legend) share one. */
let last: { limit: number; field: object; scale: StressScale } | null = null

/**
 * The stress colour scale of the current frame in the theme's field colours (canvas and legend
 * share it). The same scale object comes back while the limit and the theme stay, so what reads
 * it (the legend's ticks and bar) is not recomputed by a frame that changes neither.
 */
export function useFieldScale(): ComputedRef<StressScale> {
  const view = useStressViewStore()
  const pal = useCanvasPalette()
  return computed(() => {
    const limit = view.frame.limit
    const field = pal.value.field
    if (last && last.limit === limit && last.field === field) return last.scale
    last = { limit, field, scale: stressScale(limit, field) }
    return last.scale
  })
}

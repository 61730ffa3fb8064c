import { hitPoint } from '#shared/editor/hit'
import type { Point } from '#shared/geometry/types'
import type { Gesture } from '#shared/editor/gesture'
import { snapLoadPoint } from '#shared/stress/frame'

/** Pick and snap tolerances on screen (px). */
const LOAD_HIT_PX = 9
const LOAD_SNAP_PX = 8
const COMMENT_HIT_PX = 11

type OverlayGesture = Extract<Gesture, { kind: 'load' | 'cut' }>

/**
 * The canvas gestures that explore the drawing without editing its parts: a click on a comment
 * marker, a dragged load handle and the cut line of the stress view. Part of the canvas's one input
 * path (useCanvasInput calls these first); hit tests in mm, no Konva node listens.
 */
export function useOverlayInput() {
  const sketch = useSketchStore()
  const view = useViewportStore()
  const stress = useStressViewStore()
  const comments = useCommentsStore()

  /**
   * A pointer-down the overlay takes at `w` (mm): a comment marker (its thread is focused, the page
   * opens the list; no gesture follows), the cut line in cut mode, or a load handle. Null: not taken.
   */
  function press(w: Point): Gesture | null {
    const marker = hitPoint(comments.markers, w, COMMENT_HIT_PX / view.zoom)
    if (marker) { comments.focused = marker; return { kind: 'none' } }
    if (!stress.section) return null
    if (stress.cutMode) {
      stress.cut = { p0: [w[0], w[1]], p1: [w[0], w[1]] }
      return { kind: 'cut', p0: w }
    }
    const id = hitPoint(stress.loads, w, LOAD_HIT_PX / view.zoom)
    return id ? { kind: 'load', id } : null
  }

  /** Follows the pointer at `w` (mm) for an overlay gesture. */
  function move(g: OverlayGesture, w: Point, e: PointerEvent): void {
    if (g.kind === 'cut') stress.cut = { p0: [g.p0[0], g.p0[1]], p1: [w[0], w[1]] }
    else dragLoad(g.id, w, e)
  }

  /** Moves the dragged load for this frame (snapping to the centroid, the core's corners, the principal axes; Alt holds it off). */
  function dragLoad(id: string, w: Point, e: PointerEvent): void {
    const t0 = performance.now()
    const s = stress.section
    if (!s) return
    const at: [number, number] = [w[0], w[1]]
    const what = e.altKey ? null : snapLoadPoint(w[0], w[1], { centroid: [s.props.centroid.x, s.props.centroid.y], kern: s.kern, theta: s.props.theta }, LOAD_SNAP_PX / view.zoom, at)
    stress.snap = what
    stress.setDrag(id, at[0], at[1])
    // For npm run bench:ui: derive the frame, paint the stress layer, and let Vue update the panels.
    void nextTick(() => performance.measure('drag-update', { start: t0, end: performance.now() }))
  }

  /** Ends an overlay gesture: a dragged load is committed where it was let go. */
  function end(g: OverlayGesture): void {
    if (g.kind === 'cut') { stress.cutMode = false; return }
    const at = stress.endDrag()
    const load = sketch.loads.find(l => l.id === g.id)
    if (at && load && (at.x !== load.x || at.y !== load.y)) sketch.moveLoad(g.id, at.x, at.y)
  }

  /** Drops an overlay gesture (Esc, a cancelled pointer): nothing is committed. */
  function cancel(g: OverlayGesture): void {
    if (g.kind === 'load') stress.endDrag()
    else stress.cutMode = false
  }

  return { press, move, end, cancel }
}

/** Whether a gesture belongs to the overlay (useOverlayInput). */
export function isOverlayGesture(g: Gesture): g is OverlayGesture {
  return g.kind === 'load' || g.kind === 'cut'
}

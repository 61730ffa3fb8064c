import type { Ref } from 'vue'
import { SHAPES } from '#shared/shapes/registry'
import { hitEdge, segmentDistance2 } from '#shared/editor/hit'
import { snapPoint, snapToGrid } from '#shared/editor/snap'
import type { Point } from '#shared/geometry/types'
import { angleDeg, draftPart, pickAt, ringsExcept, roundAngle, type Cue, type Gesture } from '#shared/editor/gesture'
import { partsBounds } from '#shared/editor/parts'

/** Pick and snap tolerances on screen (px). */
const HIT_PX = 7

/**
 * The canvas's one input path: DOM pointer events on the canvas box, hit-tested in mm by pure
 * helpers (parts, vertices, edges, the rotation handle; comment markers, load handles and the cut
 * line through useOverlayInput), turned into gestures. No Konva node listens. A gesture that ends
 * in a parts change (vertex drag, move, rotation) asks the display store to hold the drawing for
 * its analysis (stores/display.ts); its ghost stays drawn (`shown`) while it is held.
 */
export function useCanvasInput(box: Ref<HTMLElement | null>) {
  const sketch = useSketchStore()
  const display = useDisplayStore()
  const selection = useSelectionStore()
  const view = useViewportStore()
  const toasts = useToastStore()
  const overlay = useOverlayInput()

  const gesture = shallowRef<Gesture>({ kind: 'none' })
  const cue = shallowRef<Cue>(null)
  const space = ref(false)
  /** The last gesture that ended: drawn as it ended while the display holds its change. */
  const settling = shallowRef<Gesture | null>(null)
  const shown = computed<Gesture>(() => (gesture.value.kind === 'none' && display.holding !== null && settling.value ? settling.value : gesture.value))

  const selectedParts = computed(() => sketch.parts.filter(p => selection.partIds.includes(p.id)))
  const selBounds = computed(() => partsBounds(selectedParts.value))
  /** The free-rotation handle sits 28 px above the selection box. */
  const rotateHandle = computed<Point | null>(() => {
    const b = selBounds.value
    return b && selection.tool === 'pick' ? [(b.minX + b.maxX) / 2, b.maxY + 28 / view.zoom] : null
  })

  function local(e: MouseEvent): Point {
    const r = box.value!.getBoundingClientRect()
    return [e.clientX - r.left, e.clientY - r.top]
  }

  function allRings() {
    return sketch.parts.flatMap(p => [p.outline, ...p.holes.map(h => h.ring)])
  }

  function snapped(p: Point, e: MouseEvent, rings: readonly (readonly Point[])[] = allRings()): Point {
    const s = sketch.settings
    if (!s.snap || e.altKey) { cue.value = null; return p }
    const res = snapPoint(p, { grid: s.gridMm, rings, tol: HIT_PX / view.zoom })
    cue.value = res.cue.kind === 'none' ? null : res.cue
    return res.point
  }

  function run(f: () => void): void {
    try { f() } catch (err) { toasts.push('error', (err as Error).message) }
  }

  function done(id: string): void {
    selection.select(id)
    selection.setTool('pick')
    cue.value = null
  }

  function onPointerDown(e: PointerEvent): void {
    box.value?.focus({ preventScroll: true })
    const s = local(e)
    const w = view.toWorld(s[0], s[1])
    if (e.button === 1 || (e.button === 0 && space.value)) {
      gesture.value = { kind: 'pan', last: s }
      box.value!.setPointerCapture(e.pointerId)
      e.preventDefault()
      return
    }
    if (e.button !== 0) return
    box.value!.setPointerCapture(e.pointerId)
    // A comment marker, the cut line or a load handle: the overlay's gestures come first.
    const taken = overlay.press(w)
    if (taken) { gesture.value = taken; return }
    // A reader (view or comment share) pans and drags loads to explore; the parts stay as drawn.
    if (useAccessStore().readOnly) return
    // A touch on the phone view explores loads only: it never edits the drawing.
    if (e.pointerType === 'touch' && selection.tool === 'pick' && window.matchMedia?.('(max-width: 640px)').matches) return
    const tol = HIT_PX / view.zoom
    const tool = selection.tool
    if (tool === 'pick') {
      const b = selBounds.value
      const hit = pickAt(sketch.parts, selection.partIds, w, tol, rotateHandle.value, b ? [(b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2] : null)
      if (hit.kind === 'rotate') { gesture.value = hit.gesture; return }
      if (hit.kind === 'vertex') { selection.selectVertex(hit.vertex); gesture.value = hit.gesture; return }
      if (hit.kind === 'none') { if (!e.shiftKey) selection.clear(); return }
      if (e.shiftKey) { selection.select(hit.id, true); return }
      if (!selection.partIds.includes(hit.id)) selection.select(hit.id)
      else selection.selectVertex(null)
      gesture.value = { kind: 'move', ids: [...selection.partIds], start: w, delta: [0, 0], moved: false }
      return
    }
    const p = snapped(w, e)
    if (tool === 'box') gesture.value = { kind: 'box', a: p, b: p }
    else if (tool === 'round' || tool === 'tube') gesture.value = { kind: 'round', centre: p, r: 0, tube: tool === 'tube' }
    else if (tool === 'outline') addOutlinePoint(p)
  }

  function addOutlinePoint(p: Point): void {
    const g = gesture.value
    const pts = g.kind === 'outline' ? g.points : []
    const first = pts[0]
    if (first && pts.length >= 3 && Math.hypot(first[0] - p[0], first[1] - p[1]) <= HIT_PX / view.zoom) { finishOutline(); return }
    const last = pts.at(-1)
    if (last && last[0] === p[0] && last[1] === p[1]) return
    gesture.value = { kind: 'outline', points: [...pts, p], hover: p }
  }

  function onPointerMove(e: PointerEvent): void {
    const s = local(e)
    const w = view.toWorld(s[0], s[1])
    const g = gesture.value
    switch (g.kind) {
      case 'pan':
        view.panBy(s[0] - g.last[0], s[1] - g.last[1])
        gesture.value = { ...g, last: s }
        return
      case 'load':
      case 'cut':
        return overlay.move(g, w, e)
      case 'move': {
        let dx = w[0] - g.start[0]
        let dy = w[1] - g.start[1]
        const grid = sketch.settings.gridMm
        if (sketch.settings.snap && !e.altKey) { dx = snapToGrid(dx, grid); dy = snapToGrid(dy, grid) }
        gesture.value = { ...g, delta: [dx, dy], moved: g.moved || Math.hypot(w[0] - g.start[0], w[1] - g.start[1]) * view.zoom > 3 }
        return
      }
      case 'vertex':
        gesture.value = { ...g, point: snapped(w, e, ringsExcept(sketch.parts, g.part, g.ring, g.index)), moved: true }
        return
      case 'rotate':
        gesture.value = { ...g, angle: roundAngle(angleDeg(g.centre, w) - g.start, e.shiftKey ? 15 : 1) }
        return
      case 'box':
        gesture.value = { ...g, b: snapped(w, e) }
        return
      case 'round': {
        const p = snapped(w, e)
        gesture.value = { ...g, r: Math.hypot(p[0] - g.centre[0], p[1] - g.centre[1]) }
        return
      }
      case 'outline':
        gesture.value = { ...g, hover: snapped(w, e) }
        return
      default:
        if (selection.tool !== 'pick') snapped(w, e)
        else cue.value = null
    }
  }

  function onPointerUp(e: PointerEvent): void {
    const g = gesture.value
    if (box.value?.hasPointerCapture(e.pointerId)) box.value.releasePointerCapture(e.pointerId)
    if (g.kind === 'outline') return
    gesture.value = { kind: 'none' }
    cue.value = null
    run(() => endGesture(g))
  }

  function endGesture(g: Gesture): void {
    if (isOverlayGesture(g)) return overlay.end(g)
    settling.value = g
    const held = (g.kind === 'move' && g.moved) || (g.kind === 'vertex' && g.moved) || (g.kind === 'rotate' && g.angle !== 0)
    if (held) display.hold()
    if (g.kind === 'move' && g.moved) sketch.moveParts(g.ids, g.delta[0], g.delta[1])
    else if (g.kind === 'vertex' && g.moved) sketch.moveVertex(g.part, g.ring, g.index, g.point)
    else if (g.kind === 'rotate' && g.angle !== 0) sketch.rotateParts(g.ids, g.angle, g.centre)
    else {
      const tol = sketch.settings.chordTolerance
      const d = draftPart(g, selection.tubeWall, { circle: dd => SHAPES.circle.build({ d: dd }, tol), tube: (dd, t) => SHAPES.tube.build({ d: dd, t }, tol) }, sketch.parts.length)
      if (d) done(sketch.addPart(d, d.label))
    }
  }

  /** Closes the outline being drawn (Enter, or a click on its first vertex). */
  function finishOutline(): void {
    const g = gesture.value
    if (g.kind !== 'outline') return
    gesture.value = { kind: 'none' }
    if (g.points.length < 3) { toasts.push('info', 'An outline needs at least 3 corners.'); return }
    run(() => done(sketch.addPart({ outline: g.points, name: `Outline ${sketch.parts.length + 1}` }, 'Draw outline')))
  }

  /** Cancels the gesture in progress (Esc, a cancelled pointer); returns whether there was one. */
  function cancel(): boolean {
    const g = gesture.value
    if (isOverlayGesture(g)) overlay.cancel(g)
    gesture.value = { kind: 'none' }
    cue.value = null
    return g.kind !== 'none'
  }

  function onDblClick(e: MouseEvent): void {
    if (selection.tool !== 'pick') return
    const s = local(e)
    const w = view.toWorld(s[0], s[1])
    const parts = [...selectedParts.value, ...sketch.parts.filter(p => !selection.partIds.includes(p.id))]
    const hit = hitEdge(parts, w, HIT_PX / view.zoom)
    if (!hit) return
    // Snap the new corner only where the snapped point stays on the edge (a midpoint, or the grid
    // on a horizontal or vertical edge); otherwise keep the exact nearest point of the edge.
    const part = sketch.partById(hit.part)!
    const ring = hit.ring === 0 ? part.outline : part.holes[hit.ring - 1]!.ring
    const a = ring[hit.index]!
    const b = ring[(hit.index + 1) % ring.length]!
    const q = snapped(hit.point, e)
    cue.value = null
    const onEdge = segmentDistance2(q, a, b).d2 <= 1e-12 * Math.max(1, (b[0] - a[0]) ** 2 + (b[1] - a[1]) ** 2)
    const isEnd = (q[0] === a[0] && q[1] === a[1]) || (q[0] === b[0] && q[1] === b[1])
    const point: Point = onEdge && !isEnd ? q : hit.point
    run(() => {
      sketch.insertVertex(hit.part, hit.ring, hit.index, point)
      selection.selectVertex({ part: hit.part, ring: hit.ring, index: hit.index + 1 })
    })
  }

  function onKey(e: KeyboardEvent): void {
    const t = e.target as HTMLElement | null
    if (t && /^(INPUT|TEXTAREA|SELECT)$/.test(t.tagName)) return
    if (e.code === 'Space') { space.value = e.type === 'keydown'; if (e.type === 'keydown' && t === box.value) e.preventDefault() }
    if (e.type !== 'keydown') return
    if (e.key === 'Enter' && gesture.value.kind === 'outline') { e.preventDefault(); finishOutline() }
  }

  watch(() => selection.tool, () => { if (gesture.value.kind === 'outline') cancel() })

  return { gesture, shown, cue, space, selBounds, rotateHandle, onPointerDown, onPointerMove, onPointerUp, onDblClick, onKey, cancel, finishOutline }
}

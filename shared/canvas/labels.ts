/** A screen rectangle in CSS px: top left (x, y), width and height, y down. */
export interface Box {
  x: number
  y: number
  w: number
  h: number
}

/** A label to place: its preferred box, how important it is (higher first) and how far (px) it may move. */
export interface LabelRequest extends Box {
  priority: number
  reach: number
}

/** True if the boxes overlap by more than `gap` px of clearance (touching at `gap` is allowed). */
export function boxesOverlap(a: Box, b: Box, gap = 0): boolean {
  return a.x < b.x + b.w + gap && b.x < a.x + a.w + gap && a.y < b.y + b.h + gap && b.y < a.y + a.h + gap
}

const STEP = 6
const MAX_REACH = 84
/**
 * Offsets (px) on a STEP grid within MAX_REACH, nearest first: the places a label may move to. Each
 * carries its length (px) third, so the search stops at a label's reach without a square root.
 */
const OFFSETS: readonly (readonly [number, number, number])[] = (() => {
  const out: [number, number, number][] = []
  const n = Math.floor(MAX_REACH / STEP)
  for (let i = -n; i <= n; i++) {
    for (let j = -n; j <= n; j++) {
      const len = Math.hypot(i, j) * STEP
      if (len <= MAX_REACH) out.push([i * STEP, j * STEP, len])
    }
  }
  // Ties (same distance) prefer moving up and right, where labels are usually put.
  return out.sort((p, q) => p[2] - q[2] || (q[0] - q[1]) - (p[0] - p[1]))
})()

/**
 * Places labels without overlap: in order of priority (ties in the given order), each label takes
 * the free place nearest its preferred box, within its reach, inside `area` (shifted in if it
 * would stick out), clear of `keepOut` (the legend, dimension lines, markers) and of the labels
 * already placed by `gap` px. Returns the boxes in the order of `labels`; null for a label that
 * found no place (the caller leaves it out rather than draw it over another).
 */
export function placeLabels(labels: readonly LabelRequest[], area: Box, keepOut: readonly Box[], gap = 2): (Box | null)[] {
  const order = labels.map((_, i) => i).sort((i, j) => labels[j]!.priority - labels[i]!.priority || i - j)
  const placed: Box[] = []
  const out: (Box | null)[] = labels.map(() => null)
  const clampX = (x: number, w: number) => Math.max(area.x, Math.min(x, area.x + area.w - w))
  const clampY = (y: number, h: number) => Math.max(area.y, Math.min(y, area.y + area.h - h))
  for (const i of order) {
    const l = labels[i]!
    if (l.w > area.w || l.h > area.h) continue
    for (const [ox, oy, len] of OFFSETS) {
      if (len > l.reach) break
      const c: Box = { x: clampX(l.x + ox, l.w), y: clampY(l.y + oy, l.h), w: l.w, h: l.h }
      if (overlapsAny(c, keepOut, gap) || overlapsAny(c, placed, gap)) continue
      placed.push(c)
      out[i] = c
      break
    }
  }
  return out
}

/** True if `c` overlaps any of `boxes` (a plain loop: the search tries hundreds of places per label). */
function overlapsAny(c: Box, boxes: readonly Box[], gap: number): boolean {
  for (let k = 0; k < boxes.length; k++) if (boxesOverlap(c, boxes[k]!, gap)) return true
  return false
}

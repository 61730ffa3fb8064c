import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { Bounds } from '#shared/geometry/types'

/** Zoom limits in screen px per mm. */
export const MIN_ZOOM = 1e-4
export const MAX_ZOOM = 1e4

/**
 * The world→screen transform of the canvas: screen = (panX + zoom·x, panY − zoom·y), so y is up
 * in the model and down on the screen. `width`/`height` are the canvas size in CSS px.
 */
export const useViewportStore = defineStore('viewport', () => {
  const zoom = ref(1)
  /** Screen px along the right edge that a floating panel covers; fit() centres in the rest. */
  const reserveRight = ref(0)
  const panX = ref(0)
  const panY = ref(0)
  const width = ref(800)
  const height = ref(600)

  /** A model point (mm) on the screen (px from the canvas's top left). */
  function toScreen(x: number, y: number): [number, number] {
    return [panX.value + zoom.value * x, panY.value - zoom.value * y]
  }

  /** A screen point (px) in the model (mm). */
  function toWorld(sx: number, sy: number): [number, number] {
    return [(sx - panX.value) / zoom.value, (panY.value - sy) / zoom.value]
  }

  /** Multiplies the zoom by `factor`, keeping the model point under the screen point (sx, sy) fixed. */
  function zoomAt(factor: number, sx: number, sy: number): void {
    const [wx, wy] = toWorld(sx, sy)
    zoom.value = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, zoom.value * factor))
    panX.value = sx - zoom.value * wx
    panY.value = sy + zoom.value * wy
  }

  /** Moves the view by (dx, dy) screen px. */
  function panBy(dx: number, dy: number): void {
    panX.value += dx
    panY.value += dy
  }

  /** Zooms and pans so `b` (mm) fills the canvas with `margin` px all round; an empty sketch shows ±250 mm. */
  function fit(b: Bounds | null, margin = 48): void {
    const box = b ?? { minX: -250, minY: -250, maxX: 250, maxY: 250 }
    const w = Math.max(box.maxX - box.minX, 1e-6)
    const h = Math.max(box.maxY - box.minY, 1e-6)
    // Keep the drawing clear of what floats over the canvas's right edge (the stress legend).
    const free = width.value - reserveRight.value
    const z = Math.min((free - 2 * margin) / w, (height.value - 2 * margin) / h)
    zoom.value = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, z > 0 ? z : 1))
    panX.value = free / 2 - zoom.value * (box.minX + box.maxX) / 2
    panY.value = height.value / 2 + zoom.value * (box.minY + box.maxY) / 2
  }

  /** Records the canvas size (CSS px). */
  function setSize(w: number, h: number): void {
    width.value = w
    height.value = h
  }

  /** The model rectangle (mm) currently on screen. */
  const visible = computed<Bounds>(() => {
    const [x0, y1] = toWorld(0, 0)
    const [x1, y0] = toWorld(width.value, height.value)
    return { minX: x0, minY: y0, maxX: x1, maxY: y1 }
  })

  return { zoom, panX, panY, width, height, reserveRight, visible, toScreen, toWorld, zoomAt, panBy, fit, setSize }
})

import { defineStore } from 'pinia'
import { computed, ref, shallowRef, toRaw, watch, markRaw } from 'vue'
import { loadSetsFor, withLoadAt } from '#shared/loads/combine'
import type { PointLoad } from '#shared/mechanics/types'
import { slenderness } from '#shared/mechanics/slenderness'
import { checkUtilisation } from '#shared/stress/check'
import { evaluateFrame, type FrameRegion } from '#shared/stress/frame'
import { displayUnits, stressScale } from '#shared/stress/scale'
import { regionsHull } from '#shared/geometry/hull'
import { kernPolygon } from '#shared/mechanics/kern'
import type { Ring } from '#shared/geometry/types'
import { useDisplayStore } from './display'
import { useSketchStore } from './sketch'

/** A material region of the view: FrameRegion plus the limits of its check (MPa). */
export interface ViewRegion extends FrameRegion {
  readonly E: number
  readonly fy: number | null
  /** The user's allowable stresses in tension and in compression (MPa, magnitudes), null when not typed. */
  readonly allowableT: number | null
  readonly allowableC: number | null
}

/** A cut line drawn by the user (mm, section coordinates). */
export interface CutLine {
  p0: [number, number]
  p1: [number, number]
}

/**
 * The live stress view of the open sketch, shared by the canvas layer and every stress panel (a
 * drag seen on the canvas is seen in the panels in the same frame): derived on every drag frame from the last analysis (properties, hull, core,
 * regions) and the document's loads, with the dragged load's position applied locally. Nothing here
 * waits for the server; the drag result goes to the store only at the end (`endDrag`).
 */
export const useStressViewStore = defineStore('stressView', () => {
  const display = useDisplayStore()
  const store = useSketchStore()
  const analysis = computed(() => display.shown.result)
  /** The last answer was an error (bad geometry): the stresses of the answer before it no longer apply. */
  const invalid = computed(() => display.shown.error)
  const doc = computed(() => toRaw(store.doc))

  /** The load being dragged and where it is now (mm), or null. */
  const drag = shallowRef<{ id: string; x: number; y: number } | null>(null)
  /** What the dragged load snapped to, for the cue on the canvas. */
  const snap = shallowRef<string | null>(null)
  const envelopeSide = ref<'compression' | 'tension'>('compression')
  const cut = shallowRef<CutLine | null>(null)
  const cutMode = ref(false)
  let lastDir: [number, number] = [1, 0]
  const scratch = new Map<string, PointLoad[]>()

  // The document's pieces the view reads, each its own computed: the store replaces only what an
  // edit changes, so moving a vertex does not re-derive the loads, and the section (which only
  // needs each material's allowable stress from the parts) waits for the new analysis.
  const settings = computed(() => doc.value.settings)
  const docLoads = computed(() => doc.value.loads)
  const cases = computed(() => doc.value.cases)
  const combinations = computed(() => doc.value.combinations)
  /** Name, E and allowable stresses (tension, compression) of each part's material; the previous list is kept while the values are equal, so readers are not re-run. */
  const allowables = computed<[string | null, number, number | null, number | null][]>((previous) => {
    const next = doc.value.parts.map((p): [string | null, number, number | null, number | null] => [p.material.name ?? null, p.material.E, p.material.allowableT ?? null, p.material.allowableC ?? null])
    const same = previous && previous.length === next.length && next.every((m, i) => m.every((v, k) => v === previous[i]![k]))
    return same ? previous : next
  })
  const anyNoTension = computed(() => doc.value.parts.some(p => p.material.noTension === true))

  const section = computed(() => {
    // Plain data, not reactive proxies: the hot loops below read every vertex on every frame.
    const a = analysis.value && !invalid.value ? toRaw(analysis.value) : null
    if (!a) return null
    const materials = allowables.value
    const regions: ViewRegion[] = a.regions.map((r) => {
      const mat = materials.find(m => m[0] === r.name && m[1] === r.E)
      // markRaw: vue-konva deep-watches and stores its configs reactively; big vertex arrays must stay plain.
      const rings: Ring[] = markRaw(r.polygons.flat().map(ring => markRaw(ring as Ring[number][]) as Ring))
      return { name: r.name, n: r.n, E: r.E, rings, fy: r.fy, fc: r.fc ?? null, allowableT: mat?.[2] ?? null, allowableC: mat?.[3] ?? null }
    })
    const hull = markRaw(regionsHull(a.regions)) as Ring
    // The live analysis leaves the core out of the answer (`omit`): the same function the server runs gives it here.
    const kern = markRaw((a.kern ?? kernPolygon(a.properties, hull)) as Ring[number][]) as Ring
    return { props: a.properties, hull, kern, regions, connections: a.connections, warnings: a.warnings }
  })

  const show = computed(() => settings.value.show)
  // The unit system with the area and inertia units chosen in the settings bar.
  const units = computed(() => displayUnits(settings.value))
  const noTension = computed(() => settings.value.noTension || anyNoTension.value)
  const baseSets = computed(() => loadSetsFor(show.value, docLoads.value, cases.value, combinations.value))

  /** The load sets with the drag applied (factored P unchanged). */
  const sets = computed(() => {
    const d = drag.value
    if (!d) return baseSets.value
    return baseSets.value.map((set) => {
      let buf = scratch.get(set.key)
      if (!buf) scratch.set(set.key, (buf = []))
      return withLoadAt(set, d.id, d.x, d.y, buf)
    })
  })

  const frame = computed(() => {
    const s = section.value
    if (!s) return evaluateFrame({ props: { area: 0, centroid: { x: 0, y: 0 }, Ixx: 0, Iyy: 0, Ixy: 0 }, hull: [], kern: [], regions: [], sets: [], envelope: false, noTension: false })
    return evaluateFrame({ props: s.props, hull: s.hull, kern: s.kern, regions: s.regions, sets: sets.value, envelope: show.value.type === 'envelope', noTension: noTension.value }, lastDir)
  })
  const scale = computed(() => stressScale(frame.value.limit))

  /**
   * The frame for the heavier panels (vertex table, checks, cut line): the live frame at rest, and at
   * most every 120 ms during a drag, so a drag frame only pays for the canvas, core status and extremes.
   */
  const settled = shallowRef(frame.value)
  let settleTimer: ReturnType<typeof setTimeout> | null = null
  watch(frame, (f) => {
    if (!drag.value) {
      settled.value = f
      return
    }
    settleTimer ??= setTimeout(() => {
      settleTimer = null
      settled.value = frame.value
    }, 120)
  })

  /** The loads drawn on the canvas: those of the shown sets, at the drag position while dragging. */
  const shownIds = computed(() => new Set(baseSets.value.flatMap(s => s.ids)))
  const loads = computed(() => {
    const ids = shownIds.value
    const d = drag.value
    return docLoads.value.filter(l => ids.has(l.id)).map(l => (d && d.id === l.id ? { ...l, x: d.x, y: d.y } : l))
  })

  const checks = computed(() => {
    const s = section.value
    const f = settled.value
    if (!s || f.planes.length === 0) return []
    return checkUtilisation(s.regions, f.planes, f.clampAbove)
  })

  const slender = computed(() => {
    const s = section.value
    // K·L about the major (u) and minor (v) principal axes (mm); nothing to show until one is typed.
    const KL = settings.value.effectiveLength
    if (!s || (KL.u === null && KL.v === null)) return null
    const P = Math.max(0, ...sets.value.map(set => set.loads.reduce((sum, l) => sum + l.P, 0)))
    return slenderness(s.props, s.props.referenceE, KL, P)
  })

  /** Moves the dragged load to (x, y) mm for this frame; remembers the motion's direction. */
  function setDrag(id: string, x: number, y: number): void {
    const prev = drag.value
    if (prev && prev.id === id) {
      const dx = x - prev.x
      const dy = y - prev.y
      if (Math.hypot(dx, dy) > 0) lastDir = [dx, dy]
    }
    drag.value = { id, x, y }
  }

  /** Ends the drag; returns the final position (the caller stores it with moveLoad). */
  function endDrag(): { id: string; x: number; y: number } | null {
    const d = drag.value
    drag.value = null
    snap.value = null
    return d
  }

  /** Forgets the last sketch's drag, cut line, cut mode, envelope side and drag direction. */
  function reset(): void {
    drag.value = null
    snap.value = null
    envelopeSide.value = 'compression'
    cut.value = null
    cutMode.value = false
    lastDir = [1, 0]
    scratch.clear()
  }
  watch(() => store.meta?.id, reset, { flush: 'sync' })

  return { analysis, invalid, doc, section, show, units, noTension, sets, frame, settled, scale, shownIds, loads, checks, slender, drag, snap, envelopeSide, cut, cutMode, setDrag, endDrag, reset }
})

/** The live stress view state, as its readers see it (refs unwrapped). */
export type StressView = ReturnType<typeof useStressViewStore>

import { ringsBounds } from '#shared/geometry/bounds'
import type { Bounds } from '#shared/geometry/types'
import { pointInRing } from '#shared/geometry/ring'
import { envelopeBands, isolineValues, lineAcrossBox, lineInRings, longestSegment, planeGradient } from '#shared/stress/field'
import { formatNumber, formatStress } from '#shared/stress/scale'
import type { Box } from '#shared/canvas/labels'
import { emptyScene, type StressScene } from '#shared/stress/paint'

const EMPTY_BOX: Bounds = { minX: 0, minY: 0, maxX: 0, maxY: 0 }

/**
 * The stress overlay's scene for the current frame (mm): exact gradients or envelope bands, isolines,
 * the neutral or lift-off line across the view, the core, extremes, where tension starts, the
 * resultant, load labels, snap guides and the cut line. Pure data: StressFieldLayer paints it.
 */
export function useStressScene(zoom: () => number, viewBox: () => Bounds | null) {
  const view = useStressViewStore()
  const pal = useCanvasPalette()
  const fieldScale = useFieldScale()
  // The drawn parts (stores/display.ts): the dimension lines the labels keep clear of are those on screen.
  const display = useDisplayStore()
  const viewport = useViewportStore()
  const workspace = useWorkspaceStore()
  return computed<StressScene>(() => {
    const s = emptyScene()
    const f = view.frame
    const sec = view.section
    if (!sec) return s
    const u = view.units
    const scale = fieldScale.value
    const regions = sec.regions
    const plane = f.planes[0]
    const contact = f.kind === 'contact'
    s.outlines = regions.map(r => r.rings)

    if ((f.kind === 'plane' || contact) && plane) {
      for (const r of regions) s.fields.push({ rings: r.rings, gradient: planeGradient(plane, r.n, r.rings, scale, contact ? 0 : Infinity), fill: pal.value.field.neutral })
      const values = isolineValues(f.min?.value ?? 0, contact ? 0 : (f.max?.value ?? 0), 6, u.stress.perMPa)
      const tmp: number[] = []
      values.forEach((v, vi) => {
        const t = vi % 2 === 0 ? 0.3 : 0.7
        let bestLen = -1
        let at: [number, number] | null = null
        for (const r of regions) {
          lineInRings(r.rings, r.n * plane.a - v, r.n * plane.b, r.n * plane.c, tmp)
          for (const q of tmp) s.iso.push(q)
          const k = longestSegment(tmp)
          if (k < 0) continue
          const len = Math.hypot(tmp[4 * k + 2]! - tmp[4 * k]!, tmp[4 * k + 3]! - tmp[4 * k + 1]!)
          if (len > bestLen) {
            bestLen = len
            at = [tmp[4 * k]! + t * (tmp[4 * k + 2]! - tmp[4 * k]!), tmp[4 * k + 1]! + t * (tmp[4 * k + 3]! - tmp[4 * k + 1]!)]
          }
        }
        if (at) s.labels.push({ x: at[0], y: at[1], text: formatStress(v, u), dx: 3, dy: -3, size: 10, priority: 1 })
      })
    } else if (f.kind === 'envelope' && f.min && (f.max || f.clampAbove === 0)) {
      // A no-tension envelope has no tension side: the contact pressures, held at 0 where every set lifts off.
      const lo = f.min.value
      const hi = f.max?.value ?? 0
      const thresholds = [lo, ...isolineValues(lo, hi, 8, u.stress.perMPa), 0].filter((v, i, a) => a.indexOf(v) === i && v >= lo && v <= hi).sort((p, q) => p - q)
      const worstC = f.clampAbove === 0 || view.envelopeSide === 'compression'
      for (const r of regions) {
        // Even-odd over the region's rings: inside its material, not in a void.
        const inMaterial = (x: number, y: number) => r.rings.reduce((odd, ring) => (pointInRing([x, y], ring) ? !odd : odd), false)
        const env = envelopeBands(ringsBounds(r.rings) ?? EMPTY_BOX, r.n, f.planes, worstC, thresholds, scale, [sec.props.centroid.x, sec.props.centroid.y], undefined, f.clampAbove, inMaterial)
        s.envelope.push({ rings: r.rings, base: env.base, bands: env.bands })
        for (const l of env.labels) s.labels.push({ x: l.x, y: l.y, text: formatStress(l.value, u), dx: 3, dy: -3, size: 10, priority: 1 })
      }
    }

    const c = sec.props.centroid
    // A material pressed past its compression or bearing strength is flagged where it is pressed most.
    for (const b of f.bearing) {
      if (b.ratio > 1) s.labels.push({ x: b.x, y: b.y, text: `over ${b.name} strength: ${Math.round(b.ratio * 100)} %`, dx: -8, dy: 16, tone: 'alarm', weight: 'bold', align: 'right', priority: 3 })
    }
    if (contact && f.contact?.status === 'overturning') {
      s.labels.push({ x: c.x, y: c.y, text: 'Overturning: the resultant is outside the base', dx: 0, dy: -40, tone: 'alarm', weight: 'bold', size: 14, align: 'center', priority: 3 })
      s.labels.push({ x: c.x, y: c.y, text: 'no equilibrium exists without tension', dx: 0, dy: -22, tone: 'alarm', size: 12, align: 'center', priority: 3 })
    }
    if (sec.kern.length >= 3) {
      s.core = sec.kern
      s.coreDots = sec.kern.length <= 400 ? sec.kern : []
      let bottom = sec.kern[0]!
      for (const p of sec.kern) if (p[1] < bottom[1]) bottom = p
      s.labels.push({ x: bottom[0], y: bottom[1], text: 'core', dx: -8, dy: 12, tone: 'core', align: 'right' })
    }

    const box = viewBox()
    if (f.neutral && box) {
      const pts = lineAcrossBox(f.neutral.a, f.neutral.b, f.neutral.c, box)
      if (pts) {
        s.neutral = pts
        const d = f.neutral.a + f.neutral.b * c.x + f.neutral.c * c.y
        const text = contact ? 'lift-off line' : f.neutralInSection ? 'neutral line' : 'neutral line (outside the section)'
        s.labels.push({ x: c.x - d * f.neutral.b, y: c.y - d * f.neutral.c, text, dx: 5, dy: -6, weight: 'bold', priority: 3 })
      }
    }
    if (contact && f.neutral && plane) {
      // Halfway into the lifted part, on the line through the centroid normal to the lift-off line.
      // The lift-off line's normal points towards compression: the lifted part is on its negative side.
      const n = f.neutral
      let far = 0
      for (const p of sec.hull) far = Math.min(far, n.a + n.b * p[0] + n.c * p[1])
      const t = far / 2 - (n.a + n.b * c.x + n.c * c.y)
      if (far < 0) s.labels.push({ x: c.x + t * n.b, y: c.y + t * n.c, text: 'lifted off: no contact', dx: 0, dy: 4, tone: 'lifted', weight: 'italic', align: 'center' })
    }

    // Extremes, called out at their points.
    const uniform = f.min && f.max && Math.abs(f.max.value - f.min.value) <= 1e-9 * Math.max(1, Math.abs(f.min.value))
    if (f.min && f.min.value < 0) {
      s.dots.push({ x: f.min.x, y: f.min.y, r: 5, fill: 'compression', stroke: 'halo' })
      const text = uniform ? `uniform ${formatStress(f.min.value, u)}` : `max C ${formatStress(f.min.value, u).replace(/ C$/, '')}`
      s.labels.push({ x: f.min.x, y: f.min.y, text, dx: 8, dy: 16, weight: 'bold', priority: 3 })
    }
    if (f.max && !contact && !uniform) {
      const t = f.max.value > 0
      s.dots.push({ x: f.max.x, y: f.max.y, r: 5, fill: t ? 'tension' : 'compressionLight', stroke: 'halo' })
      const text = t ? `max T ${formatStress(f.max.value, u).replace(/ T$/, '')}` : `least C ${formatStress(f.max.value, u).replace(/ C$/, '')}`
      s.labels.push({ x: f.max.x, y: f.max.y, text, dx: 8, dy: -8, weight: 'bold', priority: 3 })
    }
    if (f.kind === 'plane' && f.onset && (!f.inKern || view.drag)) {
      const o = f.onset
      s.dots.push({ x: o.x, y: o.y, r: 9, stroke: 'tension', width: 2, dash: [3, 2] })
      s.labels.push({ x: o.x, y: o.y, text: o.startsInTension ? 'tension starts here' : 'tension would start here', dx: 12, dy: 26, size: 10, tone: 'onset' })
    }

    // Resultant (in or out of the core) and the loads' labels.
    const r = f.resultant
    if (r && r.x !== null && r.y !== null && f.inKern !== null) {
      const tone = f.inKern ? 'resultantIn' : 'resultantOut'
      s.dots.push({ x: r.x, y: r.y, r: 11, stroke: tone, width: 2.5 })
      s.labels.push({ x: r.x, y: r.y, text: f.inKern ? 'resultant in core' : 'resultant outside core', dx: 14, dy: -10, tone, weight: 'bold' })
    }
    // The load handles: picked by the canvas's one input path (a hit test in mm), drawn here with the field.
    for (const l of view.loads) s.dots.push({ x: l.x, y: l.y, r: 7, fill: 'loadFill', stroke: 'loadStroke', width: 2 })
    for (const l of view.loads) s.labels.push({ x: l.x, y: l.y, text: `${l.name} · ${formatNumber(l.P * u.force.perN)} ${u.force.label}`, dx: 11, dy: 16 })
    const d = view.drag
    if (d) {
      const b = sec.props.bounds
      const L = Math.hypot(b.maxX - b.minX, b.maxY - b.minY)
      const th = (sec.props.theta * Math.PI) / 180
      for (const [ux, uy] of [[Math.cos(th), Math.sin(th)], [-Math.sin(th), Math.cos(th)]] as const) s.guides.push(c.x - L * ux, c.y - L * uy, c.x + L * ux, c.y + L * uy)
      if (view.snap) s.labels.push({ x: d.x, y: d.y, text: `snap: ${view.snap}`, dx: 11, dy: 30, size: 10, tone: 'core' })
    }
    const cut = view.cut
    if (cut) {
      s.cut = [...cut.p0, ...cut.p1]
      s.labels.push({ x: cut.p0[0], y: cut.p0[1], text: 'A', dx: -14, dy: 4, tone: 'alarm', weight: 'bold' })
      s.labels.push({ x: cut.p1[0], y: cut.p1[1], text: 'B', dx: 6, dy: 4, tone: 'alarm', weight: 'bold' })
    }
    s.keepOut = keepOut()
    void zoom()
    return s
  })

  /**
   * What labels must stay clear of, in screen px: the legend where it floats, the scale bar, and the dimension
   * lines with their values that the parts layer draws 22 px below and right of the drawing.
   */
  function keepOut(): Box[] {
    const out: Box[] = []
    const legend = workspace.legendBox
    if (legend) out.push(legend)
    // The scale bar in the canvas's bottom left corner (SketchScaleBar: bottom-3 left-3, about 230 × 40 px).
    out.push({ x: 0, y: viewport.height - 48, w: 240, h: 48 })
    const b = display.bounds
    if (!b) return out
    const [x0, y1] = viewport.toScreen(b.minX, b.minY)
    const [x1, y0] = viewport.toScreen(b.maxX, b.maxY)
    out.push({ x: x0 - 4, y: y1 + 17, w: x1 - x0 + 8, h: 26 })
    out.push({ x: x1 + 22 - 6, y: y0 - 4, w: 90, h: y1 - y0 + 8 })
    return out
  }
}

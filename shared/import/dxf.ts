import DxfParser from 'dxf-parser'
import { arcPoints, arcSegmentCount, circleRing, DEFAULT_CHORD_TOLERANCE } from '../shapes/arc'
import { bulgePoints, cleanRing } from './geometry'
import { chainSegments, dropDuplicates, type Segment } from './loops'
import { scanDxf } from './dxf-scan'
import { nestLoops } from './nest'
import { ImportError, type ImportResult, type ImportedLoop, type LengthUnit, type SkippedItem } from './types'
import { MM_PER_UNIT, unitFromInsunits } from './units'
import { MAX_VERTICES } from '../sketch/document'

type P = [number, number]
/** x' = a·x + b·y + e, y' = c·x + d·y + f, into mm. */
interface Affine { a: number; b: number; c: number; d: number; e: number; f: number; scale: number }

/** Options of an import: the unit override, the chord tolerance (mm) for arcs and the end-point match tolerance (mm). */
export interface ImportOptions {
  units?: LengthUnit
  chordTolerance?: number
  joinTolerance?: number
}

const MAX_BLOCK_DEPTH = 8

/**
 * Reads an ASCII DXF into closed loops (mm) and nests them into parts: closed LWPOLYLINE and
 * POLYLINE (bulges as arcs within the chord tolerance), CIRCLE, full ELLIPSE, loops of LINE, ARC,
 * partial ELLIPSE and open polylines joined end to end within `joinTolerance`, INSERT expanded
 * with its block's position, scale and rotation (nested to 8 levels). Units: `options.units`, else
 * $INSUNITS, else mm. Throws ImportError for a broken file.
 */
export function importDxf(text: string, options: ImportOptions = {}): ImportResult {
  scanDxf(text)
  let dxf: ReturnType<DxfParser['parseSync']>
  try {
    dxf = new DxfParser().parseSync(text)
  } catch (error) {
    throw new ImportError(`The DXF could not be read: ${(error as Error).message}`)
  }
  if (!dxf) throw new ImportError('The DXF could not be read.')
  const fileUnit = unitFromInsunits(dxf.header?.$INSUNITS)
  const units: LengthUnit = options.units ?? fileUnit ?? 'mm'
  const unitsFrom = options.units ? 'request' : fileUnit ? 'file' : 'default'
  const k = MM_PER_UNIT[units]
  const tol = options.chordTolerance ?? DEFAULT_CHORD_TOLERANCE
  const join = options.joinTolerance ?? 0.01
  const loops: ImportedLoop[] = []
  const segments: Segment[] = []
  const unsupported = new Map<string, { layer: string; count: number }>()
  let vertices = 0

  const walk = (entities: readonly any[], m: Affine, depth: number, layerOverride: string | null) => {
    entities.forEach((e, index) => {
      const layer = !e.layer || (e.layer === '0' && layerOverride) ? (layerOverride ?? '0') : String(e.layer)
      const name = `${e.type} ${e.handle ?? index + 1}`
      const local = tol / m.scale
      const add = (pts: P[], closed: boolean) => {
        const mapped = pts.map(p => apply(m, p, name))
        vertices += mapped.length
        if (vertices > MAX_VERTICES) throw new ImportError(`The drawing has over ${MAX_VERTICES} vertices after arcs are cut into chords; the limit is ${MAX_VERTICES}.`, null, name, 413)
        if (closed) loops.push({ ring: cleanRing(mapped, 1e-9), layer, source: e.type })
        else segments.push({ points: mapped, layer, entity: name })
      }
      switch (e.type) {
        case 'LWPOLYLINE':
        case 'POLYLINE': {
          if (e.is3dPolygonMesh || e.isPolyfaceMesh) { note(unsupported, `${e.type} mesh`, layer); return }
          const vs: any[] = e.vertices ?? []
          if (vs.length < 2) { note(unsupported, `${e.type} with under 2 vertices`, layer); return }
          const closed = !!e.shape || (vs.length > 2 && vs[0].x === vs[vs.length - 1].x && vs[0].y === vs[vs.length - 1].y)
          const pts: P[] = []
          const n = closed ? vs.length : vs.length - 1
          for (let i = 0; i < n; i++) {
            const a = vs[i]
            const b = vs[(i + 1) % vs.length]
            pts.push(...bulgePoints([num(a.x, name), num(a.y, name)], [num(b.x, name), num(b.y, name)], a.bulge ?? 0, local))
          }
          if (!closed) pts.push([num(vs[vs.length - 1].x, name), num(vs[vs.length - 1].y, name)])
          add(pts, closed)
          return
        }
        case 'CIRCLE':
          add(circleRing([num(e.center?.x, name), num(e.center?.y, name)], positive(e.radius, name), local).map(q => [q[0], q[1]]), true)
          return
        case 'ARC': {
          let sweep = num(e.endAngle, name) - num(e.startAngle, name)
          while (sweep <= 0) sweep += 2 * Math.PI
          add(arcPoints([num(e.center?.x, name), num(e.center?.y, name)], positive(e.radius, name), e.startAngle, sweep, local).map(q => [q[0], q[1]]), false)
          return
        }
        case 'ELLIPSE': {
          const cx = num(e.center?.x, name); const cy = num(e.center?.y, name)
          const ux = num(e.majorAxisEndPoint?.x, name); const uy = num(e.majorAxisEndPoint?.y, name)
          const ratio = positive(e.axisRatio, name)
          const t0 = e.startAngle ?? 0
          let sweep = (e.endAngle ?? 2 * Math.PI) - t0
          while (sweep <= 0) sweep += 2 * Math.PI
          const full = Math.abs(sweep - 2 * Math.PI) < 1e-6
          const count = Math.max(16, arcSegmentCount(Math.hypot(ux, uy), sweep, local))
          const pts: P[] = []
          for (let j = 0; j < (full ? count : count + 1); j++) {
            const t = t0 + (sweep * j) / count
            pts.push([cx + ux * Math.cos(t) - ratio * uy * Math.sin(t), cy + uy * Math.cos(t) + ratio * ux * Math.sin(t)])
          }
          add(pts, full)
          return
        }
        case 'LINE': {
          const [a, b] = e.vertices ?? []
          if (!a || !b) { note(unsupported, 'LINE without end points', layer); return }
          add([[num(a.x, name), num(a.y, name)], [num(b.x, name), num(b.y, name)]], false)
          return
        }
        case 'INSERT': {
          const block = dxf.blocks?.[e.name]
          if (!block) throw new ImportError(`${name} on layer "${layer}" inserts block "${e.name}", which the file does not define.`, null, name)
          if (depth >= MAX_BLOCK_DEPTH) throw new ImportError(`${name} nests blocks more than ${MAX_BLOCK_DEPTH} deep (or a block inserts itself).`, null, name)
          const sx = e.xScale ?? 1; const sy = e.yScale ?? 1
          const rot = ((e.rotation ?? 0) * Math.PI) / 180
          const base = block.position ?? { x: 0, y: 0 }
          const px = num(e.position?.x ?? 0, name); const py = num(e.position?.y ?? 0, name)
          // local = R·S·(p − base) + position, then the parent transform.
          const cos = Math.cos(rot); const sin = Math.sin(rot)
          const inner: Affine = { a: cos * sx, b: -sin * sy, c: sin * sx, d: cos * sy, e: 0, f: 0, scale: Math.min(Math.abs(sx), Math.abs(sy)) || 1 }
          inner.e = px - inner.a * base.x - inner.b * base.y
          inner.f = py - inner.c * base.x - inner.d * base.y
          walk(block.entities ?? [], compose(m, inner), depth + 1, layer)
          return
        }
        default:
          note(unsupported, String(e.type), layer)
      }
    })
  }
  walk(dxf.entities ?? [], { a: k, b: 0, c: 0, d: k, e: 0, f: 0, scale: k }, 0, null)

  const chained = chainSegments(segments, join)
  const unique = dropDuplicates([...loops, ...chained.loops].filter(l => l.ring.length >= 3))
  const skipped: SkippedItem[] = [...chained.skipped, ...unique.skipped]
  for (const [type, { layer, count }] of unsupported) {
    skipped.push({ kind: 'unsupported', layer, entity: type, message: `${count} × ${type} (not an outline Kernwise reads) left out.` })
  }
  const nested = nestLoops(unique.loops)
  const layerCounts = new Map<string, number>()
  for (const l of unique.loops) layerCounts.set(l.layer, (layerCounts.get(l.layer) ?? 0) + 1)
  return {
    format: 'dxf', units, unitsFrom,
    layers: [...layerCounts].map(([name, loops]) => ({ name, loops })),
    loops: unique.loops, parts: nested.parts, skipped: [...skipped, ...nested.skipped],
  }
}

function compose(outer: Affine, inner: Affine): Affine {
  return {
    a: outer.a * inner.a + outer.b * inner.c, b: outer.a * inner.b + outer.b * inner.d,
    c: outer.c * inner.a + outer.d * inner.c, d: outer.c * inner.b + outer.d * inner.d,
    e: outer.a * inner.e + outer.b * inner.f + outer.e, f: outer.c * inner.e + outer.d * inner.f + outer.f,
    scale: outer.scale * inner.scale,
  }
}

function apply(m: Affine, p: P, name: string): P {
  const x = m.a * p[0] + m.b * p[1] + m.e
  const y = m.c * p[0] + m.d * p[1] + m.f
  if (!Number.isFinite(x) || !Number.isFinite(y) || Math.abs(x) > 1e9 || Math.abs(y) > 1e9) throw new ImportError(`${name}: a point lies beyond ±1e9 mm.`, null, name)
  return [x, y]
}

function num(v: unknown, name: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new ImportError(`${name}: a coordinate is missing or not a number.`, null, name)
  return v
}

function positive(v: unknown, name: string): number {
  const x = num(v, name)
  if (!(x > 0)) throw new ImportError(`${name}: the radius or axis ratio must be positive; it is ${x}.`, null, name)
  return x
}

function note(map: Map<string, { layer: string; count: number }>, type: string, layer: string): void {
  const seen = map.get(type)
  if (seen) seen.count++
  else map.set(type, { layer, count: 1 })
}

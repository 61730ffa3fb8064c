import type { SketchHole, SketchMaterial, SketchPart } from '../sketch/document'
import type { Point, Ring } from '../geometry/types'
import { makeHollow } from '../shapes/offset'
import { overlapArea, subtractPolygons, unionPolygons } from './boolean'
import { newId } from './ids'
import { boundsCentre, deleteVertex, insertVertex, mirrorRing, ringsBounds, rotateRing, setVertex, translateRing } from './transform'
import { orientRing } from '../geometry/ring'

/**
 * Pure operations on the parts of a sketch document (mm). Each returns a new array and leaves
 * untouched parts as the same objects, so history snapshots share them.
 */

/** The rings of a part: index 0 the outline, k the hole k-1. */
export function ringOf(part: SketchPart, ring: number): Ring {
  const r = ring === 0 ? part.outline : part.holes[ring - 1]?.ring
  if (!r) throw new Error(`Part "${part.name}" has no ring ${ring}`)
  return r
}

/** The part with ring `ring` replaced by `points`. */
export function withRing(part: SketchPart, ring: number, points: Point[]): SketchPart {
  if (ring === 0) return { ...part, outline: points }
  return { ...part, holes: part.holes.map((h, k) => (k === ring - 1 ? { ...h, ring: points } : h)) }
}

/** The part with every ring mapped by `f`. */
export function mapRings(part: SketchPart, f: (r: Ring) => Point[]): SketchPart {
  return { ...part, outline: f(part.outline), holes: part.holes.map(h => ({ ...h, ring: f(h.ring) })) }
}

/** Bounds (mm) of the given parts, or null. */
export function partsBounds(parts: readonly SketchPart[]) {
  return ringsBounds(parts.flatMap(p => [p.outline, ...p.holes.map(h => h.ring)]))
}

/** Applies `f` to the parts whose id is in `ids`. */
export function mapSelected(parts: readonly SketchPart[], ids: readonly string[], f: (p: SketchPart) => SketchPart): SketchPart[] {
  const set = new Set(ids)
  return parts.map(p => (set.has(p.id) ? f(p) : p))
}

/** The centre (mm) of the selection's bounds, the pivot for rotate and mirror. */
export function selectionCentre(parts: readonly SketchPart[], ids: readonly string[]): Point {
  const b = partsBounds(parts.filter(p => ids.includes(p.id)))
  return b ? boundsCentre(b) : [0, 0]
}

/** Moves the parts `ids` by (dx, dy) mm. */
export function moveParts(parts: readonly SketchPart[], ids: readonly string[], dx: number, dy: number): SketchPart[] {
  return mapSelected(parts, ids, p => mapRings(p, r => translateRing(r, dx, dy)))
}

/** Rotates the parts `ids` counter-clockwise by `deg` about `centre` (mm). */
export function rotateParts(parts: readonly SketchPart[], ids: readonly string[], deg: number, centre: Point): SketchPart[] {
  return mapSelected(parts, ids, p => mapRings(p, r => rotateRing(r, deg, centre)))
}

/** Mirrors the parts `ids` across the line through `centre` (axis 'x' flips x, 'y' flips y). */
export function mirrorParts(parts: readonly SketchPart[], ids: readonly string[], axis: 'x' | 'y', centre: Point): SketchPart[] {
  return mapSelected(parts, ids, p => mapRings(p, r => mirrorRing(r, axis, centre)))
}

/** Copies of the parts `ids` (new ids, " copy" names) moved by `offset` mm. */
export function copyParts(parts: readonly SketchPart[], ids: readonly string[], offset: Point): SketchPart[] {
  return parts.filter(p => ids.includes(p.id)).map(p => ({
    ...mapRings(p, r => translateRing(r, offset[0], offset[1])),
    id: newId('part'),
    name: `${p.name} copy`.slice(0, 80),
    holes: p.holes.map(h => ({ ...h, id: newId('hole'), ring: translateRing(h.ring, offset[0], offset[1]) })),
  }))
}

/** Replaces one part by `f(part)`; throws when `id` is not a part. */
export function updateOne(parts: readonly SketchPart[], id: string, f: (p: SketchPart) => SketchPart): SketchPart[] {
  if (!parts.some(p => p.id === id)) throw new Error('That part no longer exists')
  return parts.map(p => (p.id === id ? f(p) : p))
}

/** Vertex edits on one ring of one part. */
export const vertexOps = {
  move: (p: SketchPart, ring: number, index: number, point: Point) => withRing(p, ring, setVertex(ringOf(p, ring), index, point)),
  insert: (p: SketchPart, ring: number, edge: number, point: Point) => withRing(p, ring, insertVertex(ringOf(p, ring), edge, point)),
  remove: (p: SketchPart, ring: number, index: number) => withRing(p, ring, deleteVertex(ringOf(p, ring), index)),
}

/**
 * The part made hollow with wall `t` mm (makeHollow offsets the outline inwards): its voids
 * are replaced by the new inner ring(s); its notches are kept.
 */
export function hollowPart(p: SketchPart, t: number): SketchPart {
  const g = makeHollow(p.outline, t)
  const voids: SketchHole[] = g.holes.map(h => ({ id: newId('hole'), kind: 'void', ring: h.map(q => [q[0], q[1]]) }))
  return { ...p, outline: g.outline.map(q => [q[0], q[1]]), holes: [...p.holes.filter(h => h.kind === 'notch'), ...voids], shape: null }
}

/**
 * Turns part `sourceId`'s outline into a hole of kind `kind` in the other part it overlaps most.
 * Returns the new parts and the id of the part that received the hole; throws when it overlaps none.
 */
export function partToHole(parts: readonly SketchPart[], sourceId: string, kind: SketchHole['kind']): { parts: SketchPart[]; target: string } {
  const src = parts.find(p => p.id === sourceId)
  if (!src) throw new Error('That part no longer exists')
  let target: SketchPart | null = null
  let best = 0
  for (const p of parts) {
    if (p.id === sourceId) continue
    const a = overlapArea(src.outline, { outline: p.outline, holes: p.holes.map(h => h.ring) })
    if (a > best) { best = a; target = p }
  }
  if (!target) throw new Error(`"${src.name}" does not overlap another part, so it cannot become its ${kind}.`)
  const hole: SketchHole = { id: newId('hole'), kind, ring: orientRing(src.outline, false) }
  const t = target
  return { parts: parts.filter(p => p.id !== sourceId).map(p => (p.id === t.id ? { ...p, holes: [...p.holes, hole], shape: null } : p)), target: t.id }
}

/** The union of the parts `ids` as one part (the first one's id, name and material); throws when they do not touch. */
export function unionOf(parts: readonly SketchPart[], ids: readonly string[]): SketchPart[] {
  const chosen = parts.filter(p => ids.includes(p.id))
  if (chosen.length < 2) throw new Error('Select two or more parts to join.')
  const result = unionPolygons(chosen.map(p => ({ outline: p.outline, holes: p.holes.map(h => h.ring) })))
  if (result.length !== 1) throw new Error('These parts do not touch or overlap, so they cannot become one part.')
  const first = chosen[0]!
  const merged: SketchPart = {
    ...first,
    outline: result[0]!.outline,
    holes: result[0]!.holes.map(r => ({ id: newId('hole'), kind: 'void', ring: r })),
    shape: null,
  }
  const drop = new Set(chosen.slice(1).map(p => p.id))
  return parts.filter(p => !drop.has(p.id)).map(p => (p.id === first.id ? merged : p))
}

/** The first of the parts `ids` minus the others; the others are removed. Several pieces become several parts. */
export function subtractOf(parts: readonly SketchPart[], ids: readonly string[]): SketchPart[] {
  const chosen = ids.map(id => parts.find(p => p.id === id)).filter((p): p is SketchPart => !!p)
  if (chosen.length < 2) throw new Error('Select the part to cut first, then the parts to take away.')
  const [first, ...rest] = chosen as [SketchPart, ...SketchPart[]]
  const pieces = subtractPolygons({ outline: first.outline, holes: first.holes.map(h => h.ring) }, rest.map(p => ({ outline: p.outline, holes: p.holes.map(h => h.ring) })))
  if (pieces.length === 0) throw new Error(`Nothing of "${first.name}" would be left.`)
  const made: SketchPart[] = pieces.map((g, k) => ({
    ...first,
    id: k === 0 ? first.id : newId('part'),
    name: k === 0 ? first.name : `${first.name} ${k + 1}`,
    outline: g.outline,
    holes: g.holes.map(r => ({ id: newId('hole'), kind: 'void' as const, ring: r })),
    shape: null,
  }))
  const drop = new Set(rest.map(p => p.id))
  const out: SketchPart[] = []
  for (const p of parts) {
    if (drop.has(p.id)) continue
    if (p.id === first.id) out.push(...made)
    else out.push(p)
  }
  return out
}

/** Sets the material of the parts `ids`. */
export function withMaterial(parts: readonly SketchPart[], ids: readonly string[], material: SketchMaterial): SketchPart[] {
  return mapSelected(parts, ids, p => ({ ...p, material: { ...material } }))
}

import type { SketchDocument, SketchHole, SketchMaterial, SketchPart } from '#shared/sketch/document'
import type { Point } from '#shared/geometry/types'
import { defaultMaterial } from '#shared/mechanics/materials'
import { newId } from '#shared/editor/ids'
import { orientRing } from '#shared/geometry/ring'
import * as ops from '#shared/editor/parts'

/** What addPart needs: an outline (mm, any orientation) and optionally holes, a name, a material, the shape it came from. */
export interface NewPart {
  outline: readonly Point[]
  holes?: { ring: readonly Point[]; kind?: SketchHole['kind'] }[]
  name?: string
  material?: SketchMaterial
  shape?: SketchPart['shape']
  kind?: SketchPart['kind']
}

/** What the part actions need from the sketch store: the document now, and how to commit new parts. */
export interface PartsContext {
  doc: { readonly value: SketchDocument }
  commitParts: (label: string, after: SketchPart[]) => void
}

/**
 * The sketch store's part, vertex and hole actions: each builds the new parts list with the pure
 * operations of shared/editor/parts and commits it as one undoable change.
 */
export function partActions({ doc, commitParts }: PartsContext) {
  /** Adds a part (outline made CCW, holes CW; steel unless a material is given); returns its id. */
  function addPart(input: NewPart, label = 'Add part'): string {
    const id = newId('part')
    const part: SketchPart = {
      id,
      name: input.name ?? `Part ${doc.value.parts.length + 1}`,
      kind: input.kind ?? 'solid',
      outline: orientRing(input.outline, true),
      holes: (input.holes ?? []).map(h => ({ id: newId('hole'), kind: h.kind ?? 'void', ring: orientRing(h.ring, false) })),
      material: input.material ?? defaultMaterial(),
      shape: input.shape ?? null,
    }
    commitParts(label, [...doc.value.parts, part])
    return id
  }

  /** Adds several parts as one change (one undo step), e.g. an import; returns their ids. */
  function addParts(inputs: NewPart[], label = 'Import'): string[] {
    const before = doc.value.parts
    const added: SketchPart[] = inputs.map((input, i) => ({
      id: newId('part'), name: input.name ?? `Part ${before.length + i + 1}`, kind: input.kind ?? 'solid',
      outline: orientRing(input.outline, true),
      holes: (input.holes ?? []).map(h => ({ id: newId('hole'), kind: h.kind ?? 'void', ring: orientRing(h.ring, false) })),
      material: input.material ?? defaultMaterial(), shape: input.shape ?? null,
    }))
    commitParts(label, [...before, ...added])
    return added.map(p => p.id)
  }

  /** Renames a part. */
  function renamePart(id: string, name: string): void {
    commitParts('Rename part', ops.updateOne(doc.value.parts, id, p => ({ ...p, name: name.slice(0, 80) })))
  }

  /** Deletes parts. */
  function removeParts(ids: string[]): void {
    if (ids.length === 0) return
    const set = new Set(ids)
    commitParts(ids.length > 1 ? 'Delete parts' : 'Delete part', doc.value.parts.filter(p => !set.has(p.id)))
  }

  /** Copies parts, moved by `offset` mm; returns the new ids. */
  function duplicateParts(ids: string[], offset: Point = [0, 0]): string[] {
    const copies = ops.copyParts(doc.value.parts, ids, offset)
    if (copies.length) commitParts('Duplicate', [...doc.value.parts, ...copies])
    return copies.map(p => p.id)
  }

  /** Moves parts by (dx, dy) mm. */
  function moveParts(ids: string[], dx: number, dy: number): void {
    if (ids.length === 0 || (dx === 0 && dy === 0)) return
    commitParts('Move', ops.moveParts(doc.value.parts, ids, dx, dy))
  }

  /** Rotates parts counter-clockwise by `deg` about `centre` (default: the selection's centre). */
  function rotateParts(ids: string[], deg: number, centre?: Point): void {
    if (ids.length === 0 || !Number.isFinite(deg) || deg % 360 === 0) return
    commitParts(`Rotate ${deg}°`, ops.rotateParts(doc.value.parts, ids, deg, centre ?? ops.selectionCentre(doc.value.parts, ids)))
  }

  /** Mirrors parts: axis 'x' flips x, 'y' flips y, about the selection's centre. */
  function mirrorParts(ids: string[], axis: 'x' | 'y', centre?: Point): void {
    if (ids.length === 0) return
    commitParts(`Mirror ${axis}`, ops.mirrorParts(doc.value.parts, ids, axis, centre ?? ops.selectionCentre(doc.value.parts, ids)))
  }

  /** Moves vertex `index` of ring `ring` (0 outline, k hole k-1) of a part to `point` (mm). */
  function moveVertex(id: string, ring: number, index: number, point: Point): void {
    commitParts('Move vertex', ops.updateOne(doc.value.parts, id, p => ops.vertexOps.move(p, ring, index, point)))
  }

  /** Inserts `point` after vertex `edge` of a ring (on that edge). */
  function insertVertex(id: string, ring: number, edge: number, point: Point): void {
    commitParts('Insert vertex', ops.updateOne(doc.value.parts, id, p => ({ ...ops.vertexOps.insert(p, ring, edge, point), shape: null })))
  }

  /** Deletes a vertex (a ring keeps at least 3). */
  function deleteVertex(id: string, ring: number, index: number): void {
    commitParts('Delete vertex', ops.updateOne(doc.value.parts, id, p => ({ ...ops.vertexOps.remove(p, ring, index), shape: null })))
  }

  /** Makes a part hollow with wall `t` mm. */
  function makeHollow(id: string, t: number): void {
    commitParts(`Hollow, wall ${t} mm`, ops.updateOne(doc.value.parts, id, p => ops.hollowPart(p, t)))
  }

  /** Turns a drawn part into a void or notch of the part it overlaps; returns that part's id. */
  function makeHole(sourceId: string, kind: SketchHole['kind']): string {
    const { parts: next, target } = ops.partToHole(doc.value.parts, sourceId, kind)
    commitParts(kind === 'void' ? 'Make void' : 'Make notch', next)
    return target
  }

  /** Makes a part material ('solid') or an opening through every part it overlaps ('cut'). */
  function setPartKind(id: string, kind: SketchPart['kind']): void {
    commitParts(kind === 'cut' ? 'Make cut through parts' : 'Make solid', ops.updateOne(doc.value.parts, id, p => ({ ...p, kind, holes: kind === 'cut' ? [] : p.holes, shape: kind === 'cut' ? null : p.shape })))
  }

  /** Changes a hole between void (inside the outline) and notch (through its edge). */
  function setHoleKind(id: string, holeId: string, kind: SketchHole['kind']): void {
    commitParts('Change hole', ops.updateOne(doc.value.parts, id, p => ({ ...p, holes: p.holes.map(h => (h.id === holeId ? { ...h, kind } : h)) })))
  }

  /** Removes a hole from a part. */
  function removeHole(id: string, holeId: string): void {
    commitParts('Remove hole', ops.updateOne(doc.value.parts, id, p => ({ ...p, holes: p.holes.filter(h => h.id !== holeId) })))
  }

  /** Joins parts into the first one (polygon union). */
  function unionParts(ids: string[]): void {
    commitParts('Join parts', ops.unionOf(doc.value.parts, ids))
  }

  /** Cuts the other selected parts out of the first one. */
  function subtractParts(ids: string[]): void {
    commitParts('Subtract parts', ops.subtractOf(doc.value.parts, ids))
  }

  /** Sets the material of parts. */
  function setMaterial(ids: string[], material: SketchMaterial): void {
    if (ids.length) commitParts('Material', ops.withMaterial(doc.value.parts, ids, material))
  }

  return { addPart, addParts, renamePart, removeParts, duplicateParts, moveParts, rotateParts, mirrorParts, moveVertex, insertVertex, deleteVertex, makeHollow, makeHole, setPartKind, setHoleKind, removeHole, unionParts, subtractParts, setMaterial }
}

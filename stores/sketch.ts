import { defineStore } from 'pinia'
import { computed, ref, shallowRef } from 'vue'
import { emptyDocument, type LoadCase, type LoadCombination, type SketchDocument, type SketchHole, type SketchLoad, type SketchMaterial, type SketchPart, type SketchSettings } from '#shared/sketch/document'
import type { SketchFull, SketchSummary } from '#shared/sketch/api'
import type { Point } from '#shared/geometry/types'
import { MATERIAL_PRESETS } from '#shared/mechanics/materials'
import { newId } from '#shared/editor/ids'
import { orientRing, type XY } from '#shared/editor/transform'
import * as ops from '#shared/editor/parts'
import { useHistoryStore, type Change, type Loading } from './history'

/** What addPart needs: an outline (mm, any orientation) and optionally holes, a name, a material, the shape it came from. */
export interface NewPart {
  outline: Point[] | XY[]
  holes?: { ring: Point[] | XY[]; kind?: SketchHole['kind'] }[]
  name?: string
  material?: SketchMaterial
  shape?: SketchPart['shape']
  kind?: SketchPart['kind']
}

/**
 * What a gesture passes to hold its change back until the change's analysis is in: given the
 * document as it will be, it starts that analysis and returns a promise that settles with it
 * (or null when there is nothing to wait for). See `stageParts`.
 */
export type Hold = (next: SketchDocument) => Promise<unknown> | null

/** How long a held change waits for its analysis at most (ms) before it is committed anyway. */
export const HOLD_MS = 120

/** The sketch's identity and save state beside the document. */
export type SketchMeta = Pick<SketchSummary, 'id' | 'title' | 'project' | 'description' | 'status' | 'version'>

const steel = (): SketchMaterial => {
  const m = MATERIAL_PRESETS.steel
  return { name: m.name, E: m.E, fy: m.fy, density: m.density }
}

/**
 * The open sketch: its document (immutable; every change replaces a slice and pushes a typed
 * Change to the history store) and its meta. `revision` counts document changes for autosave.
 */
export const useSketchStore = defineStore('sketch', () => {
  const history = useHistoryStore()
  const doc = shallowRef<SketchDocument>(emptyDocument())
  const meta = ref<SketchMeta | null>(null)
  const revision = ref(0)

  // Each slice is its own computed: an edit replaces only what it changes, so a reader of the
  // loads or the settings is not re-run (nor its component re-rendered) when a vertex moves.
  const parts = computed(() => doc.value.parts)
  const settings = computed(() => doc.value.settings)
  const loads = computed(() => doc.value.loads)
  const cases = computed(() => doc.value.cases)
  const combinations = computed(() => doc.value.combinations)
  const bounds = computed(() => ops.partsBounds(doc.value.parts))
  const canUndo = computed(() => history.canUndo)
  const canRedo = computed(() => history.canRedo)

  function loading(): Loading {
    return { loads: doc.value.loads, cases: doc.value.cases, combinations: doc.value.combinations }
  }

  function apply(change: Change, side: 'before' | 'after'): void {
    // The revision first: synchronous watchers of `doc` (the live analysis) read the new one.
    revision.value++
    if (change.kind === 'parts') doc.value = { ...doc.value, parts: change[side] }
    else if (change.kind === 'loading') doc.value = { ...doc.value, ...change[side] }
    else doc.value = { ...doc.value, settings: change[side] }
  }

  function commit(change: Change): void {
    apply(change, 'after')
    history.push(change)
  }

  function commitParts(label: string, after: SketchPart[], hold?: Hold): void {
    if (hold) stageParts(label, after, hold({ ...doc.value, parts: after }))
    else commit({ kind: 'parts', label, before: doc.value.parts, after })
  }

  // ---- a gesture's change, held until its analysis is in -------------------------------

  /** The change a gesture has drawn but not yet committed (the canvas keeps its ghost meanwhile). */
  const staged = shallowRef<{ label: string; after: SketchPart[]; timer: ReturnType<typeof setTimeout> } | null>(null)

  /** Commits the held change now, if there is one. Every other action calls it first. */
  function flushStaged(): void {
    const s = staged.value
    if (!s) return
    clearTimeout(s.timer)
    staged.value = null
    commitParts(s.label, s.after)
  }

  /**
   * Holds a parts change that a gesture already shows (a dragged vertex, moved or rotated parts)
   * until `ready` settles, at most HOLD_MS, or until any other action: then it is committed as
   * usual (history, revision, autosave). The drawing and the properties of the edit then change in
   * one update, and the browser does not render the edit while the server computes its answer.
   */
  function stageParts(label: string, after: SketchPart[], ready: Promise<unknown> | null): void {
    flushStaged()
    const entry = { label, after, timer: setTimeout(flushStaged, HOLD_MS) }
    staged.value = entry
    if (!ready) return flushStaged()
    void ready.finally(() => {
      if (staged.value === entry) flushStaged()
    })
  }

  /** The same actions, each committing a held change before it runs (it may read the parts). */
  function allAfterStaged<T extends Record<string, (...args: never[]) => unknown>>(actions: T): T {
    const wrapped: Record<string, unknown> = {}
    for (const [name, action] of Object.entries(actions)) {
      wrapped[name] = (...args: never[]) => {
        flushStaged()
        return action(...args)
      }
    }
    return wrapped as T
  }

  function commitLoading(label: string, after: Partial<Loading>): void {
    commit({ kind: 'loading', label, before: loading(), after: { ...loading(), ...after } })
  }

  /** Opens a sketch from the server; clears the history. */
  function load(sketch: SketchFull): void {
    // A change held for the sketch being replaced is dropped with it.
    if (staged.value) clearTimeout(staged.value.timer)
    staged.value = null
    revision.value = 0
    doc.value = sketch.document
    meta.value = { id: sketch.id, title: sketch.title, project: sketch.project, description: sketch.description, status: sketch.status, version: sketch.version }
    history.clear()
  }

  /** Changes title/project/description/version (not undoable: they are not the document). */
  function setMeta(patch: Partial<SketchMeta>): void {
    if (meta.value) meta.value = { ...meta.value, ...patch }
  }

  /** The part with this id, or undefined. */
  function partById(id: string): SketchPart | undefined {
    return doc.value.parts.find(p => p.id === id)
  }

  // ---- parts --------------------------------------------------------------------------

  /** Adds a part (outline made CCW, holes CW; steel unless a material is given); returns its id. */
  function addPart(input: NewPart, label = 'Add part'): string {
    const id = newId('part')
    const part: SketchPart = {
      id,
      name: input.name ?? `Part ${doc.value.parts.length + 1}`,
      kind: input.kind ?? 'solid',
      outline: orientRing(input.outline, true),
      holes: (input.holes ?? []).map(h => ({ id: newId('hole'), kind: h.kind ?? 'void', ring: orientRing(h.ring, false) })),
      material: input.material ?? steel(),
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
      material: input.material ?? steel(), shape: input.shape ?? null,
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
  function moveParts(ids: string[], dx: number, dy: number, hold?: Hold): void {
    if (ids.length === 0 || (dx === 0 && dy === 0)) return
    commitParts('Move', ops.moveParts(doc.value.parts, ids, dx, dy), hold)
  }

  /** Rotates parts counter-clockwise by `deg` about `centre` (default: the selection's centre). */
  function rotateParts(ids: string[], deg: number, centre?: Point, hold?: Hold): void {
    if (ids.length === 0 || !Number.isFinite(deg) || deg % 360 === 0) return
    commitParts(`Rotate ${deg}°`, ops.rotateParts(doc.value.parts, ids, deg, centre ?? ops.selectionCentre(doc.value.parts, ids)), hold)
  }

  /** Mirrors parts: axis 'x' flips x, 'y' flips y, about the selection's centre. */
  function mirrorParts(ids: string[], axis: 'x' | 'y', centre?: Point): void {
    if (ids.length === 0) return
    commitParts(`Mirror ${axis}`, ops.mirrorParts(doc.value.parts, ids, axis, centre ?? ops.selectionCentre(doc.value.parts, ids)))
  }

  /** Moves vertex `index` of ring `ring` (0 outline, k hole k-1) of a part to `point` (mm). */
  function moveVertex(id: string, ring: number, index: number, point: Point, hold?: Hold): void {
    commitParts('Move vertex', ops.updateOne(doc.value.parts, id, p => ops.vertexOps.move(p, ring, index, point)), hold)
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

  // ---- settings -----------------------------------------------------------------------

  /** Changes settings (units, grid, snap, chord tolerance, reference E, no-tension, KL, shear...). */
  function updateSettings(patch: Partial<SketchSettings>, label = 'Settings'): void {
    commit({ kind: 'settings', label, before: doc.value.settings, after: { ...doc.value.settings, ...patch } })
  }

  /** Picks what the stress view shows: a case, a combination, or the envelope. */
  function setShow(show: SketchSettings['show']): void {
    updateSettings({ show }, 'Show')
  }

  // ---- loads, cases, combinations -----------------------------------------------------

  /** Adds a point load (N, compression positive, at x, y mm) to a case (default the first); returns its id. */
  function addLoad(input: Partial<Omit<SketchLoad, 'id'>> = {}): string {
    const id = newId('load')
    const load: SketchLoad = {
      id,
      name: input.name ?? `Load ${doc.value.loads.length + 1}`,
      caseId: input.caseId ?? doc.value.cases[0]!.id,
      P: input.P ?? 100_000,
      x: input.x ?? 0,
      y: input.y ?? 0,
    }
    if (!doc.value.cases.some(c => c.id === load.caseId)) throw new Error('That load case does not exist')
    commitLoading('Add load', { loads: [...doc.value.loads, load] })
    return id
  }

  /** Changes a load's name, case, P (N) or position (mm). */
  function updateLoad(id: string, patch: Partial<Omit<SketchLoad, 'id'>>): void {
    if (patch.caseId && !doc.value.cases.some(c => c.id === patch.caseId)) throw new Error('That load case does not exist')
    commitLoading('Edit load', { loads: doc.value.loads.map(l => (l.id === id ? { ...l, ...patch } : l)) })
  }

  /** Moves a load to (x, y) mm: the end of a drag. */
  function moveLoad(id: string, x: number, y: number): void {
    commitLoading('Move load', { loads: doc.value.loads.map(l => (l.id === id ? { ...l, x, y } : l)) })
  }

  /** Removes a load. */
  function removeLoad(id: string): void {
    commitLoading('Delete load', { loads: doc.value.loads.filter(l => l.id !== id) })
  }

  /** Adds a load case; returns its id. */
  function addCase(name: string): string {
    const id = newId('case')
    commitLoading('Add load case', { cases: [...doc.value.cases, { id, name, Mx: 0, My: 0 }] })
    return id
  }

  /** Renames a load case. */
  function renameCase(id: string, name: string): void {
    commitLoading('Rename load case', { cases: doc.value.cases.map(c => (c.id === id ? { ...c, name } : c)) })
  }

  /** Removes a load case with its loads and its factors in combinations; the last case stays. */
  function removeCase(id: string): void {
    if (doc.value.cases.length <= 1) throw new Error('A sketch keeps at least one load case')
    commitLoading('Delete load case', {
      cases: doc.value.cases.filter(c => c.id !== id),
      loads: doc.value.loads.filter(l => l.caseId !== id),
      combinations: doc.value.combinations.map(c => {
        const { [id]: _drop, ...factors } = c.factors
        return { ...c, factors }
      }),
    })
  }

  /** Sets the applied moments of a case (N·mm). */
  function setCaseMoments(id: string, Mx: number, My: number): void {
    commitLoading('Case moments', { cases: doc.value.cases.map((c: LoadCase) => (c.id === id ? { ...c, Mx, My } : c)) })
  }

  /** Adds a combination with factors per case id; returns its id. */
  function addCombination(name: string, factors: Record<string, number> = {}): string {
    const id = newId('combo')
    commitLoading('Add combination', { combinations: [...doc.value.combinations, { id, name, factors }] })
    return id
  }

  /** Changes a combination's name or factors. */
  function updateCombination(id: string, patch: Partial<Omit<LoadCombination, 'id'>>): void {
    commitLoading('Edit combination', { combinations: doc.value.combinations.map(c => (c.id === id ? { ...c, ...patch } : c)) })
  }

  /** Removes a combination. */
  function removeCombination(id: string): void {
    commitLoading('Delete combination', { combinations: doc.value.combinations.filter(c => c.id !== id) })
  }

  // ---- history ------------------------------------------------------------------------

  /** Undoes the last change; returns its label or null. */
  function undo(): string | null {
    const c = history.takeUndo()
    if (c) apply(c, 'before')
    return c?.label ?? null
  }

  /** Redoes the last undone change; returns its label or null. */
  function redo(): string | null {
    const c = history.takeRedo()
    if (c) apply(c, 'after')
    return c?.label ?? null
  }

  // Every action that changes the document commits a held change first, so it reads (and its
  // undo restores) the parts as the user last saw them drawn.
  const actions = allAfterStaged({
    addPart, addParts, renamePart, removeParts, duplicateParts, moveParts, rotateParts, mirrorParts,
    moveVertex, insertVertex, deleteVertex, makeHollow, makeHole, setPartKind, setHoleKind, removeHole,
    unionParts, subtractParts, setMaterial, updateSettings, setShow,
    addLoad, updateLoad, moveLoad, removeLoad, addCase, renameCase, removeCase, setCaseMoments,
    addCombination, updateCombination, removeCombination, undo, redo,
  })

  return {
    doc, meta, revision, parts, settings, loads, cases, combinations, bounds, canUndo, canRedo, staged,
    load, setMeta, partById, flushStaged,
    ...actions,
  }
})

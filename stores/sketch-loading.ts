import type { LoadCase, LoadCombination, SketchDocument, SketchLoad, SketchSettings } from '#shared/sketch/document'
import { newId } from '#shared/editor/ids'
import type { Change, Loading } from './history'

/** What the loading and settings actions need from the sketch store. */
export interface LoadingContext {
  doc: { readonly value: SketchDocument }
  commit: (change: Change) => void
  commitLoading: (label: string, after: Partial<Loading>) => void
}

/** The sketch store's settings, load, load case and combination actions, each one undoable change. */
export function loadingActions({ doc, commit, commitLoading }: LoadingContext) {
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

  return { updateSettings, setShow, addLoad, updateLoad, moveLoad, removeLoad, addCase, renameCase, removeCase, setCaseMoments, addCombination, updateCombination, removeCombination }
}

import { ringArea } from '../geometry/moments'
import type { Ring } from '../geometry/types'
import { overlapArea } from '../editor/boolean'
import { orientRing } from '../geometry/ring'

/** Overlaps below this fraction of the smaller area are rounding, not material (as in prepareSection). */
const OVERLAP_TOLERANCE = 1e-6

type Json = Record<string, any>

/**
 * Brings a stored sketch document up to `target` one schema at a time: the draft format
 * (`version: 0`, no `schema`) → `kernwise.sketch/1` → `kernwise.sketch/2`. Throws with a readable
 * message for anything else. The steps keep what a saved document meant (see each step).
 */
export function upgradeDocument(raw: unknown, target: string): unknown {
  if (!raw || typeof raw !== 'object' || Array.isArray(raw)) throw new Error('The document must be a JSON object')
  let doc = raw as Json
  if (doc.schema === undefined && doc.version === 0) doc = fromDraft(doc)
  if (doc.schema === 'kernwise.sketch/1') doc = fromSchema1(doc)
  if (doc.schema === target) return doc
  throw new Error(`Unknown document schema "${String(doc.schema)}"; this Kernwise understands "${target}"`)
}

/** Draft format: one implicit load case, loads without a case id. */
function fromDraft(doc: Json): Json {
  const loads = Array.isArray(doc.loads) ? doc.loads : []
  return {
    schema: 'kernwise.sketch/1',
    parts: doc.parts ?? [],
    cases: [{ id: 'case-1', name: 'Case 1', Mx: 0, My: 0 }],
    combinations: [],
    loads: loads.map((l: any, i: number) => ({ id: l?.id ?? `load-${i + 1}`, caseId: 'case-1', ...l })),
    settings: doc.settings ?? {},
  }
}

/**
 * Schema 1 → 2. In schema 1 a hole cut every part it overlapped; in schema 2 a hole cuts its own part
 * only, and an opening through several parts is a part of kind 'cut'. So a hole that overlapped
 * another part (and did not hold it whole, which schema 1 left uncut) becomes a cut part, and the
 * numbers stay what they were. Hole kind 'cut' (crossing its own edge) is now 'notch'. One allowable
 * stress becomes the same allowable in tension and compression; one effective length applies about
 * both principal axes.
 */
function fromSchema1(doc: Json): Json {
  const parts: Json[] = Array.isArray(doc.parts) ? doc.parts : []
  const outlines = parts.map(p => (isRing(p?.outline) ? (p.outline as Ring) : null))
  const out: Json[] = []
  const cuts: Json[] = []
  parts.forEach((part, i) => {
    if (!part || typeof part !== 'object') { out.push(part); return }
    const holes: Json[] = []
    for (const hole of Array.isArray(part.holes) ? part.holes : []) {
      const ring = hole?.ring
      if (isRing(ring) && cutOtherParts(ring, i, outlines)) {
        cuts.push({
          id: `${String(hole.id ?? `hole-${cuts.length + 1}`)}-cut`.slice(0, 64),
          name: `Cut through ${String(part.name ?? `part ${i + 1}`)}`.slice(0, 80),
          kind: 'cut',
          outline: orientRing(ring, true),
          holes: [],
          material: part.material,
          shape: null,
        })
      } else {
        holes.push({ ...hole, kind: hole?.kind === 'cut' ? 'notch' : hole?.kind })
      }
    }
    const { allowable, ...material } = (part.material ?? {}) as Json
    const upgraded = typeof allowable === 'number' ? { ...material, allowableT: allowable, allowableC: allowable } : material
    out.push({ ...part, kind: 'solid', holes, material: part.material ? upgraded : part.material })
  })
  const settings: Json = { ...(doc.settings ?? {}) }
  if (typeof settings.effectiveLength === 'number' || settings.effectiveLength === null) {
    settings.effectiveLength = { u: settings.effectiveLength, v: settings.effectiveLength }
  }
  return { ...doc, schema: 'kernwise.sketch/2', parts: [...out, ...cuts], settings }
}

/** Whether schema 1 let the hole `ring` of part `own` cut some other part: it overlaps it without holding it whole. */
function cutOtherParts(ring: Ring, own: number, outlines: readonly (Ring | null)[]): boolean {
  const holeArea = Math.abs(ringArea(ring))
  return outlines.some((outline, j) => {
    if (j === own || outline === null) return false
    const partArea = Math.abs(ringArea(outline))
    const cut = overlapArea(ring, { outline: orientRing(outline, true), holes: [] })
    return cut > OVERLAP_TOLERANCE * Math.min(partArea, holeArea) && cut < partArea * (1 - OVERLAP_TOLERANCE)
  })
}

function isRing(value: unknown): value is Ring {
  return Array.isArray(value) && value.length >= 3 && value.every(p => Array.isArray(p) && p.length === 2 && p.every(Number.isFinite))
}

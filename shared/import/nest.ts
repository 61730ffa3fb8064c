import { cleanRing } from './geometry'
import { ringArea as signedArea } from '../geometry/moments'
import { pointInRing } from '../geometry/ring'
import type { ImportedLoop, ImportedPart, LayerRole, SkippedItem } from './types'

/**
 * Turns loops into parts by nesting: a loop on a 'part' layer inside an even number of other
 * part loops is an outline, inside an odd number a hole of the loop just around it. Loops on a
 * 'hole' layer become holes of the smallest outline holding them (skipped when none does);
 * 'skip' layers are left out. Outlines come back counter-clockwise, holes clockwise (mm).
 */
export function nestLoops(loops: readonly ImportedLoop[], roles: Record<string, LayerRole> = {}): { parts: ImportedPart[]; skipped: SkippedItem[] } {
  const roleOf = (l: ImportedLoop): LayerRole => roles[l.layer] ?? 'part'
  const items = loops
    .filter(l => roleOf(l) !== 'skip')
    .map(l => ({ loop: l, area: Math.abs(signedArea(l.ring)), role: roleOf(l) }))
    .sort((a, b) => b.area - a.area)
  const solids = items.filter(i => i.role === 'part')
  const depth = new Map<(typeof items)[number], number>()
  const parent = new Map<(typeof items)[number], (typeof items)[number] | null>()
  for (let k = 0; k < solids.length; k++) {
    const me = solids[k]!
    let best: (typeof items)[number] | null = null
    for (let j = k - 1; j >= 0; j--) {
      const other = solids[j]!
      if (other.area > me.area && pointInRing(sample(me.loop.ring), other.loop.ring)) { best = other; break }
    }
    parent.set(me, best)
    depth.set(me, best ? depth.get(best)! + 1 : 0)
  }
  const parts = new Map<(typeof items)[number], ImportedPart>()
  for (const s of solids) {
    if (depth.get(s)! % 2 === 0) parts.set(s, { outline: oriented(s.loop.ring, true), holes: [], layer: s.loop.layer })
  }
  for (const s of solids) {
    if (depth.get(s)! % 2 === 1) parts.get(parent.get(s)!)!.holes.push(oriented(s.loop.ring, false))
  }
  const skipped: SkippedItem[] = []
  for (const h of items.filter(i => i.role === 'hole')) {
    const owners = [...parts.entries()].filter(([s]) => s.area > h.area && pointInRing(sample(h.loop.ring), s.loop.ring))
    const owner = owners.sort((a, b) => a[0].area - b[0].area)[0]
    if (owner) owner[1].holes.push(oriented(h.loop.ring, false))
    else skipped.push({ kind: 'orphan-hole', layer: h.loop.layer, entity: h.loop.source, message: `A hole on layer "${h.loop.layer}" lies in no outline, so it was left out.` })
  }
  return { parts: [...parts.values()], skipped }
}

/** The midpoint of the first edge: for loops that do not touch it lies inside another loop exactly when the loop does. */
function sample(ring: readonly [number, number][]): [number, number] {
  const a = ring[0]!
  const b = ring[1] ?? a
  return [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2]
}

function oriented(ring: [number, number][], ccw: boolean): [number, number][] {
  const r = cleanRing(ring, 0)
  return (signedArea(r) > 0) === ccw ? r : [...r].reverse()
}

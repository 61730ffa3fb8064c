import { ringArea as signedArea } from '../geometry/moments'
import type { ImportedLoop, SkippedItem } from './types'

type P = [number, number]

/** An open piece (a LINE, an ARC, an open polyline) as points from its start to its end (mm). */
export interface Segment {
  points: P[]
  layer: string
  entity: string
}

const close = (a: P, b: P, tol: number) => Math.hypot(a[0] - b[0], a[1] - b[1]) <= tol

/**
 * Joins segments of one layer whose end points meet within `tol` mm into closed loops; a chain
 * that does not close is reported as an open loop with its two end points. Greedy: each chain
 * takes the first unused segment meeting its free end (reversed when needed).
 */
export function chainSegments(segments: readonly Segment[], tol: number): { loops: ImportedLoop[]; skipped: SkippedItem[] } {
  const loops: ImportedLoop[] = []
  const skipped: SkippedItem[] = []
  const used = new Array<boolean>(segments.length).fill(false)
  for (let i = 0; i < segments.length; i++) {
    if (used[i]) continue
    used[i] = true
    const first = segments[i]!
    const chain: P[] = [...first.points]
    const names = [first.entity]
    let closed = close(chain[0]!, chain[chain.length - 1]!, tol) && chain.length > 2
    while (!closed) {
      const end = chain[chain.length - 1]!
      let found = -1
      let reverse = false
      for (let j = 0; j < segments.length; j++) {
        const s = segments[j]!
        if (used[j] || s.layer !== first.layer) continue
        if (close(s.points[0]!, end, tol)) { found = j; break }
        if (close(s.points[s.points.length - 1]!, end, tol)) { found = j; reverse = true; break }
      }
      if (found < 0) break
      used[found] = true
      const pts = reverse ? [...segments[found]!.points].reverse() : segments[found]!.points
      chain.push(...pts.slice(1))
      names.push(segments[found]!.entity)
      closed = close(chain[0]!, chain[chain.length - 1]!, tol)
    }
    if (closed) {
      chain.pop()
      loops.push({ ring: chain, layer: first.layer, source: names.length > 1 ? `${names.length} lines and arcs` : names[0]! })
    } else {
      const a = chain[0]!
      const b = chain[chain.length - 1]!
      skipped.push({
        kind: 'open-loop', layer: first.layer, entity: names.join(', '), ends: [a, b],
        message: `An open loop on layer "${first.layer}" (${names.length} piece${names.length > 1 ? 's' : ''}) runs from (${fmt(a[0])}, ${fmt(a[1])}) to (${fmt(b[0])}, ${fmt(b[1])}) mm and does not close.`,
      })
    }
  }
  return { loops, skipped }
}

/** Drops loops that repeat another loop (same vertex count, area and centroid to 0.001 mm), reporting each. */
export function dropDuplicates(loops: readonly ImportedLoop[]): { loops: ImportedLoop[]; skipped: SkippedItem[] } {
  const seen = new Set<string>()
  const out: ImportedLoop[] = []
  const skipped: SkippedItem[] = []
  for (const l of loops) {
    const n = l.ring.length
    const cx = l.ring.reduce((s, p) => s + p[0], 0) / n
    const cy = l.ring.reduce((s, p) => s + p[1], 0) / n
    const key = `${n}|${Math.abs(signedArea(l.ring)).toFixed(3)}|${cx.toFixed(3)}|${cy.toFixed(3)}`
    if (seen.has(key)) {
      skipped.push({ kind: 'duplicate', layer: l.layer, entity: l.source, message: `A ${l.source} on layer "${l.layer}" repeats another loop at (${fmt(cx)}, ${fmt(cy)}) mm and was left out.` })
      continue
    }
    seen.add(key)
    out.push(l)
  }
  return { loops: out, skipped }
}

/** A coordinate for messages: up to 3 decimals. */
export function fmt(v: number): string {
  return String(Math.round(v * 1000) / 1000)
}

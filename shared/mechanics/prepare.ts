import { boxesNear, ringsBounds } from '../geometry/bounds'
import { polygonBoolean, polygonsArea } from '../geometry/boolean'
import { regionsHull } from '../geometry/hull'
import { findRingsIntersection, type RingsIntersection } from '../geometry/intersections'
import { ringArea } from '../geometry/moments'
import { describeRing, normaliseRing, type NormalisedRing, type RingLocation } from '../geometry/normalise'
import { orientRing } from '../geometry/ring'
import type { Bounds, Point, Polygon, Ring } from '../geometry/types'
import { SectionError } from './types'
import { DEFAULT_MATERIAL } from './materials'
import type { Material, PartInput, PreparedPart, PreparedRegion, PreparedSection } from './types'

/**
 * Options of prepareSection: the reference modulus E_ref (MPa) for the modular ratios n = E / E_ref,
 * and the section-wide cuts (rings, mm): openings through every part they overlap.
 */
export interface PrepareOptions {
  readonly referenceE?: number
  readonly cuts?: readonly Ring[]
}

/** Overlaps below this fraction of the smaller area are rounding, not material. */
const OVERLAP_TOLERANCE = 1e-6

/** One part after its rings were cleaned: outline CCW, holes CW (mm). */
interface CleanPart {
  readonly name: string
  readonly outline: Point[]
  /** Its voids then its notches, CW. */
  readonly holes: Point[][]
  readonly material: Material
  /** True when the holes lie strictly inside the outline and apart: no Boolean needed. */
  readonly simple: boolean
}

/**
 * Validates and prepares a section for integration (mm, MPa). Rings are cleaned and oriented
 * (outlines CCW, holes CW, no closing vertex). A part's holes and notches cut that part only: a
 * plate drawn inside a box's void counts in full. Section-wide cuts (options.cuts) cut every part
 * they overlap and are listed per part. Parts of one material (same E, fy, density) are then
 * unioned so overlaps count once; parts of different materials must not overlap.
 * n = E / E_ref with E_ref = options.referenceE or the first part's E. Throws SectionError,
 * naming the part or cut (1-based in the text, 0-based in the error), ring and vertex, for invalid input.
 */
export function prepareSection(parts: readonly PartInput[], options: PrepareOptions = {}): PreparedSection {
  if (!Array.isArray(parts) || parts.length === 0) {
    throw new SectionError('The section has no parts: draw at least one outline.')
  }
  const warnings: string[] = []
  const clean = parts.map((part, i) => cleanPart(part, i, warnings))
  const referenceE = options.referenceE ?? clean[0]!.material.E
  if (typeof referenceE !== 'number' || !Number.isFinite(referenceE) || referenceE <= 0) {
    throw new SectionError(`The reference modulus E_ref must be a positive number of MPa (got ${String(referenceE)}).`)
  }
  const cuts = (options.cuts ?? []).map((ring, k) => cleanCut(ring, k))
  const cutHits: { parts: number[]; area: number }[] = cuts.map(() => ({ parts: [], area: 0 }))
  const nets = clean.map((part, j) => netPolygons(part, j, cuts, cutHits))
  cutHits.forEach((hit, k) => {
    if (hit.parts.length === 0) warnings.push(`Cut ${k + 1} overlaps no part and removes nothing.`)
  })
  if (nets.every((net) => net.length === 0)) {
    throw new SectionError('Nothing is left of the section once its holes and cuts are taken away.')
  }
  nets.forEach((net, j) => {
    if (net.length === 0) warnings.push(`${partLabel(clean[j]!, j)} is cut away entirely.`)
  })
  checkMaterialOverlaps(clean, nets)

  const groups = new Map<string, number[]>()
  clean.forEach((part, j) => {
    const key = materialKey(part.material)
    groups.set(key, [...(groups.get(key) ?? []), j])
  })
  const regions: PreparedRegion[] = []
  for (const members of groups.values()) {
    const material = clean[members[0]!]!.material
    const pieces = members.map((j) => nets[j]!).filter((net) => net.length > 0)
    const polygons = pieces.length <= 1 ? (pieces[0] ?? []) : boolean('union', pieces)
    if (polygons.length > 0) regions.push({ material, n: material.E / referenceE, polygons })
  }
  const outlines = regions.flatMap((region) => region.polygons.map((polygon) => polygon[0]!))
  // Normalised rings hold at least 3 vertices, so the bounds exist.
  const bounds = ringsBounds(outlines)!
  const preparedParts: PreparedPart[] = clean.map((part, j) => ({
    index: j,
    name: part.name,
    material: part.material,
    n: part.material.E / referenceE,
    polygons: nets[j]!,
    cuts: cutHits.flatMap((hit, k) => (hit.parts.includes(j) ? [k] : [])),
  }))
  return {
    regions,
    referenceE,
    origin: [(bounds.minX + bounds.maxX) / 2, (bounds.minY + bounds.maxY) / 2],
    bounds,
    hull: regionsHull(regions),
    parts: preparedParts,
    cuts: cutHits.map((hit, k) => ({ index: k, parts: hit.parts, area: hit.area })),
    warnings,
  }
}

/** "Part 2 (Top plate)": how messages name a part. */
function partLabel(part: CleanPart, i: number): string {
  return part.name === `Part ${i + 1}` ? part.name : `Part ${i + 1} (${part.name})`
}

/** Checks the material and cleans the rings of part i; decides whether its holes need Booleans. */
function cleanPart(part: PartInput, i: number, warnings: string[]): CleanPart {
  const material = checkMaterial(part?.material ?? DEFAULT_MATERIAL, i)
  const named = typeof part?.name === 'string' && part.name.trim() !== '' ? part.name : undefined
  const name = named ?? `Part ${i + 1}`
  const voids = part?.holes ?? []
  const given = [part?.outline, ...voids, ...(part?.notches ?? [])]
  const at = (k: number): RingLocation => ({ part: i, ring: k, ...(named ? { name: named } : {}) })
  const rings = given.map((ring, k) => normaliseRing(ring as Ring, at(k)))
  // One sweep over all rings; only if it finds contact are the rings swept one by one, to tell a
  // ring crossing itself (an error) from holes touching the outline or each other (Booleans).
  const contact = findRingsIntersection(rings.map((ring) => ring.points))
  if (contact && contact.ringA === contact.ringB) throw crossingError(rings[contact.ringA]!, contact, at(contact.ringA))
  if (contact && rings.length > 1) {
    rings.forEach((ring, k) => {
      const own = findRingsIntersection([ring.points])
      if (own) throw crossingError(ring, own, at(k))
    })
  }
  const outline = orientRing(rings[0]!.points, true)
  const holes = rings.slice(1).map((ring) => orientRing(ring.points, false))
  // No contact between the rings: each hole is wholly inside the outline, outside it, or around it.
  let simple = contact === null
  holes.forEach((hole, k) => {
    const where = at(k + 1)
    const holeArea = -ringArea(hole)
    const cut = simple ? (pointInRing(hole[0]!, outline) ? holeArea : 0) : overlapArea([[outline]], [[hole]])
    if (cut <= OVERLAP_TOLERANCE * holeArea) {
      const around = simple && pointInRing(outline[0]!, hole)
      const vertex = rings[k + 1]!.source[0]!
      throw new SectionError(around
        ? `${describeRing(where)} covers the whole outline of the part.`
        : `${describeRing(where)} lies outside the part's outline (from its vertex ${vertex + 1} on); draw it inside the outline it cuts.`, { ...where, vertex })
    }
    if (k < voids.length && cut < holeArea * (1 - OVERLAP_TOLERANCE)) {
      warnings.push(`${describeRing(where)} extends beyond the part's outline; it cuts the edge as a notch (mark it a notch if that is meant).`)
    }
  })
  // Apart is not enough when one hole lies inside another.
  for (let a = 0; simple && a < holes.length; a++) {
    for (let b = 0; b < holes.length; b++) {
      if (a !== b && pointInRing(holes[a]![0]!, holes[b]!)) {
        warnings.push(`${describeRing(at(a + 1))} lies inside hole ${b + 1} and cuts nothing more.`)
        simple = false
      }
    }
  }
  return { name, outline, holes, material, simple }
}

/** Cleans section-wide cut k: a simple ring, returned clockwise (mm). */
function cleanCut(ring: Ring, k: number): Point[] {
  const where: RingLocation = { part: k, ring: 0, cut: true }
  const cleaned = normaliseRing(ring, where)
  const own = findRingsIntersection([cleaned.points])
  if (own) throw crossingError(cleaned, own, where)
  return orientRing(cleaned.points, false)
}

/** The error for a ring that crosses or touches itself, naming the edges by input vertex numbers. */
function crossingError(ring: NormalisedRing, hit: RingsIntersection, where: RingLocation): SectionError {
  const { points, source } = ring
  const n = points.length
  const edge = (k: number): string => `the edge from vertex ${source[k]! + 1} to vertex ${source[(k + 1) % n]! + 1}`
  const first = Math.min(hit.edgeA, hit.edgeB)
  const [x, y] = hit.point
  return new SectionError(
    `${describeRing(where)}: ${edge(first)} meets ${edge(Math.max(hit.edgeA, hit.edgeB))} near (${round(x)}, ${round(y)}); a ring must not cross or touch itself.`,
    { ...where, vertex: source[first]! },
  )
}

/** E must be positive and finite; fy and density, when given, too. */
function checkMaterial(material: Material, i: number): Material {
  const check = (value: unknown, what: string, optional: boolean): void => {
    if (optional && (value === undefined || value === null)) return
    if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
      throw new SectionError(`Part ${i + 1}: ${what} must be a positive number (got ${String(value)}).`, { part: i })
    }
  }
  check(material?.E, 'the modulus E (MPa)', false)
  check(material.fy, 'the yield strength fy (MPa)', true)
  check(material.density, 'the density (kg/m³)', true)
  return material
}

/**
 * The net polygons of part j: its outline minus its own holes and every section-wide cut that
 * overlaps it. Records in cutHits which cut took how much (mm²) from which part.
 */
function netPolygons(part: CleanPart, j: number, cuts: readonly Point[][], cutHits: { parts: number[]; area: number }[]): Polygon[] {
  const applied: Point[][] = []
  const partArea = ringArea(part.outline)
  let box: Bounds | null = null
  cuts.forEach((cutRing, k) => {
    box ??= ringsBounds([part.outline])!
    if (!boxesNear(ringsBounds([cutRing])!, box)) return
    const cutArea = -ringArea(cutRing)
    let cut: number
    if (findRingsIntersection([part.outline, cutRing]) !== null) cut = overlapArea([[part.outline]], [[cutRing]])
    else if (pointInRing(cutRing[0]!, part.outline)) cut = cutArea
    else cut = pointInRing(part.outline[0]!, cutRing) ? partArea : 0
    if (cut <= OVERLAP_TOLERANCE * Math.min(partArea, cutArea)) return
    applied.push(cutRing)
    cutHits[k]!.parts.push(j)
  })
  if (part.simple && applied.length === 0) return [[part.outline, ...part.holes]]
  const own = part.simple ? [[part.outline, ...part.holes]] : boolean('difference', [[[part.outline]], ...part.holes.map((hole) => [[hole]])])
  if (applied.length === 0) return own
  const net = boolean('difference', [own, ...applied.map((ring) => [[ring]])])
  // What each cut removed from this part: the net area before and after, cut by cut when several.
  let before = netArea(own)
  applied.forEach((ring, a) => {
    const k = cuts.indexOf(ring)
    const after = applied.length === 1 ? netArea(net) : netArea(boolean('difference', [own, ...applied.slice(0, a + 1).map((r) => [[r]])]))
    cutHits[k]!.area += before - after
    before = after
  })
  return net
}

/** Parts of different materials must not share area (a transformed section has one n per point). */
function checkMaterialOverlaps(clean: readonly CleanPart[], nets: readonly Polygon[][]): void {
  for (let i = 0; i < clean.length; i++) {
    for (let j = i + 1; j < clean.length; j++) {
      if (materialKey(clean[i]!.material) === materialKey(clean[j]!.material)) continue
      if (nets[i]!.length === 0 || nets[j]!.length === 0) continue
      if (!boxesNear(ringsBounds([clean[i]!.outline])!, ringsBounds([clean[j]!.outline])!)) continue
      const a = clean[i]!.outline
      const b = clean[j]!.outline
      if (findRingsIntersection([a, b]) === null && !pointInRing(a[0]!, b) && !pointInRing(b[0]!, a)) continue
      const overlap = overlapArea(nets[i]!, nets[j]!)
      if (overlap > OVERLAP_TOLERANCE * Math.min(netArea(nets[i]!), netArea(nets[j]!))) {
        throw new SectionError(
          `${partLabel(clean[i]!, i)} and ${partLabel(clean[j]!, j)} overlap (${round(overlap)} mm²) but are of different materials; cut a hole in one where the other sits.`,
          { part: i },
        )
      }
    }
  }
}

/** Area (mm²) of the intersection of two sets of polygons. */
function overlapArea(a: readonly Polygon[], b: readonly Polygon[]): number {
  return netArea(boolean('intersection', [a, b]))
}

const netArea = polygonsArea
const boolean = polygonBoolean

/** Crossing-number test: whether p lies inside the ring (p must not lie on its boundary). */
function pointInRing(p: Point, ring: Ring): boolean {
  let inside = false
  let b = ring[ring.length - 1]!
  for (const a of ring) {
    const straddles = a[1] > p[1] !== b[1] > p[1]
    if (straddles && p[0] < a[0] + ((p[1] - a[1]) * (b[0] - a[0])) / (b[1] - a[1])) inside = !inside
    b = a
  }
  return inside
}

/** Parts with equal keys are one material (same E, fy, density, strengths): their overlaps count once. */
export function materialKey(material: Material): string {
  return `${material.E}|${material.fy ?? ''}|${material.density ?? ''}|${material.fc ?? ''}|${material.stressBlock ?? ''}|${material.noTension ? 'nt' : ''}`
}



/** A coordinate rounded for a message. */
function round(value: number): string {
  return String(Number(value.toPrecision(6)))
}

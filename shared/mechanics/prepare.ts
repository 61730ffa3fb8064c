import { ringsBounds } from '../geometry/bounds'
import polygonClipping from 'polygon-clipping'
import type { MultiPolygon as ClipMultiPolygon, Polygon as ClipPolygon } from 'polygon-clipping'
import { regionsHull } from '../geometry/hull'
import { findRingsIntersection, type RingsIntersection } from '../geometry/intersections'
import { ringArea } from '../geometry/moments'
import { describeRing, normaliseRing, orientRing, type NormalisedRing, type RingLocation } from '../geometry/normalise'
import type { Bounds, Point, Polygon, Ring } from '../geometry/types'
import { DEFAULT_MATERIAL, SectionError } from './types'
import type { Material, PartInput, PreparedPart, PreparedRegion, PreparedSection } from './types'

/** Options of prepareSection: the reference modulus E_ref (MPa) for the modular ratios n = E / E_ref. */
export interface PrepareOptions {
  readonly referenceE?: number
}

/** Overlaps below this fraction of the smaller area are rounding, not material. */
const OVERLAP_TOLERANCE = 1e-6

/** One part after its rings were cleaned: outline CCW, holes CW (mm). */
interface CleanPart {
  readonly outline: Point[]
  readonly holes: Point[][]
  readonly material: Material
  /** True when the holes lie strictly inside the outline and apart: no Boolean needed. */
  readonly simple: boolean
}

/**
 * Validates and prepares a section for integration (mm, MPa). Rings are cleaned and oriented
 * (outlines CCW, holes CW, no closing vertex); a hole cuts every part it overlaps, except a part
 * lying wholly inside it, which fills it (a core in a tube); parts of one material (same E, fy,
 * density) are unioned so overlaps count once; parts of different materials must not overlap.
 * n = E / E_ref with E_ref = options.referenceE or the first part's E. Throws SectionError,
 * naming the part (1-based in the text, 0-based in `part`), ring and vertex, for invalid input.
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
  const nets = clean.map((part, j) => netPolygons(part, j, clean, warnings))
  if (nets.every((net) => net.length === 0)) {
    throw new SectionError('Nothing is left of the section once its holes are cut.')
  }
  nets.forEach((net, j) => {
    if (net.length === 0) warnings.push(`Part ${j + 1} is cut away entirely by holes of other parts.`)
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
    name: parts[j]!.name ?? `Part ${j + 1}`,
    material: part.material,
    n: part.material.E / referenceE,
    polygons: nets[j]!,
  }))
  return {
    regions,
    referenceE,
    origin: [(bounds.minX + bounds.maxX) / 2, (bounds.minY + bounds.maxY) / 2],
    bounds,
    hull: regionsHull(regions),
    parts: preparedParts,
    warnings,
  }
}

/** Checks the material and cleans the rings of part i; decides whether its holes need Booleans. */
function cleanPart(part: PartInput, i: number, warnings: string[]): CleanPart {
  const material = checkMaterial(part?.material ?? DEFAULT_MATERIAL, i)
  const rings = [part?.outline, ...(part?.holes ?? [])].map((ring, k) => normaliseRing(ring as Ring, { part: i, ring: k }))
  // One sweep over all rings; only if it finds contact are the rings swept one by one, to tell a
  // ring crossing itself (an error) from holes touching the outline or each other (Booleans).
  const contact = findRingsIntersection(rings.map((ring) => ring.points))
  if (contact && contact.ringA === contact.ringB) throw crossingError(rings[contact.ringA]!, contact, { part: i, ring: contact.ringA })
  if (contact && rings.length > 1) {
    rings.forEach((ring, k) => {
      const own = findRingsIntersection([ring.points])
      if (own) throw crossingError(ring, own, { part: i, ring: k })
    })
  }
  const outline = orientRing(rings[0]!.points, true)
  const holes = rings.slice(1).map((ring) => orientRing(ring.points, false))
  // No contact between the rings: each hole is wholly inside the outline, outside it, or around it.
  let simple = contact === null
  holes.forEach((hole, k) => {
    const where = { part: i, ring: k + 1 }
    const holeArea = -ringArea(hole)
    const cut = simple ? (pointInRing(hole[0]!, outline) ? holeArea : 0) : overlapArea([[outline]], [[hole]])
    if (cut <= OVERLAP_TOLERANCE * holeArea) {
      const around = simple && pointInRing(outline[0]!, hole)
      throw new SectionError(around
        ? `${describeRing(where)} covers the whole outline of the part.`
        : `${describeRing(where)} lies outside the part's outline; draw it inside the outline it cuts.`, where)
    }
    if (cut < holeArea * (1 - OVERLAP_TOLERANCE)) {
      warnings.push(`${describeRing(where)} extends beyond the part's outline; it is treated as a cut at the edge.`)
    }
  })
  // Apart is not enough when one hole lies inside another.
  for (let a = 0; simple && a < holes.length; a++) {
    for (let b = 0; b < holes.length; b++) {
      if (a !== b && pointInRing(holes[a]![0]!, holes[b]!)) {
        warnings.push(`${describeRing({ part: i, ring: a + 1 })} lies inside hole ${b + 1} and cuts nothing more.`)
        simple = false
      }
    }
  }
  return { outline, holes, material, simple }
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
 * The net polygons of part j: its outline minus its own holes and every other part's hole that
 * overlaps it, unless the part lies wholly inside that hole (it fills it).
 */
function netPolygons(part: CleanPart, j: number, all: readonly CleanPart[], warnings: string[]): Polygon[] {
  const foreign: Point[][] = []
  const partArea = ringArea(part.outline)
  let box: Bounds | null = null
  all.forEach((other, i) => {
    if (i === j) return
    other.holes.forEach((hole, k) => {
      box ??= ringsBounds([part.outline])!
      if (!boxesOverlap(ringsBounds([hole])!, box)) return
      const holeArea = -ringArea(hole)
      let cut: number
      if (findRingsIntersection([part.outline, hole]) !== null) cut = overlapArea([[part.outline]], [[hole]])
      else if (pointInRing(hole[0]!, part.outline)) cut = holeArea
      else cut = pointInRing(part.outline[0]!, hole) ? partArea : 0
      if (cut <= OVERLAP_TOLERANCE * Math.min(partArea, holeArea)) return
      if (cut >= partArea * (1 - OVERLAP_TOLERANCE)) return // the part fills the hole
      foreign.push(hole)
      warnings.push(`${describeRing({ part: i, ring: k + 1 })} also cuts part ${j + 1}.`)
    })
  })
  if (part.simple && foreign.length === 0) return [[part.outline, ...part.holes]]
  return boolean('difference', [[[part.outline]], ...[...part.holes, ...foreign].map((hole) => [[hole]])])
}

/** Parts of different materials must not share area (a transformed section has one n per point). */
function checkMaterialOverlaps(clean: readonly CleanPart[], nets: readonly Polygon[][]): void {
  for (let i = 0; i < clean.length; i++) {
    for (let j = i + 1; j < clean.length; j++) {
      if (materialKey(clean[i]!.material) === materialKey(clean[j]!.material)) continue
      if (nets[i]!.length === 0 || nets[j]!.length === 0) continue
      if (!boxesOverlap(ringsBounds([clean[i]!.outline])!, ringsBounds([clean[j]!.outline])!)) continue
      const a = clean[i]!.outline
      const b = clean[j]!.outline
      if (findRingsIntersection([a, b]) === null && !pointInRing(a[0]!, b) && !pointInRing(b[0]!, a)) continue
      const overlap = overlapArea(nets[i]!, nets[j]!)
      if (overlap > OVERLAP_TOLERANCE * Math.min(netArea(nets[i]!), netArea(nets[j]!))) {
        throw new SectionError(
          `Parts ${i + 1} and ${j + 1} overlap (${round(overlap)} mm²) but are of different materials; cut a hole in one where the other sits.`,
          { part: i },
        )
      }
    }
  }
}

type BooleanOperation = 'union' | 'difference' | 'intersection'

/** A polygon-clipping operation on our polygons (open rings), returning CCW outlines and CW holes. */
function boolean(operation: BooleanOperation, geoms: readonly (readonly Polygon[])[]): Polygon[] {
  const [first, ...rest] = geoms.map((geom) => geom.map(toClip))
  let result: ClipMultiPolygon
  try {
    result = polygonClipping[operation](first!, ...rest)
  } catch (error) {
    throw new SectionError(`The ${operation} of the section's parts failed (${(error as Error).message}); simplify the drawing.`)
  }
  return result.map(fromClip).filter((polygon) => polygon.length > 0)
}

function toClip(polygon: Polygon): ClipPolygon {
  return polygon.map((ring) => [...ring.map((p): [number, number] => [p[0], p[1]]), [ring[0]![0], ring[0]![1]]])
}

/** Drops the closing vertex and re-orients; drops holes that enclose nothing ([] if the outline does not). */
function fromClip(polygon: ClipPolygon): Polygon {
  const rings = polygon.map((ring) => ring.slice(0, ring.length - 1) as Point[])
  const valid = (ring: Point[]): boolean => ring.length >= 3 && ringArea(ring) !== 0
  if (!rings[0] || !valid(rings[0])) return []
  return [orientRing(rings[0], true), ...rings.slice(1).filter(valid).map((ring) => orientRing(ring, false))]
}

/** Area (mm²) of the intersection of two sets of polygons. */
function overlapArea(a: readonly Polygon[], b: readonly Polygon[]): number {
  return netArea(boolean('intersection', [a, b]))
}

function netArea(polygons: readonly Polygon[]): number {
  return polygons.reduce((sum, polygon) => sum + polygon.reduce((s, ring) => s + ringArea(ring), 0), 0)
}

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

function materialKey(material: Material): string {
  return `${material.E}|${material.fy ?? ''}|${material.density ?? ''}`
}


function boxesOverlap(a: Bounds, b: Bounds): boolean {
  return a.minX <= b.maxX && b.minX <= a.maxX && a.minY <= b.maxY && b.minY <= a.maxY
}

/** A coordinate rounded for a message. */
function round(value: number): string {
  return String(Number(value.toPrecision(6)))
}

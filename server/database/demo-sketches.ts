import { MATERIAL_PRESETS, type MaterialPreset } from '../../shared/mechanics/materials'
import { SHAPES } from '../../shared/shapes/registry'
import type { ShapeGeometry } from '../../shared/shapes/common'
import { DOCUMENT_SCHEMA, SketchDocumentSchema, type SketchDocument, type SketchPart } from '../../shared/sketch/document'
import { mirrorRing, rectangleRing, translateRing } from '../../shared/editor/transform'

/**
 * Demo sketches of the Millrace Yard retrofit, an invented scenario (README "Demo workspace"):
 * real documents built with the shapes registry, in mm and N (kN × 1000), y up.
 */

type Status = 'draft' | 'submitted' | 'approved'
type Xy = [number, number]

const kN = 1000

function material(p: MaterialPreset): SketchPart['material'] {
  return { name: p.name, E: p.E, ...(p.fy ? { fy: p.fy } : {}), ...(p.fc ? { fc: p.fc } : {}), density: p.density, ...(p.noTension ? { noTension: true } : {}) }
}

function part(id: string, name: string, g: ShapeGeometry, mat: MaterialPreset, shape: SketchPart['shape'] = null, dx = 0, dy = 0): SketchPart {
  return {
    id,
    name,
    kind: 'solid',
    outline: translateRing(g.outline, dx, dy),
    holes: g.holes.map((h, k) => ({ id: `${id}-hole-${k + 1}`, kind: 'void' as const, ring: translateRing(h, dx, dy) })),
    material: material(mat),
    shape,
  }
}

function rect(x0: number, y0: number, x1: number, y1: number): ShapeGeometry {
  return { outline: rectangleRing([x0, y0], [x1, y1]), holes: [] }
}

function doc(parts: SketchPart[], loads: { name: string; P: number; x: number; y: number; caseId?: string }[], extra: Partial<SketchDocument> = {}, settings: Record<string, unknown> = {}): SketchDocument {
  return SketchDocumentSchema.parse({
    schema: DOCUMENT_SCHEMA,
    parts,
    cases: [{ id: 'case-1', name: 'Service (example)', Mx: 0, My: 0 }],
    combinations: [],
    loads: loads.map((l, i) => ({ id: `load-${i + 1}`, caseId: 'case-1', ...l })),
    settings: { gridMm: 10, ...settings },
    ...extra,
  })
}

const steel = MATERIAL_PRESETS.steel

/** 1. A rolled H about 300 deep with a 240 × 15 plate on the top flange; the crane load sits inside the core. */
function craneColumn(): SketchDocument {
  const params = { h: 300, b: 300, tw: 11, tf: 19, r: 27 }
  const column = part('c3-column', 'H 300 × 300', SHAPES.ishape.build(params), steel, { kind: 'ishape', params })
  const plate = part('c3-plate', 'Bracket plate 240 × 15', rect(-120, 150, 120, 165), steel, { kind: 'plate', params: { b: 240, h: 15 } })
  const loads = [
    { name: 'Crane bracket', caseId: 'case-crane', P: 320 * kN, x: 20, y: 60 },
    { name: 'Column above', caseId: 'case-1', P: 200 * kN, x: 0, y: 0 },
  ]
  // Opens on the crane case: the 320 kN of the scenario, inside the core.
  return doc([column, plate], loads, {
    cases: [
      { id: 'case-1', name: 'Dead (example)', Mx: 0, My: 0 },
      { id: 'case-crane', name: 'Crane (example)', Mx: 0, My: 0 },
    ],
    combinations: [{ id: 'combo-1', name: 'Example 1.35 D + 1.5 C (factors typed for the demo)', factors: { 'case-1': 1.35, 'case-crane': 1.5 } }],
  }, { show: { type: 'case', id: 'case-crane' } })
}

/**
 * 2. Two channels toe to toe closed by plates into a box, taken at a bolt line: four 22 mm bolt holes,
 * each a section-wide cut through a plate and the channel flange under it (net section).
 */
function mezzaninePost(): SketchDocument {
  const params = { h: 200, b: 75, tw: 8.5, tf: 11.5, r: 12 }
  const ch = SHAPES.channel.build(params)
  const left = part('m1-channel-left', 'Channel left', ch, steel, { kind: 'channel', params }, -112.5, 0)
  // The right channel faces the other way: mirrored about its own centre, then placed.
  const mirrored: ShapeGeometry = { outline: mirrorRing(ch.outline, 'x', [0, 0]), holes: [] }
  const right = part('m1-channel-right', 'Channel right', mirrored, steel, null, 112.5, 0)
  const top = part('m1-plate-top', 'Top plate 300 × 10', rect(-150, 100, 150, 110), steel)
  const bottom = part('m1-plate-bottom', 'Bottom plate 300 × 10', rect(-150, -110, 150, -100), steel)
  // Drawn a little beyond the plate and the 11.5 mm flange: a cut removes only what it overlaps.
  const bolt = (id: string, name: string, cx: number, y0: number, y1: number): SketchPart => ({ ...part(id, name, rect(cx - 11, y0, cx + 11, y1), steel), kind: 'cut' })
  const bolts = [
    bolt('m1-bolt-t1', 'Bolt hole 22 top left', -112.5, 85, 115),
    bolt('m1-bolt-t2', 'Bolt hole 22 top right', 112.5, 85, 115),
    bolt('m1-bolt-b1', 'Bolt hole 22 bottom left', -112.5, -115, -85),
    bolt('m1-bolt-b2', 'Bolt hole 22 bottom right', 112.5, -115, -85),
  ]
  return doc([left, right, top, bottom, ...bolts], [{ name: 'Mezzanine beam', P: 180 * kN, x: 15, y: -10 }])
}

/** 3. A 440 × 440 brick pier, no tension; the beam bears 90 mm off centre, outside the core (440/6 = 73 mm). */
function brickPier(): SketchDocument {
  const pier = part('p2-pier', 'Brick pier 440 × 440', SHAPES.plate.build({ b: 440, h: 440 }), MATERIAL_PRESETS.masonry, { kind: 'plate', params: { b: 440, h: 440 } })
  return doc([pier], [{ name: 'Beam bearing', P: 150 * kN, x: 0, y: 90 }], {}, { noTension: true })
}

/**
 * 4. A 1800 × 2400 pad on soil with 900 kN at (250, 350): outside the core, partial contact. The
 * section is the pad's base on the ground, so its material is the soil with its bearing pressure.
 */
function padFooting(): SketchDocument {
  const pad = part('f4-pad', 'Base of pad 1800 × 2400', SHAPES.plate.build({ b: 1800, h: 2400 }), MATERIAL_PRESETS.soil, { kind: 'plate', params: { b: 1800, h: 2400 } })
  return doc([pad], [{ name: 'Column', P: 900 * kN, x: 250, y: 350 }], {}, { noTension: true, gridMm: 50 })
}

/** 5. An unequal angle 150 × 90 × 10 connected through its long leg: unsymmetric, Ixy ≠ 0. */
function canopyStrut(): SketchDocument {
  const params = { h: 150, b: 90, t: 10, r: 12, r2: 6 }
  const angle = part('s5-angle', 'Angle 150 × 90 × 10', SHAPES.angle.build(params), steel, { kind: 'angle', params })
  return doc([angle], [{ name: 'Canopy tie', P: 60 * kN, x: -40, y: 0 }], {}, { effectiveLength: { u: 2400, v: 2400 } })
}

/** 6. A flame-cut T drawn freehand, with a 30 mm slot cut up into the stem for a gusset. */
function teeStub(): SketchDocument {
  const outline: Xy[] = [[-50, -225], [50, -225], [60, -25], [130, -25], [130, 0], [-130, 0], [-130, -25], [-60, -25]]
  const slot: Xy[] = rectangleRing([-15, -230], [15, -145]).reverse()
  const tee: SketchPart = {
    id: 't6-stub', name: 'Flame-cut T', kind: 'solid', outline, holes: [{ id: 't6-slot', kind: 'notch', ring: slot }], material: material(steel), shape: null,
  }
  return doc([tee], [{ name: 'Hanger', P: 120 * kN, x: 0, y: -40 }])
}

/** Demo sketches of the Millrace Yard retrofit: one submitted for check, one approved, the rest drafts. */
export function demoSketches(): { title: string; project: string; description: string; status: Status; document: SketchDocument }[] {
  const project = 'Millrace Yard retrofit'
  return [
    { title: 'Crane column C3', project, status: 'approved', description: 'Rolled H with a bracket plate welded to one flange; 320 kN crane load inside the core (demo).', document: craneColumn() },
    { title: 'Mezzanine post M1', project, status: 'submitted', description: 'Two channels toe to toe closed by plates; net section at the bolt line (demo).', document: mezzaninePost() },
    { title: 'Brick pier P2', project, status: 'draft', description: 'Masonry pier, no tension; beam bearing 90 mm off centre lifts part of the base (demo).', document: brickPier() },
    { title: 'Pad footing F4', project, status: 'draft', description: 'Pad on soil with a biaxially eccentric column load: partial contact (demo).', document: padFooting() },
    { title: 'Canopy strut S5', project, status: 'draft', description: 'Unequal angle: principal axes and the general bending formula (demo).', document: canopyStrut() },
    { title: 'Fabricated T-stub T6', project, status: 'draft', description: 'Flame-cut T with a 30 mm slot, drawn freehand (demo).', document: teeStub() },
  ]
}

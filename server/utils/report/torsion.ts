import type PDFDocument from 'pdfkit'
import { cleanZero, formatNumber, toDisplay } from '../../../shared/editor/units'
import type { TorsionResult } from '../../../shared/mechanics/torsion/analysis'
import { TORSION_CAUTION, TORSION_METHOD } from './method'
import { heading, para, table } from './table'
import { pdfText, q, u, v } from './text'
import { CONTENT_TOP } from './title-block'
import type { ReportInput } from './types'

type Doc = InstanceType<typeof PDFDocument>

/** Cw (mm⁶) in the sheet's length unit to the sixth power. */
export function warpingText(cw: number, system: ReportInput['doc']['settings']): string {
  return pdfText(`${formatNumber(cw * toDisplay(1, 'length', system) ** 6, 4)} ${u('length', system)}⁶`)
}

/**
 * τ_max per unit torque (model: MPa per N·mm) in the sheet's stress unit per its moment unit,
 * e.g. "2.546 MPa per kN·m".
 */
export function stressPerTorqueText(perNmm: number, system: ReportInput['doc']['settings']): string {
  const value = (perNmm * toDisplay(1, 'stress', system)) / toDisplay(1, 'moment', system)
  return pdfText(`${formatNumber(value, 4)} ${u('stress', system)} per ${u('moment', system)}`)
}

/**
 * The torsion page: J, the shear centre, Cw, the shear areas and τ_max per unit torque, the mesh
 * (section vertices, nodes, elements) with the mesh study, and what the method is and is not.
 * A section the torsion solve refused gets the reason instead of the values.
 */
export function torsionPage(doc: Doc, input: ReportInput): void {
  const a = input.analysis
  if (!a) return
  const sys = input.doc.settings
  const t = a.torsion
  if (!t && !input.torsionError) return
  doc.addPage()
  doc.font('bold').fontSize(12).fillColor('#111').text('Torsion and shear (finite elements on the section)', doc.page.margins.left, CONTENT_TOP)
  doc.moveDown(0.3)
  if (!t) {
    para(doc, `Torsion was not computed: ${input.torsionError}`)
    methodBlock(doc)
    return
  }
  const width = doc.page.width - doc.page.margins.left - doc.page.margins.right
  const p = a.properties
  const ext = Math.max(p.bounds.maxX - p.bounds.minX, p.bounds.maxY - p.bounds.minY)
  // The mesh places the shear centre to about 10^-4 of the section's size: below that is mesh noise.
  const noise = (v: number) => (Math.abs(v) < 1e-4 * ext ? 0 : v)
  const sc = { x: noise(cleanZero(t.shearCentre.x, ext)), y: noise(cleanZero(t.shearCentre.y, ext)) }
  const rel = { x: noise(t.shearCentre.x - p.centroid.x), y: noise(t.shearCentre.y - p.centroid.y) }
  const tau = t.torsionStress
  const rows: [string, string][] = [
    ['J torsion constant', q(t.J, 'inertia', sys)],
    ['Cw warping constant (about the shear centre)', warpingText(t.Cw, sys)],
    ['Shear centre xs, ys', `${q(sc.x, 'length', sys)}, ${q(sc.y, 'length', sys)}`],
    ['Shear centre from the centroid (under 10^-4 of the size: 0)', `${q(rel.x, 'length', sys)}, ${q(rel.y, 'length', sys)}`],
    ['Shear area along x, along y', `${q(t.shearAreas.x, 'area', sys)}, ${q(t.shearAreas.y, 'area', sys)}`],
    ['Shear area / A along x, along y', `${(t.shearAreas.x / p.area).toFixed(3)}, ${(t.shearAreas.y / p.area).toFixed(3)}`],
    ['Max torsional shear stress per unit torque', stressPerTorqueText(tau.value, sys)],
    ['  at x, y', `${q(cleanZero(tau.x, ext), 'length', sys)}, ${q(cleanZero(tau.y, ext), 'length', sys)}`],
    ['G_ref, nu', `${q(t.referenceG, 'stress', sys)}, ${t.nu.toFixed(3)}`],
  ]
  heading(doc, t.equivalent ? 'Torsion properties (equivalent, for E_ref and G_ref)' : 'Torsion properties')
  table(doc, [{ header: 'Property', width: 220 }, { header: 'Value', width: width - 220, align: 'right' }], rows.map(r => [r[0], r[1]]), 'Torsion properties')
  para(doc, `For a torque T about the shear centre the largest torsional shear stress is tau_max = T × ${stressPerTorqueText(tau.value, sys)}; the rotation per length is T/(G·J).`, 8)

  let vertices = 0
  for (const r of a.regions) for (const poly of r.polygons) for (const ring of poly) vertices += ring.length
  heading(doc, 'Mesh and convergence')
  const mesh = t.mesh
  table(doc, [{ header: 'Mesh', width: 220 }, { header: 'Value', width: width - 220, align: 'right' }], [
    ['Section vertices', String(vertices)],
    ['Density', mesh.density],
    ['Nodes (six-node triangles)', String(mesh.nodes)],
    ['Elements', String(mesh.elements)],
    ['Target element size', q(mesh.size, 'length', sys)],
    ['Smallest element angle', `${mesh.minAngle.toFixed(1)} °`],
    ['Solver', t.iterations === 0 ? 'direct (profile Cholesky)' : `${t.converged ? 'converged' : 'NOT converged'}, ${t.iterations} conjugate-gradient iterations`],
  ], 'Mesh')
  const study = t.study
  if (study) {
    table(doc, [{ header: 'Mesh study: density', width: 110 }, { header: 'Nodes', width: 60, align: 'right' }, { header: 'Elements', width: 60, align: 'right' }, { header: `J (${u('inertia', sys)})`, width: 100, align: 'right' }, { header: `Shear centre x, y (${u('length', sys)})`, width: width - 330, align: 'right' }],
      study.rows.map(r => [r.density, String(r.nodes), String(r.elements), v(r.J, 'inertia', sys), `${v(noise(cleanZero(r.shearCentre.x, ext)), 'length', sys)}, ${v(noise(cleanZero(r.shearCentre.y, ext)), 'length', sys)}`]), 'Mesh study')
    para(doc, `Mesh study: J differs by ${formatNumber(study.difference.J * 100, 3)} % and the shear centre moves by ${q(study.difference.shearCentre, 'length', sys)} between the two densities. ${convergenceWord(study)}`, 8)
  }
  connectionFlows(doc, input, width)
  for (const w of t.warnings) para(doc, `Warning: ${w}`, 7.5)
  methodBlock(doc)
}

/** lbf/in per N/mm (1 N/mm = 1000/4.448222 lbf/m = 5.710 lbf/in, NIST SP 811 factors). */
const LBF_PER_IN_PER_N_PER_MM = 25.4 / 4.4482216152605

/** Shear flow per connection for the sketch's Vx, Vy: exact where a cut frees a side, from the FE solution where the parts close a cell. */
function connectionFlows(doc: Doc, input: ReportInput, width: number): void {
  const a = input.analysis!
  if (!a.connections.length) return
  const sys = input.doc.settings
  const us = sys.units === 'US'
  const unit = us ? 'lbf/in' : 'N/mm'
  const shear = input.doc.settings.shear
  heading(doc, 'Shear flow per connection')
  para(doc, `For Vx = ${q(shear.Vx, 'force', sys)} and Vy = ${q(shear.Vy, 'force', sys)} (the shear setting), through the shear centre.`, 8)
  const fe = a.torsion?.connections ?? []
  table(doc, [{ header: 'Connection', width: 200 }, { header: `Contact (${u('length', sys)})`, width: 80, align: 'right' }, { header: `|q| (${unit})`, width: 80, align: 'right' }, { header: 'Source', width: width - 360 }],
    a.connections.map((c) => {
      const f = fe.find(k => k.parts[0] === c.parts[0] && k.parts[1] === c.parts[1])
      const value = c.q ?? f?.q ?? null
      const text = value === null ? '—' : formatNumber(Math.abs(value) * (us ? LBF_PER_IN_PER_N_PER_MM : 1), 4)
      const source = c.q !== null ? 'V·Q/I of the side the cut frees (exact)' : f ? 'finite element shear solution (closed cell)' : 'closed cell: not statically determinate'
      return [`${c.names[0]} – ${c.names[1]}`, v(c.length, 'length', sys), text, source]
    }), 'Shear flow per connection')
}

/** A plain reading of the mesh study for a checker. */
function convergenceWord(study: NonNullable<TorsionResult['study']>): string {
  const d = study.difference.J
  if (d < 0.005) return 'Under 0.5 %: J has converged for design use.'
  if (d < 0.02) return 'Under 2 %: J is close; a finer mesh changes it little.'
  return 'Over 2 %: refine the mesh (the mesh setting) before relying on J.'
}

function methodBlock(doc: Doc): void {
  doc.moveDown(0.4).font('bold').fontSize(8.5).fillColor('#111').text('Method', doc.page.margins.left, doc.y)
  para(doc, TORSION_METHOD, 8)
  doc.moveDown(0.2).font('bold').fontSize(8.5).text('Cautions for torsion')
  para(doc, TORSION_CAUTION, 8)
}

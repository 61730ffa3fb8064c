import PDFDocument from 'pdfkit'
import { shownLoading } from '../../../shared/editor/analysis-request'
import { cleanZero } from '../../../shared/editor/units'
import { MATERIAL_PRESET_LIST } from '../../../shared/mechanics/materials'
import { checkMessage, checkUtilisation } from '../../../shared/stress/check'
import { drawSection } from './drawing'
import { CAUTION, METHOD_SECTIONS } from './method'
import { heading, para, table } from './table'
import { pdfText, q, stressCT, u, v } from './text'
import { CONTENT_TOP, drawTitleBlock } from './title-block'
import { torsionPage } from './torsion'
import type { ReportInput } from './types'
import { woffToSfnt } from './woff'

/**
 * Renders the calculation sheet as a PDF (pdfkit, IBM Plex embedded): the drawing to scale,
 * materials, properties, loads, stresses at the extremes and every vertex, contact, checks, torsion
 * (when the analysis has it), and the method with the cautions; the title block and the "not checked" mark on every page.
 */
export function renderCalculationSheet(input: ReportInput): Promise<Buffer> {
  const regular = Buffer.from(woffToSfnt(input.fonts.regular, { plain: true }))
  const bold = Buffer.from(woffToSfnt(input.fonts.bold, { plain: true }))
  const doc = new PDFDocument({
    size: input.paper,
    margins: { top: CONTENT_TOP, bottom: 56, left: 40, right: 40 },
    bufferPages: true,
    font: regular as unknown as string,
    info: { Title: pdfText(`${input.title}: calculation sheet`), Author: pdfText(input.engineer), Creator: 'Kernwise' },
  })
  doc.registerFont('regular', regular)
  doc.registerFont('bold', bold)
  const chunks: Buffer[] = []
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c))
    doc.on('end', () => resolve(Buffer.concat(chunks)))
    doc.on('error', reject)
  })
  body(doc, input)
  const range = doc.bufferedPageRange()
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i)
    drawTitleBlock(doc, input, i - range.start, range.count)
  }
  doc.end()
  return done
}

type Doc = InstanceType<typeof PDFDocument>

function body(doc: Doc, input: ReportInput): void {
  // The sketch's unit system with its area and inertia units (the section panel's choice).
  const sys = input.doc.settings
  const a = input.analysis
  const width = doc.page.width - doc.page.margins.left - doc.page.margins.right
  const sd = input.doc
  const shown = shownLoading(sd)
  const showName = sd.settings.show.type === 'case'
    ? `case ${(sd.cases.find(c => c.id === sd.settings.show.id) ?? sd.cases[0])?.name ?? ''}`
    : `combination ${(sd.combinations.find(c => c.id === sd.settings.show.id) ?? sd.combinations[0])?.name ?? ''}`
  doc.font('bold').fontSize(13).fillColor('#111').text(pdfText(`${input.title}: section calculation`), doc.page.margins.left, CONTENT_TOP)
  para(doc, `Units: ${sys.units === 'US' ? 'US customary' : 'SI'}. Stresses tension-positive, C compression, T tension. Loading shown: ${showName}. Chord tolerance for arcs: ${q(sd.settings.chordTolerance, 'length', sys)}.`)
  if (!a) {
    heading(doc, 'Section')
    para(doc, `The section could not be analysed: ${input.analysisError ?? 'it has no solid part'}.`)
  } else {
    const loadPts = sd.loads.map(l => ({ P: l.P, x: l.x, y: l.y, name: l.name }))
    const boxH = Math.min(340, doc.page.height - doc.y - doc.page.margins.bottom - 30)
    const box = { x: doc.page.margins.left, y: doc.y + 4, w: width, h: boxH }
    drawSection(doc, a, loadPts, box, sys, input.paper)
    doc.y = box.y + box.h + 24
    const p = a.properties
    const ext = Math.max(p.bounds.maxX - p.bounds.minX, p.bounds.maxY - p.bounds.minY)
    heading(doc, p.equivalent ? 'Section properties (equivalent, transformed to E_ref)' : 'Section properties')
    const rows: [string, string][] = [
      ['Area A', q(p.area, 'area', sys)],
      ['Centroid xc, yc', `${q(cleanZero(p.centroid.x, ext), 'length', sys)}, ${q(cleanZero(p.centroid.y, ext), 'length', sys)}`],
      ['Ixx, Iyy', `${q(p.Ixx, 'inertia', sys)}, ${q(p.Iyy, 'inertia', sys)}`],
      ['Ixy', q(cleanZero(p.Ixy, p.I1), 'inertia', sys)],
      ['I1 (major u), I2 (minor v)', `${q(p.I1, 'inertia', sys)}, ${q(p.I2, 'inertia', sys)}`],
      ['theta, x to the major axis', `${v(p.theta, 'angle', sys)} °`],
      ['rx, ry, r1, r2', [p.rx, p.ry, p.r1, p.r2].map(r => q(r, 'length', sys)).join(', ')],
      ['S top, bottom', `${q(p.S.top, 'modulus', sys)}, ${q(p.S.bottom, 'modulus', sys)}`],
      ['S left, right', `${q(p.S.left, 'modulus', sys)}, ${q(p.S.right, 'modulus', sys)}`],
      ['Su (+v, −v), Sv (+u, −u)', `${q(p.Su.pos, 'modulus', sys)}, ${q(p.Su.neg, 'modulus', sys)}; ${q(p.Sv.pos, 'modulus', sys)}, ${q(p.Sv.neg, 'modulus', sys)}`],
      ['Plastic Z x, y', `${q(p.Z.x, 'modulus', sys)}, ${q(p.Z.y, 'modulus', sys)}`],
      ['Ip (polar, not J)', q(p.Ip, 'inertia', sys)],
      ['Perimeter', q(p.perimeter, 'length', sys)],
      ['Mass per length', q(p.massPerMetre, 'massPerLength', sys)],
    ]
    if (p.equivalent) rows.push(['E_ref', q(p.referenceE, 'stress', sys)])
    table(doc, [{ header: 'Property', width: 170 }, { header: 'Value', width: width - 170, align: 'right' }], rows.map(r => [r[0], r[1]]), 'Section properties')
    if (p.moduliNote) para(doc, p.moduliNote, 7.5)
    const ct = a.checkTable
    if (ct && ct.rows.length) {
      heading(doc, 'Check table: parts, holes and cuts with their parallel-axis terms')
      const L = u('length', sys); const A2 = u('area', sys); const I4 = u('inertia', sys)
      table(doc, [
        { header: 'Row', width: 110 }, { header: 'Sign', width: 28, align: 'right' }, { header: 'n', width: 30, align: 'right' }, { header: `A (${A2})`, width: 62, align: 'right' },
        { header: `x (${L})`, width: 62, align: 'right' }, { header: `y (${L})`, width: 62, align: 'right' }, { header: `Ixx0 (${I4})`, width: 90, align: 'right' }, { header: `A·dy² (${I4})`, width: width - 444, align: 'right' },
      ], [
        ...ct.rows.map(r => [r.name, r.sign < 0 ? '−' : '+', r.n.toPrecision(3), v(r.A, 'area', sys), v(cleanZero(r.x, ext), 'length', sys), v(cleanZero(r.y, ext), 'length', sys), v(r.Ixx0, 'inertia', sys), v(cleanZero(r.Ady2, p.Ixx), 'inertia', sys)]),
        ['Sums', '', '', v(ct.sums.A, 'area', sys), v(cleanZero(ct.sums.x, ext), 'length', sys), v(cleanZero(ct.sums.y, ext), 'length', sys), '', `Ixx ${v(ct.sums.Ixx, 'inertia', sys)}`],
      ], 'Check table')
    }
  }

  heading(doc, 'Materials')
  table(doc, [
    { header: 'Part', width: 110 }, { header: 'Material', width: 80 }, { header: `E (${u('stress', sys)})`, width: 62, align: 'right' },
    { header: `fy (${u('stress', sys)})`, width: 52, align: 'right' }, { header: 'Density (kg/m³)', width: 62, align: 'right' }, { header: 'Source', width: width - 366 },
  ], sd.parts.filter(p => p.kind !== 'cut').map((p) => {
    const preset = MATERIAL_PRESET_LIST.find(m => m.name === p.material.name && m.E === p.material.E)
    return [p.name, p.material.name, v(p.material.E, 'stress', sys), v(p.material.fy, 'stress', sys), p.material.density ? String(p.material.density) : '—', preset ? `preset (typical values): ${preset.source.split('. ')[0]}` : 'typed in the sketch by the engineer']
  }), 'Materials')

  heading(doc, 'Loads, cases and combinations')
  table(doc, [{ header: 'Load', width: 120 }, { header: 'Case', width: 100 }, { header: `P (${u('force', sys)}, + compression)`, width: 110, align: 'right' }, { header: `x (${u('length', sys)})`, width: 80, align: 'right' }, { header: `y (${u('length', sys)})`, width: 80, align: 'right' }],
    sd.loads.map(l => [l.name, sd.cases.find(c => c.id === l.caseId)?.name ?? '—', v(l.P, 'force', sys), v(l.x, 'length', sys), v(l.y, 'length', sys)]), 'Loads')
  if (!sd.loads.length) para(doc, 'No point loads.')
  table(doc, [{ header: 'Case', width: 160 }, { header: `Mx (${u('moment', sys)})`, width: 120, align: 'right' }, { header: `My (${u('moment', sys)})`, width: 120, align: 'right' }],
    sd.cases.map(c => [c.name, v(c.Mx, 'moment', sys), v(c.My, 'moment', sys)]), 'Cases')
  if (sd.combinations.length) {
    table(doc, [{ header: 'Combination', width: 160 }, { header: 'Factors', width: width - 160 }],
      sd.combinations.map(c => [c.name, sd.cases.map(k => `${c.factors[k.id] ?? 0} × ${k.name}`).join(' + ')]), 'Combinations')
  }
  if (a) stressPages(doc, input, width)
  torsionPage(doc, input)
  methodPage(doc, input)
}

function stressPages(doc: Doc, input: ReportInput, width: number): void {
  // The sketch's unit system with its area and inertia units (the section panel's choice).
  const sys = input.doc.settings
  const a = input.analysis!
  const st = a.stress
  // A no-tension section is shown by its contact pressure (sigma = -q, never tension), not by the
  // linear plane, which would show tension it cannot carry and a lower peak (README "Method").
  const c = a.contact
  const cp = c?.plane ?? null
  const plane = c ? (cp ? { a: -cp.a, b: -cp.b, c: -cp.c } : null) : st?.plane ?? null
  const at = (n: number, x: number, y: number) => {
    const val = n * (plane!.a + plane!.b * x + plane!.c * y)
    return c ? Math.min(0, val) : val
  }
  heading(doc, c ? 'Contact pressures' : 'Stresses at the extreme points')
  if (!st) {
    para(doc, 'No load and no moment: the section is unstressed.')
  } else if (c && !plane) {
    para(doc, `Overturning: ${c.message}`)
  } else {
    para(doc, `N = ${q(st.N, 'force', sys)} (tension-positive), Mx = ${q(st.Mx, 'moment', sys)}, My = ${q(st.My, 'moment', sys)} about the centroid. The resultant is ${st.inKern ? 'inside' : 'outside'} the core.${c ? (c.liftOff ? ' No tension: part of the base lifts off; the pressures below are those of the contact solution.' : ' No tension: full contact.') : st.neutralAxis ? ` Neutral line: ${st.neutralAxis.a.toPrecision(4)} + ${st.neutralAxis.b.toPrecision(4)}·x + ${st.neutralAxis.c.toPrecision(4)}·y = 0 (x, y in mm).` : ' No neutral line crosses the plane.'}`)
    const extremes = c
      ? [['Peak pressure', v(c.peak!.x, 'length', sys), v(c.peak!.y, 'length', sys), stressCT(-c.peak!.value, sys)]]
      : [
          ['Largest (most tensile)', v(st.max.x, 'length', sys), v(st.max.y, 'length', sys), stressCT(st.max.value, sys)],
          ['Smallest (most compressive)', v(st.min.x, 'length', sys), v(st.min.y, 'length', sys), stressCT(st.min.value, sys)],
        ]
    table(doc, [{ header: 'Point', width: 140 }, { header: `x (${u('length', sys)})`, width: 90, align: 'right' }, { header: `y (${u('length', sys)})`, width: 90, align: 'right' }, { header: `Stress (${u('stress', sys)})`, width: 110, align: 'right' }], extremes, 'Extremes')
    heading(doc, c ? 'Contact pressure at every vertex' : 'Stresses at every vertex')
    const rows: string[][] = []
    for (const vs of st.vertices) {
      const region = a.regions[vs.region]
      const ringPts = region?.polygons[vs.polygon]?.[vs.ring] ?? []
      vs.values.forEach((val, i) => {
        const pt = ringPts[i]
        const shown = c && pt ? at(region!.n, pt[0], pt[1]) : val
        rows.push([String(rows.length + 1), region?.name ?? '', vs.ring === 0 ? 'outline' : `hole ${vs.ring}`, pt ? v(pt[0], 'length', sys) : '—', pt ? v(pt[1], 'length', sys) : '—', stressCT(shown, sys)])
      })
    }
    table(doc, [{ header: '#', width: 34, align: 'right' }, { header: 'Material', width: 120 }, { header: 'Ring', width: 70 }, { header: `x (${u('length', sys)})`, width: 90, align: 'right' }, { header: `y (${u('length', sys)})`, width: 90, align: 'right' }, { header: `Stress (${u('stress', sys)})`, width: width - 404, align: 'right' }], rows, c ? 'Contact pressure at every vertex' : 'Stresses at every vertex')
  }
  if (c) {
    heading(doc, 'No-tension contact')
    para(doc, `${c.message} Status: ${c.status}; contact area ${q(c.area, 'area', sys)}; peak pressure ${c.peak ? `${v(c.peak.value, 'stress', sys)} ${u('stress', sys)} C at (${v(c.peak.x, 'length', sys)}, ${v(c.peak.y, 'length', sys)})` : '—'}.`)
    for (const b of c.bearing ?? []) para(doc, `${b.name}: peak ${v(b.peak, 'stress', sys)} ${u('stress', sys)} against a compression or bearing strength of ${v(b.strength, 'stress', sys)} ${u('stress', sys)}: ${(b.ratio * 100).toFixed(0)} %${b.ratio > 1 ? ', OVER what it can bear' : ''}.`)
  }
  heading(doc, 'Checks and utilisation')
  if (st && plane) {
    const regions = a.regions.map((r) => {
      const part = input.doc.parts.find(p => p.material.name === r.name && p.material.E === r.E)
      return { name: r.name, n: r.n, rings: r.polygons.flat(), fy: r.fy, fc: r.fc, allowableT: part?.material.allowableT ?? null, allowableC: part?.material.allowableC ?? null }
    })
    const rows = checkUtilisation(regions, [plane], c ? 0 : Infinity)
    table(doc, [{ header: 'Material', width: 120 }, { header: `Worst (${u('stress', sys)})`, width: 90, align: 'right' }, { header: `Limit (${u('stress', sys)})`, width: 90, align: 'right' }, { header: 'Utilisation', width: 70, align: 'right' }, { header: 'Result', width: width - 370 }],
      rows.map(r => [r.name, r.worst ? stressCT(r.worst.value, sys) : '—', r.limit !== null ? v(r.limit, 'stress', sys) : '—', r.utilisation !== null ? `${(r.utilisation * 100).toFixed(0)} %` : '—', checkMessage(r)]), 'Checks')
  } else {
    para(doc, 'No stress to check.')
  }
  const sl = a.slenderness
  if (sl) para(doc, `Slenderness: KL/r = ${sl.KLr !== null ? sl.KLr.toFixed(1) : '—'} about the governing axis ${sl.governing ?? '—'}, Euler load ${q(sl.eulerLoad, 'force', sys)}. ${sl.warning ?? ''} ${sl.torsionalNote}`)
  for (const w of a.warnings) para(doc, `Warning: ${w}`, 7.5)
}

function methodPage(doc: Doc, input: ReportInput): void {
  doc.addPage()
  doc.font('bold').fontSize(12).fillColor('#111').text('Method', doc.page.margins.left, CONTENT_TOP)
  for (const s of METHOD_SECTIONS) {
    doc.moveDown(0.3).font('bold').fontSize(8.5).text(pdfText(s.title))
    para(doc, s.body, 8)
  }
  para(doc, `Chord tolerance of this sketch: ${q(input.doc.settings.chordTolerance, 'length', input.doc.settings)}.`, 8)
  doc.moveDown(0.4).font('bold').fontSize(10.5).text('Cautions')
  para(doc, CAUTION, 8.5)
}

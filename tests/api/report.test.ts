import { execFileSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { beforeAll, describe, expect, it } from 'vitest'
import { formatNumber } from '../../shared/editor/units'
import { Client } from './support/client'
import { useTestServer } from './support/server'

const server = useTestServer()
const PASSWORD = 'correct-horse-battery'
let owner: Client
let other: Client
let id: string
const dir = mkdtempSync(join(tmpdir(), 'kernwise-pdf-'))

// A 300 × 20 plate (mm), 100 kN at its centre: A = 6000 mm², σ = −100 000/6000 = −16.67 MPa (closed form).
const plateDoc = {
  schema: 'kernwise.sketch/2',
  parts: [{ id: 'p1', name: 'Plate', outline: [[0, 0], [300, 0], [300, 20], [0, 20]], holes: [], material: { name: 'Steel', E: 200000, fy: 355, density: 7850 }, shape: null }],
  cases: [{ id: 'dead', name: 'Dead', Mx: 0, My: 0 }],
  combinations: [],
  loads: [{ id: 'l1', name: 'Column', caseId: 'dead', P: 100000, x: 150, y: 10 }],
  settings: {},
}

/** The PDF's text by pdftotext (Debian poppler-utils), page by page. */
async function pdfPages(path: string): Promise<{ text: string[]; info: string }> {
  const res = await fetch(server.url + path, { headers: owner.headersFor() })
  expect(res.status).toBe(200)
  expect(res.headers.get('content-type')).toBe('application/pdf')
  const file = join(dir, `${Math.random().toString(36).slice(2)}.pdf`)
  writeFileSync(file, Buffer.from(await res.arrayBuffer()))
  const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).split('\f').filter(p => p.trim())
  const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' })
  return { text, info }
}

beforeAll(async () => {
  owner = new Client(() => server.url)
  other = new Client(() => server.url)
  await owner.post('/api/auth/register', { email: 'owner@report.test', password: PASSWORD, name: 'Ada Owner' })
  await other.post('/api/auth/register', { email: 'other@report.test', password: PASSWORD, name: 'Other' })
  id = (await owner.post('/api/sketches', { title: 'Base plate B1', project: 'Millrace', document: plateDoc })).body.id
})

describe('GET /api/sketches/:id/report.pdf', () => {
  it('answers a calculation sheet whose text holds the title block, the area, the stress and the caution on A4', async () => {
    const { text, info } = await pdfPages(`/api/sketches/${id}/report.pdf`)
    expect(info).toMatch(/Page size:\s+595\.\d+ x 841\.\d+ pts \(A4\)/) // ISO 216 A4 = 210 × 297 mm
    const all = text.join('\n')
    expect(all).toContain('Base plate B1')
    expect(all).toContain('Millrace')
    expect(all).toContain('Ada Owner')
    expect(all).toContain(`${formatNumber(300 * 20)} mm²`) // 300 × 20 plate (closed form)
    expect(all).toMatch(/16\.67 C/) // 100 kN / 6000 mm² in compression (closed form)
    expect(all).toContain('It does not check global')
    expect(all).toContain('lateral-torsional buckling')
    text.forEach((page, i) => {
      expect(page, `page ${i + 1}`).toContain('NOT CHECKED')
      expect(page).toContain(`${i + 1} of ${text.length}`)
    })
  })

  it('a no-tension footing shows contact pressures, never tension, with the peak 2P/(3B(L/2 - e)) (standard footing result)', async () => {
    // Pad 1000 x 1000 on soil, 1000 kN at e = 300 mm: contact 600 mm, q_max = 2·10⁶/(3·1000·200) = 3.33 MPa.
    const pad = {
      ...plateDoc,
      parts: [{ id: 'pad', name: 'Pad', outline: [[-500, -500], [500, -500], [500, 500], [-500, 500]], holes: [], material: { name: 'Soil', E: 50, density: 1900, noTension: true, fc: 0.2 }, shape: null }],
      loads: [{ id: 'l1', name: 'Column', caseId: 'dead', P: 1e6, x: 0, y: 300 }],
      settings: { noTension: true },
    }
    const padId = (await owner.post('/api/sketches', { title: 'Pad P9', document: pad })).body.id
    const { text } = await pdfPages(`/api/sketches/${padId}/report.pdf`)
    const all = text.join('\n')
    expect(all).toContain('Contact pressure at every vertex')
    expect(all).toMatch(/Peak pressure\s.*3\.333 C/)
    expect(all).toContain('OVER what it can bear')
    const vertexRows = all.slice(all.indexOf('Contact pressure at every vertex'), all.indexOf('No-tension contact'))
    expect(vertexRows).not.toMatch(/\d T\b/) // no tension anywhere
  })

  it('prints US Letter in US customary units when the sketch uses them', async () => {
    const us = (await owner.post('/api/sketches', { title: 'US plate', document: { ...plateDoc, settings: { units: 'US' } } })).body.id
    const { text, info } = await pdfPages(`/api/sketches/${us}/report.pdf?paper=Letter`)
    expect(info).toMatch(/Page size:\s+612 x 792 pts \(letter\)/) // 8.5 × 11 in
    // 6000 mm² / 645.16 mm² per in² = 9.300 in² (1 in = 25.4 mm, NIST SP 811).
    expect(text.join('\n')).toContain('9.3 in²')
  })

  it('a long vertex table runs over pages, each page with the title block', async () => {
    // A 400-gon: 400 vertex rows need several pages.
    const ring = Array.from({ length: 400 }, (_, i) => [100 * Math.cos((2 * Math.PI * i) / 400), 100 * Math.sin((2 * Math.PI * i) / 400)])
    const big = (await owner.post('/api/sketches', { title: 'Round pier', document: { ...plateDoc, parts: [{ ...plateDoc.parts[0], outline: ring }], loads: [{ ...plateDoc.loads[0], x: 20, y: 0 }] } })).body.id
    const { text } = await pdfPages(`/api/sketches/${big}/report.pdf`)
    expect(text.length).toBeGreaterThanOrEqual(6)
    expect(text.join('\n')).toContain('Stresses at every vertex (continued)')
    expect(text[text.length - 1]).toContain('Method')
  })

  it('has a torsion page: J of the 300 × 20 plate as POST /api/analysis gives it and within 1 % of b·t³/3·(1 − 0.630·t/b) (thin rectangle, Roark from memory), the mesh and the cautions', async () => {
    const { text } = await pdfPages(`/api/sketches/${id}/report.pdf`)
    const page = text.find(p => p.includes('Torsion and shear (finite elements on the section)'))
    expect(page).toBeDefined()
    // "766 400 mm^4" or "7.664 × 10^5 mm^4" (formatNumber groups thousands with a thin space).
    const m = page!.match(/J torsion constant\s+([0-9.,\s\u2009\u202f]+?)(?: × 10\^([0-9]+))? mm\^4/)
    expect(m).not.toBeNull()
    const printed = Number(m![1]!.replace(/[\s,\u2009\u202f]/g, '')) * 10 ** Number(m![2] ?? 0)
    const api = await owner.post('/api/analysis', { parts: plateDoc.parts, torsion: true })
    expect(api.status).toBe(200)
    expect(Math.abs(printed - api.body.torsion.J) / api.body.torsion.J).toBeLessThan(5e-4) // four significant digits
    const closed = (300 * 20 ** 3 / 3) * (1 - 0.630 * 20 / 300)
    expect(Math.abs(printed - closed) / closed).toBeLessThan(0.01)
    expect(page).toMatch(new RegExp(`Elements\\s+${api.body.torsion.mesh.elements}\\b`))
    expect(page).toContain('Mesh study: density')
    expect(page!.replace(/\s+/g, ' ')).toContain('Neglected: warping torsion along the member')
  })

  it('?revision=N of a revision that does not exist answers 404, a bad revision or paper 400', async () => {
    const r = await owner.get(`/api/sketches/${id}/report.pdf?revision=3`)
    expect(r.status).toBe(404)
    expect(r.body.message).toMatch(/Revision 3 does not exist/)
    expect((await owner.get(`/api/sketches/${id}/report.pdf?revision=abc`)).status).toBe(400)
    expect((await owner.get(`/api/sketches/${id}/report.pdf?paper=A3`)).body.message).toMatch(/A4 or Letter/)
  })

  it('?revision=N of an approved revision names who approved it and when, and is no longer "not checked"; the working state still is', async () => {
    // The owner registered first, so is the admin, and makes `other` a checker.
    const members = (await owner.get('/api/members')).body.members as { id: string; email: string }[]
    await owner.patch(`/api/members/${members.find(m => m.email === 'other@report.test')!.id}`, { role: 'checker' })
    const sheet = (await owner.post('/api/sketches', { title: 'Checked plate', project: 'Millrace', document: plateDoc })).body.id
    expect((await owner.post(`/api/sketches/${sheet}/revisions`, { note: 'For check' })).body.number).toBe(1)
    expect((await owner.post(`/api/sketches/${sheet}/review`, { revision: 1, checker: 'other@report.test' })).status).toBe(201)
    const submitted = (await pdfPages(`/api/sketches/${sheet}/report.pdf?revision=1`)).text.join('\n')
    expect(submitted).toContain('NOT CHECKED')
    expect((await other.post(`/api/sketches/${sheet}/review/approve`)).status).toBe(200)
    const approved = (await pdfPages(`/api/sketches/${sheet}/report.pdf?revision=1`)).text
    const all = approved.join('\n')
    expect(all).toContain('Other')
    expect(all).toContain(new Date().toISOString().slice(0, 10))
    approved.forEach(page => expect(page).not.toContain('NOT CHECKED'))
    // The checker reads the sheet too (comment access came with the submission).
    expect((await other.get(`/api/sketches/${sheet}/report.pdf?revision=1`)).status).toBe(200)
  })

  it("someone else's sketch answers 404, signed out 401", async () => {
    expect((await other.get(`/api/sketches/${id}/report.pdf`)).status).toBe(404)
    expect((await new Client(() => server.url).get(`/api/sketches/${id}/report.pdf`)).status).toBe(401)
  })
})

import { inflateSync } from 'node:zlib'

const LAYOUT_TABLES = new Set(['GSUB', 'GPOS', 'GDEF'])

/**
 * A WOFF 1.0 font (W3C WOFF File Format 1.0) unpacked into the plain TrueType/OpenType bytes it
 * wraps. fontkit reads WOFF, but inflates a table again on every access (with a pure-JS inflate),
 * which made a 20-page sheet take seconds; unpacked once with zlib, the same font lays out fast.
 * With `plain`, the OpenType layout tables (GSUB, GPOS, GDEF) are left out: text then maps
 * characters to glyphs through cmap without shaping (no ligatures or kerning), about three
 * times faster to set, which a table of thousands of numbers needs. Returns the input unchanged
 * when it is not WOFF.
 */
export function woffToSfnt(woff: Uint8Array, { plain = false } = {}): Uint8Array {
  const src = Buffer.from(woff.buffer, woff.byteOffset, woff.byteLength)
  if (src.length < 44 || src.toString('latin1', 0, 4) !== 'wOFF') return woff
  const flavor = src.readUInt32BE(4)
  const numTables = src.readUInt16BE(12)
  const tables: { tag: number; checksum: number; data: Buffer }[] = []
  for (let i = 0; i < numTables; i++) {
    const at = 44 + 20 * i
    const offset = src.readUInt32BE(at + 4)
    const compLength = src.readUInt32BE(at + 8)
    const origLength = src.readUInt32BE(at + 12)
    const raw = src.subarray(offset, offset + compLength)
    if (plain && LAYOUT_TABLES.has(src.toString('latin1', at, at + 4))) continue
    tables.push({ tag: src.readUInt32BE(at), checksum: src.readUInt32BE(at + 16), data: compLength < origLength ? inflateSync(raw) : raw })
  }
  const count = tables.length
  let size = 12 + 16 * count
  for (const t of tables) size += (t.data.length + 3) & ~3
  const out = Buffer.alloc(size)
  const pow = 2 ** Math.floor(Math.log2(count))
  out.writeUInt32BE(flavor, 0)
  out.writeUInt16BE(count, 4)
  out.writeUInt16BE(pow * 16, 6)
  out.writeUInt16BE(Math.log2(pow), 8)
  out.writeUInt16BE(count * 16 - pow * 16, 10)
  let offset = 12 + 16 * count
  tables.forEach((t, i) => {
    const rec = 12 + 16 * i
    out.writeUInt32BE(t.tag, rec)
    out.writeUInt32BE(t.checksum, rec + 4)
    out.writeUInt32BE(offset, rec + 8)
    out.writeUInt32BE(t.data.length, rec + 12)
    t.data.copy(out, offset)
    offset += (t.data.length + 3) & ~3
  })
  return out
}

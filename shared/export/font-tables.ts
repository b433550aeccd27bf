/**
 * The OpenType tables that only shape text: substitution (ligatures), positioning and kerning. A PDF from
 * pdf-lib places each glyph at its advance width and ignores positioning anyway, and the trade's text on
 * a drawing (numbers, names, Ø) needs neither; shaping it costs most of a template file's time.
 */
const SHAPING_TABLES = new Set(['GSUB', 'GPOS', 'GDEF', 'kern', 'morx', 'mort', 'JSTF', 'BASE', 'MATH']);

const TABLE_RECORD = 16;

/**
 * A TrueType font file without its shaping tables: the table directory rewritten, every other table
 * copied byte for byte (each checksum is of its own table, so they stay valid). Throws on a file that is
 * not a TrueType or OpenType font.
 */
export function withoutShapingTables(font: Uint8Array): Uint8Array {
  const view = new DataView(font.buffer, font.byteOffset, font.byteLength);
  const version = view.getUint32(0);
  if (version !== 0x00010000 && version !== 0x4f54544f) throw new Error('The drawing font must be a TrueType or OpenType font file (.ttf, .otf)');
  const tables: { tag: string; checksum: number; offset: number; length: number }[] = [];
  for (let i = 0; i < view.getUint16(4); i++) {
    const at = 12 + TABLE_RECORD * i;
    const tag = String.fromCharCode(...font.subarray(at, at + 4));
    if (!SHAPING_TABLES.has(tag)) tables.push({ tag, checksum: view.getUint32(at + 4), offset: view.getUint32(at + 8), length: view.getUint32(at + 12) });
  }
  const padded = (n: number) => (n + 3) & ~3;
  const out = new Uint8Array(12 + TABLE_RECORD * tables.length + tables.reduce((sum, t) => sum + padded(t.length), 0));
  const head = new DataView(out.buffer);
  const power = 2 ** Math.floor(Math.log2(tables.length));
  head.setUint32(0, version);
  head.setUint16(4, tables.length);
  head.setUint16(6, power * TABLE_RECORD);
  head.setUint16(8, Math.log2(power));
  head.setUint16(10, tables.length * TABLE_RECORD - power * TABLE_RECORD);
  let offset = 12 + TABLE_RECORD * tables.length;
  tables.forEach((t, i) => {
    const at = 12 + TABLE_RECORD * i;
    for (let k = 0; k < 4; k++) out[at + k] = t.tag.charCodeAt(k);
    head.setUint32(at + 4, t.checksum);
    head.setUint32(at + 8, offset);
    head.setUint32(at + 12, t.length);
    out.set(font.subarray(t.offset, t.offset + t.length), offset);
    offset += padded(t.length);
  });
  return out;
}

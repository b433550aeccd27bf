import fontkit from '@pdf-lib/fontkit';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { withoutShapingTables } from './font-tables';

const original = new Uint8Array(readFileSync(new URL('./fonts/DejaVuSans.ttf', import.meta.url)));

describe('withoutShapingTables', () => {
  const stripped = withoutShapingTables(original);

  it('leaves a font that reads as before, glyph for glyph and width for width', () => {
    const before = fontkit.create(original);
    const after = fontkit.create(stripped);
    expect(stripped.length).toBeLessThan(original.length);
    expect(after.postscriptName).toBe(before.postscriptName);
    for (const ch of 'Ø35 × 13, Łódź — 100 %') {
      const codePoint = ch.codePointAt(0)!;
      expect(after.glyphForCodePoint(codePoint).id).toBe(before.glyphForCodePoint(codePoint).id);
      expect(after.glyphForCodePoint(codePoint).advanceWidth).toBe(before.glyphForCodePoint(codePoint).advanceWidth);
    }
  });

  it('drops the shaping tables and keeps every other', () => {
    const tags = (font: Uint8Array) => {
      const view = new DataView(font.buffer, font.byteOffset, font.byteLength);
      return Array.from({ length: view.getUint16(4) }, (_, i) => String.fromCharCode(...font.subarray(12 + 16 * i, 16 + 16 * i)));
    };
    const kept = tags(stripped);
    expect(kept.some((t) => ['GSUB', 'GPOS', 'GDEF', 'kern'].includes(t))).toBe(false);
    expect(kept).toEqual(tags(original).filter((t) => !['GSUB', 'GPOS', 'GDEF', 'kern', 'MATH'].includes(t)));
  });

  it('refuses a file that is not a font', () => {
    expect(() => withoutShapingTables(new Uint8Array(64))).toThrow(/TrueType or OpenType/);
  });
});

import fontkit from '@pdf-lib/fontkit';
import type { PDFDocument, PDFRef } from 'pdf-lib';
import { withoutShapingTables } from './font-tables';

type Fontkit = Parameters<PDFDocument['registerFontkit']>[0];
type ParsedFont = ReturnType<Fontkit['create']>;

/** Each font file as embedded (without its shaping tables), and that file parsed. */
const prepared = new WeakMap<Uint8Array, { bytes: Uint8Array; parsed: ParsedFont }>();

function prepare(fontBytes: Uint8Array): { bytes: Uint8Array; parsed: ParsedFont } {
  let entry = prepared.get(fontBytes);
  if (!entry) {
    const bytes = withoutShapingTables(fontBytes);
    entry = { bytes, parsed: fontkit.create(bytes) };
    prepared.set(fontBytes, entry);
  }
  return entry;
}

/** The drawing font as the content writer uses it: its object, and texts encoded and measured. */
export interface DrawingFont {
  ref: PDFRef;
  /** The text as a PDF string in the font's encoding (`<0041…>`); its glyphs join the subset. */
  encode(text: string): string;
  /** Advance width of the text at a size, in the size's unit. */
  width(text: string, size: number): number;
}

/**
 * Embeds the drawing font (a TrueType file shipped with the product, passed in so that shared/ reads no
 * files) as a subset: the standard PDF fonts cannot write Ø or names beyond Latin-1. The file is prepared
 * and parsed once for all documents: pdf-lib would parse it again for each, and a pack makes one per panel.
 * A parsed font only answers questions (glyphs, widths, subsets), so one serves every document.
 *
 * Texts are remembered once encoded and measured: a template file writes the same labels on every page
 * (`100 mm`, the panel's name), and each encoding lays the text out anew.
 */
export async function embedDrawingFont(doc: PDFDocument, fontBytes: Uint8Array): Promise<DrawingFont> {
  const { bytes, parsed } = prepare(fontBytes);
  const once: Fontkit = { create: (data, postscriptName) => (data === bytes ? parsed : fontkit.create(data, postscriptName)) };
  doc.registerFontkit(once);
  const font = await doc.embedFont(bytes, { subset: true });
  const encoded = new Map<string, string>();
  const widths = new Map<string, number>();
  return {
    ref: font.ref,
    encode(text) {
      let hex = encoded.get(text);
      if (hex === undefined) encoded.set(text, (hex = font.encodeText(text).toString()));
      return hex;
    },
    width(text, size) {
      let width = widths.get(text);
      if (width === undefined) widths.set(text, (width = font.widthOfTextAtSize(text, 1000)));
      return (width * size) / 1000;
    },
  };
}

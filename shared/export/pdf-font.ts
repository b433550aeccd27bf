import fontkit from '@pdf-lib/fontkit';
import type { PDFDocument, PDFFont } from 'pdf-lib';
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

/**
 * Embeds the drawing font (a TrueType file shipped with the product, passed in so that shared/ reads no
 * files) as a subset: the standard PDF fonts cannot write Ø or names beyond Latin-1. The file is prepared
 * and parsed once for all documents: pdf-lib would parse it again for each, and a pack makes one per panel.
 * A parsed font only answers questions (glyphs, widths, subsets), so one serves every document.
 */
export async function embedDrawingFont(doc: PDFDocument, fontBytes: Uint8Array): Promise<PDFFont> {
  const { bytes, parsed } = prepare(fontBytes);
  const once: Fontkit = { create: (data, postscriptName) => (data === bytes ? parsed : fontkit.create(data, postscriptName)) };
  doc.registerFontkit(once);
  return remembering(await doc.embedFont(bytes, { subset: true }));
}

/**
 * The font, remembering what it has encoded and measured: a template file writes the same labels on
 * every page (`100 mm`, the panel's name), and each encoding lays the text out anew. An encoded text is
 * the same however often it is drawn, so one serves every use in the document.
 */
function remembering(font: PDFFont): PDFFont {
  const encoded = new Map<string, ReturnType<PDFFont['encodeText']>>();
  const widths = new Map<string, number>();
  const encode = font.encodeText.bind(font);
  const measure = font.widthOfTextAtSize.bind(font);
  font.encodeText = (text) => {
    let hex = encoded.get(text);
    if (!hex) encoded.set(text, (hex = encode(text)));
    return hex;
  };
  font.widthOfTextAtSize = (text, size) => {
    let width = widths.get(text);
    if (width === undefined) widths.set(text, (width = measure(text, 1000)));
    return (width * size) / 1000;
  };
  return font;
}

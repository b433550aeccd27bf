import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, PDFName, PDFObjectCopier, type PDFDict, type PDFFont, type PDFRef } from 'pdf-lib';
import { withoutShapingTables } from './font-tables';

type Fontkit = Parameters<PDFDocument['registerFontkit']>[0];
type ParsedFont = ReturnType<Fontkit['create']>;

const span = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => String.fromCharCode(from + i)).join('');

/**
 * The characters every PDF carries glyphs for: printable ASCII, the letters of Latin-1 and the signs our
 * drawings write (× Ø § · – …). Texts of these alone are written in one subset made once per process;
 * a text with any other character (Ł, ő, Cyrillic) is written in a second subset of its document's own.
 */
const REPERTOIRE = span(0x20, 0x7e) + span(0xc0, 0xff) + '§°±²³µ·—–‘’“”•…−√';

/** The drawing font prepared once for all documents. */
interface PreparedFont {
  /** The font file without its shaping tables, as the second subsets embed it. */
  bytes: Uint8Array;
  parsed: ParsedFont;
  /** A fontkit that hands out the parsed file again: pdf-lib would parse it for every document. */
  fontkit: Fontkit;
  /** The repertoire's subset, embedded in a document of its own, from which each new document copies it. */
  source: { doc: PDFDocument; ref: PDFRef };
  /** Each character of the repertoire as that subset encodes it: four hex digits. */
  codes: Map<string, string>;
  /** Advance widths by character, in font units. */
  advances: Map<string, number>;
}

const prepared = new WeakMap<Uint8Array, Promise<PreparedFont>>();

async function prepareFont(fontBytes: Uint8Array): Promise<PreparedFont> {
  const bytes = withoutShapingTables(fontBytes);
  const parsed = fontkit.create(bytes);
  const once: Fontkit = { create: (data, postscriptName) => (data === bytes ? parsed : fontkit.create(data, postscriptName)) };
  const doc = await PDFDocument.create();
  doc.registerFontkit(once);
  const font = await doc.embedFont(bytes, { subset: true });
  const codes = new Map<string, string>();
  for (const char of REPERTOIRE) if (parsed.hasGlyphForCodePoint(char.codePointAt(0) as number)) codes.set(char, font.encodeText(char).toString().slice(1, -1));
  await font.embed();
  return { bytes, parsed, fontkit: once, source: { doc, ref: font.ref }, codes, advances: new Map() };
}

/** The drawing font of one document, as the content writer uses it. */
export interface DrawingFont {
  /** The document's font resources: names to fonts, for the resource dictionary. */
  resources: PDFDict;
  /** Gets every font ready that these texts need: call before encoding them. */
  prepare(texts: Iterable<string>): Promise<void>;
  /** The text as a PDF string (`<0041…>`) and the resource name of the font that encodes it. */
  encode(text: string): { font: string; hex: string };
  /** Advance width of the text at a size, in the size's unit. */
  width(text: string, size: number): number;
}

/**
 * Embeds the drawing font (a TrueType file shipped with the product, passed in so that shared/ reads no
 * files): the standard PDF fonts cannot write Ø or names beyond Latin-1. Subsetting a font for each of a
 * pack's 300 files took as long as drawing them, so the repertoire's subset is made once and copied in
 * whole; pdf-lib makes a subset of the document's own only when a text needs more (`prepare`).
 */
export async function embedDrawingFont(doc: PDFDocument, fontBytes: Uint8Array): Promise<DrawingFont> {
  let entry = prepared.get(fontBytes);
  if (!entry) prepared.set(fontBytes, (entry = prepareFont(fontBytes)));
  const font = await entry;
  const { source, codes, advances, parsed } = font;
  const copied = PDFObjectCopier.for(source.doc.context, doc.context).copy(source.doc.context.lookup(source.ref) as PDFDict);
  const resources = doc.context.obj({ F: doc.context.register(copied) });
  /** The file's own subset, made once a text needs a character beyond the repertoire. */
  let own: PDFFont | undefined;
  const inRepertoire = (text: string) => {
    for (const char of text) if (!codes.has(char)) return false;
    return true;
  };
  return {
    resources,
    async prepare(texts) {
      if (own) return;
      for (const text of texts) {
        if (inRepertoire(text)) continue;
        doc.registerFontkit(font.fontkit);
        own = await doc.embedFont(font.bytes, { subset: true });
        resources.set(PDFName.of('G'), own.ref);
        return;
      }
    },
    encode(text) {
      if (inRepertoire(text)) return { font: 'F', hex: `<${Array.from(text, (char) => codes.get(char)).join('')}>` };
      if (!own) throw new Error(`"${text}" needs characters beyond the font's repertoire: prepare() the texts before drawing them`);
      return { font: 'G', hex: own.encodeText(text).toString() };
    },
    width(text, size) {
      let units = 0;
      for (const char of text) {
        let advance = advances.get(char);
        if (advance === undefined) advances.set(char, (advance = parsed.glyphForCodePoint(char.codePointAt(0) as number).advanceWidth));
        units += advance;
      }
      return (units * size) / parsed.unitsPerEm;
    },
  };
}

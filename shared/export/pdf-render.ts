import { PDFName, type PDFDict, type PDFDocument, type PDFObject, type PDFPage, type PDFRef } from 'pdf-lib';
import type { Drawing, Shape, Stroke } from './drawing';
import { PdfContent, type Paint, type Rgb } from './pdf-content';
import type { DrawingFont } from './pdf-font';
import { mmToPt } from './units';
import { utf8Bytes } from './utf8';

/**
 * Deflate in the zlib format (RFC 1950), as a PDF's FlateDecode filter reads it: the platform's own
 * (node:zlib on the server). pdf-lib's, written in script, took a quarter of the time of a bench pack.
 */
export type Deflate = (bytes: Uint8Array) => Uint8Array;

const colors = new Map<string, Rgb>();

/** A `#RRGGBB` colour as the content stream writes it, parsed once. */
function rgb(hex: string): Rgb {
  let color = colors.get(hex);
  if (!color) {
    const c = (i: number) => parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16) / 255;
    colors.set(hex, (color = [c(0), c(1), c(2)]));
  }
  return color;
}

/**
 * Draws drawings into one PDF document as vector graphics at true size. The sheet's millimetres (origin
 * top left, y down) become points (origin bottom left, y up). A drawing can be kept as a form XObject and
 * shown many times; symbols are kept so, once per document. Every page and form shares one resource
 * dictionary: the fonts and each kept drawing, named once. Shapes are `prepare`d before they are drawn,
 * so that the font is ready for every text among them.
 */
export class PdfDrawer {
  private readonly symbols = new Map<string, string>();
  private readonly xobjects: PDFDict;
  private readonly resources: PDFRef;

  constructor(
    private readonly doc: PDFDocument,
    private readonly font: DrawingFont,
    private readonly deflate: Deflate,
  ) {
    this.xobjects = doc.context.obj({});
    this.resources = doc.context.register(doc.context.obj({ Font: font.resources, XObject: this.xobjects }));
  }

  /** Gets the font ready for every text among the shapes, those of symbols included. */
  async prepare(shapes: readonly Shape[]): Promise<void> {
    const texts: string[] = [];
    const collect = (list: readonly Shape[]): void => {
      for (const s of list) {
        if (s.kind === 'text') texts.push(s.text);
        if (s.kind === 'symbol' && !this.symbols.has(s.id)) collect(s.drawing.shapes);
      }
    };
    collect(shapes);
    await this.font.prepare(texts);
  }

  /** Keeps a drawing as a form XObject of its size and returns the name to show it by. */
  async keep(drawing: Drawing): Promise<string> {
    await this.prepare(drawing.shapes);
    return this.form(drawing);
  }

  private form(drawing: Drawing): string {
    const content = new PdfContent();
    this.draw(content, drawing.shapes, { x: 0, y: mmToPt(drawing.height) });
    const name = `K${this.xobjects.keys().length}`;
    const bbox = [0, 0, mmToPt(drawing.width), mmToPt(drawing.height)];
    const form = this.stream(content, { Type: 'XObject', Subtype: 'Form', BBox: bbox, Resources: this.resources });
    this.xobjects.set(PDFName.of(name), this.doc.context.register(form));
    return name;
  }

  /** Adds a page `width` × `height` mm whose content `write` writes (with shapes prepared), and returns it. */
  page(width: number, height: number, write: (content: PdfContent) => void): PDFPage {
    const page = this.doc.addPage([mmToPt(width), mmToPt(height)]);
    const content = new PdfContent();
    write(content);
    // Set as they are: pdf-lib's own helpers for these would copy the shared resources into every page.
    page.node.set(PDFName.of('Contents'), this.doc.context.register(this.stream(content, {})));
    page.node.set(PDFName.of('Resources'), this.resources);
    return page;
  }

  /** Adds a page of a drawing's own size showing it at 1:1. */
  async drawingPage(drawing: Drawing): Promise<PDFPage> {
    await this.prepare(drawing.shapes);
    return this.page(drawing.width, drawing.height, (content) => this.draw(content, drawing.shapes, { x: 0, y: mmToPt(drawing.height) }));
  }

  /** Draws shapes; `origin` is where the sheet's top left corner lies on the page, in points. */
  draw(content: PdfContent, shapes: readonly Shape[], origin: { x: number; y: number }): void {
    const X = (x: number) => origin.x + mmToPt(x);
    const Y = (y: number) => origin.y - mmToPt(y);
    const paint = (fill: string | undefined, stroke: Stroke | undefined): Paint | undefined => {
      if (fill) content.fillColor(rgb(fill));
      if (stroke) content.strokeStyle(rgb(stroke.color), mmToPt(stroke.width), stroke.dash?.map(mmToPt));
      return fill ? (stroke ? 'both' : 'fill') : stroke ? 'stroke' : undefined;
    };
    for (const s of shapes) {
      switch (s.kind) {
        case 'line':
          paint(undefined, s.stroke);
          content.line(X(s.x1), Y(s.y1), X(s.x2), Y(s.y2));
          break;
        case 'rect': {
          const how = paint(s.fill, s.stroke);
          if (how) content.rect(X(s.x), Y(s.y + s.height), mmToPt(s.width), mmToPt(s.height), how);
          break;
        }
        case 'circle': {
          const how = paint(s.fill, s.stroke);
          if (how) content.circle(X(s.cx), Y(s.cy), mmToPt(s.r), how);
          break;
        }
        case 'text': {
          const size = mmToPt(s.size);
          const shift = s.anchor === 'start' ? 0 : this.font.width(s.text, size) * (s.anchor === 'middle' ? 0.5 : 1);
          const { font, hex } = this.font.encode(s.text);
          content.fillColor(rgb(s.color));
          content.text(font, size, X(s.x) - (s.upright ? 0 : shift), Y(s.y) - (s.upright ? shift : 0), hex, s.upright === true);
          break;
        }
        case 'symbol': {
          let name = this.symbols.get(s.id);
          if (!name) this.symbols.set(s.id, (name = this.form(s.drawing)));
          content.show(name, X(s.x), Y(s.y + s.drawing.height));
          break;
        }
      }
    }
  }

  private stream(content: PdfContent, dict: Record<string, PDFObject | string | number[]>) {
    return this.doc.context.stream(this.deflate(utf8Bytes(content.toString())), { ...dict, Filter: 'FlateDecode' });
  }
}

import { degrees, PDFArray, PDFRef, rgb, type Color, type PDFDocument, type PDFEmbeddedPage, type PDFFont, type PDFPage } from 'pdf-lib';
import type { Drawing, Shape, Stroke } from './drawing';
import { mmToPt } from './units';

function color(hex: string): Color {
  const c = (i: number) => parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16) / 255;
  return rgb(c(0), c(1), c(2));
}

function strokeOptions(stroke: Stroke | undefined) {
  if (!stroke) return {};
  return {
    borderColor: color(stroke.color),
    borderWidth: mmToPt(stroke.width),
    ...(stroke.dash ? { borderDashArray: stroke.dash.map(mmToPt) } : {}),
  };
}

/**
 * Draws drawings into one PDF document as vector graphics at true size. The sheet's millimetres (origin
 * top left, y down) become points (origin bottom left, y up). A drawing can be kept as a form XObject and
 * shown many times; symbols are kept so, once per document.
 */
export class PdfDrawer {
  private readonly symbols = new Map<string, PDFEmbeddedPage>();

  constructor(
    private readonly doc: PDFDocument,
    private readonly font: PDFFont,
  ) {}

  /**
   * Keeps a drawing as a form XObject: drawn once on a scratch page of its size, which is then removed
   * (page and content stream both) so that nothing of it is left in the file but the XObject.
   */
  async keep(drawing: Drawing): Promise<PDFEmbeddedPage> {
    const scratch = this.doc.addPage([mmToPt(drawing.width), mmToPt(drawing.height)]);
    await this.prepare(drawing.shapes);
    this.draw(scratch, drawing.shapes, { x: 0, y: mmToPt(drawing.height) });
    const kept = await this.doc.embedPage(scratch);
    await kept.embed();
    this.doc.removePage(this.doc.getPageCount() - 1);
    const contents = scratch.node.Contents();
    for (const ref of contents instanceof PDFArray ? contents.asArray() : []) if (ref instanceof PDFRef) this.doc.context.delete(ref);
    this.doc.context.delete(scratch.ref);
    return kept;
  }

  /** Keeps every symbol among the shapes that is not kept yet: call before `draw`. */
  async prepare(shapes: readonly Shape[]): Promise<void> {
    for (const s of shapes) if (s.kind === 'symbol' && !this.symbols.has(s.id)) this.symbols.set(s.id, await this.keep(s.drawing));
  }

  /** Draws shapes onto a page; `origin` is where the sheet's top left corner lies on the page, in points. */
  draw(page: PDFPage, shapes: readonly Shape[], origin: { x: number; y: number }): void {
    const X = (x: number) => origin.x + mmToPt(x);
    const Y = (y: number) => origin.y - mmToPt(y);
    for (const s of shapes) {
      switch (s.kind) {
        case 'line':
          page.drawLine({
            start: { x: X(s.x1), y: Y(s.y1) },
            end: { x: X(s.x2), y: Y(s.y2) },
            thickness: mmToPt(s.stroke.width),
            color: color(s.stroke.color),
            ...(s.stroke.dash ? { dashArray: s.stroke.dash.map(mmToPt) } : {}),
          });
          break;
        case 'rect':
          page.drawRectangle({
            x: X(s.x),
            y: Y(s.y + s.height),
            width: mmToPt(s.width),
            height: mmToPt(s.height),
            ...(s.fill ? { color: color(s.fill) } : {}),
            ...strokeOptions(s.stroke),
          });
          break;
        case 'circle':
          page.drawCircle({ x: X(s.cx), y: Y(s.cy), size: mmToPt(s.r), ...(s.fill ? { color: color(s.fill) } : {}), ...strokeOptions(s.stroke) });
          break;
        case 'text': {
          const size = mmToPt(s.size);
          const shift = s.anchor === 'start' ? 0 : this.font.widthOfTextAtSize(s.text, size) * (s.anchor === 'middle' ? 0.5 : 1);
          const x = X(s.x) - (s.upright ? 0 : shift);
          const y = Y(s.y) - (s.upright ? shift : 0);
          page.drawText(s.text, { x, y, size, font: this.font, color: color(s.color), ...(s.upright ? { rotate: degrees(90) } : {}) });
          break;
        }
        case 'symbol': {
          const kept = this.symbols.get(s.id);
          if (!kept) throw new Error(`Symbol "${s.id}" is not kept yet: call prepare() before draw()`);
          page.drawPage(kept, { x: X(s.x), y: Y(s.y + s.drawing.height) });
          break;
        }
      }
    }
  }
}

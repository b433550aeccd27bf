import { PDFName, PDFString } from 'pdf-lib';
import QRCode from 'qrcode';
import { panelBores } from '../layout/panel-layout';
import type { Panel } from '../model/job-document';
import { text, translate, type Drawing, type RectShape, type Shape } from './drawing';
import { carcassName, dateText, faceName, materialName, type ExportContext } from './export-context';
import { mapViews } from './map-view';
import { INK, MUTED } from './palette';
import { PAGE_MARGIN, PAPER } from './paper';
import { finishPdf, startPdf, type PdfOptions } from './pdf-document';
import { estimateTextWidth, fitText } from './text-width';
import { lengthText, mmToPt } from './units';

/**
 * The common A4 sheet of 14 self-adhesive labels, 2 columns by 7 rows of 99.1 × 38.1 mm: 4.65 mm at the
 * sides, 15.15 mm at top and bottom, 2.5 mm between the columns (4.65 · 2 + 99.1 · 2 + 2.5 = 210 and
 * 15.15 · 2 + 38.1 · 7 = 297, ISO 216 A4). Printed on plain paper, the outlines are the cutting lines.
 */
export const LABEL_SHEET = { columns: 2, rows: 7, width: 99.1, height: 38.1, left: 4.65, top: 15.15, columnGap: 2.5 } as const;
export const LABELS_PER_SHEET = LABEL_SHEET.columns * LABEL_SHEET.rows;

/**
 * The text and code keep this far inside each label, so that they stay within the PAGE_MARGIN that office
 * printers print (4.65 + 4 ≥ 8 mm) and a label cut or stuck slightly off loses nothing.
 */
const INSET = 4;
/** The QR symbol's side without its quiet zone; about 0.7 to 0.8 mm a module for a link of 40 to 70 characters. */
const QR_SIZE = 24;
const QR_TOP = 3.5;
/** The quiet zone a reader needs around a symbol, in modules (ISO/IEC 18004:2015 §6.3.8, published, from memory). */
export const QR_QUIET_MODULES = 4;
const CUT_LINE = { color: '#BDBDBD', width: 0.1, dash: [1.2, 1.2] };
const QR_INK = '#000000';

export interface LabelsInput {
  ctx: ExportContext;
  /** The panels to label, one label each, in the order they are printed. */
  panels: readonly Panel[];
  /** The absolute address each panel's QR code opens, as a phone's camera reads it. */
  link: (panel: Panel) => string;
}

/** Where a label's QR symbol lies on its label, in mm from the label's top left. */
export const LABEL_QR = { x: LABEL_SHEET.width - INSET - QR_SIZE, y: QR_TOP, size: QR_SIZE } as const;

/** The top left corner of the label at this place on a sheet (0 is top left, filled row by row). */
export function labelOrigin(index: number): { x: number; y: number } {
  const column = index % LABEL_SHEET.columns;
  const row = Math.floor(index / LABEL_SHEET.columns) % LABEL_SHEET.rows;
  return { x: LABEL_SHEET.left + column * (LABEL_SHEET.width + LABEL_SHEET.columnGap), y: LABEL_SHEET.top + row * LABEL_SHEET.height };
}

/**
 * A QR code as filled rectangles, one per run of dark modules along a row, so that it stays a vector
 * drawing at any printer resolution (error correction M: a label can be scuffed and still read).
 */
function qrShapes(value: string, x: number, y: number, size: number): RectShape[] {
  const { modules } = QRCode.create(value, { errorCorrectionLevel: 'M' });
  const module = size / modules.size;
  const shapes: RectShape[] = [];
  for (let row = 0; row < modules.size; row++) {
    let start = -1;
    for (let col = 0; col <= modules.size; col++) {
      const dark = col < modules.size && modules.get(row, col) === 1;
      if (dark && start < 0) start = col;
      if (!dark && start >= 0) {
        shapes.push({ kind: 'rect', x: x + start * module, y: y + row * module, width: (col - start) * module, height: module, fill: QR_INK });
        start = -1;
      }
    }
  }
  return shapes;
}

/** Which face the bench drills first: face A (design.md §2 and §3's frames), and face B after turning over when it has bores. */
function faceUpText(ctx: ExportContext, panel: Panel): string {
  const both = mapViews(panel, panelBores(panel, ctx.catalog, ctx.job.system)).length > 1;
  const which = faceName(panel.role, 'A');
  return `Face A up${which ? ` (${which})` : ''}${both ? ' · then B' : ''}`;
}

/** One label's shapes, laid out from its own top left corner. */
function label(ctx: ExportContext, panel: Panel, link: string): Shape[] {
  const { width, height } = LABEL_SHEET;
  const measure = LABEL_QR.x - 3.5 - INSET;
  const line = (y: number, value: string, size: number, color = INK) => text(INSET, y, fitText(value, size, measure), size, color);
  const carcass = panel.carcass === undefined ? 'No carcass' : carcassName(ctx, panel);
  const size = `${[panel.width, panel.height, panel.thickness].map(lengthText).join(' × ')} mm`;
  return [
    { kind: 'rect', x: 0, y: 0, width, height, stroke: CUT_LINE },
    line(6.4, ctx.job.name, 2.5, MUTED),
    line(11, carcass, 3),
    line(16.8, panel.name, estimateTextWidth(panel.name, 4.4) <= measure ? 4.4 : 3.5),
    line(21.8, `${size} (W × H × T)`, 3.1),
    line(26.2, materialName(ctx, panel), 2.8, MUTED),
    line(31.2, faceUpText(ctx, panel), 3.1),
    line(35.2, `${panel.id} · ${panel.role}`, 2.2, MUTED),
    ...qrShapes(link, LABEL_QR.x, LABEL_QR.y, LABEL_QR.size),
    text(LABEL_QR.x + LABEL_QR.size / 2, 34.2, 'Scan: drilling map', 2.1, MUTED, 'middle'),
  ];
}

/**
 * Panel labels on A4 sheets of 14: each with the job, the carcass, the panel's name, its size W × H × T,
 * its material, which face lies up for drilling, its document id and a QR code that opens its drilling
 * map. One sheet per 14 panels; the last one is filled as far as it goes.
 */
export function labelSheets({ ctx, panels, link }: LabelsInput): Drawing[] {
  if (panels.length === 0) throw new Error('No panels to label: pass at least one panel');
  const { width, height } = PAPER.a4;
  const sheets = Math.ceil(panels.length / LABELS_PER_SHEET);
  const drawings: Drawing[] = [];
  for (let sheet = 0; sheet < sheets; sheet++) {
    const onSheet = panels.slice(sheet * LABELS_PER_SHEET, (sheet + 1) * LABELS_PER_SHEET);
    const heading = `${ctx.job.name} · panel labels · sheet ${sheet + 1} of ${sheets} · ${dateText(ctx.date)}`;
    const shapes: Shape[] = [text(PAGE_MARGIN + 1, 10.5, fitText(heading, 2.4, width - 2 * PAGE_MARGIN), 2.4, MUTED)];
    onSheet.forEach((panel, i) => {
      const { x, y } = labelOrigin(i);
      shapes.push(...translate(label(ctx, panel, link(panel)), x, y));
    });
    drawings.push({ width, height, title: `${ctx.job.name}: panel labels, sheet ${sheet + 1} of ${sheets}`, shapes });
  }
  return drawings;
}

/**
 * The label sheets as a PDF of A4 pages at 1:1, marked not to be scaled when printed. Each QR code is also
 * a link, for whoever opens the file on a screen.
 */
export async function labelsPdf(input: LabelsInput, options: PdfOptions): Promise<Uint8Array> {
  const { doc, drawer } = await startPdf(options);
  const sheets = labelSheets(input);
  for (const [sheet, drawing] of sheets.entries()) {
    const page = await drawer.drawingPage(drawing);
    const links = input.panels.slice(sheet * LABELS_PER_SHEET, (sheet + 1) * LABELS_PER_SHEET).map((panel, i) => {
      const { x, y } = labelOrigin(i);
      const left = x + LABEL_QR.x;
      const bottom = drawing.height - (y + LABEL_QR.y + LABEL_QR.size);
      const rect = [left, bottom, left + LABEL_QR.size, bottom + LABEL_QR.size].map(mmToPt);
      return doc.context.register(doc.context.obj({ Type: 'Annot', Subtype: 'Link', Rect: rect, Border: [0, 0, 0], A: { Type: 'Action', S: 'URI', URI: PDFString.of(input.link(panel)) } }));
    });
    page.node.set(PDFName.of('Annots'), doc.context.obj(links));
  }
  return finishPdf(doc, options);
}

import { PDFName, PDFString } from 'pdf-lib';
import QRCode from 'qrcode';
import { panelBores } from '../layout/panel-layout';
import { handText, panelHands } from '../layout/side-hand';
import type { Panel } from '../model/job-document';
import { text, translate, type Drawing, type RectShape, type Shape } from './drawing';
import { carcassName, dateText, type ExportContext, exportUnit, faceName, materialName } from './export-context';
import { INK, MUTED } from './palette';
import { PAGE_MARGIN, PAPER, type PaperName } from './paper';
import { finishPdf, startPdf, type PdfOptions } from './pdf-document';
import { estimateTextWidth, fitText } from './text-width';
import { mmToPt, sizeText } from './units';

/** A sheet of self-adhesive labels: columns by rows of labels of one size, with their margins and gap, mm. */
export interface LabelSheet {
  columns: number;
  rows: number;
  width: number;
  height: number;
  left: number;
  top: number;
  columnGap: number;
}

/**
 * The common sheets of 14 labels, 2 columns by 7 rows, as each paper has it. A4: 99.1 × 38.1 mm labels,
 * 4.65 mm at the sides, 15.15 mm at top and bottom, 2.5 mm between the columns (4.65 · 2 + 99.1 · 2 + 2.5
 * = 210 and 15.15 · 2 + 38.1 · 7 = 297, ISO 216 A4). US Letter: 4 × 1⅓ in labels, 5/32 in at the sides,
 * ⅚ in at top and bottom, 3/16 in between the columns (2 · 4 + 3/16 + 2 · 5/32 = 8.5 in and 7 · 4/3 + 2 · 5/6
 * = 11 in; common practice, from memory; 1 in = 25.4 mm exactly). Printed on plain paper, the outlines are
 * the cutting lines.
 */
export const LABEL_SHEETS: Readonly<Record<PaperName, LabelSheet>> = {
  a4: { columns: 2, rows: 7, width: 99.1, height: 38.1, left: 4.65, top: 15.15, columnGap: 2.5 },
  letter: { columns: 2, rows: 7, width: 4 * 25.4, height: (4 / 3) * 25.4, left: (5 / 32) * 25.4, top: (5 / 6) * 25.4, columnGap: (3 / 16) * 25.4 },
};
export const LABELS_PER_SHEET = 14;

/**
 * The text and code keep this far inside each label, so that they stay within the PAGE_MARGIN that office
 * printers print (4.65 + 4 ≥ 8 mm on A4; on Letter 3.97 + 4.03) and a label cut or stuck slightly off loses nothing.
 */
const insetOf = (sheet: LabelSheet) => Math.max(4, PAGE_MARGIN - sheet.left);
/** The layout is drawn for the A4 label's 38.1 mm height and set closer on a lower label. */
const DESIGN_HEIGHT = 38.1;
/** The QR symbol's side without its quiet zone on the A4 label; about 0.7 to 0.8 mm a module for a link of 40 to 70 characters. */
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
  /** The absolute address each panel's QR code opens, as a phone's camera reads it; without it a label has no code. */
  link?: (panel: Panel) => string;
  /** The label sheet's paper: A4 by default. */
  paper?: PaperName;
}

/** Where a label's QR symbol lies on its label, in mm from the label's top left. */
export function labelQr(sheet: LabelSheet): { x: number; y: number; size: number } {
  const k = sheet.height / DESIGN_HEIGHT;
  const size = QR_SIZE * k;
  return { x: sheet.width - insetOf(sheet) - size, y: QR_TOP * k, size };
}

/** The top left corner of the label at this place on a sheet (0 is top left, filled row by row). */
export function labelOrigin(index: number, sheet: LabelSheet = LABEL_SHEETS.a4): { x: number; y: number } {
  const column = index % sheet.columns;
  const row = Math.floor(index / sheet.columns) % sheet.rows;
  return { x: sheet.left + column * (sheet.width + sheet.columnGap), y: sheet.top + row * sheet.height };
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

/** Which face the bench drills first: face A (design.md §2 and §3's frames), and face B after turning over when it has holes. */
function faceUpText(ctx: ExportContext, panel: Panel): string {
  const both = panelBores(panel, ctx.catalog, ctx.job.system).some((b) => b.kind === 'face' && b.face === 'B');
  const which = faceName(panel.role, 'A');
  return `Face A up${which ? ` (${which})` : ''}${both ? ' · then B' : ''}`;
}

/** One label's shapes, laid out from its own top left corner: the lines set for the label's height, the code at the right when there is a link. */
function label(ctx: ExportContext, sheet: LabelSheet, panel: Panel, hand: string | undefined, link: string | undefined): Shape[] {
  const { width, height } = sheet;
  const k = height / DESIGN_HEIGHT;
  const inset = insetOf(sheet);
  const qr = labelQr(sheet);
  const measure = (link === undefined ? width - inset : qr.x - 3.5) - inset;
  const line = (y: number, value: string, size: number, color = INK) => text(inset, y * k, fitText(value, size, measure), size, color);
  const carcass = panel.carcass === undefined ? 'No carcass' : carcassName(ctx, panel);
  const size = sizeText([panel.width, panel.height, panel.thickness], exportUnit(ctx));
  const shapes: Shape[] = [
    { kind: 'rect', x: 0, y: 0, width, height, stroke: CUT_LINE },
    line(6.4, ctx.job.name, 2.5, MUTED),
    line(11, carcass, 3),
    line(16.8, panel.name, estimateTextWidth(panel.name, 4.4) <= measure ? 4.4 : 3.5),
    line(21.8, `${size} (W × H × T)`, 3.1),
    line(26.2, hand ?? materialName(ctx, panel), hand ? 3.1 : 2.8, hand ? INK : MUTED),
    line(31.2, faceUpText(ctx, panel), 3.1),
    line(35.2, `${panel.id} · ${panel.role}${hand ? ` · ${materialName(ctx, panel)}` : ''}`, 2.2, MUTED),
  ];
  if (link !== undefined) shapes.push(...qrShapes(link, qr.x, qr.y, qr.size), text(qr.x + qr.size / 2, 34.2 * k, 'Scan: drilling map', 2.1, MUTED, 'middle'));
  return shapes;
}

/**
 * Panel labels on sheets of 14 (A4, or US Letter): each with the job, the carcass, the panel's name, its
 * size W × H × T, on a side which side of its carcass it is (left or right, seen from the front) in place of
 * the material, which face lies up for drilling, its document id and, given a link, a QR code that opens its
 * drilling map. One sheet per 14 panels; the last one is filled as far as it goes.
 */
export function labelSheets({ ctx, panels, link, paper = 'a4' }: LabelsInput): Drawing[] {
  if (panels.length === 0) throw new Error('No panels to label: pass at least one panel');
  const { width, height } = PAPER[paper];
  const sheet = LABEL_SHEETS[paper];
  const hands = panelHands(ctx.job);
  const sheets = Math.ceil(panels.length / LABELS_PER_SHEET);
  const drawings: Drawing[] = [];
  for (let n = 0; n < sheets; n++) {
    const onSheet = panels.slice(n * LABELS_PER_SHEET, (n + 1) * LABELS_PER_SHEET);
    const heading = `${ctx.job.name} · panel labels · sheet ${n + 1} of ${sheets} · ${dateText(ctx.date)}`;
    const shapes: Shape[] = [text(PAGE_MARGIN + 1, 10.5, fitText(heading, 2.4, width - 2 * PAGE_MARGIN), 2.4, MUTED)];
    onSheet.forEach((panel, i) => {
      const { x, y } = labelOrigin(i, sheet);
      shapes.push(...translate(label(ctx, sheet, panel, handText(panel, hands.get(panel.id)), link?.(panel)), x, y));
    });
    drawings.push({ width, height, title: `${ctx.job.name}: panel labels, sheet ${n + 1} of ${sheets}`, shapes });
  }
  return drawings;
}

/**
 * The label sheets as a PDF of pages at 1:1, marked not to be scaled when printed. Each QR code is also a
 * link, for whoever opens the file on a screen.
 */
export async function labelsPdf(input: LabelsInput, options: PdfOptions): Promise<Uint8Array> {
  const { doc, drawer } = await startPdf(options);
  const sheet = LABEL_SHEETS[input.paper ?? 'a4'];
  const qr = labelQr(sheet);
  for (const [n, drawing] of labelSheets(input).entries()) {
    const page = await drawer.drawingPage(drawing);
    const { link } = input;
    if (link === undefined) continue;
    const links = input.panels.slice(n * LABELS_PER_SHEET, (n + 1) * LABELS_PER_SHEET).map((panel, i) => {
      const { x, y } = labelOrigin(i, sheet);
      const left = x + qr.x;
      const bottom = drawing.height - (y + qr.y + qr.size);
      const rect = [left, bottom, left + qr.size, bottom + qr.size].map(mmToPt);
      return doc.context.register(doc.context.obj({ Type: 'Annot', Subtype: 'Link', Rect: rect, Border: [0, 0, 0], A: { Type: 'Action', S: 'URI', URI: PDFString.of(link(panel)) } }));
    });
    page.node.set(PDFName.of('Annots'), doc.context.obj(links));
  }
  return finishPdf(doc, options);
}

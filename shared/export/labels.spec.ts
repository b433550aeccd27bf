import jsQR from 'jsqr';
import { PDFDocument, PrintScaling } from 'pdf-lib';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { pdfTools } from '../../server/export/export-platform';
import { makePanel } from '../testing/make-job';
import { exportContext, exportJob } from '../testing/export-job';
import { readPdfPage } from '../testing/pdf-page';
import type { Shape } from './drawing';
import { LABEL_SHEETS, labelOrigin, labelQr, labelSheets, labelsPdf, LABELS_PER_SHEET, QR_QUIET_MODULES, type LabelsInput } from './labels';
import { PAGE_MARGIN } from './paper';
import { estimateTextWidth } from './text-width';

const tools = await pdfTools();
const link = (panelId: string) => `https://workshop.greyfield.example/bench/panels/${panelId}`;

/** A job of `count` labelled panels: the export job's four, then plain shelves. */
function labels(count: number): LabelsInput {
  const shelves = Array.from({ length: Math.max(0, count - 4) }, (_, i) => makePanel(`shelf-${i + 1}`, { name: `Shelf ${i + 1}`, role: 'shelf', carcass: 'base' }));
  const ctx = exportContext(exportJob({}, shelves));
  return { ctx, panels: ctx.job.panels.slice(0, count), link: (p) => link(p.id) };
}

const LABEL_SHEET = LABEL_SHEETS.a4;
const LABEL_QR = labelQr(LABEL_SHEET);
const pdf = (input: LabelsInput) => labelsPdf(input, { ...tools, title: 'Labels', date: input.ctx.date, producer: 'test' });

/** Points per mm: 72 pt per inch, 1 in = 25.4 mm exactly. */
const PT = 72 / 25.4;

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** The boxes of every path a page fills in black, in mm from the page's top left, as pdfjs-dist reads the file, and the page's text. */
async function blackFills(bytes: Uint8Array, pageNumber: number): Promise<{ boxes: Box[]; text: string }> {
  const { paths, text, heightPt } = await readPdfPage(bytes, pageNumber);
  const boxes = paths.filter((p) => p.filledBlack).map((p) => ({ x0: p.x0 / PT, x1: p.x1 / PT, y0: (heightPt - p.y1) / PT, y1: (heightPt - p.y0) / PT }));
  return { boxes, text };
}

/**
 * Rasterizes the black boxes inside `area` (mm) at `perMm` pixels per mm, white elsewhere, as the RGBA
 * bytes jsQR reads: a pixel is black when its centre lies in a box, as a printer's raster would have it.
 */
function rasterize(boxes: readonly Box[], area: Box, perMm: number): { data: Uint8ClampedArray; width: number; height: number } {
  const width = Math.round((area.x1 - area.x0) * perMm);
  const height = Math.round((area.y1 - area.y0) * perMm);
  const data = new Uint8ClampedArray(width * height * 4).fill(255);
  for (const b of boxes) {
    const from = (v: number, o: number) => Math.max(0, Math.ceil((v - o) * perMm - 0.5));
    const to = (v: number, o: number, n: number) => Math.min(n, Math.ceil((v - o) * perMm - 0.5));
    for (let py = from(b.y0, area.y0); py < to(b.y1, area.y0, height); py++) {
      for (let px = from(b.x0, area.x0); px < to(b.x1, area.x0, width); px++) data.fill(0, (py * width + px) * 4, (py * width + px) * 4 + 3);
    }
  }
  return { data, width, height };
}

/** The page area of the QR symbol of the label at this place, with its quiet zone. */
function qrArea(index: number, quiet: number): Box {
  const { x, y } = labelOrigin(index);
  return { x0: x + LABEL_QR.x - quiet, y0: y + LABEL_QR.y - quiet, x1: x + LABEL_QR.x + LABEL_QR.size + quiet, y1: y + LABEL_QR.y + LABEL_QR.size + quiet };
}

describe('panel labels', () => {
  it('are A4 pages of 595.28 × 841.89 pt, read back with pdf-lib, marked not to be scaled', async () => {
    // ISO 216: A4 is 210 × 297 mm; ISO 32000-1:2008 §8.3.2.3 (published, from memory): 1/72 in per unit, so 595.28 × 841.89 pt.
    const doc = await PDFDocument.load(await pdf(labels(4)));
    expect(doc.getPageCount()).toBe(1);
    const { width, height } = doc.getPage(0).getSize();
    expect(width).toBeCloseTo(595.28, 2);
    expect(height).toBeCloseTo(841.89, 2);
    expect(doc.catalog.getViewerPreferences()?.getPrintScaling()).toBe(PrintScaling.None);
  });

  it('put 14 labels on a sheet: one page for 1 to 14 panels, two for 15 to 28, three for 29', async () => {
    expect(LABELS_PER_SHEET).toBe(14);
    for (const [count, pages] of [
      [1, 1],
      [14, 1],
      [15, 2],
      [28, 2],
      [29, 3],
    ]) {
      expect((await PDFDocument.load(await pdf(labels(count)))).getPageCount()).toBe(pages);
    }
    // The last sheet holds what is left: 29 = 14 + 14 + 1.
    const sheets = labelSheets(labels(29));
    const cutLines = (shapes: Shape[]) => shapes.filter((s) => s.kind === 'rect' && s.stroke !== undefined).length;
    expect(sheets.map((s) => cutLines(s.shapes))).toEqual([14, 14, 1]);
  });

  it('fill the common 2 × 7 sheet of 99.1 × 38.1 mm labels exactly, and print everything within the printers’ margin', () => {
    // The layout adds up to ISO 216's 210 × 297 mm.
    expect(2 * LABEL_SHEET.left + 2 * LABEL_SHEET.width + LABEL_SHEET.columnGap).toBeCloseTo(210, 9);
    expect(2 * LABEL_SHEET.top + 7 * LABEL_SHEET.height).toBeCloseTo(297, 9);
    const [sheet] = labelSheets(labels(14));
    for (const s of sheet.shapes) {
      if (s.kind === 'rect' && s.stroke) continue; // the cutting lines are the labels' own edges
      const [x, y] = s.kind === 'rect' ? [s.x + s.width, s.y + s.height] : s.kind === 'text' ? [s.x, s.y] : [NaN, NaN];
      expect(x).toBeGreaterThanOrEqual(PAGE_MARGIN);
      expect(x).toBeLessThanOrEqual(210 - PAGE_MARGIN);
      expect(y).toBeGreaterThanOrEqual(PAGE_MARGIN);
      expect(y).toBeLessThanOrEqual(297 - PAGE_MARGIN);
    }
  });

  it('fill the common 2 × 7 sheet of 4 × 1⅓ in labels on US Letter, within the printers’ margin', () => {
    // ANSI/ASME Y14.1 (published, from memory): Letter is 8.5 × 11 in = 215.9 × 279.4 mm; the 14-up sheet of
    // 4 × 1⅓ in labels is the common Letter equivalent of the A4 one (common practice, from memory).
    const letter = LABEL_SHEETS.letter;
    expect(2 * letter.left + 2 * letter.width + letter.columnGap).toBeCloseTo(215.9, 9);
    expect(2 * letter.top + 7 * letter.height).toBeCloseTo(279.4, 9);
    const [sheet] = labelSheets({ ...labels(14), paper: 'letter' });
    expect([sheet.width, sheet.height]).toEqual([215.9, 279.4]);
    for (const s of sheet.shapes) {
      if (s.kind === 'rect' && s.stroke) continue;
      const [x, y] = s.kind === 'rect' ? [s.x + s.width, s.y + s.height] : s.kind === 'text' ? [s.x, s.y] : [NaN, NaN];
      expect(x).toBeGreaterThanOrEqual(PAGE_MARGIN);
      expect(x).toBeLessThanOrEqual(215.9 - PAGE_MARGIN);
      expect(y).toBeGreaterThanOrEqual(PAGE_MARGIN);
      expect(y).toBeLessThanOrEqual(279.4 - PAGE_MARGIN);
    }
    // Each label's last line stays on its own label.
    const origin = labelOrigin(13, letter);
    const lowest = Math.max(...sheet.shapes.filter((s) => s.kind === 'text' && s.y > origin.y && s.y < origin.y + letter.height + 5).map((s) => (s as { y: number }).y));
    expect(lowest).toBeLessThan(origin.y + letter.height);
  });

  it('name a side left or right as seen from the front, in place of the material', async () => {
    const { text } = await blackFills(await pdf(labels(4)), 1);
    expect(text).toContain('LEFT side (seen from the front)');
    expect(text).toContain('side-l · side · Particleboard 18');
  });

  it('leave the code off when there is no link to give it', async () => {
    const [sheet] = labelSheets({ ...labels(2), link: undefined });
    expect(sheet.shapes.some((s) => s.kind === 'rect' && s.fill === '#000000')).toBe(false);
    expect(sheet.shapes.some((s) => s.kind === 'text' && s.text === 'Scan: drilling map')).toBe(false);
  });

  it('say job, carcass, panel, size, material and which face is up', async () => {
    const { text } = await blackFills(await pdf(labels(4)), 1);
    for (const words of [
      'Larch Lane kitchen',
      'Base unit',
      'Base unit, left side',
      '560 × 720 × 18 mm (W × H × T)',
      'Face A up (inside face) · then B', // the side has a face B bore
      'Face A up (back face)\n', // the door's cups are all on face A
      'side-l · side',
      'Particleboard 18', // the door's material
      'No carcass', // the loose back
      'Scan: drilling map',
    ]) {
      expect(text).toContain(words);
    }
  });

  it('carry a QR code, drawn as vector rectangles, that decodes to the panel’s link', async () => {
    const input = labels(15);
    const bytes = await pdf(input);
    // Decoded with jsQR (github.com/cozmo/jsQR), a general-purpose QR reader, from a raster of the black
    // rectangles the PDF itself fills, as pdfjs-dist (Mozilla's PDF reader) reads them: what a printer prints.
    for (const [page, index, panel] of [
      [1, 0, input.panels[0]],
      [1, 13, input.panels[13]],
      [2, 0, input.panels[14]],
    ] as const) {
      const { boxes } = await blackFills(bytes, page);
      const area = qrArea(index, (QR_QUIET_MODULES * LABEL_QR.size) / 29);
      const inside = boxes.filter((b) => b.x0 >= area.x0 && b.x1 <= area.x1 && b.y0 >= area.y0 && b.y1 <= area.y1);
      expect(inside.length).toBeGreaterThan(20);
      const { data, width, height } = rasterize(inside, area, 12);
      expect(jsQR(data, width, height)?.data).toBe(link(panel.id));
    }
  });

  it('make each QR code a link to the same address, for a reader on a screen', async () => {
    const input = labels(15);
    const doc = await getDocument({ data: (await pdf(input)).slice(), disableFontFace: true, useSystemFonts: false }).promise;
    const links = async (n: number) => (await (await doc.getPage(n)).getAnnotations()).map((a: { subtype: string; url?: string; rect: number[] }) => ({ subtype: a.subtype, url: a.url, rect: a.rect.map((v) => Math.round(v / PT)) }));
    const first = labelOrigin(0);
    expect((await links(1))[0]).toEqual({
      subtype: 'Link',
      url: link('side-l'),
      rect: [first.x + LABEL_QR.x, 297 - first.y - LABEL_QR.y - LABEL_QR.size, first.x + LABEL_QR.x + LABEL_QR.size, 297 - first.y - LABEL_QR.y].map(Math.round),
    });
    expect((await links(1)).map((l) => l.url)).toEqual(input.panels.slice(0, 14).map((p) => link(p.id)));
    expect((await links(2)).map((l) => l.url)).toEqual([link(input.panels[14].id)]);
  });

  it('keep the QR code’s quiet zone free of anything else', () => {
    const [sheet] = labelSheets(labels(14));
    const origin = labelOrigin(0);
    // ISO/IEC 18004 asks for 4 modules of quiet zone; the symbol of a link like these has at least 29 modules.
    const quiet = (QR_QUIET_MODULES * LABEL_QR.size) / 29;
    const zone = { x0: origin.x + LABEL_QR.x - quiet, x1: origin.x + LABEL_QR.x + LABEL_QR.size + quiet, y0: origin.y + LABEL_QR.y - quiet, y1: origin.y + LABEL_QR.y + LABEL_QR.size + quiet };
    // A text's box: from a fifth of an em below its baseline to an em above, along its estimated width.
    for (const t of sheet.shapes.filter((s) => s.kind === 'text')) {
      const width = estimateTextWidth(t.text, t.size);
      const x0 = t.anchor === 'start' ? t.x : t.anchor === 'middle' ? t.x - width / 2 : t.x - width;
      const overlaps = x0 < zone.x1 && x0 + width > zone.x0 && t.y - t.size < zone.y1 && t.y + 0.2 * t.size > zone.y0;
      expect(overlaps, `"${t.text}" lies in the quiet zone`).toBe(false);
    }
  });

  it('refuse to make a sheet of no labels', () => {
    expect(() => labelSheets({ ...labels(1), panels: [] })).toThrow(/No panels to label/);
  });
});

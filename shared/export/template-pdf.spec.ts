import { PDFDocument, PrintScaling } from 'pdf-lib';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { pdfTools } from '../../server/export/export-platform';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { DEFAULT_MATERIALS } from '../model/default-materials';
import { exportContext, exportJob } from '../testing/export-job';
import { makeJob } from '../testing/make-job';
import { readPdfPage } from '../testing/pdf-page';
import { planned } from '../testing/planned-carcass';
import type { ExportContext } from './export-context';
import { jobDrilling } from './panel-drilling';
import { templateWindow, type PaperName } from './paper';
import { panelTemplates, templateSheetCount, templateSheetsPdf } from './template-pdf';
import type { Shape, TextShape } from './drawing';
import { estimateTextWidth } from './text-width';
import { TILE_OVERLAP } from './tiles';

const tools = await pdfTools();
const ctx = exportContext(exportJob({ name: 'Łódź kitchen — Ø35 cups' }, [{ id: 'big', name: 'Worktop blank', role: 'loose', width: 2800, height: 1200, thickness: 38, material: 'pb18', bores: [{ id: 'h', x: 1400, y: 600, face: 'A', diameter: 35, depth: 13 }] }]));

async function templates(panelIndex: number, paper: PaperName, context: ExportContext = ctx) {
  const drilling = jobDrilling(context.job, context.catalog, [])[panelIndex];
  const plans = panelTemplates(context, drilling, paper);
  const bytes = await templateSheetsPdf(plans, { ...tools, title: drilling.panel.name, date: context.date, producer: 'test' });
  return { plans, bytes };
}

/** Points per mm: 72 pt per inch, 1 in = 25.4 mm exactly. */
const PT = 72 / 25.4;

/** Every path's box on the page, in points, as pdfjs-dist reads it, with the page's text and the document's page count. */
async function pathBoxes(bytes: Uint8Array, pageNumber: number) {
  const { paths, text, pages } = await readPdfPage(bytes, pageNumber);
  return { boxes: paths.map((p) => ({ width: p.x1 - p.x0, height: p.y1 - p.y0 })), text, pages };
}

interface TextBox {
  str: string;
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** Each text item of each page as pdfjs-dist places it, as a box in mm from the page's bottom left: its run along the baseline and its height across. */
async function textBoxes(bytes: Uint8Array): Promise<TextBox[][]> {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  const pages: TextBox[][] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const items = (await (await doc.getPage(n)).getTextContent()).items.filter((i) => 'str' in i && i.str.trim() !== '') as { str: string; transform: number[]; width: number; height: number }[];
    pages.push(
      items.map(({ str, transform: [a, b, c, d, e, f], width, height }) => {
        const along = Math.hypot(a, b);
        const up = Math.hypot(c, d);
        const xs = [e, e + (a / along) * width, e + (c / up) * height, e + (a / along) * width + (c / up) * height];
        const ys = [f, f + (b / along) * width, f + (d / up) * height, f + (b / along) * width + (d / up) * height];
        return { str, x0: Math.min(...xs) / PT, x1: Math.max(...xs) / PT, y0: Math.min(...ys) / PT, y1: Math.max(...ys) / PT };
      }),
    );
  }
  return pages;
}

describe('template sheets', () => {
  it('are A4 pages of 595.28 × 841.89 pt, or US Letter pages of 612 × 792 pt, read back with pdf-lib', async () => {
    // ISO 216: A4 is 210 × 297 mm; ISO 32000-1:2008 §8.3.2.3 (from memory): 1/72 in per unit, so 595.28 × 841.89 pt.
    // ANSI/ASME Y14.1 (from memory): US Letter is 8.5 × 11 in, 612 × 792 pt.
    for (const [paper, size] of [
      ['a4', [595.28, 841.89]],
      ['letter', [612, 792]],
    ] as const) {
      const { bytes } = await templates(0, paper);
      const doc = await PDFDocument.load(bytes);
      expect(doc.getPageCount()).toBeGreaterThan(1);
      for (const page of doc.getPages()) {
        const { width, height } = page.getSize();
        const [short, long] = [width, height].sort((a, b) => a - b);
        expect(short).toBeCloseTo(size[0], 1);
        expect(long).toBeCloseTo(size[1], 1);
      }
    }
  });

  it('ask readers not to scale them when printing', async () => {
    // pdf-lib packs the catalog into object streams: the preference is read by reloading, not by searching bytes.
    const doc = await PDFDocument.load((await templates(2, 'a4')).bytes);
    expect(doc.catalog.getViewerPreferences()?.getPrintScaling()).toBe(PrintScaling.None);
  });

  it('lead with an information sheet (title block, bore table, legend), then tile the panel alone, each page naming itself', async () => {
    const { bytes } = await templates(2, 'a4');
    const info = (await pathBoxes(bytes, 1)).text;
    expect(info).toContain('Template sheets, face A: read this sheet first');
    expect(info).toContain('Bore table: bores drilled alike');
    expect(info).toContain('Legend');
    expect(info).toContain('Base unit, door: drilling map, face A');
    const { text } = await pathBoxes(bytes, 2);
    expect(text).toContain('Print at actual size (100 %)');
    // Ł and — lie beyond Latin-1: only the embedded font writes them.
    expect(text).toContain('A1: Łódź kitchen — Ø35 cups: Base unit, door, face A');
    expect(text).toMatch(/Row 1 of \d+, column 1 of \d+; page 2 of \d+/);
    expect(text).not.toContain('Legend');
    expect(text).not.toContain('Bore table');
  });

  it('print the face up, where the reference edge is and which side a side is on every tiled page', async () => {
    const { bytes, plans } = await templates(0, 'a4');
    const pages = await textBoxes(bytes);
    let page = 0;
    for (const plan of plans) {
      page += plan.info.pageCount;
      for (let k = 0; k < plan.plan.tiles.length; k++, page++) {
        const text = pages[page].map((t) => t.str).join('\n');
        const face = plan.facts.title.endsWith('face A') ? 'Face A (inside face) up · reference edge (x = 0) at the left' : 'Face B (outside face) up · reference edge (x = 0) at the right';
        expect(text).toContain(`${face} · LEFT side (seen from the front)`);
      }
    }
  });

  it('draw the 100 mm check bar 283.46 pt long on every page, across and down on every tiled page, as pdfjs-dist measures it', async () => {
    const { bytes, plans } = await templates(2, 'letter');
    const { pages } = await pathBoxes(bytes, 1);
    for (let n = 1; n <= pages; n++) {
      const { boxes } = await pathBoxes(bytes, n);
      // 100 mm at 72 pt per inch and 25.4 mm per inch: 283.46 pt.
      expect(boxes.some((b) => Math.abs(b.width - 100 * PT) < 0.01 && b.height < 10)).toBe(true);
      if (n > plans[0].info.pageCount) expect(boxes.some((b) => Math.abs(b.height - 100 * PT) < 0.01 && b.width < 10)).toBe(true);
    }
  });

  it('tile a panel larger than any sheet, 2800 × 1200, onto as many pages as the plan has tiles, after its information sheet', async () => {
    const { plans, bytes } = await templates(4, 'a4');
    const doc = await PDFDocument.load(bytes);
    expect(plans[0].plan.tiles.length).toBeGreaterThan(20);
    expect(doc.getPageCount()).toBe(plans[0].info.pageCount + plans[0].plan.tiles.length);
    // The cover sheet's count, made without drawing the figure, is the file's.
    expect(templateSheetCount(ctx, jobDrilling(ctx.job, ctx.catalog, [])[4], 'a4')).toBe(doc.getPageCount());
  });

  it('hold no page objects but the pages printed: the figures are form XObjects', async () => {
    const doc = await PDFDocument.load((await templates(2, 'a4')).bytes);
    const pageObjects = doc.context.enumerateIndirectObjects().filter(([, object]) => object.toString().includes('/Type /Page\n'));
    expect(pageObjects).toHaveLength(doc.getPageCount());
  });
});

describe('a 320 × 723 mm wall-unit side on A4', () => {
  // The planner's worked wall carcass (723 = 32 · 22 + 19, 320 deep) with two adjustable shelves: its left side.
  const plan = planned({ shelves: { type: 'adjustable', count: 2, play: 1 } });
  const job = makeJob(plan.panels, { materials: [...DEFAULT_MATERIALS], carcasses: [plan.carcass] });
  const wall = { ...exportContext(job), catalog: builtinCatalog() };
  const index = job.panels.findIndex((p) => p.id === 'wall-left');

  it('takes the fewest pages its size allows: one information sheet and 2 × 4 tiles', async () => {
    const { plans, bytes } = await templates(index, 'a4', wall);
    expect(job.panels[index]).toMatchObject({ width: 320, height: 723 });
    // A4 is 210 × 297 mm (ISO 216). The window a page shows is the page less an 8 mm margin all round, a
    // 12 mm band on the left (the check bar down) and bands of 29 mm above (the page label) and 14 mm below
    // (the check bar across): portrait 210 − 16 − 12 = 182 wide, 297 − 16 − 29 − 14 = 238 high.
    expect(templateWindow(210, 297)).toMatchObject({ width: 182, height: 238 });
    // Neighbouring pages overlap by 10 mm, so n pages cover 10 + n · (window − 10):
    //   across, 320 mm of panel: (320 − 10) / (182 − 10) = 1.80 → 2 columns (covering up to 354 mm);
    //   down, 723 mm of panel:   (723 − 10) / (238 − 10) = 3.13 → 4 rows (covering up to 922 mm).
    // Landscape (269 × 151 window): (320 − 10) / 259 = 1.20 → 2, (723 − 10) / 141 = 5.06 → 6: 12 pages.
    // So no tiling of the panel itself takes fewer than 2 × 4 = 8 pages; its dimensions and edge strips
    // fit within the 354 × 922 mm those 8 pages cover.
    expect(TILE_OVERLAP).toBe(10);
    const [face] = plans;
    expect(face.figure.width).toBeLessThanOrEqual(354);
    expect(face.figure.height).toBeLessThanOrEqual(922);
    expect({ orientation: face.plan.orientation, cols: face.plan.cols, rows: face.plan.rows }).toEqual({ orientation: 'portrait', cols: 2, rows: 4 });
    expect(plans).toHaveLength(1);
    expect(face.info.pageCount).toBe(1);
    expect((await PDFDocument.load(bytes)).getPageCount()).toBe(9);
    expect(templateSheetCount(wall, jobDrilling(job, wall.catalog, [])[index], 'a4')).toBe(9);
  });

  it('cuts no text at a sheet edge: the information sheet and every page label lie wholly on their page, every text of the panel wholly on some page', async () => {
    const { plans, bytes } = await templates(index, 'a4', wall);
    const [{ plan: tiles, info, figure }] = plans;
    const pages = await textBoxes(bytes);
    const { window: w, pageHeight } = tiles;
    const page = { x0: 0, y0: 0, x1: 210, y1: 297 };
    const within = (t: { x0: number; y0: number; x1: number; y1: number }, r: { x0: number; y0: number; x1: number; y1: number }) => t.x0 >= r.x0 - 0.01 && t.x1 <= r.x1 + 0.01 && t.y0 >= r.y0 - 0.01 && t.y1 <= r.y1 + 0.01;
    // As pdfjs-dist places them: the information sheet's texts (title block, bore table, legend) and each tiled
    // page's label above its window (title, face up, reference edge, side, page and neighbours).
    const infoTexts = pages.slice(0, info.pageCount).flat();
    expect(infoTexts.map((t) => t.str).join(' ')).toContain('Legend');
    for (const t of infoTexts) expect(within(t, page), `"${t.str}" on the information sheet`).toBe(true);
    const windowTop = pageHeight - w.y;
    for (const [k, texts] of pages.slice(info.pageCount).entries()) {
      const labels = texts.filter((t) => t.y0 >= windowTop);
      expect(labels.length, `page label of tile ${k + 1}`).toBeGreaterThanOrEqual(5);
      for (const t of labels) expect(within(t, page), `"${t.str}" on tile ${k + 1}`).toBe(true);
    }
    // The panel's own texts (dimensions, hole labels, edge names), from the figure as drawn, with their width
    // estimated as the layout does: each lies wholly within the part of the figure some page shows.
    const flat = (shapes: readonly Shape[], dx = 0, dy = 0): TextShape[] =>
      shapes.flatMap((sh) => (sh.kind === 'symbol' ? flat(sh.drawing.shapes, dx + sh.x, dy + sh.y) : sh.kind === 'text' ? [{ ...sh, x: sh.x + dx, y: sh.y + dy }] : []));
    const texts = flat(figure.shapes);
    expect(texts.length).toBeGreaterThan(50);
    for (const t of texts) {
      const length = estimateTextWidth(t.text, t.size);
      const start = t.anchor === 'start' ? 0 : t.anchor === 'middle' ? -length / 2 : -length;
      const box = t.upright ? { x0: t.x - t.size, x1: t.x + 0.3 * t.size, y0: t.y - start - length, y1: t.y - start } : { x0: t.x + start, x1: t.x + start + length, y0: t.y - t.size, y1: t.y + 0.3 * t.size };
      const onSome = tiles.tiles.some(({ area }) => within(box, { x0: area.x, y0: area.y, x1: area.x + area.width, y1: area.y + area.height }));
      expect(onSome, `"${t.text}" at ${Math.round(box.x0)}, ${Math.round(box.y0)} is cut on every page that shows it`).toBe(true);
    }
  });
});

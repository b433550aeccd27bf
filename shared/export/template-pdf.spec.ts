import { PDFDocument, PrintScaling } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { pdfTools } from '../../server/export/export-platform';
import { panelBores } from '../layout/panel-layout';
import { exportContext, exportJob } from '../testing/export-job';
import { readPdfPage } from '../testing/pdf-page';
import { panelDrillingMaps } from './drilling-map';
import type { PaperName } from './paper';
import { templateSheetsPdf } from './template-pdf';
import { planTiles } from './tiles';

const tools = await pdfTools();
const ctx = exportContext(exportJob({ name: 'Łódź kitchen — Ø35 cups' }, [{ id: 'big', name: 'Worktop blank', role: 'loose', width: 2800, height: 1200, thickness: 38, material: 'pb18', bores: [{ id: 'h', x: 1400, y: 600, face: 'A', diameter: 35, depth: 13 }] }]));

async function templates(panelIndex: number, paper: PaperName) {
  const panel = ctx.job.panels[panelIndex];
  const maps = panelDrillingMaps(ctx, panel, panelBores(panel, ctx.catalog, ctx.job.system));
  const bytes = await templateSheetsPdf(maps, paper, { ...tools, title: panel.name, date: ctx.date, producer: 'test' });
  return { maps, bytes };
}

/** Points per mm: 72 pt per inch, 1 in = 25.4 mm exactly. */
const PT = 72 / 25.4;

/** Every path's box on the page, in points, as pdfjs-dist reads it, with the page's text and the document's page count. */
async function pathBoxes(bytes: Uint8Array, pageNumber: number) {
  const { paths, text, pages } = await readPdfPage(bytes, pageNumber);
  return { boxes: paths.map((p) => ({ width: p.x1 - p.x0, height: p.y1 - p.y0 })), text, pages };
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

  it('say "print at actual size (100 %)" and name their page, as pdfjs-dist reads the text', async () => {
    const { text } = await pathBoxes((await templates(2, 'a4')).bytes, 1);
    expect(text).toContain('Print at actual size (100 %)');
    // Ł and — lie beyond Latin-1: only the embedded font writes them.
    expect(text).toContain('A1: Łódź kitchen — Ø35 cups: Base unit, door, face A');
    expect(text).toMatch(/Row 1 of \d+, column 1 of \d+; page 1 of \d+/);
  });

  it('draw the 100 mm check bar 283.46 pt long across and down every page, as pdfjs-dist measures it', async () => {
    const { bytes } = await templates(2, 'letter');
    const { pages } = await pathBoxes(bytes, 1);
    for (let n = 1; n <= pages; n++) {
      const { boxes } = await pathBoxes(bytes, n);
      // 100 mm at 72 pt per inch and 25.4 mm per inch: 283.46 pt.
      expect(boxes.some((b) => Math.abs(b.width - 100 * PT) < 0.01 && b.height < 10)).toBe(true);
      expect(boxes.some((b) => Math.abs(b.height - 100 * PT) < 0.01 && b.width < 10)).toBe(true);
    }
  });

  it('tile a panel larger than any sheet, 2800 × 1200, onto as many pages as the plan has tiles', async () => {
    const { maps, bytes } = await templates(4, 'a4');
    const doc = await PDFDocument.load(bytes);
    const tiles = planTiles(maps[0].width, maps[0].height, 'a4').tiles.length;
    expect(tiles).toBeGreaterThan(20);
    expect(doc.getPageCount()).toBe(tiles);
  });

  it('hold no page objects but the pages printed: the maps are form XObjects', async () => {
    const doc = await PDFDocument.load((await templates(2, 'a4')).bytes);
    const pageObjects = doc.context.enumerateIndirectObjects().filter(([, object]) => object.toString().includes('/Type /Page\n'));
    expect(pageObjects).toHaveLength(doc.getPageCount());
  });
});

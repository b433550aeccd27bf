import { PDFDict, PDFDocument, PDFName } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { pdfTools } from '../../server/export/export-platform';
import { readPdfPage } from '../testing/pdf-page';
import { line, text, type Drawing } from './drawing';
import { pdfNumber } from './pdf-content';
import { drawingsPdf } from './pdf-document';

/** Points per mm: 72 pt per inch, 1 in = 25.4 mm exactly. */
const PT = 72 / 25.4;

const tools = await pdfTools();
const sheet: Drawing = {
  width: 200,
  height: 100,
  title: 'shapes',
  shapes: [
    { kind: 'circle', cx: 100, cy: 50, r: 17.5, stroke: { color: '#000000', width: 0.3 } },
    { kind: 'rect', x: 10, y: 20, width: 30, height: 40, fill: '#000000' },
    line(150, 10, 190, 10, { color: '#FF0000', width: 0.5, dash: [3, 1.5] }),
    text(20, 90, 'Ø5 × 12 – Łódź', 4, '#000000'),
    { kind: 'symbol', id: 'mark', x: 160, y: 60, drawing: { width: 10, height: 10, title: 'mark', shapes: [{ kind: 'rect', x: 0, y: 0, width: 10, height: 10, fill: '#000000' }] } },
  ],
};

describe('PDF drawing', () => {
  it('puts every shape where the drawing has it, at 1:1, as pdfjs-dist reads the page', async () => {
    const bytes = await drawingsPdf([sheet], { ...tools, title: 'shapes', date: new Date('2026-01-01'), producer: 'test' });
    const { paths, text: words, heightPt } = await readPdfPage(bytes, 1);
    // ISO 32000-1 §8.3.2.3: 1/72 in per unit, 25.4 mm per inch; y grows upwards from the bottom edge.
    expect(heightPt).toBeCloseTo(100 * PT, 2);
    const box = (x: number, yTop: number, w: number, h: number) => ({ x0: x * PT, y0: (100 - yTop - h) * PT, x1: (x + w) * PT, y1: (100 - yTop) * PT });
    const find = (want: ReturnType<typeof box>) =>
      paths.find((p) => Math.abs(p.x0 - want.x0) < 0.01 && Math.abs(p.y0 - want.y0) < 0.01 && Math.abs(p.x1 - want.x1) < 0.01 && Math.abs(p.y1 - want.y1) < 0.01);
    expect(find(box(82.5, 32.5, 35, 35))?.filledBlack).toBe(false); // the Ø35 circle, stroked only
    expect(find(box(10, 20, 30, 40))?.filledBlack).toBe(true);
    expect(find(box(150, 10, 40, 0))).toBeDefined();
    expect(find(box(160, 60, 10, 10))?.filledBlack).toBe(true); // the symbol, through its form XObject
    expect(words).toContain('Ø5 × 12 – Łódź');
  });
});

/** The Type0 fonts a PDF embeds, as pdf-lib reads the file back. */
async function type0Fonts(bytes: Uint8Array): Promise<number> {
  const doc = await PDFDocument.load(bytes);
  return doc.context.enumerateIndirectObjects().filter(([, o]) => o instanceof PDFDict && o.get(PDFName.of('Subtype'))?.toString() === '/Type0').length;
}

describe('PDF text', () => {
  const pdfOf = (value: string) => drawingsPdf([{ width: 250, height: 30, title: 'text', shapes: [text(5, 15, value, 4, '#000000')] }], { ...tools, title: 'text', date: new Date('2026-01-01'), producer: 'test' });

  it('writes names, numbers and the drawing signs in the one subset every file shares', async () => {
    const value = 'Base unit, door: Ø35 × 12.5 – 2 pcs · §4 “Müller”';
    const bytes = await pdfOf(value);
    expect((await readPdfPage(bytes, 1)).text).toContain(value);
    expect(await type0Fonts(bytes)).toBe(1);
  });

  it('adds a subset of the file’s own for a text beyond it, and both read back as written', async () => {
    const bytes = await pdfOf('Łódź, Ђорђе, Ø35');
    expect((await readPdfPage(bytes, 1)).text).toContain('Łódź, Ђорђе, Ø35');
    expect(await type0Fonts(bytes)).toBe(2);
  });
});

describe('pdfNumber', () => {
  it('writes numbers as PDF reals: no exponent, rounded to 0.001 pt, no negative zero', () => {
    // ISO 32000-1 §7.3.3 (from memory): a real is digits with an optional point and sign, never an exponent.
    expect(pdfNumber(1e-7)).toBe('0');
    expect(pdfNumber(-0.0001)).toBe('0');
    expect(pdfNumber(2.8346456692913384)).toBe('2.835');
    expect(pdfNumber(-12.5)).toBe('-12.5');
    expect(pdfNumber(595.2755905511812)).toBe('595.276');
    expect(() => pdfNumber(Number.NaN)).toThrow(/finite/);
  });
});

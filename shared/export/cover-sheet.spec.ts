import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { pdfTools } from '../../server/export/export-platform';
import { checkJob } from '../checks/index';
import type { JobDocument } from '../model/job-document';
import type { LengthUnit } from '../units/length-unit';
import { clashPanel, exportContext, exportJob } from '../testing/export-job';
import { CAUTION_DEFERRAL, cautionsFor, PROGRAM_CAUTION } from './cautions';
import { coverSheet } from './cover-sheet';
import { hardwareList } from './hardware-list';
import { jobDrilling } from './panel-drilling';
import { drawingsPdf } from './pdf-document';

const tools = await pdfTools();

/** The cover sheet's text as pdfjs-dist reads it from the PDF, page after page. */
async function coverText(job: JobDocument, programs = false, unit: LengthUnit = 'mm'): Promise<{ text: string; pages: number }> {
  const ctx = { ...exportContext(job), unit };
  const findings = checkJob(job, ctx.catalog, { unit });
  const drilling = jobDrilling(job, ctx.catalog, findings);
  const pages = coverSheet({
    ctx,
    paper: 'a4',
    findings,
    panels: drilling.map((d, i) => ({ drilling: d, sheets: i + 1 })),
    hardware: hardwareList(ctx, drilling),
    cautions: cautionsFor(job, ctx.catalog),
    files: { labels: 'panel labels.pdf', readme: 'README.txt', schedule: 'hole schedule.csv', hardware: 'hardware list.csv', manifest: 'manifest.json' },
    programs,
  });
  const bytes = await drawingsPdf(pages, { ...tools, title: 'cover', date: ctx.date, producer: 'test' });
  const doc = await getDocument({ data: bytes, disableFontFace: true, useSystemFonts: false }).promise;
  const texts: string[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const content = await (await doc.getPage(n)).getTextContent();
    texts.push(content.items.map((item) => ('str' in item ? item.str : '')).join('\n'));
  }
  return { text: texts.join('\n'), pages: doc.numPages };
}


describe('cover sheet', () => {
  it('says "contains errors" in large type when the checks found errors', async () => {
    const { text } = await coverText(exportJob({}, [clashPanel()]));
    expect(text).toContain('CONTAINS ERRORS');
    expect(text).toContain('The checks found 1 error: see the findings. Fix them before drilling.');
    expect(text).toContain('bores-overlap');
  });

  it('does not when there are none', async () => {
    const { text } = await coverText(exportJob());
    expect(text).not.toContain('CONTAINS ERRORS');
    expect(text).toContain('The checks found nothing to report.');
  });

  it("carries the drilling programs' caution when the pack holds programs, and not otherwise", async () => {
    const flat = (await coverText(exportJob(), true)).text.replace(/\s+/g, ' ');
    expect(flat).toContain(`• Drilling programs (G-code): ${PROGRAM_CAUTION}`);
    expect(flat).toContain('drilling programs (G-code, .nc)');
    expect((await coverText(exportJob())).text.replace(/\s+/g, ' ')).not.toContain(PROGRAM_CAUTION);
  });

  it('shows the cautions that apply word for word, and what they defer to', async () => {
    const job = exportJob({ carcasses: [{ id: 'base', name: 'Wall unit', width: 600, height: 720, depth: 300, material: 'pb18', mounting: 'wall' }] });
    const { text } = await coverText(job);
    const flat = text.replace(/\s+/g, ' ');
    for (const caution of cautionsFor(job, exportContext(job).catalog)) expect(flat).toContain(`• ${caution.text}`);
    expect(flat).toContain(CAUTION_DEFERRAL);
    expect(flat).toContain('Wall-hung and floating units');
  });

  it('lists every panel with its status, and the hardware', async () => {
    const job = exportJob();
    job.panels[2].status = 'drilled';
    const { text } = await coverText(job);
    for (const panel of job.panels) expect(text).toContain(panel.id);
    expect(text).toContain('drilled');
    expect(text).toContain('Cup hinge, full overlay, 45/9.5');
  });

  it("gives the panels' sizes in the unit of the member who asked for the pack", async () => {
    const lines = (text: string) => text.replace(/\n(?=×)|(?<=×)\n/g, ' ');
    const metric = lines((await coverText(exportJob())).text);
    expect(metric).toContain('x × y × z mm');
    expect(metric).toContain('496 × 716 × 18');
    const inches = lines((await coverText(exportJob(), false, 'in-32')).text);
    expect(inches).toContain('x × y × z in');
    // The door, 496 × 716 × 18 mm, by the international inch of 25.4 mm (NIST SP 811, published):
    // 496 / 25.4 = 19.5276 in = 624.88/32 → 625/32 = 19 17/32; 716 / 25.4 = 28.1890 in = 902.05/32 → 902/32 = 28 3/16;
    // 18 / 25.4 = 0.7087 in = 22.68/32 → 23/32.
    expect(inches).toContain('19 17/32" × 28 3/16" × 23/32"');
    expect(inches).not.toContain('496 × 716');
  });

  it('starts with the order of work and says, carcass by carcass, what the pack holds', async () => {
    const { text } = await coverText(exportJob());
    const flat = text.replace(/\s+/g, ' ');
    expect(flat.indexOf('Read me first: the order of work')).toBeLessThan(flat.indexOf('Safety: read before drilling and fitting'));
    expect(flat).toContain('1. Read the safety notes and the findings below.');
    expect(flat).toContain('Print "panel labels.pdf" and stick each label on its panel');
    // Base unit: the side, the bottom and the door, with the sheets given them here (1 + 2 + 3).
    expect(flat).toContain('Carcass: Base unit');
    expect(flat).toContain('3 panels, 6 template sheets to print on A4.');
    // Two hinge cups (Ø35) with their four fixing holes (Ø8), one cam (Ø15) and its bolt hole, the side's face B hole and two edge dowels (Ø8), one through hole (Ø7), and
    // 44 system holes with the plate, pin and runner screws in them drilled once, the runner's own and the edge pilot (Ø5).
    expect(flat).toContain('Holes by diameter: Ø35: 2, Ø15: 1, Ø8: 8, Ø7: 1, Ø5: 47.');
    expect(flat).toContain('Hardware to fetch: Cam connector, Ø15 cam: 1; Cup hinge, full overlay, 45/9.5: 2; Mounting plate, 0 mm: 2;');
    expect(flat).toContain('Handed panels: Base unit, left side: LEFT side (seen from the front); Base unit, door: hinged on the LEFT (seen from the front).');
    expect(flat).toContain('Panels in no carcass 1 panel, 4 template sheets to print on A4. Holes by diameter: Ø8: 1. Hardware to fetch: none.');
  });

  it('runs onto as many pages as a long job needs, each numbered', async () => {
    const many = Array.from({ length: 80 }, (_, i) => ({ id: `p${i}`, name: `Panel ${i}`, role: 'shelf' as const, width: 300, height: 500, thickness: 18, material: 'pb18' }));
    const { text, pages } = await coverText(exportJob({}, many));
    expect(pages).toBeGreaterThan(1);
    expect(text).toContain(`Page ${pages} of ${pages}.`);
    expect(text).toContain('p79');
  });
});

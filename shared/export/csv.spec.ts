import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { panelBores } from '../layout/panel-layout';
import { exportContext, exportJob } from '../testing/export-job';
import { hardwareList, hardwareListCsv } from './hardware-list';
import { holeScheduleCsv } from './hole-schedule';
import { jobDrilling } from './panel-drilling';

const ctx = exportContext(
  exportJob({ carcasses: [{ id: 'base', name: '=HYPERLINK("x")', width: 600, height: 720, depth: 560, material: 'pb18', mounting: 'floor' }] }, [
    { id: 'evil', name: '＋2+3', role: 'loose', width: 100, height: 100, thickness: 18, material: 'pb18', placements: [{ id: 'pin', fitting: 'shelf-pin-5', x: 50, y: 50, face: 'A', rotation: 0 }] },
  ]),
);

/** Reads CSV back with papaparse (npm registry), which drops the BOM as spreadsheet programs do. */
function read(csv: string): string[][] {
  const result = Papa.parse<string[]>(csv, { skipEmptyLines: true });
  expect(result.errors).toEqual([]);
  return result.data;
}

describe('hole schedule', () => {
  const csv = holeScheduleCsv(ctx, jobDrilling(ctx.job, ctx.catalog));
  const [header, ...rows] = read(csv);

  it('opens with a BOM so that spreadsheet programs read UTF-8', () => {
    expect(csv.charCodeAt(0)).toBe(0xfeff);
    expect(csv).toContain('\r\n');
  });

  it('has a row per bore of every panel with where, size, fitting and purpose', () => {
    expect(header).toEqual(['carcass', 'panel', 'panel name', 'bore', 'face or edge', 'x', 'y', 'z from face A', 'diameter', 'depth', 'through', 'fitting', 'purpose']);
    const total = ctx.job.panels.reduce((n, p) => n + panelBores(p, ctx.catalog, ctx.job.system).length, 0);
    expect(rows).toHaveLength(total);
    const cup = rows.find((r) => r[1] === 'door' && r[3] === 'hinge-low/cup')!;
    expect(cup.slice(4)).toEqual(['A', '21.5', '87', '', '35', '13', 'no', 'Cup hinge, full overlay, 45/9.5', 'hinge cup']);
    const pilot = rows.find((r) => r[3] === 'pilot-x1')!;
    // An edge bore enters its edge (x1 at x = width) at its position along it, z from face A.
    expect(pilot.slice(4, 11)).toEqual(['edge x1', '560', '345', '9', '5', '50', 'no']);
  });

  it('writes a name a spreadsheet would run as a formula as text, with a leading quote', () => {
    // `=HYPERLINK("x")` would be a live link; a full-width plus (U+FF0B) starts a formula in some spreadsheets too.
    expect(rows.find((r) => r[1] === 'side-l')![0]).toBe(`'=HYPERLINK("x")`);
    expect(rows.find((r) => r[1] === 'evil')![2]).toBe(`'＋2+3`);
  });
});

describe('hardware list', () => {
  const list = hardwareList(ctx);

  it('counts each fitting per carcass and in total, a placement once', () => {
    const [header, ...rows] = read(hardwareListCsv(list));
    expect(header).toEqual(['fitting', 'name', 'purpose', `'=HYPERLINK("x")`, 'no carcass', 'total']);
    expect(rows.find((r) => r[0] === 'hinge-full-overlay-45')).toEqual(['hinge-full-overlay-45', 'Cup hinge, full overlay, 45/9.5', 'hinge cup', '2', '0', '2']);
    expect(rows.find((r) => r[0] === 'shelf-pin-5')).toEqual(['shelf-pin-5', 'Shelf pin, Ø5', 'shelf pin', '1', '1', '2']);
    expect(rows.map((r) => r[2])).toEqual(['construction', 'hinge cup', 'mounting plate', 'shelf pin', 'runner']);
  });

  it('names a fitting the catalog does not know', () => {
    const job = exportJob({}, [{ id: 'odd', name: 'Odd', role: 'loose', width: 100, height: 100, thickness: 18, material: 'pb18', placements: [{ id: 'p', fitting: 'gone-fitting', x: 1, y: 1, face: 'A', rotation: 0 }] }]);
    const line = hardwareList(exportContext(job)).lines.at(-1)!;
    expect(line).toMatchObject({ fitting: 'gone-fitting', name: 'gone-fitting (not in the catalog)', total: 1 });
    expect(line.purpose).toBeUndefined();
  });
});

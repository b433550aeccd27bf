import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
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

const drilling = jobDrilling(ctx.job, ctx.catalog, []);

describe('hole schedule', () => {
  const csv = holeScheduleCsv(ctx, drilling);
  const [header, ...rows] = read(csv);

  it('opens with a BOM so that spreadsheet programs read UTF-8', () => {
    expect(csv.charCodeAt(0)).toBe(0xfeff);
    expect(csv).toContain('\r\n');
  });

  it('has a row per hole of every panel, each drilled once, with its key, where, size, fitting, purpose and the bores it drills', () => {
    expect(header).toEqual(['carcass', 'panel', 'panel name', 'hole', 'face or edge', 'x', 'y', 'z from face A', 'diameter', 'depth', 'through', 'fitting', 'purpose', 'bores']);
    expect(rows).toHaveLength(drilling.reduce((n, d) => n + d.holes.length, 0));
    const cup = rows.find((r) => r[1] === 'door' && r[3] === 'A:21.5:87:35')!;
    expect(cup.slice(4)).toEqual(['A', '21.5', '87', '', '35', '13', 'no', 'Cup hinge, full overlay, 45/9.5', 'hinge cup', 'hinge-low/cup']);
    // A plate screw in a line-bored system hole is one hole, the plate's: one row naming both bores.
    const shared = rows.filter((r) => r[1] === 'side-l' && r[5] === '37' && r[6] === '73');
    expect(shared).toHaveLength(1);
    expect(shared[0][12]).toBe('mounting plate');
    expect(shared[0][13].split(' ').sort()).toEqual(['plate-low/hole-1', 'r37-2']);
    const pilot = rows.find((r) => r[13] === 'pilot-x1')!;
    // An edge bore enters its edge (x1 at x = width) at its position along it, z from face A.
    expect(pilot.slice(4, 11)).toEqual(['edge x1', '560', '345', '9', '5', '50', 'no']);
  });

  it('adds the position in inches after the other columns for someone who reads inches, the mm columns unchanged', () => {
    const [inchHeader, ...inchRows] = read(holeScheduleCsv({ ...ctx, unit: 'in-32' }, drilling));
    expect(inchHeader).toEqual([...header, 'x in inches', 'y in inches', 'z from face A in inches']);
    expect(inchRows.map((r) => r.slice(0, header.length))).toEqual(rows);
    // The international inch is 25.4 mm (NIST SP 811, published). 21.5 mm = 0.8465 in = 27.09/32 → 27/32;
    // 87 mm = 3.4252 in = 109.6/32 → 110/32 = 3 7/16.
    expect(inchRows.find((r) => r[1] === 'door' && r[3] === 'A:21.5:87:35')!.slice(header.length)).toEqual(['27/32"', '3 7/16"', '']);
    // The edge bore: x 560 mm = 22.047 in = 705.51/32 → 706/32 = 22 1/16; y 345 mm = 13.583 in = 434.6/32 → 435/32 = 13 19/32; z 9 mm = 0.3543 in = 11.34/32 → 11/32.
    expect(inchRows.find((r) => r[13] === 'pilot-x1')!.slice(header.length)).toEqual(['22 1/16"', '13 19/32"', '11/32"']);
  });

  it('writes a name a spreadsheet would run as a formula as text, with a leading quote', () => {
    // `=HYPERLINK("x")` would be a live link; a full-width plus (U+FF0B) starts a formula in some spreadsheets too.
    expect(rows.find((r) => r[1] === 'side-l')![0]).toBe(`'=HYPERLINK("x")`);
    expect(rows.find((r) => r[1] === 'evil')![2]).toBe(`'＋2+3`);
  });
});

describe('hardware list', () => {
  const list = hardwareList(ctx, drilling);

  it('counts each fitting per carcass and in total, a placement once, with the holes drilled for it apart', () => {
    const [header, ...rows] = read(hardwareListCsv(list));
    expect(header).toEqual(['fitting', 'name', 'purpose', `'=HYPERLINK("x")`, 'no carcass', 'total to buy', 'counted as', 'holes drilled', 'note']);
    // A cup hinge drills its cup and two fixing holes: 2 hinges, 6 holes.
    expect(rows.find((r) => r[0] === 'hinge-full-overlay-45')).toEqual(['hinge-full-overlay-45', 'Cup hinge, full overlay, 45/9.5', 'hinge cup', '2', '0', '2', 'one per placement', '6', '6 holes drilled']);
    expect(rows.map((r) => r[2])).toEqual(['construction', 'hinge cup', 'mounting plate', 'shelf pin', 'runner']);
  });

  it('buys no shelf pins by the hole: this job has no adjustable shelf, and says so', () => {
    const [, ...rows] = read(hardwareListCsv(list));
    expect(rows.find((r) => r[0] === 'shelf-pin-5')).toEqual(['shelf-pin-5', 'Shelf pin, Ø5', 'shelf pin', '0', '0', '0', '4 per adjustable shelf', '2', '2 holes drilled for pins; 0 pins for 0 shelves']);
  });

  it('names a fitting the catalog does not know', () => {
    const job = exportJob({}, [{ id: 'odd', name: 'Odd', role: 'loose', width: 100, height: 100, thickness: 18, material: 'pb18', placements: [{ id: 'p', fitting: 'gone-fitting', x: 1, y: 1, face: 'A', rotation: 0 }] }]);
    const odd = exportContext(job);
    const line = hardwareList(odd, jobDrilling(job, odd.catalog, [])).lines.at(-1)!;
    expect(line).toMatchObject({ fitting: 'gone-fitting', name: 'gone-fitting (not in the catalog)', total: 1 });
    expect(line.purpose).toBeUndefined();
  });
});

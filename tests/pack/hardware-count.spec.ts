// The hardware list of the Larch Lane kitchen's wall unit against a count made by hand from its job document
// (the planner's placements, panel by panel), as a shop would order the fittings.
import { describe, expect, it } from 'vitest';
import { DEMO_JOBS } from '../../server/demo/seed-demo';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { hardwareList, hardwareListCsv, PINS_PER_SHELF } from '../../shared/export/hardware-list';
import { jobDrilling } from '../../shared/export/panel-drilling';
import { parseJobDocument } from '../../shared/model/parse-job';
import Papa from 'papaparse';

const parsed = parseJobDocument(DEMO_JOBS[0]);
if (!parsed.ok) throw new Error(parsed.errors.join('; '));
const job = parsed.value;
const ctx = { job, catalog: builtinCatalog(), date: new Date('2026-03-14T09:30:00Z'), generator: { name: 'Borewright', version: '0.0.0-test' } };
const list = hardwareList(ctx, jobDrilling(job, ctx.catalog, []));
const wall = list.carcasses.indexOf('Wall unit');
const line = (fitting: string) => list.lines.find((l) => l.fitting === fitting)!;

describe('the Larch Lane kitchen’s hardware list', () => {
  it('is the Larch Lane kitchen with its wall unit', () => {
    expect(job.name).toBe('Larch Lane kitchen');
    expect(wall).toBeGreaterThanOrEqual(0);
  });

  it('buys shelf pins four per adjustable shelf, not one per hole (trade-reference §8a, common practice)', () => {
    // Counted by hand: the wall unit has two adjustable shelves (wall-unit-shelf-1 and -2, no fitting of their
    // own), so 2 × 4 = 8 pins; each side has pin-front-1…15 and pin-rear-1…15, 30 holes, 60 on both sides.
    expect(PINS_PER_SHELF).toBe(4);
    const pins = line('shelf-pin-5');
    expect(pins.perCarcass[wall]).toBe(8);
    expect(pins.holesPerCarcass[wall]).toBe(60);
    expect(pins.countedAs).toBe('4 per adjustable shelf');
    expect(pins.note).toBe('60 holes drilled for pins; 8 pins for 2 shelves');
    // Neither base unit has shelves, so the job buys 8 pins in all.
    expect(pins.total).toBe(8);
  });

  it('counts the wall unit’s other fittings one per placement, as counted by hand', () => {
    // By hand, from the wall unit's panels: 2 doors × 2 hinges = 4 hinges, each a cup and two fixing holes (12);
    // 2 sides × 2 mounting plates = 4 plates, two screw holes each (8); 2 sides × 6 cam bolts = 12 (12 holes);
    // top and bottom × 6 cams = 12, each a cam hole and an edge hole for its bolt (24).
    const expected: [string, number, number][] = [
      ['hinge-full-overlay-45', 4, 12],
      ['plate-2', 4, 8],
      ['cam-bolt', 12, 12],
      ['cam-15', 12, 24],
    ];
    for (const [fitting, buy, holes] of expected) {
      expect([line(fitting).perCarcass[wall], line(fitting).holesPerCarcass[wall]], fitting).toEqual([buy, holes]);
    }
    const wallLines = list.lines.filter((l) => l.perCarcass[wall] > 0).map((l) => l.fitting);
    expect(wallLines.sort()).toEqual(['cam-15', 'cam-bolt', 'hinge-full-overlay-45', 'plate-2', 'shelf-pin-5']);
  });

  it('writes the same in its CSV, read back with papaparse', () => {
    const { data } = Papa.parse<Record<string, string>>(hardwareListCsv(list), { header: true, skipEmptyLines: true });
    expect(data.find((r) => r.fitting === 'shelf-pin-5')).toMatchObject({ 'Wall unit': '8', 'total to buy': '8', 'holes drilled': '60' });
  });
});

import { describe, expect, it } from 'vitest';
import { makeJob, makePanel } from '../../shared/testing/make-job';
import { runCli, tempFiles } from './spawn-cli';

const clean = makeJob([makePanel('left', { placements: [{ id: 'pin', fitting: 'shelf-pin-5', x: 37, y: 105, face: 'A' }] })]);
const broken = makeJob([
  makePanel('left', { bores: [{ id: 'a', x: 100, y: 100, face: 'A', diameter: 5, depth: 12 }, { id: 'b', x: 104, y: 100, face: 'A', diameter: 5, depth: 12 }] }),
  makePanel('door', { role: 'door', width: 496, height: 716, placements: [{ id: 'h1', fitting: 'hinge-full-overlay-45', x: 21.5, y: 87, face: 'A' }] }),
  makePanel('shelf', { role: 'shelf', width: 300, height: 564 }),
]);
const pin = (id: string, y: number) => ({ id, fitting: 'shelf-pin-5', x: 37, y, face: 'A' as const });
// A plate anchored at 105 has its screw holes at 89 and 121 (9 + 32k in an 18 mm carcass).
const plate = { id: 'plate', fitting: 'plate-0', x: 37, y: 105, face: 'A' as const };
const sharedHoles = (placements: object[]) => JSON.stringify(makeJob([makePanel('left', { placements: placements as never })]));
const files = tempFiles({
  'pin-in-plate.json': sharedHoles([plate, pin('pin', 121)]),
  'two-pins.json': sharedHoles([pin('a', 329), pin('b', 329)]),
  'pitch-away.json': sharedHoles([pin('a', 329), pin('b', 361)]),
  'clean.json': JSON.stringify(clean),
  'broken.json': JSON.stringify(broken),
  'garbled.json': '{ "format": "borewright.job/1", ',
  'invalid.json': JSON.stringify({ ...clean, panels: [{ ...clean.panels[0], width: -3, bores: [{ id: 'x', x: 5, y: 5, face: 'C', diameter: 5, depth: 5 }] }] }),
  'shop.json': JSON.stringify({ fittings: [{ id: 'plate-0', name: 'Our plate', purpose: 'shelf-pin', onSystemRow: false, bores: [{ id: 'p', kind: 'face', x: 0, y: 0, diameter: 5, depth: 10, source: 'ours' }] }] }),
});

describe('borewright check', () => {
  it('says a clean job is clear and exits 0', () => {
    const { code, stdout } = runCli('check', files['clean.json']);
    expect(code).toBe(0);
    expect(stdout).toContain('Test job: 1 panel checked, 0 errors, 0 warnings, 0 notes.');
    expect(stdout).toContain('No findings');
  });

  it('prints findings grouped by panel and exits 1 on an error', () => {
    const { code, stdout } = runCli('check', files['broken.json']);
    expect(code).toBe(1);
    const left = stdout.indexOf('Panel left (left, side)');
    const door = stdout.indexOf('Panel door (door, door)');
    expect(left).toBeGreaterThan(0);
    expect(door).toBeGreaterThan(left);
    expect(stdout.slice(left, door)).toMatch(/error\s+bores-overlap\s+Bore a/);
    expect(stdout.slice(door)).toMatch(/error\s+hinge-count\s+Door door .* has 1 hinge; it needs 2\./);
    expect(stdout).not.toContain('Panel shelf');
  });

  it('prints the same findings as JSON with --json', () => {
    const { code, stdout } = runCli('check', files['broken.json'], '--json');
    expect(code).toBe(1);
    const report = JSON.parse(stdout);
    expect(report).toMatchObject({ job: 'Test job', panels: 3, errors: 2, warnings: 0 });
    expect(report.findings.map((f: { code: string; panel: string }) => [f.panel, f.code])).toEqual([
      ['left', 'bores-overlap'],
      ['door', 'hinge-count'],
    ]);
  });

  it('exits 2 with a clear message on a missing, garbled or invalid file', () => {
    const missing = runCli('check', `${files['clean.json']}.gone`);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('cannot be read: no such file');
    const garbled = runCli('check', files['garbled.json']);
    expect(garbled.code).toBe(2);
    expect(garbled.stderr).toContain('is not valid JSON');
    const invalid = runCli('check', files['invalid.json']);
    expect(invalid.code).toBe(2);
    expect(invalid.stderr).toContain('  panels[0].width: must be greater than 0');
    expect(invalid.stderr).toContain('  panels[0].bores[0].face: Invalid option');
    expect(runCli('check').code).toBe(2);
  });

  it('refuses shop fittings that would replace a built-in one', () => {
    const { code, stderr } = runCli('check', files['clean.json'], '--catalog', files['shop.json']);
    expect(code).toBe(2);
    expect(stderr).toContain('shop.json: fittings[0].id: "plate-0" is a built-in fitting');
  });

  it('reports hole-shared for a pin in a plate\'s screw hole and for two pins in one hole, and stays clean a pitch away', () => {
    // One hole carries one fitting (trade-reference §8a, common practice).
    for (const file of ['pin-in-plate.json', 'two-pins.json']) {
      const { code, stdout } = runCli('check', files[file], '--json');
      expect(code, file).toBe(1);
      const finding = JSON.parse(stdout).findings.find((f: { code: string }) => f.code === 'hole-shared');
      expect(finding, file).toMatchObject({ severity: 'error' });
      expect(finding.fixes.length, file).toBeGreaterThan(0);
    }
    const away = runCli('check', files['pitch-away.json'], '--json');
    expect(away.code).toBe(0);
    expect(JSON.parse(away.stdout).findings).toEqual([]);
  });

  it('words the findings in --units, the system pitch in mm with its inches, and refuses a unit it does not know', () => {
    const inches = runCli('check', files['broken.json'], '--units', 'in-32');
    expect(inches.code).toBe(1);
    // The international inch is 25.4 mm (NIST SP 811, published): the 1 mm overlap is 1.26/32 → 1/32; the 3 mm web
    // 3.78/32 → 1/8; the fix's x 101 = 127.2/32 → 3 31/32 and y 73 = 91.97/32 → 2 7/8; the door's 716 = 902.05/32 → 28 3/16.
    expect(inches.stdout).toContain('overlap by 1/32"; keep at least 1/8".');
    expect(inches.stdout).toContain('Fix: Move bore b to x 3 31/32", y 2 7/8", the nearest clear system hole.');
    expect(inches.stdout).toContain('Door door (28 3/16" along its hinge edge, 4.2 kg) has 1 hinge; it needs 2.');
    expect(runCli('check', files['broken.json']).stdout).toContain('Door door (716 mm along its hinge edge, 4.2 kg)');
    // The pitch is the system's own figure: 32 mm = 80.63/64 → 1 17/64.
    expect(runCli('check', files['pin-in-plate.json'], '--units', 'in-32').stdout).toContain('32 mm (1 17/64")');
    const unknown = runCli('check', files['clean.json'], '--units', 'inch');
    expect(unknown.code).toBe(2);
    expect(unknown.stdout).toBe('');
    expect(unknown.stderr).toContain('borewright check: --units must be one of mm, in, in-32, in-64, not "inch".');
    expect(runCli('check', '--help').stdout).toContain('--units mm|in|in-32|in-64');
  });
});

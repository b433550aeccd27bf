import { describe, expect, it } from 'vitest';
import { makeJob, makePanel } from '../../shared/testing/make-job';
import { runCli, tempFiles } from './spawn-cli';

// The worked example of shared/swap/check-swap.spec.ts (trade-reference §2, common practice): on a door with
// 45/9.5 hinges at cup centre (21.5, 87), the 48/6 screw holes at (27.5, 63) and (27.5, 111) lie 3.81 mm from
// the old ones at (31, 64.5) and (31, 109.5), so two Ø8 holes overlap by 4.2 mm.
const door = (status: 'planned' | 'drilled') =>
  makePanel('door', {
    role: 'door',
    width: 496,
    height: 716,
    status,
    placements: [
      { id: 'hinge-1', fitting: 'hinge-full-overlay-45', x: 21.5, y: 87, face: 'A' },
      { id: 'hinge-2', fitting: 'hinge-full-overlay-45', x: 21.5, y: 629, face: 'A' },
    ],
  });
// Runners: front screw on the 37 mm row, rear screws 32·k behind (trade-reference §6, common practice).
const side = makePanel('left', { status: 'drilled', placements: [{ id: 'runner-1', fitting: 'runner-500', x: 37, y: 105, face: 'A' }] });
const files = tempFiles({
  'drilled.json': JSON.stringify(makeJob([door('drilled'), side])),
  'planned.json': JSON.stringify(makeJob([door('planned'), side])),
  'shop.json': JSON.stringify({
    fittings: [{ id: 'runner-450', name: 'Our runner, 450 mm', purpose: 'runner', onSystemRow: true, runner: { length: 450, source: 'ours' }, bores: [{ id: 'front', kind: 'face', x: 0, y: 0, diameter: 5, depth: 'system', source: 'ours' }, { id: 'rear', kind: 'face', x: 352, y: 0, diameter: 5, depth: 'system', source: 'ours' }] }],
  }),
});

describe('borewright swap', () => {
  it('prints the report and exits 1 when a drilled panel must be remade', () => {
    const { code, stdout } = runCli('swap', files['drilled.json'], '--from', 'hinge-full-overlay-45', '--to', 'hinge-full-overlay-48');
    expect(code).toBe(1);
    expect(stdout).toContain('Replacing Cup hinge, full overlay, 45/9.5 (hinge-full-overlay-45) by Cup hinge, full overlay, 48/6 (hinge-full-overlay-48)');
    expect(stdout).toContain('Drilled panels: 0 fine, 0 to drill, 1 to remake. Not drilled yet: 0');
    expect(stdout).toContain('Panel door (door, door), drilled: to remake: 4 new holes cannot be drilled for an existing one in the way');
    expect(stdout).toMatch(/reused\s+hinge-1\/cup Ø35 × 13, face A x 21\.5 y 87/);
    expect(stdout).toMatch(/clash\s+hinge-1\/fix-1 Ø8 × 11, face A x 27\.5 y 63\n\s+Bore hinge-1\/fix-1 \(Ø8 × 11\) and old bore hinge-1\/fix-1 \(Ø8 × 11\) on face A overlap by 4\.2 mm/);
    expect(stdout).toMatch(/unused\s+hinge-1\/fix-1 Ø8 × 11, face A x 31 y 64\.5\n/);
  });

  it('exits 0 when the door is not drilled yet: it simply gets the new plan', () => {
    const { code, stdout } = runCli('swap', files['planned.json'], '--from', 'hinge-full-overlay-45', '--to', 'hinge-full-overlay-48');
    expect(code).toBe(0);
    expect(stdout).toContain('Panel door (door, door), planned: not drilled yet: it simply gets the new plan (drilled, it would be to remake)');
  });

  it("prints the report as JSON with --json, and takes a shop's fitting with --catalog", () => {
    const { code, stdout } = runCli('swap', files['drilled.json'], '--from', 'runner-500', '--to', 'runner-450', '--catalog', files['shop.json'], '--json');
    expect(code).toBe(0);
    const report = JSON.parse(stdout);
    expect(report).toMatchObject({ job: 'Test job', to: { id: 'runner-450', name: 'Our runner, 450 mm' }, summary: { toDrill: 1, reused: 1, new: 1, unused: 2 } });
    expect(report.panels[0].new.map((n: { bore: { x: number } }) => n.bore.x)).toEqual([37 + 352]);
  });

  it('exits 2 with the reason for a replacement of another kind, an unknown fitting or a missing option', () => {
    const kind = runCli('swap', files['drilled.json'], '--from', 'hinge-full-overlay-45', '--to', 'plate-0');
    expect(kind.code).toBe(2);
    expect(kind.stderr).toContain('to: "plate-0" is a mounting plate and "hinge-full-overlay-45" a cup hinge; a swap replaces a fitting by one of the same kind.');
    const unknown = runCli('swap', files['drilled.json'], '--from', 'hinge-99', '--to', 'hinge-full-overlay-48');
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toContain('from: "hinge-99": no fitting of the catalog has this id.');
    const missing = runCli('swap', files['drilled.json'], '--from', 'runner-500');
    expect(missing.code).toBe(2);
    expect(missing.stderr).toContain('name the fitting that replaces it with --to');
    const gone = runCli('swap', `${files['drilled.json']}.gone`, '--from', 'runner-500', '--to', 'runner-400');
    expect(gone.code).toBe(2);
    expect(gone.stderr).toContain('cannot be read: no such file');
  });
});

import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel, type PanelInput } from '../testing/make-job';

// A door hangs 2 mm up its side (hang.dy = 2): a cup at door height c meets a plate at side height c + 2
// (design.md §3). Plates at 89 and 633 put their holes on the 9 + 32k system holes of an 18 mm carcass;
// cups 87 mm from the door's ends sit within 76 to 100 mm (trade-reference §2, common practice).
const side = (plates: number[]): PanelInput =>
  makePanel('left', { placements: plates.map((y, i) => ({ id: `plate-${i + 1}`, fitting: 'plate-0', x: 37, y, face: 'A' })) });
const door = (cups: number[], dy = 2): PanelInput =>
  makePanel('door', {
    role: 'door',
    width: 496,
    height: 716,
    hang: { on: ['left'], dy },
    placements: cups.map((y, i) => ({ id: `hinge-${i + 1}`, fitting: 'hinge-full-overlay-45', x: 21.5, y, face: 'A' })),
  });
const unpaired = (...panels: PanelInput[]) => withCode(checkPanels(panels), 'hinge-unpaired');

describe('hinge-unpaired', () => {
  it('reports a cup with no plate, and the plate with no cup', () => {
    const findings = unpaired(side([89]), door([87, 631]));
    expect(findings.map((f) => [f.panel, f.placements])).toEqual([['door', ['hinge-2']]]);
    expect(findings[0].message).toBe(
      'Hinge hinge-2 at 631 mm on door meets no mounting plate: with the door 2 mm up on left, its plate belongs at 633 mm, the nearest is at 89 mm.',
    );
    const [lonely] = unpaired(side([89, 633]), door([87]));
    expect(lonely).toMatchObject({ panel: 'left', placements: ['plate-2'], severity: 'error' });
    // Moving the plate onto the other hinge's plate would put two plates in one place: that fix is not offered.
    // Moving the door's hinge down to meet it would leave the first plate without a cup: not offered either.
    expect(lonely.fixes).toEqual([]);
    expect(lonely.advice).toBe('No automatic fix was found: add the hinge it carries, or remove the plate.');
  });

  it('passes the clean twin: each cup faces its plate', () => {
    expect(unpaired(side([89, 633]), door([87, 631]))).toEqual([]);
  });

  it('accepts 0.5 mm and raises a door moved by 1 mm, on both the door and the side', () => {
    expect(unpaired(side([89, 633]), door([87, 631], 2.5))).toEqual([]);
    const moved = unpaired(side([89, 633]), door([87, 631], 3));
    expect(moved.map((f) => `${f.panel} ${f.placements.join()}`).sort()).toEqual([
      'door hinge-1',
      'door hinge-2',
      'left plate-1',
      'left plate-2',
    ]);
    // The door 1 mm too high: moving hinge-1 down 1 mm pairs it with its plate again; moving the plate up 1 mm
    // would take it off the system holes (an off-grid warning), so that fix is not offered.
    const fixes = moved.find((f) => f.placements[0] === 'hinge-1')?.fixes;
    expect(fixes).toEqual([
      { message: 'Move hinge hinge-1 on door to y 86.', edits: [{ kind: 'move-placement', panel: 'door', placement: 'hinge-1', x: 21.5, y: 86 }] },
    ]);
  });

  it('reports a plate on a panel that no door or flap hangs on', () => {
    const [finding] = unpaired(side([89]));
    expect(finding.message).toBe('Mounting plate plate-1 at 89 mm on left has no hinge: no door or flap hangs on this panel.');
  });
});

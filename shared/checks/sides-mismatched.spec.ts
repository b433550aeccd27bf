import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel, type PanelInput } from '../testing/make-job';

const carcasses = [{ id: 'c', name: 'Wall unit', width: 600, height: 720, depth: 560, material: 'pb18' }];
const pins = (ys: number[]) => ys.flatMap((y, i) => [37, 517].map((x) => ({ id: `pin-${i}-${x}`, fitting: 'shelf-pin-5', x, y, face: 'A' as const })));
const side = (id: string, fields: Partial<PanelInput> = {}) => makePanel(id, { carcass: 'c', ...fields });
const mismatched = (...panels: PanelInput[]) => withCode(checkPanels(panels, { carcasses }), 'sides-mismatched');
const door = (on: string) =>
  makePanel(`door-${on}`, {
    role: 'door',
    carcass: 'c',
    width: 296,
    height: 716,
    hang: { on: [on], dy: 2 },
    placements: [87, 631].map((y, i) => ({ id: `hinge-${i}`, fitting: 'hinge-full-overlay-45', x: 21.5, y, face: 'A' as const })),
  });
const plates = [89, 633].map((y, i) => ({ id: `plate-${i}`, fitting: 'plate-0', x: 37, y, face: 'A' as const }));

// A carcass's two sides are mirror images: shelf pins, plates and runners at the same heights; a shelf on uneven
// pins tilts (trade-reference §8a, common practice).
describe('sides-mismatched', () => {
  it('warns when the right side carries its shelf pins one pitch higher than the left, naming the heights', () => {
    const findings = mismatched(side('left', { placements: pins([329]) }), side('right', { placements: pins([361]) }));
    expect(findings.map((f) => f.panel)).toEqual(['left', 'right']);
    expect(findings[0].severity).toBe('warning');
    expect(findings[0].message).toBe('The sides of carcass c are not mirror images: shelf pins at 329 mm on left but at 361 mm on right.');
    // Either side can be the right one: each mirror is offered, each checked to leave the carcass clean.
    expect(findings[0].fixes.map((f) => f.edits)).toEqual([
      [{ kind: 'copy-side', from: 'left', to: 'right', purposes: ['shelf-pin'] }],
      [{ kind: 'copy-side', from: 'right', to: 'left', purposes: ['shelf-pin'] }],
    ]);
  });

  it('passes the clean twin: pins at the same heights on both sides', () => {
    expect(mismatched(side('left', { placements: pins([329]) }), side('right', { placements: pins([329]) }))).toEqual([]);
  });

  it('leaves a single door\'s plates alone, and compares them where doors hang on both sides', () => {
    expect(mismatched(side('left', { placements: plates }), side('right'), door('left'))).toEqual([]);
    const pair = mismatched(side('left', { placements: plates }), side('right'), door('left'), door('right'));
    // The right door's cups have no plates either: mirroring the left side's plates fixes both.
    expect(pair.find((f) => f.panel === 'right')?.fixes.map((f) => f.edits[0])).toEqual([{ kind: 'copy-side', from: 'left', to: 'right', purposes: ['mounting-plate'] }]);
  });
});

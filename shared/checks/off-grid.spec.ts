import { describe, expect, it } from 'vitest';
import { TEST_MATERIALS, makePanel } from '../testing/make-job';
import { checkPanels, withCode } from '../testing/check-panels';

const offGrid = (placements: object[], fields: object = {}, job: object = {}) =>
  withCode(checkPanels([makePanel('side', { placements: placements as never, ...fields })], job), 'off-grid');
const plate = (x: number, y: number) => ({ id: 'pl', fitting: 'plate-0', x, y, face: 'A' });

// Rows 37 mm from the front edge at a 32 mm pitch (Wikipedia, "32 mm cabinetmaking system", published), holes
// starting at half the adjoining board (WOODWEB Knowledge Base, "Panel and Door Balancing with 32mm Systems", published).
describe('off-grid', () => {
  it('reports a mounting plate whose holes miss the system holes, and where to move it', () => {
    // An 18 mm board puts the holes at 9 + 32k; a plate centred at 105 has its holes at 89 and 121.
    const [finding] = offGrid([plate(37, 105)]);
    expect(finding).toMatchObject({ severity: 'warning', placements: ['pl'], bores: ['pl/hole-1', 'pl/hole-2'] });
    expect(finding.fix).toEqual({ message: 'Move it to x 37, y 121 so its holes fall on system holes.', at: { x: 37, y: 121 } });
  });

  it('passes the clean twin on the grid', () => {
    expect(offGrid([plate(37, 121)])).toEqual([]);
  });

  it('starts the rows at half the carcass board, not the side\'s own', () => {
    const materials = [...TEST_MATERIALS, { id: 'pb16', name: 'Particleboard 16', thickness: 16, density: 650, modulus: 1600 }];
    const carcasses = [{ id: 'c', name: 'Box', width: 600, height: 720, depth: 560, material: 'pb16' }];
    expect(offGrid([plate(37, 120)], { carcass: 'c' }, { materials, carcasses })).toEqual([]);
    expect(offGrid([plate(37, 120)])).toHaveLength(1);
  });

  it('reports a shelf pin off the row and never a hinge, which has no row', () => {
    expect(offGrid([{ id: 's', fitting: 'shelf-pin-5', x: 40, y: 105, face: 'A' }])).toHaveLength(1);
    expect(offGrid([{ id: 'h', fitting: 'hinge-full-overlay-45', x: 21.5, y: 100, face: 'A' }], { role: 'door' })).toEqual([]);
  });
});

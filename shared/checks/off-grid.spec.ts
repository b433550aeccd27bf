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
    expect(finding.fixes).toEqual([
      {
        message: 'Move placement pl (Mounting plate, 0 mm) to x 37, y 121 so its holes fall on system holes.',
        edits: [{ kind: 'move-placement', panel: 'side', placement: 'pl', x: 37, y: 121 }],
      },
    ]);
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

  it('knows an inset door\'s plates sit on a row of their own, 37 mm plus the door\'s thickness, and still warns 1 mm off it', () => {
    // Mounting plates for inset doors go on 37 mm + the door's thickness (trade-reference §2, Popular Woodworking
    // no. 155, 2006, published): 37 + 18 = 55 for an 18 mm door.
    const door = makePanel('door', {
      role: 'door',
      width: 496,
      height: 682,
      hang: { on: ['side'], dy: 19 },
      placements: [70, 614].map((y, i) => ({ id: `h${i}`, fitting: 'hinge-inset-45', x: 21.5, y, face: 'A' as const })),
    });
    const inset = (x: number) =>
      withCode(checkPanels([makePanel('side', { placements: [89, 633].map((y, i) => ({ id: `pl${i}`, fitting: 'plate-0', x, y, face: 'A' as const })) }), door]), 'off-grid');
    expect(inset(55)).toEqual([]);
    expect(inset(56)).toHaveLength(2);
    // Without the inset door the same plates are off the grid.
    expect(offGrid([plate(55, 121)])).toHaveLength(1);
  });

  it('lets a plate on a top, which is not line-bored, follow its hinge in height', () => {
    expect(offGrid([plate(37, 100)], { role: 'top' })).toEqual([]);
    expect(offGrid([plate(38, 100)], { role: 'top' })).toHaveLength(1);
  });
});

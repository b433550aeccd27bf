import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const lift = (fitting: string) => [{ id: 'lift', fitting, x: 37, y: 617, face: 'A' as const }];
/** A flap 400 mm from hinge edge to free edge (its width in its frame) and 1000 mm long, of 700 kg/m³ MDF: 5.04 kg. */
const flap = (on: string[], fields: object = {}) =>
  makePanel('flap', { role: 'flap', width: 400, height: 1000, material: 'mdf18', hang: { on, dy: 0 }, ...fields });

// PF = flap height × (flap mass + 2 × handle mass) (trade-reference §3, common practice).
describe('lift-out-of-range', () => {
  it('reports a light mechanism under a flap of PF 2016, and names one that fits', () => {
    const [finding] = withCode(checkPanels([makePanel('side', { placements: lift('lift-light') }), flap(['side'])]), 'lift-out-of-range');
    expect(finding).toMatchObject({ severity: 'error', panel: 'side', placements: ['lift'] });
    expect(finding.message).toBe('Lift mechanism lift covers power factors 500 to 1300, but flap flap asks for 2016: it is too weak: the flap can drop.');
    expect(finding.fix?.message).toBe('Use lift-medium instead.');
  });

  it('passes the clean twin with a medium mechanism', () => {
    expect(withCode(checkPanels([makePanel('side', { placements: lift('lift-medium') }), flap(['side'])]), 'lift-out-of-range')).toEqual([]);
  });

  it('shares the power factor between a mechanism on each side, handle included', () => {
    const sides = [makePanel('left', { placements: lift('lift-light') }), makePanel('right', { placements: lift('lift-light') })];
    expect(withCode(checkPanels([...sides, flap(['left', 'right'])]), 'lift-out-of-range')).toEqual([]);
    const heavy = withCode(checkPanels([...sides, flap(['left', 'right'], { handleMass: 1.5 })]), 'lift-out-of-range');
    expect(heavy.map((f) => f.panel)).toEqual(['left', 'right']);
    expect(heavy[0].message).toContain('asks for 3216 shared by 2 mechanisms, 1608 each');
  });

  it('warns about a mechanism on a panel no flap hangs on', () => {
    const [finding] = withCode(checkPanels([makePanel('side', { placements: lift('lift-light') })]), 'lift-out-of-range');
    expect(finding).toMatchObject({ severity: 'warning' });
  });
});

import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const hinge = (id: string, y: number) => ({ id, fitting: 'hinge-full-overlay-45', x: 21.5, y, face: 'A' });
const count = (fields: object) => withCode(checkPanels([makePanel('door', { role: 'door', ...fields })]), 'hinge-count');

// Hinges per door: to 900 mm and 6 kg: 2; to 1600 mm and 12 kg: 3; beyond 2400 mm or 22 kg the rule ends;
// top-to-bottom distance should exceed the door width (trade-reference §2, common practice).
describe('hinge-count', () => {
  it('reports a 1000 mm door with two hinges: it needs three', () => {
    const [finding] = count({ width: 500, height: 1000, placements: [hinge('h1', 100), hinge('h2', 900)] });
    expect(finding).toMatchObject({ severity: 'error', placements: ['h1', 'h2'] });
    expect(finding.message).toBe('Door door (1000 mm along its hinge edge, 5.9 kg) has 2 hinges; it needs 3.');
  });

  it('passes the clean twin with three hinges spread over more than its width', () => {
    expect(count({ width: 500, height: 1000, placements: [hinge('h1', 100), hinge('h2', 500), hinge('h3', 900)] })).toEqual([]);
  });

  it('counts the handle in the mass', () => {
    const twoHinges = { width: 500, height: 800, placements: [hinge('h1', 100), hinge('h2', 700)] };
    expect(count(twoHinges)).toEqual([]);
    expect(count({ ...twoHinges, handleMass: 2 })[0].message).toContain('it needs 3');
  });

  it('warns when the door is beyond the rule or its hinges sit too close together', () => {
    expect(count({ width: 600, height: 2500, placements: [] })[0]).toMatchObject({ severity: 'warning' });
    const squat = count({ width: 600, height: 700, placements: [hinge('h1', 100), hinge('h2', 600)] });
    expect(squat[0].message).toContain('are 500 mm apart, no more than its 600 mm width');
  });
});

import { describe, expect, it } from 'vitest';
import { checkPanels, withCode } from '../testing/check-panels';
import { makePanel } from '../testing/make-job';

const plate = (id: string, y: number, face: 'A' | 'B' = 'A') => ({ id, fitting: 'plate-0', x: 37, y, face });
const overlap = (placements: object[]) => withCode(checkPanels([makePanel('side', { placements: placements as never })]), 'keepouts-overlap');

describe('keepouts-overlap', () => {
  it('reports two mounting plates one pitch apart, whose bodies need the same space', () => {
    const [finding] = overlap([plate('p2', 137), plate('p1', 105)]);
    expect(finding).toMatchObject({ placements: ['p1', 'p2'], bores: [] });
    expect(finding.message).toBe(
      'The bodies of placement p1 (Mounting plate, 0 mm) and placement p2 (Mounting plate, 0 mm) on face A overlap by 18 mm × 18 mm.',
    );
  });

  it('passes the clean twins: two pitches apart, or on opposite faces', () => {
    expect(overlap([plate('p1', 105), plate('p2', 169)])).toEqual([]);
    expect(overlap([plate('p1', 105), plate('p2', 137, 'B')])).toEqual([]);
  });
});

import { describe, expect, it } from 'vitest';
import type { PanelBore } from '../layout/bore';
import { panelHoles } from './panel-holes';

const face = (id: string, x: number, y: number, fields: Partial<PanelBore> = {}): PanelBore =>
  ({ kind: 'face', id, x, y, face: 'A', diameter: 5, depth: 13, through: false, purpose: 'loose', ...fields }) as PanelBore;

describe('panelHoles', () => {
  it('drills a plate screw in a line-bored system hole once, as the plate’s, as deep as the deeper (trade-reference §8a, common practice: the system’s purpose)', () => {
    const holes = panelHoles([face('row-2', 37, 73, { depth: 12 }), face('plate/hole-1', 37.004, 73, { purpose: 'mounting-plate', placement: 'plate' })]);
    expect(holes).toHaveLength(1);
    expect(holes[0]).toMatchObject({ key: 'A:37:73:5', purpose: 'mounting-plate', placement: 'plate', depth: 13, bores: ['row-2', 'plate/hole-1'] });
  });

  it('keeps holes apart that are not one: another face, another bit, a centre more than 0.01 mm away', () => {
    const holes = panelHoles([face('a', 37, 73), face('b', 37, 73, { face: 'B' }), face('c', 37, 73, { diameter: 8 }), face('d', 37.02, 73)]);
    expect(holes.map((h) => h.key)).toEqual(['A:37:73:5', 'B:37:73:5', 'A:37:73:8', 'A:37.02:73:5']);
  });

  it('finds one hole across the 0.01 mm buckets it keeps', () => {
    expect(panelHoles([face('a', 36.9951, 73), face('b', 37.0049, 73)])).toHaveLength(1);
  });

  it('keeps edge holes as they are, naming a second alike apart', () => {
    const edge = (id: string): PanelBore => ({ kind: 'edge', id, edge: 'y0', at: 60, z: 9, diameter: 8, depth: 21, purpose: 'construction' });
    expect(panelHoles([edge('a'), edge('b')]).map((h) => h.key)).toEqual(['y0:60:9:8', 'y0:60:9:8#2']);
  });
});

import { describe, expect, it } from 'vitest';
import { carcassOrder } from './panel-order';

describe('carcassOrder', () => {
  it('groups panels carcass by carcass in the job’s order, keeping their own order, loose ones last', () => {
    const carcasses = [{ id: 'sink' }, { id: 'wall' }];
    const panels = [
      { id: 'w1', carcass: 'wall' },
      { id: 'loose' },
      { id: 's1', carcass: 'sink' },
      { id: 'gone', carcass: 'deleted-carcass' },
      { id: 'w2', carcass: 'wall' },
      { id: 's2', carcass: 'sink' },
    ];
    expect(carcassOrder(carcasses, panels).map((p) => p.id)).toEqual(['s1', 's2', 'w1', 'w2', 'loose', 'gone']);
    expect(panels[0].id).toBe('w1');
  });
});

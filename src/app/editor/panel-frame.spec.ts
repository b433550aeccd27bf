import { describe, expect, it } from 'vitest';
import { panelFrame } from './panel-frame';

// design.md §3 "Frames by role": a door's x runs from the hinge edge to the opening edge, a flap's from the
// hinge edge to the free edge, a side's and a shelf's from the front edge.
describe('panelFrame', () => {
  it('reads a door and a flap from their hinge edge, never from a front edge', () => {
    for (const role of ['door', 'flap'] as const) {
      expect(panelFrame(role).reference).toBe('Hinge edge');
      expect(panelFrame(role).words).toMatch(/^x from the hinge edge/);
      expect(panelFrame(role).words).not.toContain('front edge');
    }
  });

  it('reads carcass parts from their front edge, and anything else from its reference edge', () => {
    expect(panelFrame('side').words).toBe('x from the front edge to the back, y from the bottom up');
    expect(panelFrame('shelf').words).toBe('x from the front edge to the back, y along its length');
    expect(panelFrame('loose').reference).toBe('Reference edge');
  });
});

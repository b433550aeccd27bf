import { describe, expect, it } from 'vitest';
import { makeJob, makePanel } from '../testing/make-job';
import { planned } from '../testing/planned-carcass';
import { doorHands, handText, sideHands } from './side-hand';

const box = { id: 'box', name: 'Box', width: 600, height: 720, depth: 560, material: 'pb18' };

describe('sideHands', () => {
  it("tells a planned carcass's sides by the parts the planner put them on, whatever they are called since", () => {
    const plan = planned();
    const [left, right] = plan.panels.filter((p) => p.role === 'side');
    // Renamed after planning, even crosswise: the planner's part decides, since it laid out the placements.
    const job = makeJob(
      [
        { ...left, name: 'Side R' },
        { ...right, name: 'Side L' },
      ],
      { carcasses: [plan.carcass], materials: [{ id: 'mdf-19', name: 'MDF 19', thickness: 19, density: 700, modulus: 2200 }] },
    );
    const hands = sideHands(job);
    expect(hands.get('wall-left')?.hand).toBe('left');
    expect(hands.get('wall-right')?.hand).toBe('right');
  });

  it('reads a hand from a word of the name, else of the id, never from part of a word', () => {
    const job = makeJob(
      [
        makePanel('s1', { name: 'Base unit, left side', carcass: 'box' }),
        makePanel('c0-right', { name: 'Box side', carcass: 'other' }),
        makePanel('s3', { name: 'Bright white side' }),
        makePanel('s4', { name: 'Left or right?' }),
      ],
      { carcasses: [box, { ...box, id: 'other' }] },
    );
    const hands = sideHands(job);
    expect(hands.get('s1')).toEqual({ hand: 'left', why: 'its name says left' });
    expect(hands.get('c0-right')).toEqual({ hand: 'right', why: 'its id says right' });
    expect(hands.has('s3')).toBe(false);
    expect(hands.has('s4')).toBe(false);
  });

  it("gives the other side of a two-sided carcass the other hand (trade-reference §8a, common practice: a carcass's two sides are mirror images)", () => {
    const job = makeJob([makePanel('a', { name: 'Left side', carcass: 'box' }), makePanel('b', { name: 'Side', carcass: 'box' })], { carcasses: [box] });
    expect(sideHands(job).get('b')).toEqual({ hand: 'right', why: 'the other side of its carcass is the left side' });
  });

  it('leaves a side it cannot tell untold, and only sides get a hand', () => {
    const job = makeJob(
      [makePanel('a', { name: 'Side', carcass: 'box' }), makePanel('b', { name: 'Side', carcass: 'box' }), makePanel('d', { name: 'Left door', role: 'door', carcass: 'box' })],
      { carcasses: [box] },
    );
    const hands = sideHands(job);
    expect(hands.size).toBe(0);
    expect(handText(job.panels[0], undefined)).toBe('side not told left or right: mark it');
    expect(handText(job.panels[2], undefined)).toBeUndefined();
  });

  it('gives a door the hand of the side it hangs on, and none when it hangs on no told side', () => {
    // A door's hinge edge is on the side it hangs on (design.md §3: a door's x runs from its hinge edge).
    const job = makeJob(
      [
        makePanel('l', { name: 'Left side', carcass: 'box' }),
        makePanel('r', { name: 'Right side', carcass: 'box' }),
        makePanel('d1', { name: 'Door', role: 'door', carcass: 'box', hang: { on: ['r'], dy: 0 } }),
        makePanel('d2', { name: 'Door', role: 'door', carcass: 'box' }),
        makePanel('d3', { name: 'Door', role: 'door', carcass: 'box', hang: { on: ['l', 'r'], dy: 0 } }),
      ],
      { carcasses: [box] },
    );
    const hands = doorHands(job, sideHands(job));
    expect(hands.get('d1')).toEqual({ hand: 'right', why: 'it hangs on the right side' });
    expect(hands.has('d2')).toBe(false);
    expect(hands.has('d3')).toBe(false);
    expect(handText(job.panels[2], hands.get('d1'))).toBe('hinged on the RIGHT (seen from the front)');
  });
});

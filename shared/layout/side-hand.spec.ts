import { describe, expect, it } from 'vitest';
import { makeJob, makePanel } from '../testing/make-job';
import { planned } from '../testing/planned-carcass';
import { handText, sideHands } from './side-hand';

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
});

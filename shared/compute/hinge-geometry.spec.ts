import { describe, expect, it } from 'vitest';
import { cupCentreFromEdge, overlayFor, plateHeightFor } from './hinge-geometry';

describe('cupCentreFromEdge', () => {
  it('is the cup-boring distance plus 17.5 for a Ø35 cup', () => {
    // Cup centre from the door edge = B + 17.5 (trade-reference §2, common practice).
    expect(cupCentreFromEdge(3)).toBe(20.5);
    expect(cupCentreFromEdge(7)).toBe(24.5);
  });
});

describe('overlay and plate height', () => {
  // Overlay = hinge constant + B − plate height (trade-reference §2, common practice).
  it('gives 1 mm more overlay per mm of B and 1 mm less per mm of plate', () => {
    expect(overlayFor(13, 4, 0) - overlayFor(13, 3, 0)).toBe(1);
    expect(overlayFor(13, 3, 2) - overlayFor(13, 3, 0)).toBe(-2);
  });

  it('finds the plate height for a wanted overlay', () => {
    expect(plateHeightFor(14, 13, 3)).toBe(2);
    expect(overlayFor(13, 3, plateHeightFor(14, 13, 3))).toBe(14);
  });
});

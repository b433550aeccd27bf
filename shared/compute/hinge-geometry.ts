/** The cup bore's diameter in mm (trade-reference §2, published). */
export const CUP_DIAMETER = 35;

/**
 * Distance from the door edge to the cup centre for a cup-boring distance B (door edge to the cup's
 * rim): B + half the cup, so B + 17.5 for a Ø35 cup (trade-reference §2, common practice).
 */
export function cupCentreFromEdge(boringDistance: number, cupDiameter = CUP_DIAMETER): number {
  return boringDistance + cupDiameter / 2;
}

/**
 * The overlay a hinge gives: hinge constant + cup-boring distance − mounting plate height, all in mm
 * (trade-reference §2, common practice): 1 mm more B gives 1 mm more overlay, a 1 mm higher plate 1 mm less.
 */
export function overlayFor(hingeConstant: number, boringDistance: number, plateHeight: number): number {
  return hingeConstant + boringDistance - plateHeight;
}

/** The mounting plate height that gives a wanted overlay: the same relation solved for the plate. */
export function plateHeightFor(overlay: number, hingeConstant: number, boringDistance: number): number {
  return hingeConstant + boringDistance - overlay;
}

/**
 * Hinges per door by the height of its hinge edge and its mass (trade-reference §2, common practice):
 * each row holds up to that height and that mass.
 */
export const HINGE_RULE = [
  { hinges: 2, height: 900, mass: 6 },
  { hinges: 3, height: 1600, mass: 12 },
  { hinges: 4, height: 2000, mass: 17 },
  { hinges: 5, height: 2400, mass: 22 },
] as const;

/**
 * How many hinges a door or flap needs: the fewest that carry both its height (mm, along the hinge edge)
 * and its mass (kg). Null when it is beyond the rule (over 2400 mm or 22 kg): then the hinge maker decides.
 */
export function hingesNeeded(height: number, mass: number): number | null {
  return HINGE_RULE.find((row) => height <= row.height && mass <= row.mass)?.hinges ?? null;
}

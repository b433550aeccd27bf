/** Standard gravity, m/s² (the value the trade-reference worked example uses). */
export const STANDARD_GRAVITY = 9.80665;

/** A lift-up flap as the mechanism sees it. */
export interface FlapLoad {
  /** Hinge edge to free edge, mm: in the flap's frame this is its width (design.md §3). */
  height: number;
  /** kg */
  mass: number;
  /** kg, at the free edge. */
  handleMass?: number;
}

/**
 * The power factor a flap asks of its mechanism: height [mm] × (flap mass + 2 × handle mass) [kg]
 * (trade-reference §3). The handle counts twice because it sits at the free edge, twice as far from the
 * hinge as the flap's own centre of mass.
 */
export function powerFactor(flap: FlapLoad): number {
  return flap.height * (flap.mass + 2 * (flap.handleMass ?? 0));
}

/**
 * The moment in N·m the flap puts about its top hinge at an angle θ in degrees from closed (hanging):
 * M(θ) = m·g·(H/2)·sin θ + m_h·g·H·sin θ (trade-reference §3). It is largest with the flap level (90°).
 */
export function flapMoment(flap: FlapLoad, angleDegrees: number): number {
  const arm = flap.height / 1000;
  const sin = Math.sin((angleDegrees * Math.PI) / 180);
  return (flap.mass * (arm / 2) + (flap.handleMass ?? 0) * arm) * STANDARD_GRAVITY * sin;
}

/** The largest moment in N·m for a power factor: PF·g/2000, the same as `flapMoment` at 90°. */
export function maxFlapMoment(powerFactorValue: number): number {
  return (powerFactorValue * STANDARD_GRAVITY) / 2000;
}

/** What a lift mechanism's power-factor range covers: each mechanism, or the pair on one flap. */
export type RangeFor = 'mechanism' | 'pair';

/**
 * The power factor to hold against a mechanism's printed range when `count` mechanisms share a flap equally:
 * a range for each mechanism takes its share, PF / count; a range for a pair takes what two such mechanisms
 * would carry together, 2 × PF / count (trade-reference §8a, common practice: makers print both ways).
 */
export function powerFactorAgainstRange(pf: number, count: number, rangeFor: RangeFor): number {
  const share = pf / Math.max(count, 1);
  return rangeFor === 'pair' ? 2 * share : share;
}

/** How a range reads in a message: "for each mechanism" or "for a pair". */
export function rangeForWords(rangeFor: RangeFor): string {
  return rangeFor === 'pair' ? 'for a pair' : 'for each mechanism';
}

import { MM_PER_INCH, type LengthUnit } from './length-unit';

/** The steps offered, in the unit's own terms, and the one a panel starts with. */
const STEPS: Record<LengthUnit, { inUnit: readonly number[]; usual: number; mmPerUnit: number }> = {
  mm: { inUnit: [0.1, 0.5, 1, 5, 10], usual: 1, mmPerUnit: 1 },
  // Decimal inches are read in thousandths: the steps are round hundredths and tenths.
  in: { inUnit: [0.01, 0.05, 0.1, 0.25, 0.5], usual: 0.05, mmPerUnit: MM_PER_INCH },
  // A rule marked in 32nds or 64ths: the binary fractions a tape measure shows, 1/16 the usual.
  'in-32': { inUnit: [1 / 32, 1 / 16, 1 / 8, 1 / 4, 1 / 2], usual: 1 / 16, mmPerUnit: MM_PER_INCH },
  'in-64': { inUnit: [1 / 64, 1 / 32, 1 / 16, 1 / 8, 1 / 4], usual: 1 / 16, mmPerUnit: MM_PER_INCH },
};

/**
 * The steps the editor offers for where fittings off the system rows land, in mm: round millimetres for a
 * metric reader, and for one who reads inches the inch marks they measure with (`1/16"` is 1.5875 mm), so
 * that a fitting placed by the step sits on a figure they can read off a rule. The system rows stay metric.
 */
export function stepChoices(unit: LengthUnit): number[] {
  const { inUnit, mmPerUnit } = STEPS[unit];
  return inUnit.map((step) => step * mmPerUnit);
}

/** The step a panel starts with, in mm: 1 mm, 0.05" or 1/16". */
export function usualStep(unit: LengthUnit): number {
  return STEPS[unit].usual * STEPS[unit].mmPerUnit;
}

/**
 * How a person reads and types lengths: millimetres, decimal inches, or fractional inches to the nearest
 * 1/32 or 1/64. Only the screen and the printed figures follow it; the system, the grid and the job
 * document stay in millimetres. Plain data, so that the first page's session schema (zod/mini) can list them.
 */
export const LENGTH_UNITS = ['mm', 'in', 'in-32', 'in-64'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

/** The international inch: exactly 25.4 mm (the 1959 international yard and pound agreement; NIST SP 811). */
export const MM_PER_INCH = 25.4;

/** The choices as a menu names them, short enough for a phone's top bar. */
export const LENGTH_UNIT_NAMES: Record<LengthUnit, string> = {
  mm: 'mm',
  in: 'in 0.001',
  'in-32': 'in 1/32',
  'in-64': 'in 1/64',
};

/** Whether a unit is one of the inch forms (a bare number typed by such a user means inches). */
export function isInches(unit: LengthUnit): boolean {
  return unit !== 'mm';
}

/** The smallest step a unit shows, in mm: 0.01 mm, 0.001 in, 1/32 in or 1/64 in. */
export function unitStep(unit: LengthUnit): number {
  switch (unit) {
    case 'mm':
      return 0.01;
    case 'in':
      return MM_PER_INCH / 1000;
    case 'in-32':
      return MM_PER_INCH / 32;
    case 'in-64':
      return MM_PER_INCH / 64;
  }
}

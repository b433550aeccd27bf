import { MM_PER_INCH, type LengthUnit } from './length-unit';

/** Greatest common divisor of two whole numbers, for reducing a fraction. */
function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** A count of steps rounded half away from zero, so that -x always prints as the negative of x. */
function roundSteps(value: number, perUnit: number): number {
  return Math.sign(value) * Math.round(Math.abs(value) * perUnit);
}

/** A decimal with at most `decimals` places and no trailing zeros, never `-0`. */
function decimalText(value: number, decimals: number): string {
  const steps = roundSteps(value, 10 ** decimals);
  if (steps === 0) return '0';
  return String(steps / 10 ** decimals);
}

/** Whole inches and a reduced fraction of `denominator`ths: `12 3/8`, `3/8`, `12`, `-1 1/2`. */
function fractionText(inches: number, denominator: number): string {
  const steps = roundSteps(inches, denominator);
  if (steps === 0) return '0';
  const sign = steps < 0 ? '-' : '';
  const whole = Math.floor(Math.abs(steps) / denominator);
  const rest = Math.abs(steps) % denominator;
  if (rest === 0) return `${sign}${whole}`;
  const divisor = gcd(rest, denominator);
  const fraction = `${rest / divisor}/${denominator / divisor}`;
  return whole === 0 ? `${sign}${fraction}` : `${sign}${whole} ${fraction}`;
}

/**
 * A length given in millimetres as the person who chose `unit` reads it, with its unit sign:
 * `314.33 mm` (to 0.01 mm), `12.375"` (to 0.001 in), `12 3/8"` (to the nearest 1/32 or 1/64 in, the
 * fraction reduced). Every form rounds half away from zero, so a negative length prints as the same
 * figure with a minus sign. Not finite prints as `–`.
 */
export function formatLength(mm: number, unit: LengthUnit): string {
  if (!Number.isFinite(mm)) return '–';
  const inches = mm / MM_PER_INCH;
  switch (unit) {
    case 'mm':
      return `${decimalText(mm, 2)} mm`;
    case 'in':
      return `${decimalText(inches, 3)}"`;
    case 'in-32':
      return `${fractionText(inches, 32)}"`;
    case 'in-64':
      return `${fractionText(inches, 64)}"`;
  }
}

/**
 * A length that is the 32 mm system's own figure (its pitch, setback, hole size): always in millimetres,
 * followed for an inch user by the inches it comes to, `32 mm (1 17/64")` (fractional inches to 1/64
 * unless the user reads decimal inches).
 */
export function formatSystemLength(mm: number, unit: LengthUnit): string {
  const metric = formatLength(mm, 'mm');
  if (unit === 'mm') return metric;
  return `${metric} (${formatLength(mm, unit === 'in' ? 'in' : 'in-64')})`;
}

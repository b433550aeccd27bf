import { isInches, MM_PER_INCH, type LengthUnit } from './length-unit';

export type ParsedLength = { ok: true; mm: number } | { ok: false; error: string };

const INCH_SIGNS = new Set(['"', '″', "''", 'in', 'inch', 'inches']);
const MM_SIGNS = new Set(['mm']);

// sign, then a whole number and a fraction (`12 3/8`, `12-3/8`), a fraction alone (`3/8`) or a decimal
// (`12.375`, `.5`), then an optional unit sign. Spaces are already collapsed to one.
const LENGTH = /^([-−]?)\s?(?:(\d+)(?:\s|-)(\d+)\/(\d+)|(\d+)\/(\d+)|(\d+(?:\.\d*)?|\.\d+))\s?([^\d\s].*)?$/;

/** Parsed lengths keep a nanometre: enough to give back 314.325 for 12 3/8", not float noise. */
function nanometres(mm: number): number {
  const rounded = Math.round(mm * 1e6) / 1e6;
  return rounded === 0 ? 0 : rounded;
}

function refuse(error: string): ParsedLength {
  return { ok: false, error };
}

/**
 * Reads a length as a person types it, in millimetres: `12 3/8"`, `12-3/8 in`, `3/8"`, `12.375"`,
 * `314.3 mm`, or a bare number, which is read in the person's own unit (millimetres for `mm`, inches for
 * the inch forms). Inches are the international inch, 25.4 mm. A fraction is always inches; a decimal
 * comma, an unknown unit or anything else is refused with what to type instead.
 */
export function parseLength(input: string, unit: LengthUnit): ParsedLength {
  const text = input.trim().replace(/\s+/g, ' ');
  if (text === '') return refuse('Type a length, e.g. ' + example(unit) + '.');
  if (/\d,\d/.test(text)) return refuse('Use a point for decimals, e.g. 314.3 mm or 12.375".');
  const match = LENGTH.exec(text);
  if (match === null) return refuse(`"${input.trim()}" is not a length: type e.g. ${example(unit)}.`);
  const [, minus, whole, wholeTop, wholeBottom, top, bottom, decimal, rawSign] = match;
  const sign = rawSign?.trim().toLowerCase();
  const inches = sign === undefined ? isInches(unit) : INCH_SIGNS.has(sign);
  if (sign !== undefined && !inches && !MM_SIGNS.has(sign)) return refuse(`"${rawSign.trim()}" is not a unit here: write mm or " (inches).`);
  const fractionTop = wholeTop ?? top;
  const fractionBottom = wholeBottom ?? bottom;
  let value: number;
  if (fractionTop !== undefined) {
    const numerator = Number(fractionTop);
    const denominator = Number(fractionBottom);
    if (denominator === 0) return refuse('A fraction cannot have 0 below the line.');
    if (!inches) return refuse(`A fraction is read as inches: write ${text.replace(/\s?mm$/i, '')}" for inches, or millimetres as a decimal.`);
    if (whole !== undefined && numerator >= denominator) return refuse(`In ${whole} ${numerator}/${denominator} the fraction is not less than one: write it as whole inches and a fraction below one.`);
    // (whole × denominator + numerator) first keeps the whole count of steps exact before the one division.
    value = ((Number(whole ?? 0) * denominator + numerator) * MM_PER_INCH) / denominator;
  } else {
    value = Number(decimal) * (inches ? MM_PER_INCH : 1);
  }
  if (!Number.isFinite(value)) return refuse('That length is too large.');
  return { ok: true, mm: nanometres(minus === '' ? value : -value) };
}

/** A length typed the way this unit reads it, for hints and errors. */
function example(unit: LengthUnit): string {
  return isInches(unit) ? '12 3/8" or 314.3 mm' : '314.3 mm or 12 3/8"';
}

/** What a length field says under it: what a bare number means, and that the other unit may be typed too. */
export function lengthInputHint(unit: LengthUnit): string {
  return isInches(unit) ? 'Inches (12 3/8", 12.375) or mm (314.3 mm)' : 'mm (314.3), or inches with " (12 3/8")';
}

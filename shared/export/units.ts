import { formatLength } from '../units/format-length';
import type { LengthUnit } from '../units/length-unit';

/** PostScript points per millimetre: 72 pt per inch, 25.4 mm per inch exactly. */
const PT_PER_MM = 72 / 25.4;

/** Millimetres to PDF points. */
export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}

/**
 * A number rounded to a step that is a power of ten (0.0001 for DXF coordinates, 0.001 for SVG and PDF,
 * 0.01 for lengths on a drawing), never `-0`. Dividing the whole count of steps by the steps per unit
 * gives the double nearest that decimal, so 0.1 + 0.2 prints as 0.3. Every drawing file rounds each of
 * its numbers here, so it does no string work.
 */
export function roundTo(value: number, step: number): number {
  const perUnit = Math.round(1 / step);
  const rounded = Math.round(value * perUnit) / perUnit;
  return rounded === 0 ? 0 : rounded;
}

/** A length as printed on a drawing or in a table: up to two decimals, no trailing zeros (`9.5`, `37`, `22.25`). */
export function lengthText(mm: number): string {
  return String(roundTo(mm, 0.01));
}

/**
 * A length on a drawing for someone who reads `unit`: the bare millimetres of `lengthText` (the sheet says
 * it is in mm), or inches with their sign, `12 3/8"`.
 */
export function drawingLength(mm: number, unit: LengthUnit): string {
  return unit === 'mm' ? lengthText(mm) : formatLength(mm, unit);
}

/** Sizes as a title block or label prints them: `560 × 720 mm`, or `22 1/16" × 28 3/8"` for inches. */
export function sizeText(mm: readonly number[], unit: LengthUnit): string {
  const figures = mm.map((v) => drawingLength(v, unit)).join(' × ');
  return unit === 'mm' ? `${figures} mm` : figures;
}

/** PostScript points per millimetre: 72 pt per inch, 25.4 mm per inch exactly. */
const PT_PER_MM = 72 / 25.4;

/** Millimetres to PDF points. */
export function mmToPt(mm: number): number {
  return mm * PT_PER_MM;
}

/** A number rounded to a step (0.0001 for DXF coordinates, 0.001 for SVG), never `-0`. */
export function roundTo(value: number, step: number): number {
  const rounded = Math.round(value / step) * step;
  // Dividing back by the step's inverse keeps 0.1 + 0.2 from printing as 0.30000000000000004.
  const decimals = Math.max(0, Math.ceil(-Math.log10(step)));
  const clean = Number(rounded.toFixed(decimals));
  return Object.is(clean, -0) ? 0 : clean;
}

/** A length as printed on a drawing or in a table: up to two decimals, no trailing zeros (`9.5`, `37`, `22.25`). */
export function lengthText(mm: number): string {
  return String(roundTo(mm, 0.01));
}

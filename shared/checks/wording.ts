import type { PanelBore } from '../layout/bore';
import type { PlacedFitting } from '../layout/panel-layout';
import { formatLength, formatSystemLength } from '../units/format-length';
import type { LengthUnit } from '../units/length-unit';

/** A length as a bench hand reads it: at most one decimal, in mm. */
export function mm(value: number): string {
  return `${formatNumber(value)} mm`;
}

/**
 * How a message prints a length for someone who reads `unit`: `mm` above for millimetres (what the command
 * line and the API print unless asked otherwise), the shared length format for inches (`12 3/8"`).
 */
export function lengthWords(unit: LengthUnit): (value: number) => string {
  return unit === 'mm' ? mm : (value) => formatLength(value, unit);
}

/** A position on the panel (`x 37, y 9.5`): the bare number for millimetres, the length with its sign for inches. */
export function coordinateWords(unit: LengthUnit): (value: number) => string {
  return unit === 'mm' ? formatNumber : (value) => formatLength(value, unit);
}

/** A figure of the 32 mm system itself (its pitch): in mm, with the inches beside it for an inch reader. */
export function systemWords(unit: LengthUnit): (value: number) => string {
  return unit === 'mm' ? mm : (value) => formatSystemLength(value, unit);
}

/** How a message words lengths for someone who reads `unit`: lengths, positions and the system's own figures. */
export interface LengthWording {
  unit: LengthUnit;
  length: (mm: number) => string;
  /** A position on the panel: `37` in mm, `1 15/32"` in inches. */
  coordinate: (mm: number) => string;
  /** The system's own figures: `32 mm`, `32 mm (1 17/64")`. */
  system: (mm: number) => string;
}

/** The wording of the checks' findings and the planner's reasons for a reader of `unit` (mm unless told). */
export function lengthWording(unit: LengthUnit = 'mm'): LengthWording {
  return { unit, length: lengthWords(unit), coordinate: coordinateWords(unit), system: systemWords(unit) };
}

/** A number rounded to one decimal, without a trailing `.0`. */
export function formatNumber(value: number): string {
  const rounded = Math.round(value * 10) / 10;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}

/** How a bore is named in a message: its id and size, `bore h1/cup (Ø35 × 13)`. */
export function boreName(bore: PanelBore): string {
  const depth = bore.kind === 'face' && bore.through ? 'through' : formatNumber(bore.depth);
  const where = bore.kind === 'edge' ? ` in edge ${bore.edge}` : '';
  return `bore ${bore.id} (Ø${formatNumber(bore.diameter)} × ${depth}${where})`;
}

/** Sorts ids so that a message names them in the same order whatever the order of the document. */
export function sortedIds(...ids: (string | undefined)[]): string[] {
  return [...new Set(ids.filter((id): id is string => id !== undefined))].sort();
}

/** How a placed fitting is named in a message: `placement pl1 (Mounting plate, 0 mm)`. */
export function placementName(placed: PlacedFitting): string {
  return `placement ${placed.placement.id} (${placed.fitting.name})`;
}

/** The same text with a capital first letter, to open a sentence. */
export function capitalize(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

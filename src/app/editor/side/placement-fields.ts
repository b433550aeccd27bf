import type { Fitting } from '../../../../shared/catalog/fitting';
import type { Panel } from '../../../../shared/model/job-document';
import { formatLength } from '../../../../shared/units/format-length';
import type { LengthUnit } from '../../../../shared/units/length-unit';
import { parseLength } from '../../../../shared/units/parse-length';
import { panelFrame } from '../panel-frame';

/** A number field of the properties form: what it is called and the values the panel or fitting allows. */
export interface NumberField {
  key: 'x' | 'y' | string;
  label: string;
  min: number;
  max: number;
  /** Where a param lives: on the placement itself or in its params. */
  param: boolean;
  hint: string;
}

/**
 * The number fields of a placement: its position, limited to the panel, and its fitting's parameters
 * (a hinge's cup-boring distance, limited to the range the hinge allows).
 */
export function placementFields(panel: Panel, fitting: Fitting | undefined): NumberField[] {
  const fields: NumberField[] = [
    { key: 'x', label: 'x', min: 0, max: panel.width, param: false, hint: `From the ${panelFrame(panel.role).reference.toLowerCase()}` },
    { key: 'y', label: 'y', min: 0, max: panel.height, param: false, hint: 'From the lower edge' },
  ];
  if (fitting?.purpose === 'hinge-cup') {
    const { min, max } = fitting.hinge.boringDistance;
    fields.push({ key: 'boringDistance', label: 'Cup-boring distance', min, max, param: true, hint: 'Door edge to cup rim' });
  }
  return fields;
}

/**
 * Reads a typed length against its field, in mm: either unit (`12 3/8"`, `314.3 mm`), a bare number in the
 * user's own; the message says what to type instead, the limits in the user's unit.
 */
export function readLength(text: string, field: NumberField, unit: LengthUnit): { value: number } | { message: string } {
  const read = parseLength(text, unit);
  if (!read.ok) return { message: read.error };
  if (read.mm < field.min || read.mm > field.max) {
    const where = field.param ? 'for this fitting' : 'to stay on the panel';
    return { message: `The ${field.label} must be from ${formatLength(field.min, unit)} to ${formatLength(field.max, unit)} ${where}.` };
  }
  return { value: read.mm };
}

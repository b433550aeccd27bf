import { LENGTH_UNITS, type LengthUnit } from '../../shared/units/length-unit';
import type { CliIo } from './cli-io';

/** The `--units` option as parseArgs reads it: millimetres unless told. */
export const UNITS_OPTION = { units: { type: 'string', default: 'mm' } } as const;

/** How a command's help names the option; `what` says what follows it. */
export function unitsHelp(what: string): string {
  return `  --units ${LENGTH_UNITS.join('|')}
                         ${what}: mm (the default), decimal inches
                         to 0.001 (in), or fractional inches to the nearest 1/32 (in-32) or 1/64 (in-64);
                         the 32 mm system's own figures stay in mm with their inches beside them`;
}

/** The unit `--units` names, or undefined after saying, on standard error, which units there are. */
export function unitOrSay(io: CliIo, command: string, value: string): LengthUnit | undefined {
  if ((LENGTH_UNITS as readonly string[]).includes(value)) return value as LengthUnit;
  io.err(`borewright ${command}: --units must be one of ${LENGTH_UNITS.join(', ')}, not "${value}".`);
  return undefined;
}

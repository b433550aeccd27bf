import { line, text, type Shape, type SymbolShape } from './drawing';
import { INK } from './palette';
import { estimateTextWidth } from './text-width';

/** The check bar's length: the bench measures it before drilling (design.md §8). */
const CHECK_BAR_LENGTH = 100;
const THICK = 2.5;

/**
 * A 100 mm check bar from (x, y): a bar outlined on exactly its length, so that a rule laid on it reads
 * 0 and 100, in ten 10 mm blocks with every other one filled, and 0, 50 and 100 written beside it.
 * `across` draws it along x; otherwise it runs down the sheet with its labels reading upwards.
 */
function checkBar(x: number, y: number, across: boolean): Shape[] {
  const at = (u: number, v: number): [number, number] => (across ? [x + u, y + v] : [x + v, y + u]);
  const ink = { color: INK, width: 0.3 };
  const [ox, oy] = at(0, 0);
  const shapes: Shape[] = [
    { kind: 'rect', x: ox, y: oy, width: across ? CHECK_BAR_LENGTH : THICK, height: across ? THICK : CHECK_BAR_LENGTH, stroke: ink },
  ];
  for (let k = 0; k < 10; k += 2) {
    const [bx, by] = at(10 * k, 0);
    shapes.push({ kind: 'rect', x: bx, y: by, width: across ? 10 : THICK, height: across ? THICK : 10, fill: INK });
  }
  for (const [u, value] of [
    [0, '0'],
    [50, '50'],
    [CHECK_BAR_LENGTH, '100 mm'],
  ] as const) {
    shapes.push(line(...at(u, -1.5), ...at(u, 0), ink));
    shapes.push(text(...at(u, THICK + 3.2), value, 2.6, INK, 'middle', !across));
  }
  return shapes;
}

/** Room a check bar's labels take around the bar, mm: before its start, and beside it. */
const PAD = { start: 6, end: 12, before: 3, beside: 7 };

/** A check bar kept as a symbol, for pages that print the same bar many times. Placed like `checkBar`. */
export function checkBarSymbol(x: number, y: number, across: boolean): SymbolShape {
  const along = PAD.start + CHECK_BAR_LENGTH + PAD.end;
  const wide = PAD.before + THICK + PAD.beside;
  const shapes = across ? checkBar(PAD.start, PAD.before, true) : checkBar(PAD.before, PAD.start, false);
  const drawing = { width: across ? along : wide, height: across ? wide : along, title: 'check bar', shapes };
  return across
    ? { kind: 'symbol', id: 'check-bar-across', x: x - PAD.start, y: y - PAD.before, drawing }
    : { kind: 'symbol', id: 'check-bar-down', x: x - PAD.before, y: y - PAD.start, drawing };
}

/** What goes with every check bar, in two short lines. */
const CHECK_BAR_NOTE: readonly string[] = [
  'Check bar: measure it before drilling.',
  'Not exactly 100 mm? The print is not to scale: do not drill from it.',
];

let block: { shapes: Shape[]; width: number; height: number } | undefined;

/** A check bar with its note beneath, drawn from its top left, as a block of a drawing: the same everywhere, laid out once. */
export function checkBarBlock(): { shapes: Shape[]; width: number; height: number } {
  return (block ??= drawCheckBarBlock());
}

function drawCheckBarBlock(): { shapes: Shape[]; width: number; height: number } {
  const shapes = [...checkBar(0, 2, true), ...CHECK_BAR_NOTE.map((note, i) => text(0, 13 + 4.2 * i, note, 2.8, INK))];
  const width = Math.max(CHECK_BAR_LENGTH + 6, ...CHECK_BAR_NOTE.map((note) => estimateTextWidth(note, 2.8)));
  return { shapes, width, height: 13 + 4.2 * (CHECK_BAR_NOTE.length - 1) + 2 };
}

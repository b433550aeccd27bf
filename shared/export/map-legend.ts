import { FACE_B_DASH, tint } from './bore-marks';
import { line, text, type Shape } from './drawing';
import { estimateTextWidth } from './text-width';
import { INK, MUTED, PURPOSE_ORDER, PURPOSE_STYLES } from './palette';

const ROW = 5;
const SIZE = 2.8;

type Block = { shapes: Shape[]; width: number; height: number };
let drawn: Block | undefined;

/**
 * The legend of every drawing: each purpose with its colour and its letter, then how faces, through
 * bores, labels, centres and edge strips are drawn. Drawn from its top left; returns its height. The same
 * on every drawing, so laid out once per process.
 */
export function legend(): Block {
  return (drawn ??= drawLegend());
}

function drawLegend(): Block {
  const shapes: Shape[] = [text(0, 4, 'Legend', 3.5, INK)];
  let y = 7;
  let width = 0;
  const entry = (mark: Shape[], words: string) => {
    width = Math.max(width, 10 + estimateTextWidth(words, SIZE));
    shapes.push(...mark, text(10, y + 3.4, words, SIZE, INK));
    y += ROW;
  };
  const swatch = (color: string, extra: Partial<Extract<Shape, { kind: 'circle' }>> = {}): Shape => ({
    kind: 'circle',
    cx: 3,
    cy: y + 2.5,
    r: 2,
    stroke: { color, width: 0.35 },
    ...extra,
  });
  for (const purpose of PURPOSE_ORDER) {
    const { color, letter, label } = PURPOSE_STYLES[purpose];
    entry([swatch(color), text(6.2, y + 3.4, letter, SIZE, color)], label);
  }
  const grey = PURPOSE_STYLES.loose.color;
  entry([swatch(grey, { stroke: { color: grey, width: 0.35, dash: FACE_B_DASH } })], 'dashed: a face B bore, on its own map seen from face B');
  entry([swatch(grey, { fill: tint(grey, 0.8) })], 'filled: a through bore (THRU)');
  entry([line(1, y + 2.5, 5, y + 2.5, { color: INK, width: 0.15 }), line(3, y + 0.5, 3, y + 4.5, { color: INK, width: 0.15 })], 'centre cross: prick the centre through the paper');
  entry([text(0, y + 3.4, 'S13', SIZE, MUTED)], 'beside a bore: its letter and depth in mm');
  entry([{ kind: 'rect', x: 0.5, y: y + 1, width: 5, height: 3, stroke: { color: MUTED, width: 0.25 } }], 'edge strip: the edge seen from outside, face A side next to the panel');
  return { shapes, width, height: y };
}

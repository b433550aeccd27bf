import type { PanelBore } from '../layout/bore';
import type { PanelHole } from './panel-holes';
import type { Shape, Stroke, SymbolShape } from './drawing';
import { line, text } from './drawing';
import { INK, PURPOSE_STYLES } from './palette';
import { estimateTextWidth } from './text-width';
import { lengthText } from './units';

/** Face B bores are dashed wherever they are drawn (design.md §6). */
export const FACE_B_DASH: readonly number[] = [1.2, 0.8];

const LABEL_SIZE = 2.2;

/** A colour mixed with white: the tint that fills a through bore. */
export function tint(color: string, amount: number): string {
  const channel = (i: number) => {
    const c = parseInt(color.slice(1 + 2 * i, 3 + 2 * i), 16);
    return Math.round(c + (255 - c) * amount)
      .toString(16)
      .padStart(2, '0');
  };
  return `#${channel(0)}${channel(1)}${channel(2)}`;
}

/** What a bore's label says: its purpose letter and depth, `S13`, or `C THRU` for a through bore. */
function boreLabel(bore: PanelBore): string {
  const { letter } = PURPOSE_STYLES[bore.purpose];
  return bore.kind === 'face' && bore.through ? `${letter} THRU` : `${letter}${lengthText(bore.depth)}`;
}

/**
 * A bore drawn centred on (cx, cy): its circle at full size in its purpose's colour (dashed on face B,
 * tinted when through), a centre cross to prick through the paper, and its letter and depth beside it.
 * A symbol, since a panel repeats the same few marks many times (a side's system holes), named by the
 * hole's key so that a reader of the file can tell which hole of the pack it is.
 */
export function boreMark(bore: PanelHole, cx: number, cy: number): SymbolShape {
  const { color } = PURPOSE_STYLES[bore.purpose];
  const r = bore.diameter / 2;
  const faceB = bore.kind === 'face' && bore.face === 'B';
  const through = bore.kind === 'face' && bore.through;
  const label = boreLabel(bore);
  const stroke: Stroke = faceB ? { color, width: 0.35, dash: FACE_B_DASH } : { color, width: 0.35 };
  // The symbol's box holds the circle with its stroke and the label above right of it.
  const diagonal = r * Math.SQRT1_2;
  const left = r + 0.5;
  const top = Math.max(r + 0.5, diagonal + 0.4 + LABEL_SIZE);
  const width = Math.max(2 * r + 1, left + diagonal + 0.4 + estimateTextWidth(label, LABEL_SIZE) + 0.5);
  const height = top + r + 0.5;
  const arm = Math.min(r * 0.8, 2);
  const cross: Stroke = { color: INK, width: 0.15 };
  const shapes: Shape[] = [
    through ? { kind: 'circle', cx: left, cy: top, r, stroke, fill: tint(color, 0.8) } : { kind: 'circle', cx: left, cy: top, r, stroke },
    line(left - arm, top, left + arm, top, cross),
    line(left, top - arm, left, top + arm, cross),
    text(left + diagonal + 0.4, top - diagonal - 0.4, label, LABEL_SIZE, color),
  ];
  const id = ['bore', bore.diameter, faceB ? 'B' : 'A', through ? 'through' : 'blind', color, label].join(' ');
  return { kind: 'symbol', id, hole: bore.key, x: cx - left, y: cy - top, drawing: { width, height, title: label, shapes } };
}

import { line, text, type Shape } from './drawing';
import type { Reach } from './map-panel';
import { viewPoint, type MapView } from './map-view';
import { distinctValues, spreadLabels } from './ordinates';
import { MUTED } from './palette';
import { estimateTextWidth } from './text-width';
import type { LengthUnit } from '../units/length-unit';
import { drawingLength } from './units';

const SIZE = 2.5;
const SPACING = 3.1;
const STRAIGHT = 3;
const JOG = 4;
const LEAD = { color: MUTED, width: 0.15 };

/** A column of ordinate labels: values at positions along one axis of the sheet, written outwards from `start`. */
interface Column {
  /** Values and where they lie along the column, in any order. */
  marks: { value: number; at: number }[];
  /** The coordinate across the column where the leaders begin, just clear of the figure. */
  start: number;
  /** +1 when the labels go towards larger sheet coordinates (down or right), −1 otherwise. */
  outward: 1 | -1;
  /** 'x' when the marks lie along the sheet's x (labels written upright below or above the figure). */
  along: 'x' | 'y';
  unit: LengthUnit;
}

/**
 * Ordinate labels with leaders: a straight stub from each position, a jog to where the label has room,
 * and the value. Returns the shapes and how far the column reaches from `start`.
 */
function ordinateColumn(column: Column): Shape[] {
  const marks = [...column.marks].sort((p, q) => p.at - q.at);
  const placed = spreadLabels(
    marks.map((m) => m.at),
    SPACING,
  );
  const { start, outward } = column;
  const v1 = start + outward * STRAIGHT;
  const v2 = v1 + outward * JOG;
  const shapes: Shape[] = [];
  marks.forEach((mark, i) => {
    const label = drawingLength(mark.value, column.unit);
    const u = placed[i];
    const at = (along: number, across: number): [number, number] => (column.along === 'x' ? [along, across] : [across, along]);
    shapes.push(line(...at(mark.at, start), ...at(mark.at, v1), LEAD));
    shapes.push(line(...at(mark.at, v1), ...at(u, v2), LEAD));
    // The glyphs are centred on the leader: a baseline sits about a third of the size off the centre line.
    const v3 = v2 + outward * 1;
    if (column.along === 'x') shapes.push(text(u + SIZE * 0.35, v3, label, SIZE, MUTED, outward > 0 ? 'end' : 'start', true));
    else shapes.push(text(v3, u + SIZE * 0.35, label, SIZE, MUTED, outward > 0 ? 'start' : 'end'));
  });
  return shapes;
}

/** How far a column of ordinate labels of these values reaches from where its leaders begin. */
function columnDepth(values: readonly number[], unit: LengthUnit): number {
  return STRAIGHT + JOG + 1 + Math.max(0, ...values.map((v) => estimateTextWidth(drawingLength(v, unit), SIZE)));
}

/** The distinct x and y values a map dimensions: the panel's own size and every hole's position. */
function ordinateValues(view: MapView): { xs: number[]; ys: number[] } {
  const { width: W, height: H } = view.panel;
  const xs = distinctValues([0, W, ...view.faceBores.map((b) => b.x), ...view.edgeBores.filter((b) => b.edge === 'y0' || b.edge === 'y1').map((b) => b.at)]);
  const ys = distinctValues([0, H, ...view.faceBores.map((b) => b.y), ...view.edgeBores.filter((b) => b.edge === 'x0' || b.edge === 'x1').map((b) => b.at)]);
  return { xs, ys };
}

/**
 * How far a map reaches beyond the outline once its ordinate dimensions are drawn, from the figure's own
 * reach: what a template's tiles are planned from, without drawing the labels.
 */
export function ordinateReach(view: MapView, figure: Reach, unit: LengthUnit): Reach {
  const { xs, ys } = ordinateValues(view);
  const reach = { ...figure };
  reach.bottom += 1 + columnDepth(xs, unit) + 5;
  if (view.referenceAt === 'left') reach.left += 1 + columnDepth(ys, unit);
  else reach.right += 1 + columnDepth(ys, unit);
  reach.top += 5;
  return reach;
}

/**
 * Ordinate dimensions of a map: x from the reference edge written below the figure, y from the lower edge
 * written on the reference edge's side, each value once however many bores share it, the panel's own size
 * included. Shapes are relative to the outline's top left; the result's reach includes `figure`'s.
 */
export function ordinateDimensions(view: MapView, figure: Reach, unit: LengthUnit): { shapes: Shape[]; reach: Reach } {
  const { width: W, height: H } = view.panel;
  const { xs, ys } = ordinateValues(view);
  const below = ordinateColumn({
    marks: xs.map((value) => ({ value, at: viewPoint(view, value, 0).x })),
    start: H + figure.bottom + 1,
    outward: 1,
    along: 'x',
    unit,
  });
  const onLeft = view.referenceAt === 'left';
  const beside = ordinateColumn({
    marks: ys.map((value) => ({ value, at: viewPoint(view, 0, value).y })),
    start: onLeft ? -figure.left - 1 : W + figure.right + 1,
    outward: onLeft ? -1 : 1,
    along: 'y',
    unit,
  });
  const reach = ordinateReach(view, figure, unit);
  const words = unit === 'mm' ? 'mm' : 'inches';
  const captions = [
    text(onLeft ? -reach.left : W + reach.right, H + reach.bottom - 1, `x: ${words} from the reference edge`, SIZE, MUTED, onLeft ? 'start' : 'end'),
    text(onLeft ? -reach.left : W + reach.right, -figure.top - 3, `y: ${words} from the lower edge`, SIZE, MUTED, onLeft ? 'start' : 'end'),
  ];
  return { shapes: [...below, ...beside, ...captions], reach };
}

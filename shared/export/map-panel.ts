import { planBox } from '../layout/bore';
import type { Edge } from '../model/job-document';
import { boreMark, tint } from './bore-marks';
import { line, text, type Shape } from './drawing';
import { viewPoint, type EdgeHole, type MapView } from './map-view';
import { INK, MUTED, PURPOSE_STYLES } from './palette';

/** Room between the outline and an edge strip, mm. */
const STRIP_GAP = 6;

/** How far the drawing reaches beyond the outline on each side, mm. */
export interface Reach {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export interface PanelFigure {
  /** Shapes relative to the outline's top left corner. */
  shapes: Shape[];
  reach: Reach;
}

const EDGES: readonly Edge[] = ['x0', 'x1', 'y0', 'y1'];

/** The side of the sheet an edge lies on in this view: x0, the reference edge, where the view puts it. */
function sheetSide(view: MapView, edge: Edge): keyof Reach {
  if (edge === 'y0') return 'bottom';
  if (edge === 'y1') return 'top';
  const left = (edge === 'x0') === (view.referenceAt === 'left');
  return left ? 'left' : 'right';
}

/**
 * An edge seen from outside, folded out beside the edge it belongs to: a strip as wide as the board, face A's
 * side next to the panel, each bore a circle of its diameter at its position along the edge and its height
 * from face A, so the strip can be laid against the edge like the face template.
 */
function edgeStrip(view: MapView, edge: Edge, bores: EdgeHole[]): Shape[] {
  const { width: W, height: H, thickness: T } = view.panel;
  const side = sheetSide(view, edge);
  const shapes: Shape[] = [];
  const frame = { color: MUTED, width: 0.25 };
  // The strip's near border is STRIP_GAP beyond the outline; z runs away from the panel.
  const across = (z: number) => ({ left: -STRIP_GAP - z, right: W + STRIP_GAP + z, top: -STRIP_GAP - z, bottom: H + STRIP_GAP + z })[side];
  const vertical = side === 'left' || side === 'right';
  const [a, b] = [across(0), across(T)].sort((p, q) => p - q);
  shapes.push(vertical ? { kind: 'rect', x: a, y: 0, width: b - a, height: H, stroke: frame } : { kind: 'rect', x: 0, y: a, width: W, height: b - a, stroke: frame });
  shapes.push(vertical ? text(a + T / 2, -2, `edge ${edge}`, 2.2, MUTED, 'middle') : text(-2, a + T / 2 + 0.8, `edge ${edge}`, 2.2, MUTED, 'end'));
  for (const bore of bores) {
    const along = edge === 'x0' || edge === 'x1' ? viewPoint(view, 0, bore.at).y : viewPoint(view, bore.at, 0).x;
    shapes.push(vertical ? boreMark(bore, across(bore.z), along) : boreMark(bore, along, across(bore.z)));
  }
  return shapes;
}

/** An edge bore's path through the board, seen through face A: a light dashed outline of how far it runs. */
function hiddenPath(view: MapView, bore: EdgeHole): Shape {
  const [x0, y0, x1, y1] = planBox(bore, view.panel);
  const p = viewPoint(view, x0, y0);
  const q = viewPoint(view, x1, y1);
  const { color } = PURPOSE_STYLES[bore.purpose];
  return {
    kind: 'rect',
    x: Math.min(p.x, q.x),
    y: Math.min(p.y, q.y),
    width: Math.abs(q.x - p.x),
    height: Math.abs(q.y - p.y),
    stroke: { color: tint(color, 0.4), width: 0.2, dash: [0.8, 0.8] },
  };
}

/**
 * The panel at full size: its outline, the reference edge drawn heavy and named, the lower edge named,
 * every bore of the view, and the edge strips. The face bores lie where they are drilled, seen from the
 * face the map is for.
 */
export function panelFigure(view: MapView): PanelFigure {
  const { width: W, height: H } = view.panel;
  const shapes: Shape[] = [{ kind: 'rect', x: 0, y: 0, width: W, height: H, stroke: { color: INK, width: 0.5 } }];
  const onLeft = view.referenceAt === 'left';
  const refX = onLeft ? 0 : W;
  shapes.push(line(refX, 0, refX, H, { color: INK, width: 1.2 }));
  const inward = onLeft ? 4.5 : -2.5;
  shapes.push(text(refX + inward, H - 4, 'REFERENCE EDGE (x = 0)', 2.8, INK, 'start', true));
  shapes.push(text(onLeft ? 9 : W - 9, H - 2, 'lower edge (y = 0)', 2.4, MUTED, onLeft ? 'start' : 'end'));
  for (const bore of view.edgeBores) shapes.push(hiddenPath(view, bore));
  for (const bore of view.faceBores) {
    const at = viewPoint(view, bore.x, bore.y);
    shapes.push(boreMark(bore, at.x, at.y));
  }
  for (const edge of EDGES) {
    const bores = view.edgeBores.filter((b) => b.edge === edge);
    if (bores.length > 0) shapes.push(...edgeStrip(view, edge, bores));
  }
  return { shapes, reach: figureReach(view) };
}

/** How far a map's figure reaches beyond the outline: an edge strip on each side whose edge has holes. */
export function figureReach(view: MapView): Reach {
  const reach: Reach = { left: 0, right: 0, top: 0, bottom: 0 };
  for (const edge of EDGES) if (view.edgeBores.some((b) => b.edge === edge)) reach[sheetSide(view, edge)] = STRIP_GAP + view.panel.thickness;
  return reach;
}

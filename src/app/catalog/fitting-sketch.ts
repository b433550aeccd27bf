import type { FittingPurpose } from '../../../shared/catalog/fitting';
import type { Edge } from '../../../shared/model/job-document';

/**
 * What a fitting drawing needs: its purpose (for the colour) and the numbers of its bores and keep-outs.
 * A catalog fitting is one; so is a half-filled import form, whose missing numbers are simply not drawn.
 */
export interface FittingSketch {
  purpose?: FittingPurpose | null;
  bores: readonly SketchBore[];
  keepOuts: readonly SketchKeepOut[];
}

export interface SketchBore {
  id?: string | null;
  kind: 'face' | 'edge';
  x?: number | null;
  y?: number | null;
  diameter?: number | null;
  /** An edge bore's edge, in the fitting's frame. */
  toward?: Edge | null;
}

export interface SketchKeepOut {
  x?: number | null;
  y?: number | null;
  width?: number | null;
  height?: number | null;
}

export interface Box {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** Everything in SVG coordinates: mm, y pointing down (the fitting's y is negated). */
export interface SketchGeometry {
  viewBox: string;
  /** A unit for text and marks that keeps them readable however large the fitting. */
  unit: number;
  /** The view's top left corner, where the purpose's letter goes. */
  corner: { x: number; y: number };
  span: number;
  faceBores: { id: string; cx: number; cy: number; r: number; label: string }[];
  edgeBores: { id: string; box: Box; edge: { x1: number; y1: number; x2: number; y2: number }; label: string }[];
  keepOuts: Box[];
}

const finite = (n: number | null | undefined): n is number => typeof n === 'number' && Number.isFinite(n);
const fmt = (n: number) => String(Math.round(n * 100) / 100);

/**
 * An edge bore opens on its edge and runs to its inner end at (x, y). Where that edge lies depends on
 * the panel, so the drawing shows the bore from its inner end back to the anchor's line when the anchor
 * is on the edge (an edge dowel), and otherwise a stub of two diameters with the edge marked at its end.
 */
function edgeBoreBox(x: number, y: number, d: number, toward: Edge): { box: Box; edge: SketchGeometry['edgeBores'][number]['edge'] } {
  const stub = Math.max(2 * d, 10);
  const r = d / 2;
  switch (toward) {
    case 'y0': {
      const end = y > 0 ? 0 : y - stub;
      return { box: { x: x - r, y: -y, w: d, h: y - end }, edge: { x1: x - d, y1: -end, x2: x + d, y2: -end } };
    }
    case 'y1': {
      const end = y < 0 ? 0 : y + stub;
      return { box: { x: x - r, y: -end, w: d, h: end - y }, edge: { x1: x - d, y1: -end, x2: x + d, y2: -end } };
    }
    case 'x0': {
      const end = x > 0 ? 0 : x - stub;
      return { box: { x: end, y: -y - r, w: x - end, h: d }, edge: { x1: end, y1: -y - d, x2: end, y2: -y + d } };
    }
    case 'x1': {
      const end = x < 0 ? 0 : x + stub;
      return { box: { x, y: -y - r, w: end - x, h: d }, edge: { x1: end, y1: -y - d, x2: end, y2: -y + d } };
    }
  }
}

/** Lays a fitting out around its anchor (0, 0) in a view box that holds all of it with a margin. */
export function sketchGeometry(sketch: FittingSketch): SketchGeometry {
  const faceBores: SketchGeometry['faceBores'] = [];
  const edgeBores: SketchGeometry['edgeBores'] = [];
  sketch.bores.forEach((b, i) => {
    if (!finite(b.x) || !finite(b.y) || !finite(b.diameter) || b.diameter <= 0) return;
    const id = b.id || `bore ${i + 1}`;
    if (b.kind === 'face') faceBores.push({ id, cx: b.x, cy: -b.y, r: b.diameter / 2, label: `${id} Ø${fmt(b.diameter)}` });
    else if (b.toward) edgeBores.push({ id, ...edgeBoreBox(b.x, b.y, b.diameter, b.toward), label: `${id} Ø${fmt(b.diameter)} → ${b.toward}` });
  });
  const keepOuts = sketch.keepOuts
    .filter((k) => finite(k.x) && finite(k.y) && finite(k.width) && finite(k.height) && k.width! > 0 && k.height! > 0)
    .map((k) => ({ x: k.x!, y: -(k.y! + k.height!), w: k.width!, h: k.height! }));

  const boxes: Box[] = [
    { x: 0, y: 0, w: 0, h: 0 },
    ...faceBores.map((b) => ({ x: b.cx - b.r, y: b.cy - b.r, w: 2 * b.r, h: 2 * b.r })),
    ...edgeBores.map((b) => b.box),
    ...keepOuts,
  ];
  const minX = Math.min(...boxes.map((b) => b.x));
  const minY = Math.min(...boxes.map((b) => b.y));
  const maxX = Math.max(...boxes.map((b) => b.x + b.w));
  const maxY = Math.max(...boxes.map((b) => b.y + b.h));
  // A lone shelf pin is 5 mm across: never zoom in further than a 30 mm field, so sizes compare by eye.
  const span = Math.max(maxX - minX, maxY - minY, 30);
  const margin = span * 0.12;
  const cx = (minX + maxX) / 2;
  const cy = (minY + maxY) / 2;
  const half = span / 2 + margin;
  return {
    viewBox: [cx - half, cy - half, 2 * half, 2 * half].map(fmt).join(' '),
    unit: (2 * half) / 100,
    corner: { x: cx - half, y: cy - half },
    span,
    faceBores,
    edgeBores,
    keepOuts,
  };
}

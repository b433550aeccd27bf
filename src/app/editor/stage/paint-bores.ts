import Konva from 'konva';
import { planBox, type PanelBore } from '../../../../shared/layout/bore';
import type { PanelLayout } from '../../../../shared/layout/panel-layout';
import type { Face, Panel } from '../../../../shared/model/job-document';
import { PLACEHOLDER_HALF } from './hit-index';
import { FACE_B_DASH_PX, PURPOSE_STYLES, RING_COLORS, tint } from './paint-style';
import type { View } from './view';

interface Drawn {
  node: Konva.Shape;
  key: string;
}

/** What a face bore looks like: its key changes only when its drawing does. */
function faceKey(b: Extract<PanelBore, { kind: 'face' }>, ghost: boolean): string {
  return `${b.x} ${b.y} ${b.diameter} ${b.face} ${b.purpose} ${b.through} ${ghost}`;
}

/**
 * The bores, keep-outs and placeholders of a panel, in the panel's own frame (mm) inside one group
 * whose transform is the view: panning and zooming touch one node. Nodes are kept by id and changed
 * only when their bore changed, so a drag redraws what moved, not the panel.
 */
export class BorePainter {
  private readonly world = new Konva.Group();
  private readonly drawn = new Map<string, Drawn>();

  constructor(layer: Konva.Layer) {
    layer.add(this.world);
  }

  setView(view: View): void {
    this.world.position({ x: view.x, y: view.y });
    this.world.scale({ x: view.fromB ? -view.scale : view.scale, y: -view.scale });
  }

  paint(panel: Panel, layout: PanelLayout, face: Face): void {
    const seen = new Set<string>();
    for (const bore of layout.bores) {
      const ghost = bore.kind === 'face' && bore.face !== face;
      const key = bore.kind === 'face' ? faceKey(bore, ghost) : `${planBox(bore, panel).join(' ')} ${bore.purpose}`;
      this.upsert(`bore:${bore.id}`, key, () => this.boreNode(bore, panel, ghost), seen);
    }
    for (const placed of layout.placed)
      placed.keepOuts.forEach((k, i) => {
        const ghost = k.face !== face;
        this.upsert(`keep:${placed.placement.id}:${i}`, `${k.box.join(' ')} ${ghost}`, () => keepOutNode(k.box, ghost), seen);
      });
    for (const p of layout.unknown) this.upsert(`unknown:${p.id}`, `${p.x} ${p.y}`, () => placeholderNode(p.x, p.y), seen);
    for (const [id, drawn] of this.drawn)
      if (!seen.has(id)) {
        drawn.node.destroy();
        this.drawn.delete(id);
      }
  }

  private upsert(id: string, key: string, make: () => Konva.Shape, seen: Set<string>): void {
    seen.add(id);
    const drawn = this.drawn.get(id);
    if (drawn?.key === key) return;
    drawn?.node.destroy();
    const node = make();
    this.world.add(node);
    this.drawn.set(id, { node, key });
  }

  private boreNode(bore: PanelBore, panel: Panel, ghost: boolean): Konva.Shape {
    const color = PURPOSE_STYLES[bore.purpose].color;
    if (bore.kind === 'edge') {
      const [x0, y0, x1, y1] = planBox(bore, panel);
      return new Konva.Rect({ x: x0, y: y0, width: x1 - x0, height: y1 - y0, stroke: color, strokeWidth: 1.25, strokeScaleEnabled: false, fill: tint(color, 0.75), perfectDrawEnabled: false });
    }
    return new Konva.Circle({
      x: bore.x,
      y: bore.y,
      radius: bore.diameter / 2,
      stroke: color,
      strokeWidth: 1.5,
      strokeScaleEnabled: false,
      fill: tint(color, bore.through ? 0.45 : 0.8),
      dash: bore.face === 'B' ? FACE_B_DASH_PX : undefined,
      opacity: ghost ? 0.3 : 1,
      perfectDrawEnabled: false,
    });
  }
}

function keepOutNode(box: readonly number[], ghost: boolean): Konva.Shape {
  const [x0, y0, x1, y1] = box;
  return new Konva.Rect({ x: x0, y: y0, width: x1 - x0, height: y1 - y0, stroke: '#8A857E', strokeWidth: 0.75, strokeScaleEnabled: false, dash: [3, 3], opacity: ghost ? 0.25 : 0.7, perfectDrawEnabled: false });
}

/** A placement whose fitting is missing: a crossed square, never nothing. */
function placeholderNode(x: number, y: number): Konva.Shape {
  const h = PLACEHOLDER_HALF;
  return new Konva.Line({
    points: [x - h, y - h, x + h, y - h, x + h, y + h, x - h, y + h, x - h, y - h, x + h, y + h, x - h, y + h, x + h, y - h],
    stroke: RING_COLORS.error,
    strokeWidth: 1.5,
    strokeScaleEnabled: false,
    dash: [5, 3],
    fill: tint(RING_COLORS.error, 0.9),
    closed: false,
  });
}

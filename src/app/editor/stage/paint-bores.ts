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

/** Which layers a paint changed, so that only those are drawn again. */
export interface PaintedLayers {
  bores: boolean;
  drag: boolean;
}

/** What a face bore looks like: its key changes only when its drawing does. */
function faceKey(b: Extract<PanelBore, { kind: 'face' }>, ghost: boolean): string {
  return `${b.x} ${b.y} ${b.diameter} ${b.face} ${b.purpose} ${b.through} ${ghost}`;
}

/**
 * The bores, keep-outs and placeholders of a panel, in the panel's own frame (mm) inside groups whose
 * transform is the view: panning and zooming touch two nodes. Nodes are kept by id and changed only
 * when their bore changed; what is selected lives on the drag layer, so that a drag redraws the few
 * shapes that move and leaves the panel's hundreds of bores as they were drawn.
 */
export class BorePainter {
  private readonly world = new Konva.Group();
  private readonly lifted = new Konva.Group();
  private readonly drawn = new Map<string, Drawn>();
  private changed: PaintedLayers = { bores: false, drag: false };

  constructor(bores: Konva.Layer, drag: Konva.Layer) {
    bores.add(this.world);
    drag.add(this.lifted);
  }

  setView(view: View): void {
    for (const group of [this.world, this.lifted]) {
      group.position({ x: view.x, y: view.y });
      group.scale({ x: view.fromB ? -view.scale : view.scale, y: -view.scale });
    }
  }

  /** Brings the drawing up to the layout; `selected` holds placement ids and loose bore ids. */
  paint(panel: Panel, layout: PanelLayout, face: Face, selected: { placements: ReadonlySet<string>; bores: ReadonlySet<string> }): PaintedLayers {
    this.changed = { bores: false, drag: false };
    const seen = new Set<string>();
    for (const bore of layout.bores) {
      const ghost = bore.kind === 'face' && bore.face !== face;
      const key = bore.kind === 'face' ? faceKey(bore, ghost) : `${planBox(bore, panel).join(' ')} ${bore.purpose}`;
      const lift = bore.placement ? selected.placements.has(bore.placement) : selected.bores.has(bore.id);
      this.upsert(`bore:${bore.id}`, key, lift, () => this.boreNode(bore, panel, ghost), seen);
    }
    for (const placed of layout.placed)
      placed.keepOuts.forEach((k, i) => {
        const ghost = k.face !== face;
        const lift = selected.placements.has(placed.placement.id);
        this.upsert(`keep:${placed.placement.id}:${i}`, `${k.box.join(' ')} ${ghost}`, lift, () => keepOutNode(k.box, ghost), seen);
      });
    for (const p of layout.unknown) this.upsert(`unknown:${p.id}`, `${p.x} ${p.y}`, selected.placements.has(p.id), () => placeholderNode(p.x, p.y), seen);
    for (const [id, drawn] of this.drawn)
      if (!seen.has(id)) {
        this.touch(drawn.node.getParent());
        drawn.node.destroy();
        this.drawn.delete(id);
      }
    return this.changed;
  }

  private upsert(id: string, key: string, lift: boolean, make: () => Konva.Shape, seen: Set<string>): void {
    seen.add(id);
    const group = lift ? this.lifted : this.world;
    const drawn = this.drawn.get(id);
    if (drawn?.key === key) {
      if (drawn.node.getParent() === group) return;
      this.touch(drawn.node.getParent());
      drawn.node.moveTo(group);
      this.touch(group);
      return;
    }
    if (drawn) {
      this.touch(drawn.node.getParent());
      drawn.node.destroy();
    }
    const node = make();
    group.add(node);
    this.touch(group);
    this.drawn.set(id, { node, key });
  }

  private touch(group: unknown): void {
    if (group === this.world) this.changed.bores = true;
    if (group === this.lifted) this.changed.drag = true;
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

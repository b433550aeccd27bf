import Konva from 'konva';
import { planBox, type PanelBore } from '../../../../shared/layout/bore';
import type { PanelLayout } from '../../../../shared/layout/panel-layout';
import type { Face, Panel } from '../../../../shared/model/job-document';
import { PLACEHOLDER_HALF } from './hit-index';
import { FACE_B_DASH_PX, PURPOSE_STYLES, RING_COLORS, tint } from './paint-style';
import type { View } from './view';

interface Drawn {
  node: Konva.Shape;
  /** What the node was drawn from: a face bore itself (compared field by field), else a key of its look. */
  look: PanelBore | string;
  /** Drawn faint, as on the face not shown. */
  ghost: boolean;
  /** The paint that last saw it; one that no paint saw any more is removed. */
  painted: number;
}

/** Which layers a paint changed, so that only those are drawn again. */
export interface PaintedLayers {
  bores: boolean;
  drag: boolean;
}

/** Whether a face bore looks as when it was drawn: compared field by field, as a panel may hold thousands. */
function sameFace(drawn: Drawn, b: Extract<PanelBore, { kind: 'face' }>, ghost: boolean): boolean {
  const { look } = drawn;
  return (
    typeof look !== 'string' &&
    look.kind === 'face' &&
    drawn.ghost === ghost &&
    look.x === b.x &&
    look.y === b.y &&
    look.diameter === b.diameter &&
    look.face === b.face &&
    look.purpose === b.purpose &&
    look.through === b.through
  );
}

/**
 * The bores, keep-outs and placeholders of a panel, in the panel's own frame (mm) inside groups whose
 * transform is the view: panning and zooming touch two nodes. Nodes are kept by id and changed only
 * when their bore changed; what is selected lives on the live layer (under the overlay), so that a drag redraws the few
 * shapes that move and leaves the panel's hundreds of bores as they were drawn. A paint during a drag
 * walks every bore but builds nothing for those that did not change.
 */
export class BorePainter {
  private readonly world = new Konva.Group();
  private readonly lifted = new Konva.Group();
  /** Nodes by id: loose bores, the bores of placements, keep-outs and placeholders apart, as a loose bore's id may be any text. */
  private readonly drawn = { loose: new Map<string, Drawn>(), fitted: new Map<string, Drawn>(), keepOut: new Map<string, Drawn>(), unknown: new Map<string, Drawn>() };
  private painting = 0;
  /** What the loose bores were last painted from: while it holds (a drag of placements), they are not walked. */
  private looseFrom: { bores: Panel['bores']; size: string; face: Face; selected: ReadonlySet<string> } | undefined;
  private changed: PaintedLayers = { bores: false, drag: false };

  constructor(bores: Konva.Container, drag: Konva.Container) {
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
    const painting = ++this.painting;
    // The layout lists the loose bores first (panel-layout.ts), one for each of the panel's own.
    // (A bore's look depends on the board too: through or not by its thickness, an edge bore's box by its size.)
    const from = this.looseFrom;
    const size = `${panel.width} ${panel.height} ${panel.thickness}`;
    const looseKept = from !== undefined && from.bores === panel.bores && from.size === size && from.face === face && from.selected === selected.bores;
    this.looseFrom = { bores: panel.bores, size, face, selected: selected.bores };
    for (let i = looseKept ? panel.bores.length : 0; i < layout.bores.length; i++) {
      const bore = layout.bores[i];
      const nodes = i < panel.bores.length ? this.drawn.loose : this.drawn.fitted;
      const ghost = bore.kind === 'face' && bore.face !== face;
      const lift = bore.placement ? selected.placements.has(bore.placement) : selected.bores.has(bore.id);
      const drawn = nodes.get(bore.id);
      // A face bore is compared field by field, without building a key: a panel may hold thousands.
      const look = bore.kind === 'face' ? bore : `${planBox(bore, panel).join(' ')} ${bore.purpose}`;
      const same = drawn !== undefined && (bore.kind === 'face' ? sameFace(drawn, bore, ghost) : drawn.look === look);
      if (same && drawn.node.getParent() === (lift ? this.lifted : this.world)) {
        drawn.painted = painting;
        continue;
      }
      this.place(nodes, bore.id, same, { look, ghost, lift }, () => this.boreNode(bore, panel, ghost));
    }
    for (const placed of layout.placed)
      placed.keepOuts.forEach((k, i) => {
        const id = `${placed.placement.id}:${i}`;
        const ghost = k.face !== face;
        const look = `${k.box.join(' ')} ${ghost}`;
        this.place(this.drawn.keepOut, id, this.drawn.keepOut.get(id)?.look === look, { look, ghost, lift: selected.placements.has(placed.placement.id) }, () => keepOutNode(k.box, ghost));
      });
    for (const p of layout.unknown) {
      const look = `${p.x} ${p.y}`;
      this.place(this.drawn.unknown, p.id, this.drawn.unknown.get(p.id)?.look === look, { look, ghost: false, lift: selected.placements.has(p.id) }, () => placeholderNode(p.x, p.y));
    }
    for (const [kind, nodes] of Object.entries(this.drawn)) {
      if (kind === 'loose' && looseKept) continue;
      for (const [id, drawn] of nodes)
        if (drawn.painted !== painting) {
          this.touch(drawn.node.getParent());
          drawn.node.destroy();
          nodes.delete(id);
        }
    }
    return this.changed;
  }

  /** Keeps a node that still looks the same (moving it between layers if its selection changed), else draws it anew. */
  private place(nodes: Map<string, Drawn>, id: string, same: boolean, { look, ghost, lift }: { look: PanelBore | string; ghost: boolean; lift: boolean }, make: () => Konva.Shape): void {
    const group = lift ? this.lifted : this.world;
    const drawn = nodes.get(id);
    if (drawn && same) {
      drawn.painted = this.painting;
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
    nodes.set(id, { node, look, ghost, painted: this.painting });
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

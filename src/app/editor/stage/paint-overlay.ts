import Konva from 'konva';
import type { Finding } from '../../../../shared/checks';
import type { PanelLayout } from '../../../../shared/layout/panel-layout';
import type { Box, PanelBore } from '../../../../shared/layout/bore';
import { formatLength } from '../../../../shared/units/format-length';
import type { LengthUnit } from '../../../../shared/units/length-unit';
import type { Hit } from './hit-index';
import { PLACEHOLDER_HALF } from './hit-index';
import { ACCENT, LABEL_FONT, RING_COLORS } from './paint-style';
import { toScreen, type Point, type View } from './view';

/** What the overlay shows on top of the bores. */
export interface OverlayScene {
  view: View;
  layout: PanelLayout;
  findings: readonly Finding[];
  /** The selected items, the first one dimensioned. */
  selected: readonly Hit[];
  /** The anchor of the first selected item, in mm, for its dimensions. */
  anchor?: Point;
  /** A box selection being drawn, in screen px. */
  band?: { a: Point; b: Point };
  /** The member's unit, which the dimensions are written in. */
  unit: LengthUnit;
  /** The panel's own bores: the layout's first ones, drawn from them, so unchanged while this is. */
  loose: readonly unknown[];
}

function screenBox(view: View, box: Box): { x: number; y: number; width: number; height: number } {
  const a = toScreen(view, { x: box[0], y: box[1] });
  const b = toScreen(view, { x: box[2], y: box[3] });
  return { x: Math.min(a.x, b.x), y: Math.min(a.y, b.y), width: Math.abs(b.x - a.x), height: Math.abs(b.y - a.y) };
}

function label(text: string, x: number, y: number, color = ACCENT, name?: string): Konva.Label {
  const tag = new Konva.Label({ x, y, name });
  tag.add(new Konva.Tag({ fill: '#FFFFFF', opacity: 0.9, cornerRadius: 3 }));
  tag.add(new Konva.Text({ text, fontSize: 12, fontFamily: LABEL_FONT, fill: color, padding: 3 }));
  return tag;
}

/** The dimensions' words in the member's unit: `x 23 mm`, `y 12 3/8"`. The document's numbers stay in mm. */
export function dimensionTexts(anchor: Point, unit: LengthUnit): { x: string; y: string } {
  return { x: `x ${formatLength(anchor.x, unit)}`, y: `y ${formatLength(anchor.y, unit)}` };
}

/** Ordinate dimensions of the selection: x from the reference edge, y from the lower edge. */
function dimensions(layer: Konva.Container, view: View, anchor: Point, unit: LengthUnit): void {
  const p = toScreen(view, anchor);
  const edge = toScreen(view, { x: 0, y: anchor.y });
  const floor = toScreen(view, { x: anchor.x, y: 0 });
  const arrow = { stroke: ACCENT, fill: ACCENT, strokeWidth: 1, pointerLength: 6, pointerWidth: 5, pointerAtBeginning: true };
  layer.add(new Konva.Arrow({ points: [edge.x, p.y, p.x, p.y], ...arrow }));
  layer.add(new Konva.Arrow({ points: [p.x, floor.y, p.x, p.y], ...arrow }));
  const words = dimensionTexts(anchor, unit);
  layer.add(label(words.x, (edge.x + p.x) / 2 - 18, p.y - 22, ACCENT, 'dimension-x'));
  layer.add(label(words.y, p.x + 6, (floor.y + p.y) / 2 - 9, ACCENT, 'dimension-y'));
}

/** Rings around every bore a finding concerns, and around a missing fitting's placeholder; `boreOf` finds a bore by id. */
function findingRings(layer: Konva.Container, scene: OverlayScene, boreOf: (id: string) => PanelBore | undefined): void {
  const { view, layout } = scene;
  const unknown = new Map(layout.unknown.map((p) => [p.id, p]));
  const placed = new Map(layout.placed.map((p) => [p.placement.id, p]));
  for (const finding of scene.findings) {
    const stroke = RING_COLORS[finding.severity];
    for (const id of finding.bores) {
      const bore = boreOf(id);
      if (bore?.kind !== 'face') continue;
      const c = toScreen(view, bore);
      layer.add(new Konva.Circle({ x: c.x, y: c.y, radius: (bore.diameter / 2) * view.scale + 4, stroke, strokeWidth: 2.5, name: `finding-${finding.code}` }));
    }
    // A finding about whole placements (keep-outs that overlap) outlines their keep-outs.
    if (finding.bores.length === 0)
      for (const id of finding.placements)
        for (const k of placed.get(id)?.keepOuts ?? [])
          layer.add(new Konva.Rect({ ...screenBox(view, k.box), stroke, strokeWidth: 2.5, cornerRadius: 3, name: `finding-${finding.code}` }));
    for (const id of finding.placements) {
      const p = unknown.get(id);
      if (!p) continue;
      const h = PLACEHOLDER_HALF;
      const box = screenBox(view, [p.x - h, p.y - h, p.x + h, p.y + h]);
      layer.add(new Konva.Rect({ ...box, stroke, strokeWidth: 2.5, name: `finding-${finding.code}` }));
      layer.add(label(`? ${p.fitting}`, box.x, box.y + box.height + 4, stroke));
    }
  }
}

/**
 * Where the rings stand: the findings, the view, and the places of what they ring that may move. The
 * panel's own bores move only with the panel's bores; of the placements' bores, keep-outs and placeholders,
 * only those the findings name are read, so that a drag on a panel of thousands of holes does not walk them.
 */
interface RingsFrom {
  findings: readonly Finding[];
  view: View;
  loose: readonly unknown[];
  /** The named fitted bores', keep-outs' and placeholders' places. */
  places: string;
}

function ringedPlaces(scene: OverlayScene): string {
  const bores = new Set(scene.findings.flatMap((f) => f.bores));
  const placements = new Set(scene.findings.flatMap((f) => (f.bores.length === 0 ? f.placements : [])));
  const unknown = new Set(scene.findings.flatMap((f) => f.placements));
  const places: (number | string)[] = [];
  for (const placed of scene.layout.placed) {
    for (const b of placed.bores) if (bores.has(b.id) && b.kind === 'face') places.push(b.id, b.x, b.y, b.diameter);
    if (placements.has(placed.placement.id)) for (const k of placed.keepOuts) places.push(placed.placement.id, ...k.box);
  }
  for (const p of scene.layout.unknown) if (unknown.has(p.id)) places.push(p.id, p.x, p.y);
  return places.join(' ');
}

/**
 * The overlay in screen space: the finding rings, drawn again only when the findings, the view or the place
 * of something ringed changed (a drag moves the selection on every frame, rarely a ring), and the
 * selection, its dimensions and a box selection band, drawn on every paint.
 */
export class OverlayPainter {
  private readonly rings = new Konva.Group();
  private readonly marks = new Konva.Group();
  private ringsFrom: RingsFrom | undefined;
  /** Where each of the panel's own bores is in the layout's list (they come first), by id; made once for each list of them. */
  private looseAt: { loose: readonly unknown[]; index: Map<string, number> } | undefined;

  constructor(layer: Konva.Layer) {
    layer.add(this.rings, this.marks);
  }

  /**
   * A bore of the layout by id, a placement's before a loose one of the same id. The rings are built again
   * on every snap of a drag that moves a ringed fitting: finding the few named bores must not walk the
   * thousands of a perforated panel each time.
   */
  private boreFinder(scene: OverlayScene): (id: string) => PanelBore | undefined {
    const { layout, loose } = scene;
    if (this.looseAt?.loose !== loose) this.looseAt = { loose, index: new Map(layout.bores.slice(0, loose.length).map((b, i) => [b.id, i])) };
    const index = this.looseAt.index;
    const fitted = new Map(layout.placed.flatMap((p) => p.bores.map((b) => [b.id, b] as const)));
    return (id) => {
      const i = index.get(id);
      return fitted.get(id) ?? (i === undefined ? undefined : layout.bores[i]);
    };
  }

  paint(scene: OverlayScene): void {
    const from = this.ringsFrom;
    const kept = from !== undefined && from.findings === scene.findings && from.view === scene.view && from.loose === scene.loose;
    const places = ringedPlaces(scene);
    if (!kept || from.places !== places) {
      this.rings.destroyChildren();
      findingRings(this.rings, scene, this.boreFinder(scene));
      this.ringsFrom = { findings: scene.findings, view: scene.view, loose: scene.loose, places };
    }
    this.marks.destroyChildren();
    for (const hit of scene.selected)
      this.marks.add(new Konva.Rect({ ...screenBox(scene.view, hit.box), stroke: ACCENT, strokeWidth: 1.5, dash: [6, 3], cornerRadius: 2 }));
    if (scene.anchor) dimensions(this.marks, scene.view, scene.anchor, scene.unit);
    if (scene.band) {
      const { a, b } = scene.band;
      this.marks.add(new Konva.Rect({ x: Math.min(a.x, b.x), y: Math.min(a.y, b.y), width: Math.abs(b.x - a.x), height: Math.abs(b.y - a.y), stroke: ACCENT, strokeWidth: 1, fill: 'rgba(14,107,102,0.08)' }));
    }
  }
}

import { Component, computed, inject, input } from '@angular/core';
import { layoutPanel } from '../../../shared/layout/panel-layout';
import type { CarcassPlan } from '../../../shared/planner/plan-carcass';
import { PURPOSE_ORDER, PURPOSE_STYLES } from '../../../shared/export/palette';
import { CatalogStore } from '../catalog/catalog-store';
import { Lengths } from '../ui/lengths';

interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
  kind: string;
}

/** The gap between the front and the section, mm. */
const GAP = 160;

/**
 * The planned carcass drawn to scale in millimetres: its front (carcass parts, fronts dashed over them,
 * hinge cups) and, beside it, the left side seen from inside with every bore coloured by purpose.
 */
@Component({
  selector: 'bw-carcass-drawing',
  templateUrl: './carcass-drawing.html',
  styleUrl: './carcass-drawing.scss',
})
export class CarcassDrawing {
  readonly plan = input.required<CarcassPlan>();
  private readonly catalog = inject(CatalogStore).catalog;
  protected readonly lengths = inject(Lengths);

  protected readonly styles = PURPOSE_STYLES;
  protected readonly legend = PURPOSE_ORDER.filter((p) => p !== 'loose').map((p) => PURPOSE_STYLES[p]);

  protected readonly geometry = computed(() => {
    const { input, box, panels } = this.plan();
    const { width: W, height: H, depth: D } = input;
    const T = box.thickness;
    const kick = input.mounting.type === 'kickboard' ? input.mounting.height : 0;
    const flipY = (y: number, h = 0) => H - y - h;
    const parts: Rect[] = [
      { x: 0, y: 0, w: T, h: H, kind: 'part' },
      { x: W - T, y: 0, w: T, h: H, kind: 'part' },
      { x: T, y: 0, w: W - 2 * T, h: T, kind: 'part' },
      { x: T, y: H - T, w: W - 2 * T, h: T, kind: 'part' },
      ...this.plan().shelves.map((s) => ({ x: T, y: s.kind === 'fixed' ? s.y.value - T / 2 : s.y.value + 2.5, w: W - 2 * T, h: T, kind: 'part' })),
    ];
    if (kick > 0) parts.push({ x: 0, y: -kick, w: W, h: kick, kind: 'kick' });
    const fronts: Rect[] = [];
    const cups: { x: number; y: number }[] = [];
    for (const [i, door] of this.plan().doors.entries()) {
      const w = door.width.value;
      const left = T - door.hinge.overlay.value + i * (w + (W - 2 * (T - door.hinge.overlay.value) - 2 * w));
      fronts.push({ x: left, y: door.dy.value, w, h: door.height.value, kind: 'front' });
      const hingeOnLeft = door.hangsOn.endsWith('-left');
      const cx = hingeOnLeft ? left + door.hinge.cupFromEdge.value : left + w - door.hinge.cupFromEdge.value;
      cups.push(...door.hinges.map((h) => ({ x: cx, y: door.dy.value + h.cup.value })));
    }
    const flap = this.plan().flap;
    if (flap) {
      const r = (W - flap.length.value) / 2;
      // A flap hangs from the top: over the whole carcass, or over the top section of one in sections.
      fronts.push({ x: r, y: H - r - flap.height.value, w: flap.length.value, h: flap.height.value, kind: 'front' });
      cups.push(...flap.hinges.map((h) => ({ x: r + h.cup.value, y: H - r - flap.hinge.cupFromEdge.value })));
    }
    for (const [i, drawer] of this.plan().drawers.entries()) {
      const r = W - drawer.width.value;
      fronts.push({ x: r / 2, y: r / 2 + i * (drawer.height.value + r), w: drawer.width.value, h: drawer.height.value, kind: 'front' });
    }
    const left = panels.find((p) => p.role === 'side');
    const bores = left ? layoutPanel(left, this.catalog(), input.system).bores.filter((b) => b.kind === 'face') : [];
    const sectionX = W + GAP;
    return {
      viewBox: `-40 -40 ${W + GAP + Math.max(D, 480) + 80} ${H + kick + 110}`,
      W,
      H,
      D,
      sectionX,
      labelY: H + kick + 40,
      parts: parts.map((p) => ({ ...p, y: flipY(p.y, p.h) })),
      fronts: fronts.map((f) => ({ ...f, y: flipY(f.y, f.h) })),
      cups: cups.map((c) => ({ x: c.x, y: flipY(c.y) })),
      bores: bores.map((b) => ({ x: sectionX + b.x, y: flipY(b.y), r: Math.max(b.diameter / 2, 3), style: PURPOSE_STYLES[b.purpose] })),
      rows: [box.rows.front.value, box.rows.rear.value].map((x) => sectionX + x),
      back: input.back.type === 'none' ? undefined : { x: sectionX + D - box.backAllowance.value, w: input.back.type === 'inset' ? T : 6 },
    };
  });
}

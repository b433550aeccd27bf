import { Component, computed, input } from '@angular/core';
import { planBox, type Box } from '../../../shared/layout/bore';
import { PURPOSE_STYLES } from '../../../shared/export/palette';
import type { PanelSwap, SwapBore } from '../../../shared/swap/swap-report';

/** Room around the holes of a placement, mm; and the least a view spans, so a small pattern is not blown up. */
const MARGIN = 12;
const LEAST = 40;
/** Screen pixels per mm at most, and the largest drawing in pixels; a narrow screen shrinks it further. */
const SCALE = 3;
const MAX_WIDTH = 1100;
const MAX_HEIGHT = 240;

interface Mark {
  id: string;
  face: boolean;
  x: number;
  y: number;
  r: number;
  box: Box;
  faceB: boolean;
}

function mark(bore: SwapBore, panel: { width: number; height: number }): Mark {
  const box = planBox(bore, panel);
  const face = bore.kind === 'face';
  // An edge bore is drawn as its path in plan; its marks (ring, cross) sit on the middle of that path.
  const [x, y] = face ? [bore.x, bore.y] : [(box[0] + box[2]) / 2, (box[1] + box[3]) / 2];
  return { id: bore.id, face, x, y, r: bore.diameter / 2, box, faceB: face && bore.face === 'B' };
}

/**
 * One swapped placement of a panel drawn to scale, seen on face A with y up: the panel's holes there now
 * ghosted, the holes reused outlined in their purpose's colour, the new ones filled in the accent colour,
 * a clash ringed red, an old hole left unused crossed (and ringed red, dashed, when it would show).
 */
@Component({
  selector: 'bw-swap-drawing',
  templateUrl: './swap-drawing.html',
  styleUrls: ['./swap-marks.scss', './swap-drawing.scss'],
})
export class SwapDrawing {
  readonly swap = input.required<PanelSwap>();
  readonly placement = input.required<string>();

  protected readonly view = computed(() => {
    const { panel, existing, reused, clashing, unused } = this.swap();
    const id = this.placement();
    const mine = (b: SwapBore) => b.placement === id;
    const marks = {
      existing: existing.map((b) => mark(b, panel)),
      reused: reused.filter((r) => mine(r.bore)).map((r) => ({ ...mark(r.bore, panel), color: PURPOSE_STYLES[r.bore.purpose].color })),
      new: this.swap().new.filter((n) => mine(n.bore)).map((n) => mark(n.bore, panel)),
      clashing: clashing.filter((c) => mine(c.bore)).map((c) => mark(c.bore, panel)),
      unused: unused.filter((u) => mine(u.bore)).map((u) => ({ ...mark(u.bore, panel), visible: u.visible })),
    };
    const focus = [...marks.reused, ...marks.new, ...marks.clashing, ...marks.unused].map((m) => m.box);
    let [minX, minY, maxX, maxY] = focus.reduce<Box>(
      (acc, b) => [Math.min(acc[0], b[0]), Math.min(acc[1], b[1]), Math.max(acc[2], b[2]), Math.max(acc[3], b[3])],
      [Infinity, Infinity, -Infinity, -Infinity],
    );
    [minX, minY, maxX, maxY] = [minX - MARGIN, minY - MARGIN, maxX + MARGIN, maxY + MARGIN];
    const grow = (lo: number, hi: number): [number, number] => (hi - lo >= LEAST ? [lo, hi] : [(lo + hi - LEAST) / 2, (lo + hi + LEAST) / 2]);
    [minX, maxX] = grow(minX, maxX);
    [minY, maxY] = grow(minY, maxY);
    const [w, h] = [maxX - minX, maxY - minY];
    const scale = Math.min(SCALE, MAX_WIDTH / w, MAX_HEIGHT / h);
    return {
      viewBox: `${minX} ${-maxY} ${w} ${h}`,
      width: Math.round(w * scale),
      height: Math.round(h * scale),
      panel,
      marks,
      caption: `${id}: x ${Math.round(Math.max(minX, 0))} to ${Math.round(Math.min(maxX, panel.width))}, y ${Math.round(Math.max(minY, 0))} to ${Math.round(Math.min(maxY, panel.height))} mm`,
    };
  });
}

import Konva from 'konva';
import { holeHeights, type SystemGrid } from '../../../../shared/grid/system-grid';
import { ACCENT, BOARD_FILL, GRID_INK, INK, LABEL_FONT, MUTED } from './paint-style';
import { toScreen, type View } from './view';

/**
 * The board, its reference edge and the 32 mm system: outline, rows as lines and every system hole as
 * a small ring. Drawn in screen space, as it is redrawn only when the view or the panel's size changes.
 * Into a group of its own, below the bores on the same layer.
 */
export function paintGrid(group: Konva.Group, panel: { width: number; height: number; reference: string }, grid: SystemGrid | undefined, view: View): void {
  group.destroyChildren();
  const at = (x: number, y: number) => toScreen(view, { x, y });
  const a = at(0, 0);
  const b = at(panel.width, panel.height);
  const left = Math.min(a.x, b.x);
  group.add(
    new Konva.Rect({ x: left, y: b.y, width: Math.abs(b.x - a.x), height: a.y - b.y, fill: BOARD_FILL, stroke: INK, strokeWidth: 1.5, shadowColor: '#000', shadowOpacity: 0.08, shadowBlur: 8 }),
  );
  // The reference edge: a strong line and its name, so that x is never read from the wrong edge.
  group.add(new Konva.Line({ points: [a.x, a.y, a.x, b.y], stroke: ACCENT, strokeWidth: 4 }));
  const label = new Konva.Text({ text: `${panel.reference} (x = 0)`, fontSize: 11, fontFamily: LABEL_FONT, fill: ACCENT });
  label.position({ x: a.x - label.width() / 2, y: b.y - 18 });
  group.add(label);
  const lower = new Konva.Text({ text: 'Lower edge (y = 0)', fontSize: 11, fontFamily: LABEL_FONT, fill: MUTED });
  lower.position({ x: (a.x + b.x) / 2 - lower.width() / 2, y: a.y + 6 });
  group.add(lower);
  if (!grid) return;
  const heights = holeHeights(grid);
  const rows = grid.rows.map((rowX) => heights.map((y) => at(rowX, y)));
  for (const row of rows) {
    const [first, last] = [row[0], row.at(-1)];
    if (first && last) group.add(new Konva.Line({ points: [first.x, first.y, last.x, last.y], stroke: GRID_INK, strokeWidth: 1, dash: [2, 3] }));
  }
  // Each system hole a small cross, so that a drilled hole (a circle) never looks like a planned one;
  // one shape for all of them, and only where they are far enough apart to read.
  if (grid.pitch * view.scale < 6) return;
  const arm = 3;
  group.add(
    new Konva.Shape({
      stroke: GRID_INK,
      strokeWidth: 1,
      sceneFunc: (ctx, shape) => {
        ctx.beginPath();
        for (const c of rows.flat()) {
          ctx.moveTo(c.x - arm, c.y);
          ctx.lineTo(c.x + arm, c.y);
          ctx.moveTo(c.x, c.y - arm);
          ctx.lineTo(c.x, c.y + arm);
        }
        ctx.strokeShape(shape);
      },
    }),
  );
}

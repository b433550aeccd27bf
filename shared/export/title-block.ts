import { line, text, type Shape } from './drawing';
import { carcassName, dateText, faceText, materialName, type ExportContext } from './export-context';
import type { MapView } from './map-view';
import { INK, MUTED } from './palette';
import { fitText } from './text-width';
import { lengthText } from './units';

const CELL_W = 38;
const CELL_H = 9;
const TITLE_BLOCK_WIDTH = 5 * CELL_W;

/**
 * The title block of a drilling map, drawn from its top left: the panel's name large, then job, carcass,
 * panel, size, material, thickness, face, date, version and what made it. Every value is plain text.
 */
export function titleBlock(ctx: ExportContext, view: MapView): { shapes: Shape[]; width: number; height: number } {
  const { panel } = view;
  const version = ctx.panelVersion?.(panel.id);
  const cells: [string, string][] = [
    ['Job', ctx.job.name],
    ['Carcass', carcassName(ctx, panel)],
    ['Panel', `${panel.id} (${panel.role})`],
    ['Size (x × y)', `${lengthText(panel.width)} × ${lengthText(panel.height)} mm`],
    ['Material', materialName(ctx, panel)],
    ['Thickness', `${lengthText(panel.thickness)} mm`],
    ['Face', faceText(panel.role, view.face)],
    ['Date', dateText(ctx.date)],
    ['Version', version === undefined ? 'from a job file' : `panel version ${version}`],
    ['Made by', `${ctx.generator.name} ${ctx.generator.version}`],
  ];
  const frame = { color: INK, width: 0.35 };
  const head = 11;
  const height = head + 2 * CELL_H;
  const shapes: Shape[] = [
    { kind: 'rect', x: 0, y: 0, width: TITLE_BLOCK_WIDTH, height, stroke: frame },
    text(2, 7.5, fitText(`${panel.name}: drilling map, face ${view.face}`, 5, TITLE_BLOCK_WIDTH - 4), 5, INK),
    line(0, head, TITLE_BLOCK_WIDTH, head, frame),
    line(0, head + CELL_H, TITLE_BLOCK_WIDTH, head + CELL_H, { color: MUTED, width: 0.15 }),
  ];
  cells.forEach(([label, value], i) => {
    const x = (i % 5) * CELL_W;
    const y = head + Math.floor(i / 5) * CELL_H;
    if (i % 5 > 0) shapes.push(line(x, y, x, y + CELL_H, { color: MUTED, width: 0.15 }));
    shapes.push(text(x + 1.5, y + 3, label, 2.2, MUTED), text(x + 1.5, y + 7.4, fitText(value, 3.2, CELL_W - 3), 3.2, INK));
  });
  return { shapes, width: TITLE_BLOCK_WIDTH, height };
}

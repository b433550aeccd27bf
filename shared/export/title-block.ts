import { handText } from '../layout/side-hand';
import type { Face } from '../model/job-document';
import { line, text, type Shape } from './drawing';
import { carcassName, dateText, type ExportContext, exportUnit, faceText, materialName } from './export-context';
import { ERROR_RED, INK, MUTED } from './palette';
import type { PanelDrilling } from './panel-drilling';
import { estimateTextWidth, fitText } from './text-width';
import { sizeText } from './units';

const CELL_W = 38;
const CELL_H = 9;
const COLUMNS = 5;
const TITLE_BLOCK_WIDTH = COLUMNS * CELL_W;
const HEAD = 11;
const VALUE_SIZE = 3.2;
const MIN_VALUE_SIZE = 2.4;

/** What a panel's files say of the checks: "has errors" with their count, or that there are none. */
export function checksText(drilling: PanelDrilling): string {
  return drilling.errors > 0 ? `HAS ERRORS (${drilling.errors}): see the cover sheet` : 'no errors';
}

/**
 * The title block of a drilling map, drawn from its top left: the panel's name large (and HAS ERRORS in red
 * when the checks found any on it), then job, carcass, panel, size, material, thickness, face, which side
 * of the carcass a side is, date, version, what made it and the checks' word. Every value is plain text.
 */
export function titleBlock(ctx: ExportContext, drilling: PanelDrilling, face: Face): { shapes: Shape[]; width: number; height: number } {
  const { panel } = drilling;
  const version = ctx.panelVersion?.(panel.id);
  const unit = exportUnit(ctx);
  // Row by row, five columns wide; the side and the checks take more room than one cell.
  const cells: { label: string; value: string; span?: number; color?: string; shrink?: boolean }[] = [
    { label: 'Job', value: ctx.job.name },
    { label: 'Carcass', value: carcassName(ctx, panel) },
    { label: 'Panel', value: `${panel.id} (${panel.role})` },
    { label: 'Size (x × y)', value: sizeText([panel.width, panel.height], unit), shrink: true },
    { label: 'Material', value: materialName(ctx, panel) },
    { label: 'Thickness', value: sizeText([panel.thickness], unit) },
    { label: 'Face up', value: faceText(panel.role, face) },
    { label: 'Date', value: dateText(ctx.date) },
    { label: 'Version', value: version === undefined ? 'from a job file' : `panel version ${version}` },
    { label: 'Made by', value: `${ctx.generator.name} ${ctx.generator.version}` },
    { label: 'Hand', value: handText(panel, drilling.hand) ?? `none told (${panel.role})`, span: 2 },
    { label: 'Checks', value: checksText(drilling), span: 3, color: drilling.errors > 0 ? ERROR_RED : INK },
  ];
  const frame = { color: INK, width: 0.35 };
  const rows = Math.ceil(cells.reduce((n, c) => n + (c.span ?? 1), 0) / COLUMNS);
  const height = HEAD + rows * CELL_H;
  const flag = drilling.errors > 0 ? 'HAS ERRORS' : '';
  const shapes: Shape[] = [
    { kind: 'rect', x: 0, y: 0, width: TITLE_BLOCK_WIDTH, height, stroke: frame },
    text(2, 7.5, fitText(`${panel.name}: drilling map, face ${face}`, 5, TITLE_BLOCK_WIDTH - 4 - (flag ? 36 : 0)), 5, INK),
    line(0, HEAD, TITLE_BLOCK_WIDTH, HEAD, frame),
  ];
  if (flag) shapes.push(text(TITLE_BLOCK_WIDTH - 2, 7.8, flag, 5, ERROR_RED, 'end'));
  for (let r = 1; r < rows; r++) shapes.push(line(0, HEAD + r * CELL_H, TITLE_BLOCK_WIDTH, HEAD + r * CELL_H, { color: MUTED, width: 0.15 }));
  let column = 0;
  for (const { label, value, span = 1, color = INK, shrink = false } of cells) {
    const x = (column % COLUMNS) * CELL_W;
    const y = HEAD + Math.floor(column / COLUMNS) * CELL_H;
    if (x > 0) shapes.push(line(x, y, x, y + CELL_H, { color: MUTED, width: 0.15 }));
    // A size in fractional inches is longer than in mm: it gets a smaller type before it would be cut short.
    const room = span * CELL_W - 3;
    const size = shrink ? Math.max(MIN_VALUE_SIZE, Math.min(VALUE_SIZE, (VALUE_SIZE * room) / estimateTextWidth(value, VALUE_SIZE))) : VALUE_SIZE;
    shapes.push(text(x + 1.5, y + 3, label, 2.2, MUTED), text(x + 1.5, y + 7.4, fitText(value, size, room), size, color));
    column += span;
  }
  return { shapes, width: TITLE_BLOCK_WIDTH, height };
}

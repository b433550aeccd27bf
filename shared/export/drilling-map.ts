import type { PanelBore } from '../layout/bore';
import type { Panel } from '../model/job-document';
import { checkBarBlock } from './check-bar';
import { text, translate, type Drawing, type Shape } from './drawing';
import { fittingNameOf, type ExportContext } from './export-context';
import { boreGroups, boreTable } from './map-bore-table';
import { ordinateDimensions } from './map-dimensions';
import { legend } from './map-legend';
import { panelFigure } from './map-panel';
import { mapViews, type MapView } from './map-view';
import { INK } from './palette';
import { titleBlock } from './title-block';

const MARGIN = 10;
const GAP = 10;
const NOTE_SIZE = 3.2;

interface Block {
  shapes: Shape[];
  width: number;
  height: number;
}

/** What the map is and what it is not: seen from which face, and the other face's bores left to their own map. */
function viewNotes(view: MapView): string[] {
  const notes = [`Seen from face ${view.face}, full size (1:1). Every x is measured from the reference edge, every y from the lower edge.`];
  if (view.otherFaceCount > 0) {
    const other = view.face === 'A' ? 'B' : 'A';
    const bores = `${view.otherFaceCount} bore${view.otherFaceCount === 1 ? '' : 's'}`;
    notes.push(`Face ${other} has ${bores} of its own, on the face ${other} map: do not drill ${view.otherFaceCount === 1 ? 'it' : 'them'} from this side.`);
  }
  return notes;
}

/**
 * Lays blocks out in rows no wider than `width` (a block wider than that gets a row of its own), from the
 * top left. Returns the shapes and the height used.
 */
function flow(blocks: readonly Block[], width: number): { shapes: Shape[]; width: number; height: number } {
  const shapes: Shape[] = [];
  let x = 0;
  let y = 0;
  let rowHeight = 0;
  let used = 0;
  for (const block of blocks) {
    if (x > 0 && x + block.width > width) {
      y += rowHeight + GAP;
      x = 0;
      rowHeight = 0;
    }
    shapes.push(...translate(block.shapes, x, y));
    used = Math.max(used, x + block.width);
    x += block.width + GAP;
    rowHeight = Math.max(rowHeight, block.height);
  }
  return { shapes, width: used, height: y + rowHeight };
}

/**
 * One drilling map at full size (1:1, millimetres): across the top the title block, the bore table, the
 * legend and a 100 mm check bar; below them the panel with its bores and edge strips and the ordinate
 * dimensions from the reference edge and the lower edge. The sheet is as wide as the panel needs.
 */
function drillingMap(ctx: ExportContext, view: MapView): Drawing {
  const figure = panelFigure(view);
  const dims = ordinateDimensions(view, figure.reach);
  const { reach } = dims;
  const figureWidth = reach.left + view.panel.width + reach.right;
  const blocks = [titleBlock(ctx, view), boreTable(boreGroups(view, fittingNameOf(ctx, view.panel))), legend(), checkBarBlock()];
  const band = flow(blocks, Math.max(figureWidth, ...blocks.map((b) => b.width)));
  const notes = viewNotes(view);
  const notesTop = MARGIN + band.height + 8;
  const ox = MARGIN + reach.left;
  const oy = notesTop + 5 * notes.length + reach.top;
  const shapes: Shape[] = [
    ...translate(band.shapes, MARGIN, MARGIN),
    ...notes.map((note, i) => text(MARGIN, notesTop + 5 * i, note, NOTE_SIZE, INK)),
    ...translate([...figure.shapes, ...dims.shapes], ox, oy),
  ];
  return {
    width: MARGIN + Math.max(band.width, figureWidth) + MARGIN,
    height: oy + view.panel.height + reach.bottom + MARGIN,
    title: `${ctx.job.name}: ${view.panel.name}, face ${view.face}`,
    shapes,
  };
}

/** The drilling maps of a panel: face A's, and face B's when it has bores of its own. */
export function panelDrillingMaps(ctx: ExportContext, panel: Panel, bores: readonly PanelBore[]): Drawing[] {
  return mapViews(panel, bores).map((view) => drillingMap(ctx, view));
}

import { handText } from '../layout/side-hand';
import { checkBarBlock } from './check-bar';
import { text, translate, type Drawing, type Shape } from './drawing';
import { type ExportContext, exportUnit, faceText, fittingNameOf } from './export-context';
import { boreGroups, boreTable, type BoreGroup } from './map-bore-table';
import type { LengthUnit } from '../units/length-unit';
import { ordinateDimensions, ordinateReach } from './map-dimensions';
import { legend } from './map-legend';
import { figureReach, panelFigure } from './map-panel';
import { mapViews, type MapView } from './map-view';
import { INK } from './palette';
import type { PanelDrilling } from './panel-drilling';
import { titleBlock } from './title-block';

const MARGIN = 10;
const GAP = 10;
const NOTE_SIZE = 3.2;

export interface Block {
  shapes: Shape[];
  width: number;
  height: number;
}

/** What the map is and what it is not: seen from which face, and the other face's holes left to their own map. */
function viewNotes(view: MapView): string[] {
  const notes = [`Seen from face ${view.face}, full size (1:1). Every x is measured from the reference edge, every y from the lower edge.`];
  if (view.otherFaceCount > 0) {
    const other = view.face === 'A' ? 'B' : 'A';
    const holes = `${view.otherFaceCount} hole${view.otherFaceCount === 1 ? '' : 's'}`;
    notes.push(`Face ${other} has ${holes} of its own, on the face ${other} map: do not drill ${view.otherFaceCount === 1 ? 'it' : 'them'} from this side.`);
  }
  return notes;
}

/**
 * The line every template page and the map's notes carry, so that a hand never drills a mirrored side:
 * the face that lies up, where the reference edge is on the drawing, and which side of its carcass a side is.
 */
export function orientationText(drilling: PanelDrilling, view: MapView): string {
  const hand = handText(drilling.panel, drilling.hand);
  return [`Face ${faceText(drilling.panel.role, view.face)} up`, `reference edge (x = 0) at the ${view.referenceAt}`, ...(hand ? [hand] : [])].join(' · ');
}

/**
 * Lays blocks out in rows no wider than `width` (a block wider than that gets a row of its own), from the
 * top left. Returns the shapes and the size used.
 */
function flow(blocks: readonly Block[], width: number): Block {
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
 * The panel of a map at full size with its holes, edge strips and ordinate dimensions, from the top left of
 * all it reaches: what the template sheets tile, and nothing else.
 */
export function mapFigure(view: MapView, unit: LengthUnit): Block {
  const figure = panelFigure(view);
  const dims = ordinateDimensions(view, figure.reach, unit);
  return { shapes: translate([...figure.shapes, ...dims.shapes], dims.reach.left, dims.reach.top), ...mapFigureSize(view, unit) };
}

/** The size of a map's figure, worked out without drawing it: what the cover sheet counts template pages by. */
export function mapFigureSize(view: MapView, unit: LengthUnit): { width: number; height: number } {
  const reach = ordinateReach(view, figureReach(view), unit);
  return { width: reach.left + view.panel.width + reach.right, height: reach.top + view.panel.height + reach.bottom };
}

/** What goes beside the figure: the title block, the bore table's groups, the legend, a 100 mm check bar and the notes. */
export function mapBlocks(ctx: ExportContext, drilling: PanelDrilling, view: MapView): { title: Block; groups: BoreGroup[]; legend: Block; checkBar: Block; notes: string[] } {
  return {
    title: titleBlock(ctx, drilling, view.face),
    groups: boreGroups(view, fittingNameOf(ctx, view.panel), exportUnit(ctx)),
    legend: legend(),
    checkBar: checkBarBlock(),
    notes: [orientationText(drilling, view), ...viewNotes(view)],
  };
}

/** The title of a map, as its SVG and its template pages name it. */
export function mapTitle(ctx: ExportContext, view: MapView): string {
  return `${ctx.job.name}: ${view.panel.name}, face ${view.face}`;
}

/**
 * One drilling map on one sheet at full size (1:1, millimetres): across the top the title block, the bore
 * table, the legend and a 100 mm check bar; below them the notes and the figure. The sheet is as wide as
 * the panel needs.
 */
function drillingMap(ctx: ExportContext, drilling: PanelDrilling, view: MapView): Drawing {
  const figure = mapFigure(view, exportUnit(ctx));
  const blocks = mapBlocks(ctx, drilling, view);
  const all = [blocks.title, boreTable(blocks.groups, exportUnit(ctx)), blocks.legend, blocks.checkBar];
  const band = flow(all, Math.max(figure.width, ...all.map((b) => b.width)));
  const notesTop = MARGIN + band.height + 8;
  const figureTop = notesTop + 5 * blocks.notes.length;
  const shapes: Shape[] = [
    ...translate(band.shapes, MARGIN, MARGIN),
    ...blocks.notes.map((note, i) => text(MARGIN, notesTop + 5 * i, note, NOTE_SIZE, INK)),
    ...translate(figure.shapes, MARGIN, figureTop),
  ];
  return {
    width: MARGIN + Math.max(band.width, figure.width) + MARGIN,
    height: figureTop + figure.height + MARGIN,
    title: mapTitle(ctx, view),
    shapes,
  };
}

/** The drilling maps of a panel: face A's, and face B's when it has holes of its own. */
export function panelDrillingMaps(ctx: ExportContext, drilling: PanelDrilling): Drawing[] {
  return mapViews(drilling).map((view) => drillingMap(ctx, drilling, view));
}

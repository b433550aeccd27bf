import { text } from './drawing';
import { mapBlocks, type Block } from './drilling-map';
import { exportUnit, type ExportContext } from './export-context';
import { boreTable } from './map-bore-table';
import type { MapView } from './map-view';
import { PageFlow } from './page-flow';
import { INK, MUTED } from './palette';
import type { PanelDrilling } from './panel-drilling';
import { PAPER, type PaperName } from './paper';
import { TILE_OVERLAP, type TilePlan } from './tiles';

const MARGIN = 10;
/** Bore table rows per block: a block never runs past a page, however many ways a panel is drilled. */
const TABLE_ROWS = 30;

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/**
 * The leading sheet (or sheets) of a map's templates: the title block, what the template pages after it
 * are and how to join them, the orientation, the bore table, the legend and a 100 mm check bar, set down
 * pages of the paper so that no block is cut by a page edge. The tiled pages then carry the panel alone.
 */
export function templateInfo(ctx: ExportContext, drilling: PanelDrilling, view: MapView, plan: TilePlan, paper: PaperName): PageFlow {
  const { width, height } = PAPER[paper];
  const flow = new PageFlow(width, height, MARGIN);
  const blocks = mapBlocks(ctx, drilling, view);
  const place = (block: Block) => flow.place(block.shapes, block.height);
  flow.place([text(0, 6, `Template sheets, face ${view.face}: read this sheet first`, 5.5, INK)], 10);
  place(blocks.title);
  flow.gap(4);
  const pages = plan.tiles.length;
  flow.paragraph(
    `The ${plural(pages, 'page')} after this one show the panel at full size (1:1), ${plural(plan.cols, 'column')} by ${plural(plan.rows, 'row')}, ${plan.orientation}. ` +
      `Neighbouring pages share a ${TILE_OVERLAP} mm strip: cut along the dashed edge, lay the page on the grey strip of the one before and match the square marks.`,
    3.3,
  );
  for (const note of blocks.notes) flow.paragraph(note, 3.3, note === blocks.notes[0] ? INK : MUTED);
  flow.gap(4);
  const { groups } = blocks;
  for (let i = 0; i === 0 || i < groups.length; i += TABLE_ROWS) place(boreTable(groups.slice(i, i + TABLE_ROWS), exportUnit(ctx)));
  flow.gap(6);
  place(blocks.legend);
  flow.gap(6);
  place(blocks.checkBar);
  flow.paragraph('Every page of these templates carries a 100 mm bar across and one down: measure both on each page before drilling from it.', 3, MUTED);
  return flow;
}

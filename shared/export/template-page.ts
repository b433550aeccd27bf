import { checkBarSymbol } from './check-bar';
import { line, text, type Shape, type SymbolShape } from './drawing';
import { ERROR_RED, INK, MUTED } from './palette';
import { PAGE_MARGIN } from './paper';
import { fitText } from './text-width';
import { TILE_OVERLAP, tileName, type Tile, type TilePlan } from './tiles';

/** What is printed around the map on a template page: `under` goes beneath the map, `over` on top of it. */
export interface PageFurniture {
  under: Shape[];
  over: Shape[];
}

/** The words every template page carries: print at actual size. */
const PRINT_AT_ACTUAL_SIZE = 'Print at actual size (100 %): no scaling, no "fit to page".';

const MARK = 6;
/**
 * A registration mark: a square with two opposite quarters filled. Square and filled, so that no one takes
 * it for a bore, which is always a circle with a fine cross.
 */
const MARK_SHAPES: Shape[] = [
  { kind: 'rect', x: 0, y: 0, width: MARK, height: MARK, stroke: { color: INK, width: 0.25 } },
  { kind: 'rect', x: 0, y: 0, width: MARK / 2, height: MARK / 2, fill: INK },
  { kind: 'rect', x: MARK / 2, y: MARK / 2, width: MARK / 2, height: MARK / 2, fill: INK },
];

/** A registration mark centred on (x, y): printed on both pages of a seam at the same place of the map. */
function registrationMark(x: number, y: number): SymbolShape {
  return { kind: 'symbol', id: 'registration-mark', x: x - MARK / 2, y: y - MARK / 2, drawing: { width: MARK, height: MARK, title: 'registration mark', shapes: MARK_SHAPES } };
}

const tileCell = (plan: TilePlan) => Math.min(5, 44 / plan.cols, 16 / plan.rows);
/** How much of the header's width the small map of the tiles and its `rows × cols` take, mm. */
const tileMapWidth = (plan: TilePlan) => tileCell(plan) * plan.cols + 14;

/** The small map of the tiles in the header, right-aligned at `right`: every page a cell, this one filled. */
function tileMap(plan: TilePlan, tile: Tile, right: number, top: number): Shape[] {
  const cell = tileCell(plan);
  const width = cell * plan.cols;
  const height = cell * plan.rows;
  const left = right - width;
  const ink = { color: INK, width: 0.15 };
  // The grid is the same on every page of the plan: a symbol, drawn once per file.
  const grid: Shape[] = [];
  for (let c = 0; c <= plan.cols; c++) grid.push(line(c * cell, 0, c * cell, height, ink));
  for (let r = 0; r <= plan.rows; r++) grid.push(line(0, r * cell, width, r * cell, ink));
  return [
    { kind: 'symbol', id: `tile-map ${plan.rows}x${plan.cols}`, x: left, y: top, drawing: { width, height, title: 'tiles', shapes: grid } },
    { kind: 'rect', x: left + tile.col * cell, y: top + tile.row * cell, width: cell, height: cell, fill: INK },
    text(left - 1.5, top + 3, `${plan.rows} × ${plan.cols}`, 2.6, MUTED, 'end'),
  ];
}

function neighbours(plan: TilePlan, tile: Tile): string {
  const { row, col } = tile;
  const parts = [
    col > 0 ? `left ${tileName(row, col - 1)}` : '',
    col < plan.cols - 1 ? `right ${tileName(row, col + 1)}` : '',
    row > 0 ? `above ${tileName(row - 1, col)}` : '',
    row < plan.rows - 1 ? `below ${tileName(row + 1, col)}` : '',
  ].filter((p) => p !== '');
  return parts.length === 0 ? 'A single page: nothing to join.' : `Joins ${parts.join(', ')}. Cut along the dashed edge, lay it on the grey strip of the page before and match the square marks.`;
}

/** What every page of one map's templates says of the panel besides its title. */
export interface PageFacts {
  /** The map's title: job, panel and face. */
  title: string;
  /** The face up, where the reference edge is and a side's hand (drilling-map.ts `orientationText`). */
  orientation: string;
  /** The checks' word when they found errors on the panel; none otherwise. */
  errors?: string;
}

/**
 * The marks of one template page, in the page's mm: its label (what, which tile, which page), the face up
 * with the reference edge and a side's hand, "has errors" when the panel has, the words "print at actual
 * size (100 %)", a small map of the tiles, a 100 mm check bar across and one down, the grey overlap strips
 * the next pages are laid on, dashed cut edges and the registration marks.
 */
export function templatePage(plan: TilePlan, tile: Tile, facts: PageFacts, page: number, pages: number): PageFurniture {
  const w = plan.window;
  const under: Shape[] = [];
  const over: Shape[] = [{ kind: 'rect', x: w.x, y: w.y, width: w.width, height: w.height, stroke: { color: MUTED, width: 0.2 } }];
  const grey = '#E6E6E6';
  const last = { col: tile.col === plan.cols - 1, row: tile.row === plan.rows - 1 };
  if (!last.col) under.push({ kind: 'rect', x: w.x + w.width - TILE_OVERLAP, y: w.y, width: TILE_OVERLAP, height: w.height, fill: grey });
  if (!last.row) under.push({ kind: 'rect', x: w.x, y: w.y + w.height - TILE_OVERLAP, width: w.width, height: TILE_OVERLAP, fill: grey });
  const cut = { color: INK, width: 0.3, dash: [3, 1.5] };
  if (tile.col > 0) over.push(line(w.x, w.y, w.x, w.y + w.height, cut));
  if (tile.row > 0) over.push(line(w.x, w.y, w.x + w.width, w.y, cut));

  // Marks sit mid-strip on every seam, at a quarter and three quarters along it, in the map's frame.
  const { area } = tile;
  const onPage = (u: number, v: number) => registrationMark(w.x + u - area.x, w.y + v - area.y);
  const half = TILE_OVERLAP / 2;
  const down = [area.y + area.height / 4, area.y + (3 * area.height) / 4];
  const across = [area.x + area.width / 4, area.x + (3 * area.width) / 4];
  if (tile.col > 0) down.forEach((v) => over.push(onPage(area.x + half, v)));
  if (!last.col) down.forEach((v) => over.push(onPage(area.x + area.width - half, v)));
  if (tile.row > 0) across.forEach((u) => over.push(onPage(u, area.y + half)));
  if (!last.row) across.forEach((u) => over.push(onPage(u, area.y + area.height - half)));

  const right = plan.pageWidth - PAGE_MARGIN;
  const textWidth = right - PAGE_MARGIN - tileMapWidth(plan);
  const name = tileName(tile.row, tile.col);
  const heading = facts.errors ? `${facts.errors} · ${name}: ${facts.title}` : `${name}: ${facts.title}`;
  over.push(
    text(PAGE_MARGIN, PAGE_MARGIN + 5, fitText(heading, 4.2, textWidth), 4.2, facts.errors ? ERROR_RED : INK),
    text(PAGE_MARGIN, PAGE_MARGIN + 10.5, fitText(facts.orientation, 3, textWidth), 3, INK),
    text(PAGE_MARGIN, PAGE_MARGIN + 15.5, fitText(PRINT_AT_ACTUAL_SIZE, 3.2, textWidth), 3.2, INK),
    text(PAGE_MARGIN, PAGE_MARGIN + 20.5, fitText(`Row ${tile.row + 1} of ${plan.rows}, column ${tile.col + 1} of ${plan.cols}; page ${page} of ${pages}. Check both 100 mm bars before drilling.`, 3, textWidth), 3, INK),
    text(PAGE_MARGIN, PAGE_MARGIN + 25, fitText(neighbours(plan, tile), 2.5, right - PAGE_MARGIN), 2.5, MUTED),
    ...tileMap(plan, tile, right, PAGE_MARGIN),
    checkBarSymbol(w.x, w.y + w.height + 3, true),
    checkBarSymbol(PAGE_MARGIN + 1.5, w.y, false),
  );
  return { under, over };
}

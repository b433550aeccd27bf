import { PAPER, templateWindow, type PaperName, type Rect } from './paper';

/** How much each template page repeats of its neighbour, mm: the strip the next page is laid on. */
export const TILE_OVERLAP = 10;

/** One page of a tiled map: its place in the grid and the part of the map it shows. */
export interface Tile {
  row: number;
  col: number;
  /** The map area the page shows, in the map's mm. */
  area: Rect;
}

export interface TilePlan {
  orientation: 'portrait' | 'landscape';
  /** Page size in mm as printed. */
  pageWidth: number;
  pageHeight: number;
  window: Rect;
  rows: number;
  cols: number;
  /** Row by row, left to right. */
  tiles: Tile[];
}

/** How many steps of `window − overlap` cover `length` with every page overlapping the next. */
function count(length: number, window: number): number {
  return Math.max(1, Math.ceil((length - TILE_OVERLAP) / (window - TILE_OVERLAP)));
}

function plan(mapWidth: number, mapHeight: number, pageWidth: number, pageHeight: number, orientation: TilePlan['orientation']): TilePlan {
  const window = templateWindow(pageWidth, pageHeight);
  const cols = count(mapWidth, window.width);
  const rows = count(mapHeight, window.height);
  const tiles: Tile[] = [];
  for (let row = 0; row < rows; row++) {
    for (let col = 0; col < cols; col++) {
      const x = col * (window.width - TILE_OVERLAP);
      const y = row * (window.height - TILE_OVERLAP);
      tiles.push({ row, col, area: { x, y, width: window.width, height: window.height } });
    }
  }
  return { orientation, pageWidth, pageHeight, window, rows, cols, tiles };
}

/**
 * Tiles a map of any size onto pages of the paper, portrait or landscape, whichever needs fewer pages
 * (portrait when equal). Neighbouring pages share a strip of TILE_OVERLAP mm, so a panel larger than any
 * sheet still prints whole.
 */
export function planTiles(mapWidth: number, mapHeight: number, paper: PaperName): TilePlan {
  const { width, height } = PAPER[paper];
  const portrait = plan(mapWidth, mapHeight, width, height, 'portrait');
  const landscape = plan(mapWidth, mapHeight, height, width, 'landscape');
  return landscape.tiles.length < portrait.tiles.length ? landscape : portrait;
}

/** A tile's name on the page and in the small map of tiles: row letter and column number, `B3`; rows past Z go on AA, AB… */
export function tileName(row: number, col: number): string {
  let letters = '';
  for (let n = row + 1; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return `${letters}${col + 1}`;
}

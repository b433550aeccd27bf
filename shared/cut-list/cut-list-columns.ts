/**
 * The columns of a cut list and the header names each answers to. Headers are matched after folding:
 * lower case, a unit in brackets or a trailing "mm" dropped, runs of spaces, "_" and "-" made one space,
 * so `Panel_Name`, `WIDTH (mm)` and ` qty ` all match.
 */
export const CUT_LIST_COLUMNS = ['name', 'width', 'height', 'thickness', 'material', 'quantity'] as const;
export type CutListColumn = (typeof CUT_LIST_COLUMNS)[number];

/** The header the app's own template and messages use for each column. */
export const COLUMN_HEADERS: Record<CutListColumn, string> = {
  name: 'panel name',
  width: 'width',
  height: 'height',
  thickness: 'thickness',
  material: 'material',
  quantity: 'quantity',
};

/**
 * Aliases spreadsheets commonly use. A cut list's "length" is the panel's height (y) here: the trade
 * writes length × width, and our frame puts the longer run of a side or shelf along y (design.md §3).
 */
const ALIASES: Record<CutListColumn, readonly string[]> = {
  name: ['panel name', 'name', 'panel', 'part', 'part name', 'description'],
  width: ['width', 'w'],
  height: ['height', 'h', 'length', 'l'],
  thickness: ['thickness', 't', 'thk', 'thick'],
  material: ['material', 'material id', 'board', 'board material'],
  quantity: ['quantity', 'qty', 'count', 'pieces', 'pcs', 'number'],
};

const BY_ALIAS = new Map(CUT_LIST_COLUMNS.flatMap((column) => ALIASES[column].map((alias) => [alias, column] as const)));

/** A header cell as it is matched: `" Width (mm) "` → `"width"`. */
export function foldHeader(header: string): string {
  return header
    .toLowerCase()
    .replace(/\(\s*mm\s*\)|\[\s*mm\s*\]/g, ' ')
    .replace(/[\s_-]+/g, ' ')
    .trim()
    .replace(/ mm$/, '');
}

/** The column a header names, if any. */
export function columnOf(header: string): CutListColumn | undefined {
  return BY_ALIAS.get(foldHeader(header));
}

/** The accepted names of every column, for a message about a header that matches none. */
export function acceptedHeaders(): string {
  return CUT_LIST_COLUMNS.map((column) => `${COLUMN_HEADERS[column]} (or ${ALIASES[column].filter((a) => a !== COLUMN_HEADERS[column]).join(', ')})`).join('; ');
}

import Papa from 'papaparse';
import { displayName, type Material, type PanelRole } from '../model/job-document';
import { acceptedHeaders, columnOf, COLUMN_HEADERS, CUT_LIST_COLUMNS, type CutListColumn } from './cut-list-columns';
import { CUT_LIST_MAX_NAME, CUT_LIST_MAX_PANELS, CUT_LIST_MAX_QUANTITY, CUT_LIST_MAX_ROWS, fitsOnSheet, LARGEST_SHEETS, roleFromName } from './cut-list-rules';

/** One line of a cut list: its cells as text, the values read from them, the role its name suggests, and what is wrong with it. */
export interface CutListRow {
  /** The row as a spreadsheet numbers it: the header is row 1. */
  row: number;
  name: string;
  width: number | null;
  height: number | null;
  thickness: number | null;
  /** The job's material id, when the cell names one of the job's materials (by id or by name). */
  material: string | null;
  quantity: number | null;
  role: PanelRole;
  /** The cells as they were in the file, by column; a formula stays the literal text. */
  cells: Record<CutListColumn, string>;
  errors: string[];
}

/** A parsed cut list: its rows, each with its errors, and the problems of the file as a whole. */
export interface CutList {
  rows: CutListRow[];
  /** Problems of the whole file: the header, the separator, too many rows or panels. */
  problems: string[];
  /** Panels the rows would create, counting each valid row's quantity. */
  panelCount: number;
}

const SEPARATORS = [',', ';', '\t'] as const;
const SEPARATOR_NAMES: Record<(typeof SEPARATORS)[number], string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };

/**
 * The separator is read from the header line, which holds only column names: whichever of comma,
 * semicolon and tab it uses most. Spreadsheets in countries that write a decimal comma save "CSV"
 * with semicolons, so guessing from the data lines (`18,5;…`) could mistake a decimal comma for one.
 */
function separatorOf(text: string): (typeof SEPARATORS)[number] {
  const header = text.slice(0, text.search(/\r?\n|$/));
  const count = (sep: string) => header.split(sep).length - 1;
  return SEPARATORS.reduce((best, sep) => (count(sep) > count(best) ? sep : best));
}

type Read<T> = { value: T } | { error: string };

/**
 * A length or count as written in a cell. A decimal point is always accepted; a decimal comma only in a
 * semicolon- or tab-separated file, where it cannot be a separator (a comma file writes `18.5`).
 * Thousands separators are not accepted: `1.200` would be 1.2 mm to some and 1200 mm to others.
 */
function readNumber(cell: string, decimalComma: boolean): Read<number> {
  const text = cell.trim();
  if (text === '') return { error: 'is empty' };
  if (!/^[+-]?(\d+([.,]\d+)?)$/.test(text)) return { error: `"${text}" is not a number` };
  if (text.includes(',') && !decimalComma) return { error: `"${text}" has a decimal comma; in a comma-separated file write a decimal point (${text.replace(',', '.')})` };
  return { value: Number(text.replace(',', '.')) };
}

function materialList(materials: readonly Material[]): string {
  return materials.map((m) => `${m.id} (${m.name}, ${m.thickness} mm)`).join(', ');
}

/** Finds a job material by its id or its name, ignoring case and surrounding spaces. */
function findMaterial(cell: string, materials: readonly Material[]): Material | undefined {
  const wanted = cell.trim().toLowerCase();
  return materials.find((m) => m.id.toLowerCase() === wanted) ?? materials.find((m) => m.name.trim().toLowerCase() === wanted);
}

/** Checks one row's cells against the job; every problem is listed, each led by its column. */
function readRow(row: number, cells: Record<CutListColumn, string>, materials: readonly Material[], decimalComma: boolean): CutListRow {
  const errors: string[] = [];
  const number = (column: 'width' | 'height' | 'thickness' | 'quantity'): number | null => {
    const read = readNumber(cells[column], decimalComma);
    if ('error' in read) {
      errors.push(`${COLUMN_HEADERS[column]}: ${read.error}`);
      return null;
    }
    return read.value;
  };

  const name = cells.name.trim();
  const nameCheck = displayName.max(CUT_LIST_MAX_NAME, `must be at most ${CUT_LIST_MAX_NAME} characters`).safeParse(name);
  if (!nameCheck.success) errors.push(`${COLUMN_HEADERS.name}: ${nameCheck.error.issues[0].message}`);

  const sizes = (['width', 'height', 'thickness'] as const).map((column) => {
    const value = number(column);
    if (value !== null && value <= 0) {
      errors.push(`${COLUMN_HEADERS[column]}: must be greater than 0 mm (it is ${value})`);
      return null;
    }
    return value;
  });
  const [width, height, thickness] = sizes;
  if (width !== null && height !== null && !fitsOnSheet(width, height)) {
    const sheets = LARGEST_SHEETS.map(([long, short]) => `${long} × ${short}`).join(' or ');
    errors.push(`width × height: ${width} × ${height} mm is larger than the largest sheet (${sheets} mm)`);
  }

  const material = findMaterial(cells.material, materials);
  if (cells.material.trim() === '') errors.push(`${COLUMN_HEADERS.material}: is empty; this job's materials are ${materialList(materials)}`);
  else if (!material) errors.push(`${COLUMN_HEADERS.material}: this job has no material "${cells.material.trim()}"; its materials are ${materialList(materials)}`);
  else if (thickness !== null && thickness !== material.thickness)
    errors.push(`${COLUMN_HEADERS.thickness}: ${material.name} comes in ${material.thickness} mm only, not ${thickness} mm`);

  let quantity = number('quantity');
  if (quantity !== null && !(Number.isInteger(quantity) && quantity >= 1 && quantity <= CUT_LIST_MAX_QUANTITY)) {
    errors.push(`${COLUMN_HEADERS.quantity}: must be a whole number from 1 to ${CUT_LIST_MAX_QUANTITY} (it is ${cells.quantity.trim()})`);
    quantity = null;
  }

  return { row, name, width, height, thickness, material: material?.id ?? null, quantity, role: roleFromName(name), cells, errors };
}

/** The header's columns by position, or the problems that keep the file from being read. */
function readHeader(header: readonly string[]): { columns: (CutListColumn | undefined)[]; problems: string[] } {
  const problems: string[] = [];
  const columns = header.map((cell) => columnOf(cell));
  header.forEach((cell, i) => {
    if (columns[i] === undefined && cell.trim() !== '') problems.push(`The header names a column "${cell.trim()}" that a cut list does not have.`);
  });
  for (const column of CUT_LIST_COLUMNS) {
    const at = columns.flatMap((c, i) => (c === column ? [i + 1] : []));
    if (at.length === 0) problems.push(`The header has no "${COLUMN_HEADERS[column]}" column.`);
    if (at.length > 1) problems.push(`The header names the "${COLUMN_HEADERS[column]}" column ${at.length} times (columns ${at.join(', ')}).`);
  }
  if (problems.length > 0) problems.push(`A cut list's header names these columns, in any order, in upper or lower case: ${acceptedHeaders()}.`);
  return { columns, problems };
}

/**
 * Reads a cut list (CSV text: a header row, then a row per panel) against the job's materials. Every
 * cell is read as text; nothing in a cell is ever evaluated, so `=HYPERLINK(…)` is a name like any
 * other. A UTF-8 BOM is dropped; the separator is a comma, semicolon or tab (see `separatorOf`).
 * Rows with nothing in them are skipped.
 */
export function parseCutList(text: string, materials: readonly Material[]): CutList {
  const source = text.replace(/^\uFEFF/, '');
  const separator = separatorOf(source);
  const parsed = Papa.parse<string[]>(source, { delimiter: separator, skipEmptyLines: false });
  const [header = [], ...records] = parsed.data;
  const { columns, problems } = readHeader(header);
  if (header.every((cell) => cell.trim() === '')) return { rows: [], problems: ['The file is empty: a cut list starts with a header row.'], panelCount: 0 };

  const lines = records.map((cells, i) => ({ row: i + 2, cells })).filter(({ cells }) => cells.some((cell) => cell.trim() !== ''));
  if (lines.length === 0) problems.push('The file has a header but no rows.');
  if (lines.length > CUT_LIST_MAX_ROWS) {
    problems.push(`The file has ${lines.length} rows; a cut list may have at most ${CUT_LIST_MAX_ROWS}. Split it into several files.`);
    return { rows: [], problems, panelCount: 0 };
  }

  // papaparse counts records from 0 at the header; a spreadsheet counts rows from 1.
  const quoteErrors = new Map<number, string>();
  for (const error of parsed.errors) if (error.row !== undefined) quoteErrors.set(error.row + 1, error.message);

  const rows = lines.map(({ row, cells }) => {
    const byColumn = Object.fromEntries(CUT_LIST_COLUMNS.map((c) => [c, ''])) as Record<CutListColumn, string>;
    cells.forEach((cell, i) => {
      const column = columns[i];
      if (column) byColumn[column] = cell;
    });
    const read = readRow(row, byColumn, materials, separator !== ',');
    if (cells.length !== header.length) {
      read.errors.unshift(`has ${cells.length} cells where the header has ${header.length} (is a ${SEPARATOR_NAMES[separator]} missing or extra?)`);
    }
    const quoteError = quoteErrors.get(row);
    if (quoteError) read.errors.unshift(`cannot be read: ${quoteError}`);
    return read;
  });

  const panelCount = rows.reduce((sum, r) => sum + (r.errors.length === 0 ? (r.quantity ?? 0) : 0), 0);
  const asked = rows.reduce((sum, r) => sum + (r.quantity ?? 0), 0);
  if (asked > CUT_LIST_MAX_PANELS) problems.push(`The rows ask for ${asked} panels; one import may create at most ${CUT_LIST_MAX_PANELS}.`);
  return { rows, problems, panelCount };
}

/** True when nothing in the cut list stands in the way of importing it. */
export function isImportable(list: CutList): boolean {
  return list.problems.length === 0 && list.rows.length > 0 && list.rows.every((r) => r.errors.length === 0);
}

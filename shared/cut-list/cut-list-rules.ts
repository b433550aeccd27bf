import type { PanelRole } from '../model/job-document';

/** A cut list file may be this large; a 500-row list is about 25 kB, so 1 MB refuses only what is not a cut list. */
export const CUT_LIST_MAX_BYTES = 1024 * 1024;
/** Rows per import: a whole kitchen is well under 200 lines. */
export const CUT_LIST_MAX_ROWS = 500;
/** Copies one row may ask for. */
export const CUT_LIST_MAX_QUANTITY = 100;
/** Panels one import may create, all rows together. */
export const CUT_LIST_MAX_PANELS = 2000;
/** A copy's name gets " 12" added, and a panel name is at most 200 characters (job-document.ts). */
export const CUT_LIST_MAX_NAME = 190;

/**
 * The largest common sheet goods, long side × short side, mm (common practice, from memory: 2800 × 2070
 * particleboard and MDF, 3050 × 1250 plywood and compact sheets). A panel must fit one of them.
 */
export const LARGEST_SHEETS: readonly (readonly [number, number])[] = [
  [2800, 2070],
  [3050, 1250],
];

/** True when a panel of these sizes can be cut from one of the largest sheets, turned either way. */
export function fitsOnSheet(width: number, height: number): boolean {
  const [long, short] = width >= height ? [width, height] : [height, width];
  return LARGEST_SHEETS.some(([sheetLong, sheetShort]) => long <= sheetLong && short <= sheetShort);
}

/** Words in a panel's name that say its role; the first found wins. `drawer front` is two words. */
const ROLE_WORDS: readonly [RegExp, PanelRole][] = [
  [/\bdrawer[\s-]*fronts?\b/, 'drawer-front'],
  [/\bdoors?\b/, 'door'],
  [/\bflaps?\b/, 'flap'],
  [/\bshel(f|ves)\b/, 'shelf'],
  [/\bsides?\b/, 'side'],
  [/\btops?\b/, 'top'],
  [/\bbottoms?\b/, 'bottom'],
  [/\bbacks?\b/, 'back'],
  [/\b(kickboards?|plinths?)\b/, 'kickboard'],
];

/**
 * The role a cut list panel gets: the one its name says ("Left side", "Shelf", "Drawer front 2"),
 * else `loose`. A cut list has no carcasses, so its panels belong to none; the designer changes a
 * role in the panel form when the guess is wrong, and the preview shows each guess before import.
 */
export function roleFromName(name: string): PanelRole {
  const folded = name.toLowerCase();
  return ROLE_WORDS.find(([words]) => words.test(folded))?.[1] ?? 'loose';
}

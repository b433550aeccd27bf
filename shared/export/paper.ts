/** The paper a template is printed on. */
export type PaperName = 'a4' | 'letter';

export interface PaperSize {
  name: string;
  /** Portrait width and height in mm. */
  width: number;
  height: number;
}

/** A4 is 210 × 297 mm (ISO 216); US Letter 8.5 × 11 in, 215.9 × 279.4 mm (ANSI/ASME Y14.1). */
export const PAPER: Readonly<Record<PaperName, PaperSize>> = {
  a4: { name: 'A4', width: 210, height: 297 },
  letter: { name: 'US Letter', width: 215.9, height: 279.4 },
};

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Most printers leave a border of 4 to 6 mm unprinted; 8 mm keeps every mark on the paper. */
export const PAGE_MARGIN = 8;
/** Bands around the window: the page label on top, the check bar down the left and across the bottom. */
const HEADER = 29;
const LEFT_BAND = 12;
const FOOTER = 14;

/** Where the drilling map shows through on a template page of this size, in mm from its top left. */
export function templateWindow(pageWidth: number, pageHeight: number): Rect {
  return {
    x: PAGE_MARGIN + LEFT_BAND,
    y: PAGE_MARGIN + HEADER,
    width: pageWidth - 2 * PAGE_MARGIN - LEFT_BAND,
    height: pageHeight - 2 * PAGE_MARGIN - HEADER - FOOTER,
  };
}

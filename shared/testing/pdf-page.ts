import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';

/** A PDF transform matrix [a b c d e f]. */
type Matrix = [number, number, number, number, number, number];

const multiply = (m: Matrix, n: Matrix): Matrix => [
  m[0] * n[0] + m[2] * n[1],
  m[1] * n[0] + m[3] * n[1],
  m[0] * n[2] + m[2] * n[3],
  m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4],
  m[1] * n[4] + m[3] * n[5] + m[5],
];

/** How many numbers each path operator of pdfjs-dist's `constructPath` takes. */
const PATH_ARGS = new Map<number, number>([
  [OPS.moveTo, 2],
  [OPS.lineTo, 2],
  [OPS.curveTo, 6],
  [OPS.curveTo2, 4],
  [OPS.curveTo3, 4],
  [OPS.closePath, 0],
  [OPS.rectangle, 4],
]);

/**
 * A path's box [x0 y0 x1 y1] from its points, Bézier control points included: a curve lies within them,
 * and a circle drawn as four quarter arcs reaches exactly their box. (pdfjs-dist's own box leaves curves out.)
 */
function pathBox(ops: readonly number[], coords: readonly number[]): [number, number, number, number] {
  const xs: number[] = [];
  const ys: number[] = [];
  let at = 0;
  for (const op of ops) {
    const n = PATH_ARGS.get(op) ?? 0;
    const a = coords.slice(at, at + n);
    at += n;
    if (op === OPS.rectangle) {
      xs.push(a[0], a[0] + a[2]);
      ys.push(a[1], a[1] + a[3]);
    } else {
      for (let i = 0; i < n; i += 2) {
        xs.push(a[i]);
        ys.push(a[i + 1]);
      }
    }
  }
  return [Math.min(...xs), Math.min(...ys), Math.max(...xs), Math.max(...ys)];
}

/** A path's bounding box in points, in the page's own space (origin bottom left), and how it was filled. */
export interface PdfPath {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  /** Filled in pure black (as QR modules and check-bar blocks are). */
  filledBlack: boolean;
  /** Drawn with curves (a circle is four quarter arcs), not straight lines and rectangles alone. */
  curved: boolean;
}

const CURVES = new Set<number>([OPS.curveTo, OPS.curveTo2, OPS.curveTo3]);

/**
 * One page of a PDF as pdfjs-dist, an outside reader, draws it: every path's box with transforms and form
 * XObjects followed, the page's text, its height in points and the document's page count.
 */
export async function readPdfPage(bytes: Uint8Array, pageNumber: number): Promise<{ paths: PdfPath[]; text: string; heightPt: number; pages: number }> {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  const page = await doc.getPage(pageNumber);
  const { fnArray, argsArray } = await page.getOperatorList();
  const paths: PdfPath[] = [];
  let ctm: Matrix = [1, 0, 0, 1, 0, 0];
  let black = false;
  const stack: { ctm: Matrix; black: boolean }[] = [];
  fnArray.forEach((fn, i) => {
    const args = argsArray[i];
    if (fn === OPS.save || fn === OPS.paintFormXObjectBegin) stack.push({ ctm, black });
    if (fn === OPS.restore || fn === OPS.paintFormXObjectEnd) ({ ctm, black } = stack.pop()!);
    if (fn === OPS.transform) ctm = multiply(ctm, args as Matrix);
    if (fn === OPS.paintFormXObjectBegin && args[0]) ctm = multiply(ctm, args[0] as Matrix);
    if (fn === OPS.setFillRGBColor) black = [0, 1, 2].every((k) => (args as Record<number, number>)[k] === 0);
    if (fn === OPS.constructPath) {
      const [x0, y0, x1, y1] = pathBox(args[0] as number[], args[1] as number[]);
      const a = multiply(ctm, [1, 0, 0, 1, x0, y0]);
      const b = multiply(ctm, [1, 0, 0, 1, x1, y1]);
      const curved = (args[0] as number[]).some((op) => CURVES.has(op));
      paths.push({ x0: Math.min(a[4], b[4]), y0: Math.min(a[5], b[5]), x1: Math.max(a[4], b[4]), y1: Math.max(a[5], b[5]), filledBlack: false, curved });
    }
    if ((fn === OPS.fill || fn === OPS.eoFill) && paths.length > 0) paths[paths.length - 1].filledBlack = black;
  });
  const text = (await page.getTextContent()).items.map((item) => ('str' in item ? item.str : '')).join('\n');
  return { paths, text, heightPt: page.view[3], pages: doc.numPages };
}

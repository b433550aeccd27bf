import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { deflateSync } from 'node:zlib';
import type { PanelFileOptions } from '../../shared/export/panel-files';
import type { PdfTools } from '../../shared/export/pdf-document';
import type { SvgWindow } from '../../shared/export/svg-render';
import pkg from '../../package.json';

/** The font the PDFs draw text with, shipped beside the export code with its licence. */
const FONT_URL = new URL('../../shared/export/fonts/DejaVuSans.ttf', import.meta.url);

let font: Promise<Uint8Array> | undefined;

/** The drawing font's bytes, read once. */
function drawingFont(): Promise<Uint8Array> {
  font ??= readFile(FONT_URL).then((b) => new Uint8Array(b.buffer, b.byteOffset, b.byteLength));
  return font;
}

let svgdom: Promise<typeof import('svgdom')> | undefined;

/**
 * A maker of fresh svgdom windows, one per drawing (svg.js registers its window globally). svgdom takes
 * about 200 ms and 25 MB to load, so it is loaded once, on first use.
 */
export async function svgWindows(): Promise<() => SvgWindow> {
  svgdom ??= import('svgdom');
  const { createSVGWindow } = await svgdom;
  return () => createSVGWindow();
}

/** SHA-256 of some bytes, lower-case hex. */
export function sha256Hex(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** What the PDF writer needs of Node: the drawing font and zlib's deflate. */
export async function pdfTools(): Promise<PdfTools> {
  return { fontBytes: await drawingFont(), deflate: (bytes) => deflateSync(bytes) };
}

/** Everything the files of a pack need of Node besides the paper: fonts, zlib, svgdom and SHA-256. */
export async function packTools(): Promise<Omit<PanelFileOptions, 'paper'> & { sha256: (bytes: Uint8Array) => string }> {
  return { ...(await pdfTools()), svgWindow: await svgWindows(), sha256: sha256Hex };
}

/** What made the files: the product and its version. */
export const GENERATOR = { name: 'Borewright', version: pkg.version } as const;

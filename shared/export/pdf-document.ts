import { PDFDocument, PrintScaling } from 'pdf-lib';
import type { Drawing } from './drawing';
import { embedDrawingFont } from './pdf-font';
import { PdfDrawer, type Deflate } from './pdf-render';

/** What a PDF is drawn with: given by the platform, since shared/ reads no files and has no zlib. */
export interface PdfTools {
  /** The TrueType font to draw text with (names, Ø): the product ships one. */
  fontBytes: Uint8Array;
  deflate: Deflate;
}

/** What every PDF we write is drawn with and records about itself. */
export interface PdfOptions extends PdfTools {
  title: string;
  /** The date the document records as made: the export's, so the same job gives the same file. */
  date: Date;
  /** What made the file. */
  producer: string;
}

/** A new PDF with the drawing font embedded and a drawer for it. */
export async function startPdf(options: PdfOptions): Promise<{ doc: PDFDocument; drawer: PdfDrawer }> {
  const doc = await PDFDocument.create();
  return { doc, drawer: new PdfDrawer(doc, await embedDrawingFont(doc, options.fontBytes), options.deflate) };
}

/**
 * Finishes a PDF: print scaling set to none, so that a reader's print dialog does not shrink the drawing to
 * fit, and the title, producer and dates recorded. Returns the file.
 */
export async function finishPdf(doc: PDFDocument, options: PdfOptions): Promise<Uint8Array> {
  doc.catalog.getOrCreateViewerPreferences().setPrintScaling(PrintScaling.None);
  doc.setTitle(options.title);
  doc.setProducer(options.producer);
  doc.setCreator(options.producer);
  doc.setCreationDate(options.date);
  doc.setModificationDate(options.date);
  // The whole file is written at once: a pack yields between files, and the default of pausing every
  // 50 objects only adds timer waits.
  return doc.save({ objectsPerTick: Number.POSITIVE_INFINITY });
}

/** Drawings as a PDF, each on a page of its own size at 1:1. */
export async function drawingsPdf(drawings: readonly Drawing[], options: PdfOptions): Promise<Uint8Array> {
  const { doc, drawer } = await startPdf(options);
  for (const drawing of drawings) await drawer.drawingPage(drawing);
  return finishPdf(doc, options);
}

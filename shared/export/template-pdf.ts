import type { Drawing } from './drawing';
import type { PaperName } from './paper';
import { finishPdf, startPdf, type PdfOptions } from './pdf-document';
import { templatePage } from './template-page';
import { planTiles } from './tiles';
import { mmToPt } from './units';

/**
 * Template sheets of a panel as a PDF: each drilling map at exactly 1:1 (1 mm = 72/25.4 pt), tiled onto A4
 * or US Letter pages with overlap strips, registration marks, page labels, a small map of the tiles and
 * a 100 mm check bar across and down on every page; the file asks readers not to scale it when printing.
 * Each map is stored once, as a form XObject every one of its pages shows through a clipped window.
 */
export async function templateSheetsPdf(maps: readonly Drawing[], paper: PaperName, options: PdfOptions): Promise<Uint8Array> {
  const { doc, drawer } = await startPdf(options);
  const sheets = [];
  for (const map of maps) sheets.push({ map, plan: planTiles(map.width, map.height, paper), kept: await drawer.keep(map) });
  const pages = sheets.reduce((n, s) => n + s.plan.tiles.length, 0);
  let page = 0;
  for (const { map, plan, kept } of sheets) {
    const { window: w, pageWidth, pageHeight } = plan;
    for (const tile of plan.tiles) {
      const furniture = templatePage(plan, tile, map.title, ++page, pages);
      await drawer.prepare([...furniture.under, ...furniture.over]);
      drawer.page(pageWidth, pageHeight, (content) => {
        const top = { x: 0, y: mmToPt(pageHeight) };
        drawer.draw(content, furniture.under, top);
        content.save();
        content.clipRect(mmToPt(w.x), mmToPt(pageHeight - w.y - w.height), mmToPt(w.width), mmToPt(w.height));
        // The map's top left corner lies `tile.area` before the window's top left.
        content.show(kept, mmToPt(w.x - tile.area.x), mmToPt(pageHeight - (w.y - tile.area.y + map.height)));
        content.restore();
        drawer.draw(content, furniture.over, top);
      });
    }
  }
  return finishPdf(doc, options);
}

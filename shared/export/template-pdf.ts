import { translate, type Drawing } from './drawing';
import type { LengthUnit } from '../units/length-unit';
import { mapFigure, mapFigureSize, mapTitle, orientationText } from './drilling-map';
import { exportUnit, type ExportContext } from './export-context';
import { mapViews, type MapView } from './map-view';
import type { PageFlow } from './page-flow';
import type { PanelDrilling } from './panel-drilling';
import type { PaperName } from './paper';
import { finishPdf, startPdf, type PdfOptions } from './pdf-document';
import { templateInfo } from './template-info';
import { templatePage, type PageFacts } from './template-page';
import { planTiles, type TilePlan } from './tiles';
import { checksText } from './title-block';
import { mmToPt } from './units';

/** Room left around the figure on the tiled sheets, mm, so that nothing of it lies on the window's edge. */
const FIGURE_MARGIN = 3;

/** One map's templates: its leading information sheet(s), then the figure tiled onto pages. */
export interface MapTemplate {
  facts: PageFacts;
  info: PageFlow;
  /** The panel with its holes and dimensions alone: what the pages tile. */
  figure: Drawing;
  plan: TilePlan;
}

/** The pages a map's figure is tiled onto, planned from its size alone. */
function tilePlan(view: MapView, paper: PaperName, unit: LengthUnit): TilePlan {
  const { width, height } = mapFigureSize(view, unit);
  return planTiles(width + 2 * FIGURE_MARGIN, height + 2 * FIGURE_MARGIN, paper);
}

/** Lays out the templates of each map of a panel on the paper: what the PDF prints. */
export function panelTemplates(ctx: ExportContext, drilling: PanelDrilling, paper: PaperName): MapTemplate[] {
  return mapViews(drilling).map((view) => {
    const figure = mapFigure(view, exportUnit(ctx));
    const plan = tilePlan(view, paper, exportUnit(ctx));
    const drawing: Drawing = {
      width: figure.width + 2 * FIGURE_MARGIN,
      height: figure.height + 2 * FIGURE_MARGIN,
      title: mapTitle(ctx, view),
      shapes: translate(figure.shapes, FIGURE_MARGIN, FIGURE_MARGIN),
    };
    const facts: PageFacts = { title: drawing.title, orientation: orientationText(drilling, view), ...(drilling.errors > 0 ? { errors: checksText(drilling) } : {}) };
    return { facts, info: templateInfo(ctx, drilling, view, plan, paper), figure: drawing, plan };
  });
}

/** How many pages a panel's template file has: each map's information sheets and its tiles. */
export function templatePageCount(templates: readonly Pick<MapTemplate, 'info' | 'plan'>[]): number {
  return templates.reduce((n, t) => n + t.info.pageCount + t.plan.tiles.length, 0);
}

/** How many pages a panel's template file will have, counted without drawing its figures: for the cover sheet. */
export function templateSheetCount(ctx: ExportContext, drilling: PanelDrilling, paper: PaperName): number {
  return templatePageCount(
    mapViews(drilling).map((view) => {
      const plan = tilePlan(view, paper, exportUnit(ctx));
      return { plan, info: templateInfo(ctx, drilling, view, plan, paper) };
    }),
  );
}

/**
 * Template sheets of a panel as a PDF. For each map, first its information sheet (title block, bore table,
 * legend, check bar, how to join the pages), then the panel alone at exactly 1:1 (1 mm = 72/25.4 pt),
 * tiled onto A4 or US Letter pages with overlap strips, registration marks, page labels with the face up,
 * the reference edge and a side's hand, a small map of the tiles and a 100 mm check bar across and down on
 * every page; the file asks readers not to scale it when printing. Each figure is stored once, as a form
 * XObject every one of its pages shows through a clipped window.
 */
export async function templateSheetsPdf(templates: readonly MapTemplate[], options: PdfOptions): Promise<Uint8Array> {
  const { doc, drawer } = await startPdf(options);
  const total = templatePageCount(templates);
  let page = 0;
  for (const { facts, info, figure, plan } of templates) {
    for (const sheet of info.finish(`${facts.title}, information`, `${facts.title}: read first`, { first: page + 1, total })) await drawer.drawingPage(sheet);
    page += info.pageCount;
    const kept = await drawer.keep(figure);
    const { window: w, pageWidth, pageHeight } = plan;
    for (const tile of plan.tiles) {
      const furniture = templatePage(plan, tile, facts, ++page, total);
      await drawer.prepare([...furniture.under, ...furniture.over]);
      drawer.page(pageWidth, pageHeight, (content) => {
        const top = { x: 0, y: mmToPt(pageHeight) };
        drawer.draw(content, furniture.under, top);
        content.save();
        content.clipRect(mmToPt(w.x), mmToPt(pageHeight - w.y - w.height), mmToPt(w.width), mmToPt(w.height));
        // The figure's top left corner lies `tile.area` before the window's top left.
        content.show(kept, mmToPt(w.x - tile.area.x), mmToPt(pageHeight - (w.y - tile.area.y + figure.height)));
        content.restore();
        drawer.draw(content, furniture.over, top);
      });
    }
  }
  return finishPdf(doc, options);
}

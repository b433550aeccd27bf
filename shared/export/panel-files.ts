import type { Drawing } from './drawing';
import { panelDrillingMaps } from './drilling-map';
import type { ExportContext } from './export-context';
import { mapViews } from './map-view';
import { drillingPrograms } from './drilling-programs';
import type { MachineSettings } from './machine-settings';
import { panelDxf } from './panel-dxf';
import type { PanelDrilling } from './panel-drilling';
import { PAPER, type PaperName } from './paper';
import type { PdfTools } from './pdf-document';
import { drawingToSvg, type SvgWindow } from './svg-render';
import { panelTemplates, templateSheetsPdf } from './template-pdf';
import { utf8Bytes } from './utf8';

/** One file of an export, made when asked for, so that a pack never holds all of its files at once. */
export interface ExportFile {
  /** The file's name in its folder. */
  name: string;
  /** What it is, for progress lines. */
  label: string;
  /** Whether zipping can make it smaller: a PDF is compressed already. */
  compress: boolean;
  produce: () => Promise<Uint8Array>;
}

/** What the files of a panel need besides the job. */
export interface PanelFileOptions extends PdfTools {
  paper: PaperName;
  /** A fresh SVG window for each drawing (svgdom's on the server). */
  svgWindow: () => SvgWindow;
  /** The shop's machine conventions: when given, a drilling program (G-code) per face and edge with holes. */
  machine?: MachineSettings;
}

/**
 * A panel's files: its drilling map as SVG (face A, and face B when it has holes of its own), its DXF, its
 * drilling programs when the options carry machine settings, and its template sheets as PDF, all drawn
 * from the panel's one hole list. Names start with `base`. The maps
 * are laid out when the first SVG asks for them and let go after the last.
 */
export function panelFiles(ctx: ExportContext, drilling: PanelDrilling, base: string, options: PanelFileOptions): ExportFile[] {
  const { panel } = drilling;
  let maps: Drawing[] | undefined;
  const faces = mapViews(drilling).map((view) => view.face);
  const svgs: ExportFile[] = faces.map((face, i) => ({
    name: `${base} face ${face}.svg`,
    label: `${panel.name}: drilling map, face ${face}`,
    compress: true,
    produce: async () => {
      const drawn = (maps ??= panelDrillingMaps(ctx, drilling));
      if (i === faces.length - 1) maps = undefined;
      return utf8Bytes(drawingToSvg(drawn[i], options.svgWindow()));
    },
  }));
  const paper = PAPER[options.paper].name;
  return [
    ...svgs,
    { name: `${base}.dxf`, label: `${panel.name}: DXF`, compress: true, produce: async () => utf8Bytes(panelDxf(ctx, drilling)) },
    ...(options.machine ? drillingPrograms(ctx, drilling, base, options.machine) : []),
    {
      name: `${base} templates ${paper}.pdf`,
      label: `${panel.name}: template sheets`,
      compress: false,
      produce: async () => {
        const title = `${ctx.job.name}: ${panel.name}, template sheets`;
        return templateSheetsPdf(panelTemplates(ctx, drilling, options.paper), { fontBytes: options.fontBytes, deflate: options.deflate, title, date: ctx.date, producer: `${ctx.generator.name} ${ctx.generator.version}` });
      },
    },
  ];
}

import {
  Colors,
  DxfWriter,
  LineTypes,
  LWPolylineFlags,
  point3d,
  TextHorizontalAlignment,
  TextVerticalAlignment,
  Units,
} from '@tarikjabiri/dxf';
import type { PanelBore, PanelEdgeBore } from '../layout/bore';
import type { Panel } from '../model/job-document';
import { printable } from './drawing';
import { edgeBoreLayer, faceBoreLayer, NOTES_LAYER, OUTLINE_LAYER, REFERENCE_LAYER } from './dxf-layers';
import { carcassName, materialName, type ExportContext } from './export-context';
import { lengthText, roundTo } from './units';

/** DXF writers print raw JS numbers (0.30000000000000004, 1e-7): every coordinate goes through here. */
const c = (value: number) => roundTo(value, 0.0001);
const p = (x: number, y: number) => point3d(c(x), c(y), 0);

/** Group codes of real numbers: points, distances, scales and angles (DXF reference, group code ranges). */
function isRealCode(code: number): boolean {
  return (code >= 10 && code <= 59) || (code >= 110 && code <= 149) || (code >= 210 && code <= 239);
}

/**
 * Every real value of a DXF text rounded to 0.0001: the writer also prints numbers of its own making (the
 * view's centre and height), raw. Lines come in pairs, a group code and its value.
 */
function roundReals(dxf: string): string {
  const lines = dxf.split('\n');
  for (let i = 1; i < lines.length; i += 2) {
    const value = Number(lines[i]);
    if (isRealCode(Number(lines[i - 1])) && lines[i].trim() !== '' && Number.isFinite(value)) lines[i] = String(c(value));
  }
  return lines.join('\n');
}

const TEXT = 3;
const GAP = 2;

/** Where an edge bore's rectangle lies: outside the edge it enters, as long as the bore is deep, as wide as it is. */
function edgeRectangle(bore: PanelEdgeBore, panel: Panel): [number, number, number, number] {
  const r = bore.diameter / 2;
  switch (bore.edge) {
    case 'x0':
      return [-bore.depth, bore.at - r, 0, bore.at + r];
    case 'x1':
      return [panel.width, bore.at - r, panel.width + bore.depth, bore.at + r];
    case 'y0':
      return [bore.at - r, -bore.depth, bore.at + r, 0];
    case 'y1':
      return [bore.at - r, panel.height, bore.at + r, panel.height + bore.depth];
  }
}

function addEdgeBore(dxf: DxfWriter, bore: PanelEdgeBore, panel: Panel): void {
  const layerName = edgeBoreLayer(bore.edge, bore.diameter, bore.depth);
  const [x0, y0, x1, y1] = edgeRectangle(bore, panel);
  dxf.addLWPolyline(
    [p(x0, y0), p(x1, y0), p(x1, y1), p(x0, y1)].map((point) => ({ point })),
    { flags: LWPolylineFlags.Closed, layerName },
  );
  const words = `${bore.edge.toUpperCase()} AT ${lengthText(bore.at)} H ${lengthText(bore.z)} FROM FACE A D${lengthText(bore.diameter)} DEPTH ${lengthText(bore.depth)}`;
  // The words run on from the rectangle's far end, along the bore's axis.
  const along = bore.edge === 'y0' || bore.edge === 'y1';
  const outward = bore.edge === 'x1' || bore.edge === 'y1';
  const at = along ? p(bore.at, outward ? y1 + GAP : y0 - GAP) : p(outward ? x1 + GAP : x0 - GAP, bore.at);
  dxf.addText(at, TEXT, words, {
    layerName,
    rotation: along ? 90 : 0,
    horizontalAlignment: outward ? TextHorizontalAlignment.Left : TextHorizontalAlignment.Right,
    verticalAlignment: TextVerticalAlignment.Middle,
    secondAlignmentPoint: at,
  });
}

/**
 * A panel's drilling as a DXF file (ASCII, AutoCAD 2007 format, millimetres: $INSUNITS = 4), in the panel's
 * frame seen from face A: x from the reference edge, y from the lower edge. The outline on its own layer;
 * each face bore a CIRCLE on a layer named for its face, diameter and depth (`BORE_A_D5_Z13`; face B on
 * `BORE_B_…`, in the same frame); each edge bore a rectangle outside the edge it enters, as long as it is
 * deep, with its position, height from face A and depth written beside it (`EDGE_X0_D8_Z30`).
 */
export function panelDxf(ctx: ExportContext, panel: Panel, bores: readonly PanelBore[]): string {
  const dxf = new DxfWriter();
  dxf.setUnits(Units.Millimeters);
  const layers = new Map<string, number>([
    [OUTLINE_LAYER, Colors.White],
    [REFERENCE_LAYER, Colors.Red],
    [NOTES_LAYER, Colors.White],
  ]);
  for (const b of bores) {
    if (b.kind === 'face') layers.set(faceBoreLayer(b.face, b.diameter, b.through ? 'through' : b.depth), b.face === 'A' ? Colors.Cyan : Colors.Magenta);
    else layers.set(edgeBoreLayer(b.edge, b.diameter, b.depth), Colors.Yellow);
  }
  for (const [name, color] of layers) dxf.addLayer(name, color, LineTypes.Continuous);

  const { width: W, height: H } = panel;
  dxf.addLWPolyline([p(0, 0), p(W, 0), p(W, H), p(0, H)].map((point) => ({ point })), { flags: LWPolylineFlags.Closed, layerName: OUTLINE_LAYER });
  dxf.addLine(p(0, 0), p(0, H), { layerName: REFERENCE_LAYER });
  dxf.addText(p(GAP, H / 2), TEXT, 'REFERENCE EDGE X = 0', { layerName: REFERENCE_LAYER, rotation: 90 });

  for (const b of bores) {
    if (b.kind === 'face') dxf.addCircle(p(b.x, b.y), c(b.diameter / 2), { layerName: faceBoreLayer(b.face, b.diameter, b.through ? 'through' : b.depth) });
    else addEdgeBore(dxf, b, panel);
  }

  const notes = [
    `${ctx.job.name} / ${carcassName(ctx, panel)} / ${panel.name} (${panel.id})`,
    `${lengthText(W)} x ${lengthText(H)} x ${lengthText(panel.thickness)} mm, ${materialName(ctx, panel)}`,
    'Units mm. Seen from face A: x from the reference edge (x = 0), y from the lower edge (y = 0).',
    'Face B bores (layers BORE_B_...) are drawn in the same frame, seen from face A.',
    'Layers BORE_<face>_D<diameter>_Z<depth> or _THRU; EDGE_<edge>_D<diameter>_Z<depth>.',
  ];
  const reach = Math.max(0, ...bores.filter((b): b is PanelEdgeBore => b.kind === 'edge' && b.edge === 'y1').map((b) => b.depth + 80));
  notes.forEach((note, i) => dxf.addText(p(0, H + reach + 10 + 5 * (notes.length - i)), TEXT, printable(note), { layerName: NOTES_LAYER }));
  return roundReals(dxf.stringify());
}

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
import { handText } from '../layout/side-hand';
import type { Panel } from '../model/job-document';
import { printable } from './drawing';
import { DXF_LAYER_SCHEME, holeLayer, NOTES_LAYER, OUTLINE_LAYER, REFERENCE_LAYER } from './dxf-layers';
import { carcassName, materialName, type ExportContext } from './export-context';
import { referenceAt, type EdgeHole } from './map-view';
import type { PanelDrilling } from './panel-drilling';
import type { PanelHole } from './panel-holes';
import { checksText } from './title-block';
import { lengthText, roundTo } from './units';

/** DXF writers print raw JS numbers (0.30000000000000004, 1e-7): every coordinate goes through here. */
const c = (value: number) => roundTo(value, 0.0001);

/**
 * Where a point of the panel's frame (x from the reference edge, y up from the lower edge) is drawn: as the
 * face is truly seen (map-view.ts `referenceAt`), so x runs leftward from a reference edge on the right.
 */
type Place = (x: number, y: number) => ReturnType<typeof point3d>;
function placer(panel: Panel, referenceOnRight: boolean): Place {
  return (x, y) => point3d(c(referenceOnRight ? panel.width - x : x), c(y), 0);
}

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
function edgeRectangle(bore: EdgeHole, panel: Panel): [number, number, number, number] {
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

/** The layer a hole is drawn on. */
export function layerOf(hole: PanelHole): string {
  return hole.kind === 'face' ? holeLayer(hole.face, hole.diameter, hole.through ? 'through' : hole.depth, hole.purpose) : holeLayer(hole.edge, hole.diameter, hole.depth, hole.purpose);
}

function addEdgeBore(dxf: DxfWriter, bore: EdgeHole, panel: Panel, p: Place, referenceOnRight: boolean): void {
  const layerName = layerOf(bore);
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
  // Text on an x edge runs away from the panel: rightward from the edge drawn on the right.
  const towardRight = along ? outward : outward !== referenceOnRight;
  dxf.addText(at, TEXT, words, {
    layerName,
    rotation: along ? 90 : 0,
    horizontalAlignment: towardRight ? TextHorizontalAlignment.Left : TextHorizontalAlignment.Right,
    verticalAlignment: TextVerticalAlignment.Middle,
    secondAlignmentPoint: at,
  });
}

/**
 * A panel's holes as a DXF file (ASCII, AutoCAD 2007 format, millimetres: $INSUNITS = 4), face A as it is
 * truly seen lying face up (the reference edge on the left, or on the right for a right side), x measured
 * from the reference edge, y from the lower edge. The outline on its own layer;
 * each face hole a CIRCLE, each edge hole a rectangle outside the edge it enters, as long as it is deep,
 * with its position, height from face A and depth written beside it; every hole on a layer named by our
 * scheme (dxf-layers.ts: where, diameter, depth, purpose). Face B holes are drawn in the same frame.
 */
export function panelDxf(ctx: ExportContext, drilling: PanelDrilling): string {
  const { panel, holes } = drilling;
  const dxf = new DxfWriter();
  dxf.setUnits(Units.Millimeters);
  const layers = new Map<string, number>([
    [OUTLINE_LAYER, Colors.White],
    [REFERENCE_LAYER, Colors.Red],
    [NOTES_LAYER, Colors.White],
  ]);
  for (const h of holes) layers.set(layerOf(h), h.kind === 'edge' ? Colors.Yellow : h.face === 'A' ? Colors.Cyan : Colors.Magenta);
  for (const [name, color] of layers) dxf.addLayer(name, color, LineTypes.Continuous);

  const { width: W, height: H } = panel;
  const onRight = referenceAt('A', panel.role, drilling.hand?.hand) === 'right';
  const p = placer(panel, onRight);
  dxf.addLWPolyline([p(0, 0), p(W, 0), p(W, H), p(0, H)].map((point) => ({ point })), { flags: LWPolylineFlags.Closed, layerName: OUTLINE_LAYER });
  dxf.addLine(p(0, 0), p(0, H), { layerName: REFERENCE_LAYER });
  dxf.addText(p(onRight ? GAP + TEXT : GAP, H / 2), TEXT, 'REFERENCE EDGE X = 0', { layerName: REFERENCE_LAYER, rotation: 90 });

  for (const h of holes) {
    if (h.kind === 'face') dxf.addCircle(p(h.x, h.y), c(h.diameter / 2), { layerName: layerOf(h) });
    else addEdgeBore(dxf, h, panel, p, onRight);
  }

  const hand = handText(panel, drilling.hand);
  const notes = [
    ...(drilling.errors > 0 ? [checksText(drilling).toUpperCase()] : []),
    `${ctx.job.name} / ${carcassName(ctx, panel)} / ${panel.name} (${panel.id})${hand ? ` / ${hand}` : ''}`,
    `${lengthText(W)} x ${lengthText(H)} x ${lengthText(panel.thickness)} mm, ${materialName(ctx, panel)}, ${holes.length} holes`,
    `Units mm. Seen from face A lying face up, the reference edge (x = 0) at the ${onRight ? 'RIGHT' : 'left'}: x measured from it, y from the lower edge (y = 0). Face B holes are drawn in the same view.`,
    `Hole layers: ${DXF_LAYER_SCHEME.pattern}, e.g. ${DXF_LAYER_SCHEME.examples[0]}.`,
  ];
  const reach = Math.max(0, ...holes.filter((h): h is EdgeHole => h.kind === 'edge' && h.edge === 'y1').map((h) => h.depth + 80));
  notes.forEach((note, i) => dxf.addText(point3d(0, c(H + reach + 10 + 5 * (notes.length - i)), 0), TEXT, printable(note), { layerName: NOTES_LAYER }));
  return roundReals(dxf.stringify());
}

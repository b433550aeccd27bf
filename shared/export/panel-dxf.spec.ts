import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { exportContext, exportJob } from '../testing/export-job';
import { checkedLayerName, holeLayer } from './dxf-layers';
import { jobDrilling } from './panel-drilling';
import { panelDxf } from './panel-dxf';

const ctx = exportContext(exportJob({}, [{ id: 'odd', name: 'Odd', role: 'loose', width: 300.1, height: 200.2, thickness: 18, material: 'pb18', bores: [{ id: 'h', x: 0.1 + 0.2, y: 10.000000001, face: 'A', diameter: 5, depth: 10 }] }]));

interface Entity {
  type: string;
  layer: string;
  center?: { x: number; y: number };
  radius?: number;
  vertices?: { x: number; y: number }[];
  text?: string;
}

/** Reads a DXF file with dxf-parser (npm registry), the outside reader. */
function read(panelIndex: number) {
  const drilling = jobDrilling(ctx.job, ctx.catalog, [])[panelIndex];
  const { panel, holes: bores } = drilling;
  const text = panelDxf(ctx, drilling);
  const parsed = new DxfParser().parseSync(text) as unknown as { header: Record<string, unknown>; entities: Entity[]; tables: { layer: { layers: Record<string, unknown> } } };
  return { panel, bores, text, parsed };
}

describe('panel DXF', () => {
  it('is ASCII DXF of AutoCAD 2007 in millimetres', () => {
    const { text, parsed } = read(0);
    // DXF reference, HEADER section (from memory): $ACADVER AC1021 is AutoCAD 2007, $INSUNITS 4 is millimetres.
    expect(parsed.header['$INSUNITS']).toBe(4);
    expect(parsed.header['$ACADVER']).toBe('AC1021');
    expect(/^[\x09\x0a\x0d\x20-\x7e\u00a0-\uffff]*$/.test(text)).toBe(true);
  });

  it('has a CIRCLE for every face hole, its centre and radius those of the hole, on its face, diameter, depth and purpose layer', () => {
    // The left side is drawn in the document's frame; the door hung on it, whose back is face A, is hinged on
    // the left seen from the front and so on the right seen from behind (common practice, handed parts):
    // its reference edge and every x then read from the right.
    for (const [index, onRight] of [
      [0, false],
      [2, true],
    ] as const) {
      const { panel, bores, parsed } = read(index);
      const reference = parsed.entities.find((e) => e.layer === 'REFERENCE_EDGE' && e.type === 'LINE')!;
      expect(reference.vertices!.map((v) => v.x)).toEqual(onRight ? [panel.width, panel.width] : [0, 0]);
      const drawnX = (x: number) => (onRight ? panel.width - x : x);
      const circles = parsed.entities.filter((e) => e.type === 'CIRCLE');
      const faceBores = bores.filter((b) => b.kind === 'face');
      expect(circles).toHaveLength(faceBores.length);
      for (const bore of faceBores) {
        const layer = holeLayer(bore.face, bore.diameter, bore.through ? 'through' : bore.depth, bore.purpose);
        const match = circles.find((c) => c.layer === layer && Math.abs(c.center!.x - drawnX(bore.x)) < 0.001 && Math.abs(c.center!.y - bore.y) < 0.001);
        expect(match, `circle of ${bore.id}`).toBeDefined();
        expect(Math.abs(match!.radius! - bore.diameter / 2)).toBeLessThan(0.001);
      }
    }
  });

  it('keeps face B holes on layers of their own and names layers our way: where, diameter, depth, purpose', () => {
    const { parsed } = read(0);
    const layers = Object.keys(parsed.tables.layer.layers);
    expect(layers).toEqual(
      expect.arrayContaining([
        'PANEL',
        'REFERENCE_EDGE',
        'FACE_A-DIA_5-DEPTH_13-LOOSE',
        'FACE_A-DIA_5-DEPTH_13-MOUNTING_PLATE',
        'FACE_A-DIA_5-DEPTH_13-SHELF_PIN',
        'FACE_B-DIA_8-DEPTH_11-LOOSE',
        'FACE_A-DIA_7-THROUGH-LOOSE',
        'EDGE_Y0-DIA_8-DEPTH_21-LOOSE',
        'EDGE_X1-DIA_5-DEPTH_50-LOOSE',
      ]),
    );
    // None of the BORE_<face>_D<diameter>_Z<depth> pattern some machine programs use.
    for (const layer of layers) expect(layer).not.toMatch(/^(BORE|EDGE)_[A-Z0-9]+_D[\d.]+_(Z[\d.]+|THRU)$/);
    for (const entity of parsed.entities) expect(layers).toContain(entity.layer);
  });

  it('says "has errors" first in its notes when the checks found errors on the panel', () => {
    const drilling = { ...jobDrilling(ctx.job, ctx.catalog, [])[0], errors: 2 };
    const notes = (new DxfParser().parseSync(panelDxf(ctx, drilling)) as unknown as { entities: Entity[] }).entities.filter((e) => e.layer === 'NOTES').map((e) => e.text);
    expect(notes[0]).toBe('HAS ERRORS (2): SEE THE COVER SHEET');
    expect(notes.join('\n')).toContain('LEFT side (seen from the front)');
  });

  it('draws the outline as a closed polyline of the panel size', () => {
    const { panel, parsed } = read(0);
    const outline = parsed.entities.find((e) => e.type === 'LWPOLYLINE' && e.layer === 'PANEL')!;
    expect(outline.vertices).toEqual([
      { x: 0, y: 0 },
      { x: panel.width, y: 0 },
      { x: panel.width, y: panel.height },
      { x: 0, y: panel.height },
    ]);
  });

  it('shows an edge bore outside its edge, as long as it is deep, with its position, height and depth written', () => {
    const { panel, parsed } = read(0);
    const onLayer = parsed.entities.filter((e) => e.layer === 'EDGE_X1-DIA_5-DEPTH_50-LOOSE');
    const rectangle = onLayer.find((e) => e.type === 'LWPOLYLINE')!;
    const xs = rectangle.vertices!.map((v) => v.x);
    const ys = rectangle.vertices!.map((v) => v.y);
    expect([Math.min(...xs), Math.max(...xs)]).toEqual([panel.width, panel.width + 50]);
    expect([Math.min(...ys), Math.max(...ys)]).toEqual([342.5, 347.5]);
    expect(onLayer.find((e) => e.type === 'TEXT')!.text).toBe('X1 AT 345 H 9 FROM FACE A D5 DEPTH 50');
  });

  it('rounds coordinates to 0.0001 mm: no 0.30000000000000004 or 1e-7 in the file', () => {
    const { text, parsed } = read(4);
    expect(text).not.toMatch(/\d\.\d{5,}|e-\d/);
    const circle = parsed.entities.find((e) => e.type === 'CIRCLE')!;
    expect(circle.center).toEqual({ x: 0.3, y: 10, z: 0 });
  });
});

describe('layer names', () => {
  it('are ours and refuse what a DXF reader would change', () => {
    expect(holeLayer('A', 5, 13, 'shelf-pin')).toBe('FACE_A-DIA_5-DEPTH_13-SHELF_PIN');
    expect(holeLayer('B', 7.5, 'through', 'loose')).toBe('FACE_B-DIA_7.5-THROUGH-LOOSE');
    expect(holeLayer('x0', 8, 30, 'construction')).toBe('EDGE_X0-DIA_8-DEPTH_30-CONSTRUCTION');
    expect(() => checkedLayerName('BORE A')).toThrow(/not one of ours/);
    expect(() => checkedLayerName('BORE/A')).toThrow(/not one of ours/);
  });
});

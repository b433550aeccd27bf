import { describe, expect, it } from 'vitest';
import { exportContext } from '../testing/export-job';
import type { Drawing } from './drawing';
import { panelDrillingMaps } from './drilling-map';
import { labelSheets } from './labels';
import { jobDrilling } from './panel-drilling';
import { panelDxf } from './panel-dxf';
import { panelTemplates } from './template-pdf';

const ctx = exportContext();
const inches = { ...ctx, unit: 'in-32' as const };
const side = jobDrilling(ctx.job, ctx.catalog, []).find((d) => d.panel.id === 'side-l')!;

/** Every text of a drawing, the marks it repeats included. */
function texts(drawing: Drawing): string[] {
  return drawing.shapes.flatMap((s) => (s.kind === 'text' ? [s.text] : s.kind === 'symbol' ? texts(s.drawing) : []));
}

// The side is 560 × 720 × 18 mm. With the international inch of 25.4 mm (NIST SP 811, published):
// 560 mm = 22.047 in = 705.51/32 → 706/32 = 22 1/16; 720 mm = 28.346 in = 907.09/32 → 907/32 = 28 11/32;
// 18 mm = 0.7087 in = 22.68/32 → 23/32; the front row at 37 mm = 1.4567 in = 46.61/32 → 47/32 = 1 15/32.
describe('drilling files for someone who reads inches', () => {
  it('dimension the drilling map and fill the title block in inches', () => {
    const [map] = panelDrillingMaps(inches, side);
    const words = texts(map);
    expect(words).toContain('22 1/16" × 28 11/32"'); // in smaller type than the other cells, whole
    expect(words).toContain('23/32"');
    expect(words).toContain('1 15/32"');
    expect(words).toContain('x: inches from the reference edge');
    expect(words).not.toContain('37');
    // Bits and depth stops stay metric and say so; an edge bore's height follows the unit (9 mm = 11.34/32 → 11/32).
    expect(words).toEqual(expect.arrayContaining(['8 mm', '21 mm', 'edge y0, 11/32" from face A']));
  });

  it('keep the millimetre map as it was when no unit is given', () => {
    const words = texts(panelDrillingMaps(ctx, side)[0]);
    expect(words).toContain('560 × 720 mm');
    expect(words).toContain('37');
    expect(words).toContain('x: mm from the reference edge');
    expect(words).toEqual(expect.arrayContaining(['8', '21', 'edge y0, 9 from face A']));
  });

  it('dimension the template sheets in inches, and plan their pages for the wider labels', () => {
    const [template] = panelTemplates(inches, side, 'a4');
    expect(texts(template.figure)).toContain('1 15/32"');
    expect(template.figure.width).toBeGreaterThan(panelTemplates(ctx, side, 'a4')[0].figure.width);
  });

  it('print the panel labels in inches', () => {
    const [sheet] = labelSheets({ ctx: inches, panels: [side.panel], link: undefined });
    expect(texts(sheet)).toContain('22 1/16" × 28 11/32" × 23/32" (W × H × T)');
  });

  it('leave the DXF in millimetres, as a machine reads it', () => {
    expect(panelDxf(inches, side)).toBe(panelDxf(ctx, side));
  });
});

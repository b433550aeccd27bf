import { describe, expect, it } from 'vitest';
import { BUILTIN_CATALOG_FILES, builtinCatalog } from './builtin-catalog';
import { parseFittingFile } from './parse-catalog';

describe('the built-in catalog', () => {
  it.each(Object.keys(BUILTIN_CATALOG_FILES))('%s validates', (file) => {
    const result = parseFittingFile(BUILTIN_CATALOG_FILES[file]);
    expect(result.ok ? [] : result.errors).toEqual([]);
  });

  it('holds every family the product needs, under stable ids', () => {
    const catalog = builtinCatalog();
    const purposes = new Set([...catalog.values()].map((f) => f.purpose));
    expect([...purposes].sort()).toEqual(
      ['construction', 'hinge-cup', 'lift-mechanism', 'mounting-plate', 'runner', 'shelf-pin'].sort(),
    );
    for (const id of ['hinge-full-overlay-45', 'plate-0', 'plate-2', 'shelf-pin-5', 'lift-light', 'runner-300', 'cam-15'])
      expect(catalog.has(id)).toBe(true);
  });

  it('says where every bore, keep-out and family figure comes from', () => {
    for (const f of builtinCatalog().values()) {
      const sourced: { source: string }[] = [...f.bores, ...f.keepOuts];
      if (f.purpose === 'hinge-cup') sourced.push(f.hinge);
      if (f.purpose === 'mounting-plate') sourced.push(f.plate);
      if (f.purpose === 'lift-mechanism') sourced.push(f.lift);
      if (f.purpose === 'runner') sourced.push(f.runner);
      for (const item of sourced) expect(item.source, f.id).toMatch(/trade-reference §\d|estimate|as its name says|nominal length/);
    }
  });

  it('gives cups Ø35 × 13 with the 45/9.5 or 48/6 fixing pattern', () => {
    // Cup Ø35: Popular Woodworking no. 155 (June 2006), "European Hinges" (published);
    // depth 13 and the 45/9.5 and 48/6 patterns (common practice).
    const patterns = [...builtinCatalog().values()]
      .filter((f) => f.purpose === 'hinge-cup')
      .map((f) => {
        const [cup, a, b] = f.bores;
        expect(cup).toMatchObject({ diameter: 35, depth: 13 });
        return `${Math.abs(b.y - a.y)}/${a.x - cup.x}`;
      });
    expect(patterns).toContain('45/9.5');
    expect(patterns).toContain('48/6');
  });

  it('puts a mounting plate\'s two holes 32 mm apart on one row', () => {
    // Two holes 32 mm apart on the 37 mm row: Popular Woodworking no. 155 (June 2006) (published).
    for (const id of ['plate-0', 'plate-2']) {
      const [a, b] = builtinCatalog().get(id)!.bores;
      expect(a.x).toBe(b.x);
      expect(Math.abs(b.y - a.y)).toBe(32);
    }
  });

  it('covers power factors from 500 to 4000 with lift mechanisms and no gap', () => {
    const ranges = [...builtinCatalog().values()]
      .flatMap((f) => (f.purpose === 'lift-mechanism' ? [f.lift.powerFactor] : []))
      .sort((a, b) => a.min - b.min);
    expect(ranges).toHaveLength(3);
    expect(ranges[0].min).toBeLessThanOrEqual(500);
    expect(ranges[2].max).toBeGreaterThanOrEqual(4000);
    ranges.slice(1).forEach((r, i) => expect(r.min).toBeLessThanOrEqual(ranges[i].max));
  });

  it('keeps runner screws on one row in whole pitches behind the front screw', () => {
    // Front screw on the 37 mm row, rear screws 32·k behind it (common practice).
    const runners = [...builtinCatalog().values()].filter((f) => f.purpose === 'runner');
    expect(runners).toHaveLength(3);
    for (const f of runners) for (const b of f.bores) expect([b.y, b.x % 32]).toEqual([0, 0]);
  });
});

import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { makeJob, makePanel } from '../testing/make-job';
import { applyFix } from './apply-fix';
import { findingKey } from './finding';
import { checkJob } from './index';

const catalog = builtinCatalog();

describe('applyFix', () => {
  it('moves a placement and a loose bore, and refuses an edit naming what the job does not have', () => {
    const job = makeJob([makePanel('p', { placements: [{ id: 'pin', fitting: 'shelf-pin-5', x: 37, y: 9, face: 'A' }], bores: [{ id: 'b', x: 5, y: 5, face: 'A', diameter: 5, depth: 10 }] })]);
    const moved = applyFix(job, catalog, {
      message: 'both',
      edits: [
        { kind: 'move-placement', panel: 'p', placement: 'pin', x: 37, y: 41 },
        { kind: 'move-bore', panel: 'p', bore: 'b', x: 9, y: 5 },
      ],
    });
    expect(moved?.panels[0].placements[0]).toMatchObject({ x: 37, y: 41 });
    expect(moved?.panels[0].bores[0]).toMatchObject({ x: 9, y: 5 });
    expect(job.panels[0].placements[0].y).toBe(9);
    expect(applyFix(job, catalog, { message: 'none', edits: [{ kind: 'move-placement', panel: 'p', placement: 'nope', x: 0, y: 0 }] })).toBeNull();
  });

  it('mirrors one side onto the other: the chosen purposes replaced, the rest kept', () => {
    const pin = (id: string, y: number) => ({ id, fitting: 'shelf-pin-5', x: 37, y, face: 'A' as const });
    const job = makeJob([
      makePanel('left', { placements: [pin('a', 329)] }),
      makePanel('right', { placements: [pin('b', 361), { id: 'cam', fitting: 'cam-15', x: 100, y: 24, face: 'A' }] }),
    ]);
    const after = applyFix(job, catalog, { message: 'mirror', edits: [{ kind: 'copy-side', from: 'left', to: 'right', purposes: ['shelf-pin'] }] });
    expect(after?.panels[1].placements.map((p) => `${p.id} ${p.y}`)).toEqual(['cam 24', 'a 329']);
  });
});

// Every fix offered is checked first (design.md §2): over generated panels, applying any fix leaves fewer errors
// (or as many, for a warning's fix) and never a new error or warning.
let walked = 0;
describe('every fix offered', () => {
  const at = fc.integer({ min: 0, max: 30 }).map((v) => 9 + v * 16);
  const placement = fc.record({
    fitting: fc.constantFrom('plate-0', 'shelf-pin-5', 'shelf-pin-5', 'cam-bolt', 'runner-300', 'dowel-8x30-face'),
    x: fc.constantFrom(37, 38, 69, 101, 517),
    y: at,
    face: fc.constantFrom('A' as const, 'B' as const),
  });
  const bore = fc.record({ x: fc.constantFrom(2, 37, 40, 69), y: at, face: fc.constantFrom('A' as const), diameter: fc.constantFrom(5, 8), depth: fc.constantFrom(10, 13) });
  const drilling = fc.record({ placements: fc.array(placement, { maxLength: 8 }), bores: fc.array(bore, { maxLength: 6 }) });

  test.prop([drilling], { numRuns: 120, seed: 4242 })('removes its finding and adds no error or warning', ({ placements, bores }) => {
    const job = makeJob([
      makePanel('p', {
        placements: placements.map((p, i) => ({ ...p, id: `p${i}` })),
        bores: bores.map((b, i) => ({ ...b, id: `b${i}` })),
      }),
    ]);
    const before = checkJob(job, catalog);
    const serious = (fs: typeof before) => fs.filter((f) => f.severity !== 'note');
    const known = new Set(serious(before).map(findingKey));
    const errors = before.filter((f) => f.severity === 'error').length;
    for (const finding of before) {
      for (const fix of finding.fixes) {
        walked++;
        const after = applyFix(job, catalog, fix);
        expect(after).not.toBeNull();
        const findings = checkJob(after!, catalog);
        expect(findings.map(findingKey)).not.toContain(findingKey(finding));
        for (const f of serious(findings)) expect(known.has(findingKey(f)), `${fix.message} brought ${f.message}`).toBe(true);
        const left = findings.filter((f) => f.severity === 'error').length;
        expect(left).toBeLessThanOrEqual(finding.severity === 'error' ? errors - 1 : errors);
      }
    }
  });

  it('walked fixes of every kind the generated panels raise', () => {
    // The property above would pass vacuously if no panel had a fix: it must have walked many.
    expect(walked).toBeGreaterThan(50);
  });
});

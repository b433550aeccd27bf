import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { parseJobDocument } from '../model/parse-job';
import { checkPanels } from '../testing/check-panels';
import { makeJob, makePanel } from '../testing/make-job';
import { checkJob, checkPanel } from './index';

/** A 560 × 720 side of 18 mm board, line-bored on both rows at 9 + 32k. */
function lineBored(id: string) {
  const bores = [37, 517].flatMap((x) =>
    Array.from({ length: 22 }, (_, k) => ({ id: `r${x}-${k}`, x, y: 9 + 32 * k, face: 'A' as const, diameter: 5, depth: 12 })),
  );
  return makePanel(id, { carcass: 'c', bores });
}

const carcassJob = () =>
  makeJob(
    [
      {
        ...lineBored('left'),
        placements: [
          { id: 'plate-low', fitting: 'plate-0', x: 37, y: 89, face: 'A' },
          { id: 'plate-high', fitting: 'plate-0', x: 37, y: 633, face: 'A' },
          { id: 'pin-front', fitting: 'shelf-pin-5', x: 37, y: 329, face: 'A' },
          { id: 'pin-back', fitting: 'shelf-pin-5', x: 517, y: 329, face: 'A' },
        ],
      },
      makePanel('bottom', { role: 'bottom', carcass: 'c', height: 564, placements: [{ id: 'cam', fitting: 'cam-15', x: 100, y: 24, face: 'A' }] }),
      makePanel('shelf', { role: 'shelf', carcass: 'c', width: 300, height: 564 }),
      makePanel('door', {
        role: 'door',
        carcass: 'c',
        width: 496,
        height: 716,
        hang: { on: ['left'], dy: 2 },
        placements: [
          // Cups 87 and 85 mm from the door's bottom and top (76 to 100: trade-reference §2, common practice),
          // each facing its plate: door y + dy = the plate's centre on the side.
          { id: 'hinge-low', fitting: 'hinge-full-overlay-45', x: 21.5, y: 87, face: 'A' },
          { id: 'hinge-high', fitting: 'hinge-full-overlay-45', x: 21.5, y: 631, face: 'A' },
        ],
      }),
    ],
    { carcasses: [{ id: 'c', name: 'Base unit', width: 600, height: 720, depth: 560, material: 'pb18' }] },
  );

describe('checkJob', () => {
  it('finds nothing wrong with a sound carcass: plates and pins in line-bored holes, a cam, a shelf, a hung door', () => {
    expect(checkJob(carcassJob(), builtinCatalog())).toEqual([]);
  });

  it('gives a panel the same findings alone as within the job', () => {
    const job = carcassJob();
    const broken = { ...job.panels[0], bores: [...job.panels[0].bores, { id: 'stray', x: 40, y: 329, face: 'A' as const, diameter: 5, depth: 12 }] };
    const withBroken = { ...job, panels: [broken, ...job.panels.slice(1)] };
    const alone = checkPanel(withBroken, broken, builtinCatalog());
    expect(alone.length).toBeGreaterThan(0);
    expect(checkJob(withBroken, builtinCatalog())).toEqual(alone);
  });
});

describe('findings do not depend on the order of bores', () => {
  const at = fc.integer({ min: 0, max: 60 }).map((v) => v * 4);
  const bore = fc.oneof(
    fc.record({ x: at, y: at, face: fc.constantFrom('A' as const, 'B' as const), diameter: fc.constantFrom(5, 8, 35), depth: fc.constantFrom(8, 12, 18) }),
    fc.record({ edge: fc.constantFrom('x0' as const, 'y0' as const, 'y1' as const), at, z: fc.constantFrom(4, 9), diameter: fc.constantFrom(5, 8), depth: fc.constantFrom(21, 50) }),
  );
  const placement = fc.record({
    fitting: fc.constantFrom('plate-0', 'shelf-pin-5', 'hinge-full-overlay-45', 'cam-15', 'dowel-8x30-edge', 'runner-300'),
    x: at,
    y: at,
    face: fc.constantFrom('A' as const, 'B' as const),
    rotation: fc.constantFrom(0 as const, 90 as const, 180 as const, 270 as const),
  });
  const drilling = fc
    .record({ bores: fc.array(bore, { maxLength: 25 }), placements: fc.array(placement, { maxLength: 6 }) })
    .map(({ bores, placements }) => ({
      bores: bores.map((b, i) => ({ ...b, id: `b${i}` })),
      placements: placements.map((p, i) => ({ ...p, id: `p${i}` })),
    }))
    .chain((d) =>
      fc.record({
        original: fc.constant(d),
        bores: fc.shuffledSubarray(d.bores, { minLength: d.bores.length, maxLength: d.bores.length }),
        placements: fc.shuffledSubarray(d.placements, { minLength: d.placements.length, maxLength: d.placements.length }),
      }),
    );

  test.prop([drilling], { numRuns: 150 })('shuffled bores and placements give the same findings', ({ original, bores, placements }) => {
    const panel = (d: { bores: object[]; placements: object[] }) => [makePanel('p', { width: 240, height: 240, ...(d as object) })];
    expect(checkPanels(panel({ bores, placements }))).toEqual(checkPanels(panel(original)));
  });
});

describe('bad input', () => {
  const document = (panel: object) => ({ format: 'borewright.job/1', name: 'Bad', materials: makeJob([]).materials, panels: [makePanel('p', panel as never)] });

  it.each([
    ['a NaN width', { width: Number.NaN }, 'panels[0].width: Invalid input: expected number, received NaN'],
    ['a 0 mm panel', { height: 0 }, 'panels[0].height: must be greater than 0'],
    ['a 100 m panel', { width: 100_000 }, 'panels[0].width: must be at most 6000 mm'],
    ['a negative bore', { bores: [{ id: 'b', x: 5, y: 5, face: 'A', diameter: -5, depth: 10 }] }, 'panels[0].bores[0].diameter: must be greater than 0'],
  ])('refuses %s with a line naming the element', (_, panel, line) => {
    const result = parseJobDocument(document(panel));
    expect(result.ok ? [] : result.errors).toContain(line);
  });
});

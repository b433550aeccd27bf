import { fc, test } from '@fast-check/vitest';
import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { makeJob, makePanel } from '../testing/make-job';
import { checkPanel } from './index';
import { checkMove, MOVE_REACH } from './move-check';

// checkMove is only a faster way to the findings of a panel in the middle of a drag: the reference it is
// held to is the full check of the moved panel (checkPanel without fixes), on every drilling tried.
const catalog = builtinCatalog();

function moveBy<T extends { id: string }>(items: T[], ids: ReadonlySet<string>, dx: number, dy: number, place: (item: T, dx: number, dy: number) => T): T[] {
  return items.map((item) => (ids.has(item.id) ? place(item, dx, dy) : item));
}

describe('checkMove', () => {
  const at = fc.integer({ min: 0, max: 120 }).map((v) => v * 4);
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
  const step = fc.integer({ min: -60, max: 60 }).map((v) => v * 4);
  const drag = fc.record({
    role: fc.constantFrom('side' as const, 'door' as const, 'shelf' as const),
    bores: fc.array(bore, { maxLength: 60 }),
    placements: fc.array(placement, { minLength: 1, maxLength: 6 }),
    movedPlacements: fc.array(fc.nat(5), { maxLength: 3 }),
    movedBores: fc.array(fc.nat(59), { maxLength: 3 }),
    dx: step,
    dy: step,
  });

  test.prop([drag], { numRuns: 300 })('gives the findings the full check gives the moved panel', (d) => {
    const bores = d.bores.map((b, i) => ({ ...b, id: `b${i}` }));
    const placements = d.placements.map((p, i) => ({ ...p, id: `p${i}` }));
    const moved = { placements: new Set(d.movedPlacements.map((i) => `p${i}`)), bores: new Set(d.movedBores.map((i) => `b${i}`)) };
    const job = makeJob([makePanel('p', { role: d.role, width: 480, height: 480, bores, placements })]);
    const before = job.panels[0];
    const after = {
      ...before,
      placements: moveBy(before.placements, moved.placements, d.dx, d.dy, (p, dx, dy) => ({ ...p, x: p.x + dx, y: p.y + dy })),
      bores: moveBy(before.bores, moved.bores, d.dx, d.dy, (b, dx, dy) => ('edge' in b ? { ...b, at: b.at + dx } : { ...b, x: b.x + dx, y: b.y + dy })),
    };
    const findings = checkPanel(job, before, catalog, { fixes: false });
    expect(checkMove(job, catalog, findings, after, moved)).toEqual(checkPanel(job, after, catalog, { fixes: false }));
  });

  it('checks a plate dragged onto a perforated panel against the holes it lands on, and only those', () => {
    // 25 × 200 holes, 24 mm across and 12 mm up (the editor bench's perforated panel).
    const bores = Array.from({ length: 5000 }, (_, n) => ({ id: `h${n}`, x: 37 + 24 * (n % 25), y: 9 + 12 * Math.floor(n / 25), face: 'A' as const, diameter: 5, depth: 13 }));
    const job = makeJob([makePanel('side', { width: 900, height: 2400, bores, placements: [{ id: 'plate', fitting: 'plate-0', x: 837, y: 521, face: 'A' }] })]);
    const before = job.panels[0];
    const after = { ...before, placements: [{ ...before.placements[0], x: 613, y: 521 }] };
    const moved = { placements: new Set(['plate']), bores: new Set<string>() };
    const findings = checkMove(job, catalog, checkPanel(job, before, catalog, { fixes: false }), after, moved);
    expect(findings.some((f) => f.placements.includes('plate'))).toBe(true);
    expect(findings).toEqual(checkPanel(job, after, catalog, { fixes: false }));
    // Every hole a finding about the plate names lies within reach of it.
    const near = new Set(bores.filter((b) => Math.abs(b.x - 613) < MOVE_REACH + 40 && Math.abs(b.y - 521) < MOVE_REACH + 40).map((b) => b.id));
    const named = findings.filter((f) => f.placements.includes('plate')).flatMap((f) => f.bores).filter((id) => id.startsWith('h'));
    expect(named.length).toBeGreaterThan(0);
    expect(named.every((id) => near.has(id))).toBe(true);
  });
});

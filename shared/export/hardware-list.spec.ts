import { describe, expect, it } from 'vitest';
import { exportContext, exportJob } from '../testing/export-job';
import { makePanel } from '../testing/make-job';
import { hardwareList } from './hardware-list';
import { jobDrilling } from './panel-drilling';

const pins = (k: number) => Array.from({ length: k }, (_, i) => ({ id: `pin-${i}`, fitting: 'shelf-pin-5', x: 37, y: 41 + 32 * i, face: 'A' as const, rotation: 0 as const }));

function listFor(extra: Parameters<typeof exportJob>[1]) {
  const ctx = exportContext(exportJob({}, extra));
  return hardwareList(ctx, jobDrilling(ctx.job, ctx.catalog, []));
}

describe('hardwareList', () => {
  it('buys four pins per adjustable shelf of the carcass, whatever the holes (trade-reference §8a, common practice)', () => {
    const list = listFor([makePanel('s1', { role: 'shelf', carcass: 'base' }), makePanel('s2', { role: 'shelf', carcass: 'base' }), makePanel('pins', { carcass: 'base', placements: pins(10) })]);
    const line = list.lines.find((l) => l.fitting === 'shelf-pin-5')!;
    expect(line.total).toBe(8);
    // The export job's side has one pin too: 11 holes drilled for 2 shelves.
    expect(line.note).toBe('11 holes drilled for pins; 8 pins for 2 shelves');
  });

  it('counts no pins for a shelf joined by connectors: a fixed shelf rests on none', () => {
    const fixed = makePanel('fixed', { role: 'shelf', carcass: 'base', placements: [{ id: 'cam', fitting: 'cam-15', x: 37, y: 24, face: 'A' }] });
    expect(listFor([fixed]).lines.find((l) => l.fitting === 'shelf-pin-5')!.total).toBe(0);
  });

  it('says so of shelves in no carcass, and counts no pins for them', () => {
    const list = listFor([makePanel('loose-shelf', { role: 'shelf' })]);
    const line = list.lines.find((l) => l.fitting === 'shelf-pin-5')!;
    expect(line.total).toBe(0);
    expect(line.note).toContain('1 shelf in no carcass: pins not counted, 4 each if they rest on pins');
    expect(list.notes).toEqual(['1 shelf in no carcass: their pins are not counted (4 each if they rest on pins).']);
  });
});

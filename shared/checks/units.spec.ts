import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { makeJob, makePanel } from '../testing/make-job';
import { checkJob, checkPanel, type Finding } from './index';

const offGrid = (findings: Finding[]) => findings.filter((f) => f.code === 'off-grid');

// The same off-grid plate as off-grid.spec.ts (an 18 mm board puts the holes at 9 + 32k; a plate centred at
// 105 has its holes at 89 and 121), its message read by someone who chose inches.
const job = makeJob([makePanel('side', { placements: [{ id: 'pl', fitting: 'plate-0', x: 37, y: 105, face: 'A' }] as never })]);

describe("findings in the reader's units", () => {
  it('speak millimetres unless told, as the command line and the API print them', () => {
    const [finding] = offGrid(checkJob(job, builtinCatalog()));
    expect(finding.message).toBe('Placement pl (Mounting plate, 0 mm) is off the 32 mm grid: bore pl/hole-1 (Ø5 × 13) sits at x 37, y 89, 16 mm from the nearest system hole.');
    expect(finding.advice).toContain('32 mm apart from x 37, y 9,');
  });

  it('print lengths and positions in inches for an inch reader, and the system pitch in mm with its inches', () => {
    const [finding] = offGrid(checkPanel(job, job.panels[0], builtinCatalog(), { unit: 'in-32' }));
    // The international inch is 25.4 mm (NIST SP 811, published). x 37 mm = 1.4567 in = 46.61/32 → 47/32 = 1 15/32;
    // y 89 mm = 3.5039 in = 112.13/32 → 3 1/2; 16 mm = 0.6299 in = 20.16/32 → 20/32 = 5/8.
    expect(finding.message).toBe('Placement pl (Mounting plate, 0 mm) is off the 32 mm grid: bore pl/hole-1 (Ø5 × 13) sits at x 1 15/32", y 3 1/2", 5/8" from the nearest system hole.');
    // The pitch is the system's own figure: 32 mm = 1.2598 in = 80.63/64 → 81/64 = 1 17/64. y 9 mm = 11.34/32 → 11/32.
    expect(finding.advice).toContain('32 mm (1 17/64") apart from x 1 15/32", y 11/32",');
    // The fix's y 121 mm = 4.7638 in = 152.44/32 → 152/32 = 4 3/4.
    expect(finding.fixes[0].message).toBe('Move placement pl (Mounting plate, 0 mm) to x 1 15/32", y 4 3/4" so its holes fall on system holes.');
  });

  it('find the same findings whatever the unit: only the words change', () => {
    const key = (f: { code: string; bores: string[]; fixes: { edits: unknown }[] }) => [f.code, f.bores, f.fixes.map((x) => x.edits)];
    expect(checkJob(job, builtinCatalog(), { unit: 'in-64' }).map(key)).toEqual(checkJob(job, builtinCatalog()).map(key));
  });
});

import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../../../shared/catalog/builtin-catalog';
import { checkPanel } from '../../../../../shared/checks';
import { makeJob, makePanel } from '../../../../../shared/testing/make-job';
import { applyFindingFix, fixStaysOnPanel } from './apply-finding-fix';

const catalog = builtinCatalog();
const pin = (id: string, y: number) => ({ id, fitting: 'shelf-pin-5', x: 37, y, face: 'A' as const });

describe('applyFindingFix', () => {
  it('applies the fix the checks offer for two pins in one hole, leaving the panel clear of it', () => {
    const job = makeJob([makePanel('left', { placements: [pin('a', 329), pin('b', 329)] })]);
    const [finding] = checkPanel(job, job.panels[0], catalog);
    expect(finding.code).toBe('hole-shared');
    const next = applyFindingFix(job.panels[0], { fix: finding.fixes[0], job, catalog });
    expect(next.placements.map((p) => p.y).sort()).toEqual([329, 361]);
    expect(checkPanel(job, next, catalog)).toEqual([]);
  });

  it('leaves the panel alone for a fix that edits another panel', () => {
    const job = makeJob([makePanel('left'), makePanel('right', { placements: [pin('a', 329)] })]);
    const fix = { message: 'elsewhere', edits: [{ kind: 'move-placement' as const, panel: 'right', placement: 'a', x: 37, y: 361 }] };
    expect(fixStaysOnPanel(fix, 'left')).toBe(false);
    expect(applyFindingFix(job.panels[0], { fix, job, catalog })).toBe(job.panels[0]);
  });
});

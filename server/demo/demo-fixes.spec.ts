import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { applyFix } from '../../shared/checks/apply-fix';
import { findingKey, type Finding } from '../../shared/checks/finding';
import { checkJob } from '../../shared/checks';
import type { JobDocument, Panel, Placement } from '../../shared/model/job-document';
import { parseJobDocument } from '../../shared/model/parse-job';
import { DEMO_JOBS } from './seed-demo';

const catalog = builtinCatalog();
const documents = DEMO_JOBS.map((input) => {
  const result = parseJobDocument(input);
  if (!result.ok) throw new Error(result.errors.join('; '));
  return result.value;
});
const purpose = (p: Placement) => catalog.get(p.fitting)?.purpose;

function withPanel(job: JobDocument, panel: Panel, placements: Placement[]): JobDocument {
  return { ...job, panels: job.panels.map((p) => (p.id === panel.id ? { ...panel, placements } : p)) };
}

function movePlacement(job: JobDocument, panel: Panel, id: string, to: Partial<Placement>): JobDocument {
  return withPanel(job, panel, panel.placements.map((p) => (p.id === id ? { ...p, ...to } : p)));
}

/** The mistakes a designer makes in the editor, each on one panel of a demo job. */
function mistakes(job: JobDocument): { what: string; job: JobDocument }[] {
  const out: { what: string; job: JobDocument }[] = [];
  for (const panel of job.panels) {
    const pins = panel.placements.filter((p) => purpose(p) === 'shelf-pin');
    const plates = panel.placements.filter((p) => purpose(p) === 'mounting-plate');
    const cups = panel.placements.filter((p) => purpose(p) === 'hinge-cup');
    if (pins.length >= 2) out.push({ what: `${panel.id}: two pins in one hole`, job: movePlacement(job, panel, pins[0].id, { x: pins[1].x, y: pins[1].y }) });
    if (pins.length >= 1 && plates.length >= 1)
      out.push({ what: `${panel.id}: a pin in a plate's screw hole`, job: movePlacement(job, panel, pins[0].id, { x: plates[0].x, y: plates[0].y + 16 }) });
    if (pins.length >= 1 && panel.role === 'side') out.push({ what: `${panel.id}: a pin one pitch up`, job: movePlacement(job, panel, pins[0].id, { y: pins[0].y + 32 }) });
    if (plates.length >= 1) out.push({ what: `${panel.id}: a plate 1 mm up`, job: movePlacement(job, panel, plates[0].id, { y: plates[0].y + 1 }) });
    if (cups.length >= 2) out.push({ what: `${panel.id}: a hinge 60 mm from the end`, job: movePlacement(job, panel, cups[0].id, { y: 60 }) });
  }
  return out;
}

const serious = (findings: Finding[]) => findings.filter((f) => f.severity !== 'note');

describe('the demo jobs and the checks', () => {
  it('raise none of the rules a planned carcass must meet: one hole per fitting, mirrored sides, plates on their rows, cups 76 to 100 mm from the ends', () => {
    for (const job of documents) {
      const codes = checkJob(job, catalog).map((f) => f.code);
      for (const code of ['hole-shared', 'sides-mismatched', 'off-grid', 'hinge-end-distance', 'hinge-unpaired'] as const) expect(codes, `${job.name}`).not.toContain(code);
    }
  });

  it('offer, after each typical mistake, only fixes that remove their finding and leave fewer errors and no new error or warning', () => {
    let walked = 0;
    const codes = new Set<string>();
    for (const job of documents) {
      for (const mistake of mistakes(job)) {
        const before = checkJob(mistake.job, catalog);
        const known = new Set(serious(before).map(findingKey));
        const errors = before.filter((f) => f.severity === 'error').length;
        for (const finding of before) {
          for (const fix of finding.fixes) {
            walked++;
            codes.add(finding.code);
            const after = applyFix(mistake.job, catalog, fix);
            expect(after, `${mistake.what}: ${fix.message}`).not.toBeNull();
            const findings = checkJob(after!, catalog);
            expect(findings.map(findingKey), `${mistake.what}: ${fix.message}`).not.toContain(findingKey(finding));
            for (const f of serious(findings)) expect(known.has(findingKey(f)), `${mistake.what}: ${fix.message} brought ${f.message}`).toBe(true);
            expect(findings.filter((f) => f.severity === 'error').length).toBeLessThanOrEqual(finding.severity === 'error' ? errors - 1 : errors);
          }
        }
      }
    }
    expect(walked).toBeGreaterThan(20);
    expect([...codes].sort()).toEqual(expect.arrayContaining(['hole-shared', 'off-grid', 'hinge-end-distance', 'sides-mismatched']));
  });
});

import { describe, expect, it } from 'vitest';
import { checkPanel } from '../../../shared/checks';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import type { Panel } from '../../../shared/model/job-document';
import { makeJob, makePanel } from '../../../shared/testing/make-job';
import { answer, LiveCheckRequests, receive, type LiveCheckState } from './live-check-request';

const catalog = builtinCatalog();
// Three mounting plates on one spot: dragged apart, the two left behind still share their holes.
const plates = ['a', 'b', 'c'].map((id) => ({ id, fitting: 'plate-0', x: 37, y: 121, face: 'A' as const }));
const job = makeJob([makePanel('left', { placements: plates, bores: [{ id: 'h1', x: 37, y: 57, face: 'A', diameter: 5, depth: 13 }] })]);

describe('live check requests', () => {
  it('send the job, the catalog and the bores once, and each answer equals the full check of the panel as asked', () => {
    const requests = new LiveCheckRequests();
    let state: LiveCheckState = {};
    const start = job.panels[0];
    // A drag of plate c up the rows in pitches, and back onto the other two.
    const positions = [121, 153, 185, 505, 89, 121];
    positions.forEach((y, i) => {
      const panel: Panel = { ...start, placements: start.placements.map((p) => (p.id === 'c' ? { ...p, y } : p)) };
      const request = requests.next(job, panel, catalog, 'mm');
      expect(request.seq).toBe(i + 1);
      expect(request.job !== undefined, 'the job only with the first request').toBe(i === 0);
      expect(request.bores !== undefined, 'the bores only with the first request').toBe(i === 0);
      state = receive(state, request);
      expect(answer(state, request).findings).toEqual(checkPanel(job, panel, catalog, { fixes: false }));
    });
  });

  it('reports the two plates left behind sharing a hole once the third is dragged away', () => {
    const requests = new LiveCheckRequests();
    const start = job.panels[0];
    const panel: Panel = { ...start, placements: start.placements.map((p) => (p.id === 'c' ? { ...p, y: 505 } : p)) };
    const request = requests.next(job, panel, catalog, 'mm');
    const { findings } = answer(receive({}, request), request);
    // Two mounting plates cannot use one screw hole (common practice): hole-shared names a and b only.
    const shared = findings.filter((f) => f.code === 'hole-shared');
    expect(shared.length).toBeGreaterThan(0);
    expect(shared.every((f) => f.placements.every((id) => id === 'a' || id === 'b'))).toBe(true);
  });

  it('sends the bores again once they change, and refuses a first request without them', () => {
    const requests = new LiveCheckRequests();
    const start = job.panels[0];
    requests.next(job, start, catalog, 'mm');
    const moved = requests.next(job, { ...start, bores: [] }, catalog, 'mm');
    expect(moved.bores).toEqual([]);
    expect(moved.job).toBeUndefined();
    expect(() => answer({}, moved)).toThrow(/first request/);
  });
});

import type { Row } from './role-matrix-row';

/**
 * The bench's routes (issue 7 parts 3 and 4). Marking a panel's status (PATCH /api/panels/:panelId/status)
 * keeps its row in role-matrix.spec.ts: admin, designer and bench, not a viewer. The label sheets are a
 * print of what every role may read (design.md §1: the bench prints templates, a viewer reads drawings),
 * so everyone signed in gets them; the fixture job's one panel makes one label.
 */
export const BENCH_ROUTES: Record<string, Row> = {
  'GET /api/jobs/:jobId/labels.pdf': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/labels.pdf?panels=${f.panel.dbId}`), expect: [401, 200, 200, 200, 200] },
};

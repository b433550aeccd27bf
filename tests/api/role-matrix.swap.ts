import type { Row } from './role-matrix-row';

/** The fixture's side has no plates: a swap of plate-0 for plate-2 is a swap the job can be asked about. */
const plates = 'from=plate-0&to=plate-2';

/**
 * The swap check's routes (issue 7 part 1): everyone who reads jobs reads its report and its retrofit pack
 * (the bench drills from it; an installer needs to know what a substitute fitting does); those who edit
 * jobs apply it (design.md §1). With nothing of plate-0 to swap, an editor gets past the permission and is
 * told so (409); nobody else gets that far. Applying a swap that changes panels is tested in
 * server/swap/swap.spec.ts.
 */
export const SWAP_ROUTES: Record<string, Row> = {
  'GET /api/jobs/:jobId/swap': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/swap?${plates}`), expect: [401, 200, 200, 200, 200] },
  'GET /api/jobs/:jobId/swap/retrofit.zip': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/swap/retrofit.zip?${plates}`), expect: [401, 200, 200, 200, 200] },
  'POST /api/jobs/:jobId/swap': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/swap`).send({ from: 'plate-0', to: 'plate-2' }),
    expect: [401, 409, 409, 403, 403],
  },
};

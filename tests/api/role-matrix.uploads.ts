import { minimalPng } from '../../server/testing/sample-files';
import type { Row } from './role-matrix-row';

const CUT_LIST = Buffer.from('panel name,width,height,thickness,material,quantity\r\nShelf,540,300,18,plywood-18,2\r\n');

/**
 * The uploads' routes (issue 7 part 6): those who change jobs preview and import cut lists and upload
 * and delete attachments; everyone who reads jobs lists and downloads them. By id, no such attachment:
 * whoever gets past the permission is told 404; a real download by a viewer and a real delete are tested
 * in server/attachments/attachments.spec.ts.
 */
export const UPLOADS_ROUTES: Record<string, Row> = {
  'POST /api/jobs/:jobId/cut-list/preview': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/cut-list/preview`).attach('file', CUT_LIST, 'cut-list.csv'),
    expect: [401, 200, 200, 403, 403],
  },
  'POST /api/jobs/:jobId/cut-list': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/cut-list`).attach('file', CUT_LIST, 'cut-list.csv'),
    expect: [401, 201, 201, 403, 403],
  },
  'GET /api/jobs/:jobId/attachments': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/attachments`), expect: [401, 200, 200, 200, 200] },
  'POST /api/jobs/:jobId/attachments': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/attachments`).attach('file', minimalPng(), 'site.png'),
    expect: [401, 201, 201, 403, 403],
  },
  'GET /api/attachments/:attachmentId': { request: (c) => c.get('/api/attachments/999999'), expect: [401, 404, 404, 404, 404] },
  'DELETE /api/attachments/:attachmentId': { request: (c) => c.delete('/api/attachments/999999'), expect: [401, 404, 404, 403, 403] },
};

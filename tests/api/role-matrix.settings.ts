import { DEFAULT_MACHINE_SETTINGS } from '../../shared/export/machine-settings';
import type { Row } from './role-matrix-row';

/**
 * The shop's machine settings: everyone signed in reads them (the packs and a panel's drilling programs
 * follow them); only the admin sets them. A panel's programs are read like its other drilling files; the
 * fixture's panel has no holes, so everyone signed in gets past the permission and is told it has none
 * (server/packs/packs.spec.ts downloads a drilled panel's programs).
 */
export const SETTINGS_ROUTES: Record<string, Row> = {
  'GET /api/settings/machine': { request: (c) => c.get('/api/settings/machine'), expect: [401, 200, 200, 200, 200] },
  'PUT /api/settings/machine': { request: (c) => c.put('/api/settings/machine').send(DEFAULT_MACHINE_SETTINGS), expect: [401, 200, 403, 403, 403] },
  'GET /api/panels/:panelId/drilling-programs.zip': { request: (c, f) => c.get(`/api/panels/${f.panel.dbId}/drilling-programs.zip`), expect: [401, 404, 404, 404, 404] },
};

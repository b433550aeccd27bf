import { shopHinge } from '../../shared/testing/shop-fitting';
import type { Row } from './role-matrix-row';

/** Each import carries a fitting id of its own, so an admin's import is never refused as a duplicate. */
let imported = 0;

/**
 * The catalog's routes (issue 7 part 2): everyone signed in reads it; the admin imports the shop's own
 * fittings and deletes them (design.md §1). Deleting one that exists, and one still in use, is tested in
 * server/catalog/catalog.spec.ts.
 */
export const CATALOG_ROUTES: Record<string, Row> = {
  'GET /api/catalog': { request: (c) => c.get('/api/catalog'), expect: [401, 200, 200, 200, 200] },
  'POST /api/catalog/fittings': {
    request: (c) => c.post('/api/catalog/fittings').send(shopHinge(`matrix-hinge-${++imported}`)),
    expect: [401, 201, 403, 403, 403],
  },
  // No such shop fitting: the admin gets past the permission and is told so; nobody else gets that far.
  'DELETE /api/catalog/fittings/:fittingId': { request: (c) => c.delete('/api/catalog/fittings/no-such-fitting'), expect: [401, 404, 403, 403, 403] },
};

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApiRouter } from '../../server/api-router';
import { DEMO_PASSWORD } from '../../server/demo/greyfield-people';
import { larchLaneKitchen } from '../../server/demo/larch-lane-kitchen';
import { createLogger } from '../../server/logger';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { signPackLink } from '../../server/packs/pack-links';
import { createTestApp, DEMO_SHOP_ID, TEST_SESSION_SECRET, testConfig, type TestApp } from '../../server/testing/test-app';
import { ACTORS, emailOf, type Actor, type Fixture, type Row } from './role-matrix-row';
import { CATALOG_ROUTES } from './role-matrix.catalog';
import { BENCH_ROUTES } from './role-matrix.bench';
import { SETTINGS_ROUTES } from './role-matrix.settings';
import { SWAP_ROUTES } from './role-matrix.swap';
import { TEAM_ROUTES } from './role-matrix.team';
import { UPLOADS_ROUTES } from './role-matrix.uploads';
import { PLANNED_CARCASS } from './planned-carcass';

/** A message in the outbox with the pack attached, sent before the rows run. */
let caughtMessageId = 0;
const packLink = (jobId: number) => signPackLink(TEST_SESSION_SECRET, { shopId: DEMO_SHOP_ID, jobId, paper: 'a4', expiresAt: Date.now() + 60_000 });

/**
 * Every API route and what each actor gets from it. A route registered on the API router without a
 * row here fails the first test: a new route cannot ship without its permissions decided.
 */
const ROUTES: Record<string, Row> = {
  'GET /api/health': { request: (c) => c.get('/api/health'), expect: [200, 200, 200, 200, 200] },
  'GET /api/auth/me': { request: (c) => c.get('/api/auth/me'), expect: [401, 200, 200, 200, 200] },
  'GET /api/auth/session': { request: (c) => c.get('/api/auth/session'), expect: [200, 200, 200, 200, 200] },
  'POST /api/auth/sign-in': {
    request: (c, _f, actor) => c.post('/api/auth/sign-in').send({ email: emailOf(actor), password: DEMO_PASSWORD }),
    expect: [200, 200, 200, 200, 200],
    ownClient: true,
  },
  'PATCH /api/auth/me/preferences': { request: (c) => c.patch('/api/auth/me/preferences').send({ units: 'mm' }), expect: [401, 200, 200, 200, 200] },
  'POST /api/auth/sign-out': { request: (c) => c.post('/api/auth/sign-out'), expect: [204, 204, 204, 204, 204], ownClient: true },
  'GET /api/jobs': { request: (c) => c.get('/api/jobs?archived=false'), expect: [401, 200, 200, 200, 200] },
  'POST /api/jobs': { request: (c) => c.post('/api/jobs').send({ name: 'Matrix job' }), expect: [401, 201, 201, 403, 403] },
  'POST /api/jobs/import': {
    request: (c) => c.post('/api/jobs/import').attach('file', Buffer.from(JSON.stringify(larchLaneKitchen)), 'kitchen.json'),
    expect: [401, 201, 201, 403, 403],
  },
  'GET /api/jobs/:jobId': { request: (c, f) => c.get(`/api/jobs/${f.jobId}`), expect: [401, 200, 200, 200, 200] },
  'PATCH /api/jobs/:jobId': { request: (c, f) => c.patch(`/api/jobs/${f.jobId}`).send({ archived: true, version: 1 }), expect: [401, 200, 200, 403, 403] },
  'GET /api/jobs/:jobId/document': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/document`), expect: [401, 200, 200, 200, 200] },
  'POST /api/jobs/:jobId/carcasses': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/carcasses`).send({ name: 'Box', width: 600, height: 722, depth: 560, material: 'mdf-19' }),
    expect: [401, 201, 201, 403, 403],
  },
  'POST /api/jobs/:jobId/plan': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/plan`).send(PLANNED_CARCASS),
    expect: [401, 201, 201, 403, 403],
  },
  'POST /api/jobs/:jobId/panels': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/panels`).send({ name: 'Shelf', role: 'shelf', width: 540, height: 562, thickness: 19, material: 'mdf-19' }),
    expect: [401, 201, 201, 403, 403],
  },
  'PATCH /api/panels/:panelId': {
    request: (c, f) => c.patch(`/api/panels/${f.panel.dbId}`).send({ version: f.panel.version, name: 'Renamed' }),
    expect: [401, 200, 200, 403, 403],
  },
  'DELETE /api/panels/:panelId': { request: (c, f) => c.delete(`/api/panels/${f.panel.dbId}?version=${f.panel.version}`), expect: [401, 204, 204, 403, 403] },
  'PUT /api/panels/:panelId/drilling': {
    request: (c, f) => c.put(`/api/panels/${f.panel.dbId}/drilling`).send({ version: f.panel.version, placements: [], bores: [] }),
    expect: [401, 200, 200, 403, 403],
  },
  'PATCH /api/panels/:panelId/status': {
    request: (c, f) => c.patch(`/api/panels/${f.panel.dbId}/status`).send({ version: f.panel.version, status: 'drilled' }),
    expect: [401, 200, 200, 200, 403],
  },
  'GET /api/activity': { request: (c, f) => c.get(`/api/activity?jobId=${f.jobId}`), expect: [401, 200, 200, 403, 403] },
  'GET /api/panels/:panelId/drilling-map.svg': { request: (c, f) => c.get(`/api/panels/${f.panel.dbId}/drilling-map.svg`), expect: [401, 200, 200, 200, 200] },
  'GET /api/panels/:panelId/drilling-map.dxf': { request: (c, f) => c.get(`/api/panels/${f.panel.dbId}/drilling-map.dxf`), expect: [401, 200, 200, 200, 200] },
  'GET /api/panels/:panelId/template.pdf': { request: (c, f) => c.get(`/api/panels/${f.panel.dbId}/template.pdf?paper=letter`), expect: [401, 200, 200, 200, 200] },
  'GET /api/jobs/:jobId/findings': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/findings`), expect: [401, 200, 200, 200, 200] },
  'GET /api/jobs/:jobId/pack.zip': { request: (c, f) => c.get(`/api/jobs/${f.jobId}/pack.zip`), expect: [401, 200, 200, 200, 200] },
  // No pack is being made under this ticket: a reader hears so, anyone else is refused first.
  'GET /api/pack-progress/:ticket': { request: (c) => c.get('/api/pack-progress/no-such-pack-0123456789'), expect: [401, 404, 404, 404, 404] },
  'POST /api/jobs/:jobId/pack/send': {
    request: (c, f) => c.post(`/api/jobs/${f.jobId}/pack/send`).send({ to: ['bench@greyfield.example'], paper: 'a4' }),
    expect: [401, 200, 200, 403, 403],
  },
  // The signed link is the permission: it works signed in or not, whatever the role.
  'GET /api/pack-links/:token': { request: (c, f) => c.get(`/api/pack-links/${packLink(f.jobId)}`), expect: [200, 200, 200, 200, 200] },
  'GET /api/outbox': { request: (c) => c.get('/api/outbox'), expect: [401, 200, 403, 403, 403] },
  'GET /api/outbox/:id/attachments/:index': { request: (c) => c.get(`/api/outbox/${caughtMessageId}/attachments/0`), expect: [401, 200, 403, 403, 403] },
  'GET /api/mail/recipients': { request: (c) => c.get('/api/mail/recipients'), expect: [401, 200, 200, 403, 403] },
  ...CATALOG_ROUTES,
  ...TEAM_ROUTES,
  ...UPLOADS_ROUTES,
  ...SWAP_ROUTES,
  ...BENCH_ROUTES,
  ...SETTINGS_ROUTES,
};

describe('role matrix', () => {
  let t: TestApp;
  let owner: ApiClient;
  const clients = new Map<Actor, ApiClient>();

  async function clientFor(actor: Actor): Promise<ApiClient> {
    if (actor !== 'signed out') return signedIn(t.app, emailOf(actor));
    const client = new ApiClient(t.app);
    await client.me();
    return client;
  }

  async function fixture(): Promise<Fixture> {
    const { body: job } = await owner.post('/api/jobs').send({ name: 'Fixture' }).expect(201);
    const { body: panel } = await owner
      .post(`/api/jobs/${job.id}/panels`)
      .send({ name: 'Side', role: 'side', width: 560, height: 722, thickness: 19, material: 'mdf-19' })
      .expect(201);
    return { jobId: job.id, panel };
  }

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signedIn(t.app, 'owner@greyfield.example');
    for (const actor of ACTORS) clients.set(actor, await clientFor(actor));
    await owner.post(`/api/jobs/${(await fixture()).jobId}/pack/send`).send({ to: ['bench@greyfield.example'], paper: 'a4' }).expect(200);
    caughtMessageId = (await owner.get('/api/outbox').expect(200)).body.messages[0].id;
  });
  afterAll(() => t.close());

  it('has a row for every route the API registers, and no other', () => {
    const router = createApiRouter({ db: t.database.db, config: testConfig(), sessionSecret: 'x'.repeat(32), logger: createLogger('silent'), mailer: t.mailer });
    const registered = router.stack.flatMap((layer) =>
      layer.route ? [...new Set(layer.route.stack.map((handler) => handler.method.toUpperCase()))].map((method) => `${method} /api${layer.route!.path}`) : [],
    );
    expect(registered.sort()).toEqual(Object.keys(ROUTES).sort());
  });

  for (const [route, row] of Object.entries(ROUTES)) {
    it(route, async () => {
      const got: Record<string, number> = {};
      for (const actor of ACTORS) {
        const client = row.ownClient ? await clientFor(actor) : clients.get(actor)!;
        got[actor] = (await row.request(client, await fixture(), actor)).status;
      }
      expect(got).toEqual(Object.fromEntries(ACTORS.map((actor, i) => [actor, row.expect[i]])));
    });
  }
});

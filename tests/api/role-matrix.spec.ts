import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApiRouter } from '../../server/api-router';
import { DEMO_PASSWORD } from '../../server/demo/greyfield-people';
import { larchLaneKitchen } from '../../server/demo/larch-lane-kitchen';
import { createLogger } from '../../server/logger';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { signPackLink } from '../../server/packs/pack-links';
import { firstBytes } from '../../server/testing/live-stream-reader';
import { createTestApp, DEMO_SHOP_ID, TEST_SESSION_SECRET, testConfig, type TestApp } from '../../server/testing/test-app';
import { ACTORS, emailOf, type Actor, type Fixture, type Row } from './role-matrix-row';
import { CATALOG_ROUTES } from './role-matrix.catalog';
import { BENCH_ROUTES } from './role-matrix.bench';
import { SETTINGS_ROUTES } from './role-matrix.settings';
import { SWAP_ROUTES } from './role-matrix.swap';
import { TEAM_ROUTES } from './role-matrix.team';
import { UPLOADS_ROUTES } from './role-matrix.uploads';
import { PLANNED_CARCASS } from './planned-carcass';
import JSZip from 'jszip';
import { binaryBody } from '../../server/testing/binary-body';
import { addSecondShop, type SecondShop } from '../../server/testing/second-shop';
import { OTHER_SHOP_REQUESTS, otherShopExpect } from './role-matrix.other-shop';

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
  'GET /api/jobs/:jobId/events': { request: (c, f) => firstBytes(c.get(`/api/jobs/${f.jobId}/events?panel=${f.panel.dbId}`)), expect: [401, 200, 200, 200, 200] },
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
  /** A second shop on the same server, with one of everything (server/testing/second-shop.ts). */
  let other: SecondShop;
  let otherBefore: unknown;

  /** Everything the second shop's admin can read of it, to show that nothing asked from the demo shop changed it. */
  async function otherShopState() {
    const read = async (url: string) => (await other.admin.get(url).expect(200)).body;
    return {
      document: await read(`/api/jobs/${other.jobId}/document`),
      jobs: await read('/api/jobs?archived=false'),
      archived: await read('/api/jobs?archived=true'),
      team: await read('/api/team'),
      catalog: await read('/api/catalog'),
      attachments: await read(`/api/jobs/${other.jobId}/attachments`),
      settings: await read('/api/settings/machine'),
      outbox: await read('/api/outbox'),
      activity: await read('/api/activity'),
    };
  }

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
    other = await addSecondShop(t);
    otherBefore = await otherShopState();
  });
  afterAll(() => t.close());

  it('has a row for every route the API registers, and no other', () => {
    const router = createApiRouter({ db: t.database.db, config: testConfig(), sessionSecret: 'x'.repeat(32), logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents });
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

  // Isolation from outside: the demo shop's people, with the second shop's ids. Never a 403 that a row of
  // the demo shop would not get too: that would tell them the id exists.
  describe('with ids of another shop', () => {
    for (const [route, row] of Object.entries(ROUTES)) {
      it(route, async () => {
        const got: Record<string, number> = {};
        for (const actor of ACTORS) {
          const client = row.ownClient ? await clientFor(actor) : clients.get(actor)!;
          const override = OTHER_SHOP_REQUESTS[route];
          got[actor] = (await (override ? override(client, other) : row.request(client, { jobId: other.jobId, panel: other.panel }, actor))).status;
        }
        const expected = otherShopExpect(route, row.expect);
        expect(got).toEqual(Object.fromEntries(ACTORS.map((actor, i) => [actor, expected[i]])));
      });
    }

    it('changed nothing of the other shop', async () => {
      expect(await otherShopState()).toEqual(otherBefore);
    });

    it("shows none of the other shop's things in the demo shop's lists, exports, packs, labels and mail", async () => {
      const text = async (url: string) => JSON.stringify((await owner.get(url).expect(200)).body);
      const lists = [
        await text('/api/jobs?archived=false'),
        await text('/api/jobs?archived=true'),
        await text('/api/catalog'),
        await text('/api/team'),
        await text('/api/activity'),
        await text('/api/outbox'),
        await text('/api/mail/recipients'),
        await text('/api/settings/machine'),
      ];
      for (const list of lists) for (const thing of ['second-shop', 'Second Shop', 'Second Admin']) expect(list).not.toContain(thing);
      const jobIds = (await owner.get('/api/jobs?archived=false').expect(200)).body.jobs.map((j: { id: number }) => j.id);
      expect(jobIds).not.toContain(other.jobId);
      // The demo shop's own pack and document name only its own job and fittings: every text file of the zip is read.
      const ownJob = jobIds[0];
      const pack = await owner.get(`/api/jobs/${ownJob}/pack.zip`).buffer(true).parse(binaryBody).expect(200);
      const zip = await JSZip.loadAsync(pack.body as Buffer);
      const texts = await Promise.all(Object.values(zip.files).filter((f) => !f.dir && /\.(csv|svg|dxf|json|txt|nc|html)$/.test(f.name)).map((f) => f.async('string')));
      expect(texts.length).toBeGreaterThan(0);
      for (const file of [...texts, await text(`/api/jobs/${ownJob}/document`)]) expect(file).not.toContain(other.fittingId);
    });
  });
});

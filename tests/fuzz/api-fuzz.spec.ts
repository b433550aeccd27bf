import fc from 'fast-check';
import type { Test } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as z from 'zod';
import { carcassCreateBody, jobCreateBody, jobUpdateBody, panelDrillingBody, panelFieldsBody, panelStatusBody, panelUpdateBody, preferencesBody, signInBody } from '../../shared/api/contract';
import { packSendBody } from '../../shared/api/pack-contract';
import { machineSettingsBody } from '../../shared/api/settings-contract';
import { swapApplyBody } from '../../shared/api/swap-contract';
import { acceptInvitationBody, invitationBody, memberUpdateBody, passwordResetBody, passwordResetRequestBody } from '../../shared/api/team-contract';
import { fitting } from '../../shared/catalog/fitting';
import { jobDocument } from '../../shared/model/job-document';
import { carcassPlanInput } from '../../shared/planner/carcass-plan-input';
import { createApiRouter } from '../../server/api-router';
import { inShop } from '../../server/db/shop-scope';
import { jobAsDocument, listJobs } from '../../server/jobs/jobs.service';
import { createLogger } from '../../server/logger';
import { ApiClient, signedIn } from '../../server/testing/api-client';
import { firstBytes } from '../../server/testing/live-stream-reader';
import { minimalPng } from '../../server/testing/sample-files';
import { createTestApp, DEMO_SHOP_ID, testConfig, type TestApp } from '../../server/testing/test-app';
import { arbitraryFor, hostile, pathParameter } from './schema-arbitrary';

/**
 * The API's own fuzz test: every write route with bodies made from its zod contract (most of the shape
 * right, parts hostile) and every route with a path parameter with ids that exist, ids that do not and
 * malformed ones. Whatever is sent, no answer is a 5xx, the server stays up, and a refused write
 * changes nothing (the fuzzed job's export and the list of jobs are compared before and after).
 *
 * `npm test` runs FUZZ_RUNS cases in all (300 unless set) with a fixed seed; `npm run test:fuzz` with
 * FUZZ_RUNS=10000 runs more on demand, and FUZZ_SEED picks another seed.
 */
const RUNS = Number(process.env.FUZZ_RUNS ?? 300);
const SEED = Number(process.env.FUZZ_SEED ?? 20_260_101);
/** Room for a slow machine: a case takes tens of milliseconds. */
const TIMEOUT_MS = 60_000 + RUNS * 1000;

type Body = { json: z.ZodType } | { file: fc.Arbitrary<{ bytes: Buffer; name: string }> } | { query: fc.Arbitrary<string> } | 'none';
interface WriteRoute {
  body: Body;
  /** Signed out: sign-in, sign-out and the mailed links, so the fuzzer's own session lives on. */
  anonymous?: boolean;
}

const fileName = fc.oneof(fc.constantFrom('job.json', 'cut.csv', 'photo.png', 'invoice.html', '.htaccess', 'a'.repeat(300)), fc.string({ maxLength: 30 }));
const file = (content: fc.Arbitrary<Buffer>) => ({ file: fc.record({ bytes: content, name: fileName }) });
const randomBytes = fc.uint8Array({ maxLength: 300 }).map((b) => Buffer.from(b));
const jsonBytes = (schema: z.ZodType) => arbitraryFor(schema).map((v) => Buffer.from(JSON.stringify(v) ?? 'null'));
const csvBytes = fc
  .array(fc.array(fc.oneof(fc.string({ maxLength: 12 }), fc.integer().map(String), hostile.map((v) => String(v).slice(0, 40))), { maxLength: 7 }), { maxLength: 6 })
  .map((rows) => Buffer.from(['name,width,height,thickness,material,qty', ...rows.map((r) => r.join(','))].join('\n')));

/** Every write route of the API and what it takes; a route registered without a row here fails the first test. */
const WRITE_ROUTES: Record<string, WriteRoute> = {
  'POST /api/auth/sign-in': { body: { json: signInBody }, anonymous: true },
  'POST /api/auth/sign-out': { body: 'none', anonymous: true },
  'PATCH /api/auth/me/preferences': { body: { json: preferencesBody } },
  'POST /api/auth/password-reset': { body: { json: passwordResetRequestBody }, anonymous: true },
  'POST /api/auth/password-reset/:token': { body: { json: passwordResetBody }, anonymous: true },
  'POST /api/invitations/:token/accept': { body: { json: acceptInvitationBody }, anonymous: true },
  'POST /api/jobs': { body: { json: jobCreateBody } },
  'POST /api/jobs/import': { body: file(fc.oneof(jsonBytes(jobDocument), randomBytes)) },
  'PATCH /api/jobs/:jobId': { body: { json: jobUpdateBody } },
  'POST /api/jobs/:jobId/carcasses': { body: { json: carcassCreateBody } },
  'POST /api/jobs/:jobId/plan': { body: { json: carcassPlanInput } },
  'POST /api/jobs/:jobId/panels': { body: { json: panelFieldsBody } },
  'PATCH /api/panels/:panelId': { body: { json: panelUpdateBody } },
  'DELETE /api/panels/:panelId': { body: { query: fc.oneof(fc.integer({ min: -1, max: 5 }).map((v) => `version=${v}`), fc.constantFrom('', 'version=x', 'version=1&version=2', 'version=99999999999')) } },
  'PUT /api/panels/:panelId/drilling': { body: { json: panelDrillingBody } },
  'PATCH /api/panels/:panelId/status': { body: { json: panelStatusBody } },
  'POST /api/jobs/:jobId/pack/send': { body: { json: packSendBody } },
  'POST /api/jobs/:jobId/swap': { body: { json: swapApplyBody } },
  'POST /api/jobs/:jobId/cut-list/preview': { body: file(fc.oneof(csvBytes, randomBytes)) },
  'POST /api/jobs/:jobId/cut-list': { body: file(fc.oneof(csvBytes, randomBytes)) },
  'POST /api/jobs/:jobId/attachments': { body: file(fc.oneof(randomBytes, fc.constant(minimalPng()))) },
  'DELETE /api/attachments/:attachmentId': { body: 'none' },
  'POST /api/catalog/fittings': { body: { json: fitting } },
  'DELETE /api/catalog/fittings/:fittingId': { body: 'none' },
  'POST /api/team/invitations': { body: { json: invitationBody } },
  'DELETE /api/team/invitations/:invitationId': { body: 'none' },
  'PATCH /api/team/members/:userId': { body: { json: memberUpdateBody } },
  'PUT /api/settings/machine': { body: { json: machineSettingsBody } },
};

describe('API fuzz', () => {
  let t: TestApp;
  let owner: ApiClient;
  let stranger: ApiClient;
  let ownerId: number;
  let jobId: number;
  const statuses = new Map<number, number>();
  const existing: Record<string, string[]> = {};
  let routes: { method: string; path: string }[] = [];

  /** The fuzzed job's export and the list of jobs, read by the services themselves as the demo shop: what a refused write must leave as it was. */
  function snapshot(): Promise<string> {
    const db = t.database.db;
    return inShop(DEMO_SHOP_ID, async () => {
      const doc = await jobAsDocument(db, jobId).catch((err: Error) => err.message);
      return JSON.stringify([doc, await listJobs(db, false), await listJobs(db, true)]);
    });
  }

  beforeAll(async () => {
    t = await createTestApp();
    owner = await signedIn(t.app, 'owner@greyfield.example');
    stranger = new ApiClient(t.app);
    await stranger.me();
    ownerId = (await owner.me()).body.user.id;
    // A small job of its own: a carcass planned, a panel added, an attachment kept, so ids exist to aim at.
    jobId = (await owner.post('/api/jobs').send({ name: 'Fuzz job' }).expect(201)).body.id;
    await owner
      .post(`/api/jobs/${jobId}/plan`)
      .send({ width: 600, height: 723, depth: 320, material: 'mdf-19', back: { type: 'none' }, construction: 'dowels', fronts: { type: 'doors', count: 1, overlay: 'full', reveal: 3 }, shelves: { type: 'none' }, mounting: { type: 'wall' } })
      .expect(201);
    const detail = (await owner.get(`/api/jobs/${jobId}`).expect(200)).body;
    const attachment = (await owner.post(`/api/jobs/${jobId}/attachments`).attach('file', minimalPng(), 'p.png').expect(201)).body;
    const invitation = await owner.post('/api/team/invitations').send({ email: 'fuzz@greyfield.example', role: 'viewer' }).expect(201);
    const team = (await owner.get('/api/team').expect(200)).body;
    const catalog = (await owner.get('/api/catalog').expect(200)).body.fittings;
    Object.assign(existing, {
      jobId: [String(jobId)],
      panelId: detail.panels.map((p: { dbId: number }) => String(p.dbId)),
      attachmentId: [String(attachment.id)],
      invitationId: [String(invitation.body.id ?? team.invitations[0]?.id ?? 1)],
      userId: team.members.map((m: { id: number }) => String(m.id)).filter((id: string) => id !== String(ownerId)),
      fittingId: [catalog[0].fitting.id, 'shop-fitting'],
      token: ['A'.repeat(43), 'not-a-token'],
      id: ['1'],
      index: ['0', '1'],
    });
    const router = createApiRouter({ db: t.database.db, config: testConfig(), sessionSecret: 'x'.repeat(32), logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents });
    routes = router.stack.flatMap((layer) =>
      layer.route ? [...new Set(layer.route.stack.map((h) => h.method.toUpperCase()))].map((method) => ({ method, path: `/api${layer.route!.path}` })) : [],
    );
  });

  afterAll(async () => {
    const figures = [...statuses.entries()].sort(([a], [b]) => a - b).map(([status, n]) => `${status}: ${n}`);
    console.log(`API fuzz, ${RUNS} runs, seed ${SEED}; answers by status: ${figures.join(', ')}`);
    await t.close();
  });

  it('knows every write route the API registers', () => {
    const writes = routes.filter((r) => r.method !== 'GET').map((r) => `${r.method} ${r.path}`);
    expect(writes.sort()).toEqual(Object.keys(WRITE_ROUTES).sort());
  });

  /** The route's path with each parameter filled in; the fuzzer's own account is never the member it changes. */
  const pathFor = (path: string) => {
    const names = [...path.matchAll(/:(\w+)/g)].map((m) => m[1]);
    return fc.tuple(...names.map((name) => pathParameter(existing[name] ?? ['1']))).map((values) =>
      names.reduce((out, name, i) => out.replace(`:${name}`, name === 'userId' && values[i] === String(ownerId) ? '0' : values[i]), path),
    );
  };

  function send(client: ApiClient, method: string, url: string, body: Body, value: unknown): Test {
    const request = method === 'POST' ? client.post(url) : method === 'PUT' ? client.put(url) : method === 'PATCH' ? client.patch(url) : method === 'DELETE' ? client.delete(url) : client.get(url);
    if (body === 'none' || method === 'GET') return request;
    if ('query' in body) return client.delete(`${url}?${value as string}`);
    if ('file' in body) {
      const { bytes, name } = value as { bytes: Buffer; name: string };
      return request.attach('file', bytes, name.replace(/[\r\n"]/g, '_') || 'upload');
    }
    return request.set('Content-Type', 'application/json').send(JSON.stringify(value) ?? 'null');
  }

  it('answers every fuzzed write with no 5xx, stays up, and leaves a refused write without effect', async () => {
    const entries = Object.entries(WRITE_ROUTES);
    const runsEach = Math.max(1, Math.ceil(RUNS / (entries.length + routes.filter((r) => r.method === 'GET' && r.path.includes(':')).length)));
    const failures: string[] = [];
    for (const [route, spec] of entries) {
      const [method, path] = route.split(' ');
      const bodyArb = spec.body === 'none' ? fc.constant(undefined) : 'json' in spec.body ? arbitraryFor(spec.body.json) : 'file' in spec.body ? spec.body.file : spec.body.query;
      await fc.assert(
        fc.asyncProperty(pathFor(path), bodyArb, async (url, value) => {
          const client = spec.anonymous ? stranger : owner;
          const before = await snapshot();
          const res = await send(client, method, url, spec.body, value);
          statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
          if (res.status >= 500) failures.push(`${method} ${url} ${JSON.stringify(value)?.slice(0, 300)} → ${res.status} ${res.text.slice(0, 200)}`);
          if (res.status >= 400 && !(res.headers['content-type'] ?? '').startsWith('application/json')) failures.push(`${method} ${url} → ${res.status} not JSON`);
          if (res.status >= 400 && res.status < 500) {
            const after = await snapshot();
            if (after !== before) failures.push(`${method} ${url} ${JSON.stringify(value)?.slice(0, 300)} → ${res.status} but changed the job`);
          }
        }),
        { numRuns: runsEach, seed: SEED, endOnFailure: true },
      );
    }
    await owner.get('/api/health').expect(200);
    expect(failures).toEqual([]);
  }, TIMEOUT_MS);

  it('answers every route with a path parameter, fuzzed, with no 5xx', async () => {
    const reads = routes.filter((r) => r.method === 'GET' && r.path.includes(':'));
    const runsEach = Math.max(1, Math.ceil(RUNS / (Object.keys(WRITE_ROUTES).length + reads.length)));
    const failures: string[] = [];
    for (const { path } of reads) {
      await fc.assert(
        fc.asyncProperty(pathFor(path), async (url) => {
          // A live stream never ends by itself: its headers and first bytes are its answer.
          const res = await (path === '/api/jobs/:jobId/events' ? firstBytes(owner.get(url)) : owner.get(url));
          statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
          if (res.status >= 500) failures.push(`GET ${url} → ${res.status} ${res.text.slice(0, 200)}`);
        }),
        { numRuns: runsEach, seed: SEED },
      );
    }
    await owner.get('/api/health').expect(200);
    expect(failures).toEqual([]);
  }, TIMEOUT_MS);
});

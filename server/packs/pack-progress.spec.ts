import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { packProgress, type PackProgressAnswer } from '../../shared/api/pack-contract';
import { createApp } from '../app';
import { createLogger } from '../logger';
import { ApiClient, signedIn } from '../testing/api-client';
import { binaryBody } from '../testing/binary-body';
import { inShop } from '../db/shop-scope';
import { createTestApp, DEMO_SHOP_ID, TEST_SESSION_SECRET, testConfig, type TestApp } from '../testing/test-app';
import { PackProgressBoard, PROGRESS_WRITE_MS } from './pack-progress';

describe('pack progress', () => {
  let t: TestApp;
  let viewer: ApiClient;
  /** The same member through a second server on the same database: progress is kept there, not in one process. */
  let elsewhere: ApiClient;
  beforeAll(async () => {
    t = await createTestApp();
    viewer = await signedIn(t.app, 'viewer@greyfield.example');
    const second = createApp({ db: t.database.db, config: testConfig(), sessionSecret: TEST_SESSION_SECRET, logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents });
    elsewhere = await signedIn(second, 'viewer@greyfield.example');
  });
  afterAll(() => t.close());

  it('tells which panel the pack has reached while it downloads, on any server, and forgets the ticket once it is done', async () => {
    const { body } = await viewer.get('/api/jobs').expect(200);
    const kitchen = body.jobs.find((j: { name: string }) => j.name === 'Larch Lane kitchen') as { id: number; panelCount: number };
    const ticket = 'kitchen-pack-0123456789';
    const heard: PackProgressAnswer[] = [];
    let done = false;
    const download = viewer
      .get(`/api/jobs/${kitchen.id}/pack.zip?progress=${ticket}`)
      .buffer(true)
      .parse(binaryBody)
      .then((res) => ((done = true), res));
    // The request thread answers while a worker makes the pack.
    while (!done) {
      const res = await elsewhere.get(`/api/pack-progress/${ticket}`);
      if (res.status === 200) heard.push(packProgress.parse(res.body));
      await new Promise((r) => setTimeout(r, 10));
    }
    expect((await download).status).toBe(200);
    expect(heard.length).toBeGreaterThan(0);
    for (const progress of heard) expect(progress.panels).toBe(kitchen.panelCount);
    const reached = heard.map((p) => p.panel);
    expect(reached).toEqual([...reached].sort((a, b) => a - b));
    expect(reached.some((panel) => panel > 0 && panel <= kitchen.panelCount)).toBe(true);
    expect((await elsewhere.get(`/api/pack-progress/${ticket}`).expect(404)).body.error.code).toBe('no-such-pack');
    // A whole pack on a busy machine: more time than a plain request's test is given.
  }, 120_000);

  it('refuses a ticket of the wrong form, and asks who is there first', async () => {
    const res = await viewer.get('/api/jobs/1/pack.zip?progress=short').expect(400);
    expect(res.body.error.fields).toHaveProperty('progress');
    await new ApiClient(t.app).get('/api/pack-progress/kitchen-pack-0123456789').expect(401);
  });

  it('writes a pack’s row at most every PROGRESS_WRITE_MS, the newest report, and drops a waiting report once the pack ends', async () => {
    const db = t.database.db;
    const board = new PackProgressBoard(db, (err) => {
      throw err;
    });
    const ticket = 'throttle-pack-0123456789';
    const writes = vi.spyOn(db, 'update');
    try {
      await inShop(DEMO_SHOP_ID, async () => {
        const report = await board.start(ticket, 300);
        // A worker on a large job reports a panel every few ms, far more often than the browser polls.
        const began = Date.now();
        for (let panel = 1; panel <= 30; panel++) {
          report({ panel, panels: 300 });
          await new Promise((r) => setTimeout(r, 10));
        }
        await vi.waitFor(async () => expect(await board.get(ticket)).toEqual({ panel: 30, panels: 300 }), { timeout: 4 * PROGRESS_WRITE_MS });
        // The first report at once, then one write a pause at most: a write for every panel would be 30.
        expect(writes.mock.calls.length).toBeGreaterThanOrEqual(2);
        expect(writes.mock.calls.length).toBeLessThanOrEqual(1 + Math.ceil((Date.now() - began) / PROGRESS_WRITE_MS));
        const written = writes.mock.calls.length;

        // The next report waits out the pause; the pack's end does not.
        report({ panel: 31, panels: 300 });
        const ending = Date.now();
        await board.finish(ticket);
        expect(Date.now() - ending).toBeLessThan(PROGRESS_WRITE_MS);
        expect(writes).toHaveBeenCalledTimes(written);
        expect(await board.get(ticket)).toBeUndefined();
      });
    } finally {
      writes.mockRestore();
    }
  });
});

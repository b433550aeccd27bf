import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { createLogger } from '../logger';
import { DEMO_PASSWORD } from '../demo/greyfield-people';
import { ApiClient } from '../testing/api-client';
import { createTestApp, TEST_SESSION_SECRET, testConfig, type TestApp } from '../testing/test-app';
import { delayAfter, type SignInThrottleLimits } from './sign-in-throttle';

const LIMITS: SignInThrottleLimits = {
  windowMs: 10 * 60_000,
  perAddress: { free: 6, refuseAfter: 9 },
  perPair: { free: 2, refuseAfter: 4 },
  baseDelayMs: 1000,
  maxDelayMs: 8000,
  usualAddressDays: 90,
};

describe('delayAfter', () => {
  it('lets the free attempts through at once, then doubles the wait up to its ceiling', () => {
    const key = { free: 2, refuseAfter: 10 };
    expect([0, 1, 2, 3, 4, 5, 6, 9].map((n) => delayAfter(n, LIMITS, key))).toEqual([0, 0, 1000, 2000, 4000, 8000, 8000, 8000]);
  });
});

describe('sign-in throttling', () => {
  let t: TestApp;
  // TRUST_PROXY lets each test speak from an address of its own through X-Forwarded-For.
  const config = { signInThrottle: LIMITS, trustProxy: 'true' };
  beforeAll(async () => {
    t = await createTestApp({ config });
  });
  afterAll(() => t.close());

  async function signIn(app: TestApp['app'], from: string, email: string, password = DEMO_PASSWORD) {
    const client = new ApiClient(app);
    await client.me();
    return client.post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email, password });
  }

  it('slows a stranger guessing one account, then refuses the pair until the window ends', async () => {
    const from = '203.0.113.7';
    expect((await signIn(t.app, from, 'owner@greyfield.example', 'guess-1')).status).toBe(401);
    expect((await signIn(t.app, from, 'owner@greyfield.example', 'guess-2')).status).toBe(401);
    const slowed = await signIn(t.app, from, 'owner@greyfield.example', 'guess-3');
    expect([slowed.status, slowed.body.error.code, slowed.headers['retry-after']]).toEqual([429, 'sign-in-wait', '1']);
    t.advance(1000);
    expect((await signIn(t.app, from, 'owner@greyfield.example', 'guess-3')).status).toBe(401);
    t.advance(2000);
    expect((await signIn(t.app, from, 'owner@greyfield.example', 'guess-4')).status).toBe(401);
    t.advance(60_000);
    // Four wrong: this pair is refused, the right password included, until its window ends.
    const refused = await signIn(t.app, from, 'owner@greyfield.example');
    expect([refused.status, refused.body.error.code]).toEqual([429, 'too-many-attempts']);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    // Another account from the same address is another pair.
    expect((await signIn(t.app, from, 'viewer@greyfield.example')).status).toBe(200);
    t.advance(LIMITS.windowMs);
    expect((await signIn(t.app, from, 'owner@greyfield.example')).status).toBe(200);
  });

  it('refuses an address that tries many accounts, whichever it tries next', async () => {
    const from = '198.51.100.20';
    for (let i = 0; i < 9; i++) {
      const res = await signIn(t.app, from, `nobody-${i}@greyfield.example`, 'guess');
      if (res.status === 429) {
        expect(res.body.error.code).toBe('sign-in-wait');
        t.advance(Number(res.headers['retry-after']) * 1000);
        i--;
      } else expect(res.status).toBe(401);
    }
    const refused = await signIn(t.app, from, 'bench@greyfield.example');
    expect([refused.status, refused.body.error.code]).toEqual([429, 'too-many-attempts']);
  });

  it('never refuses the right password at its owner’s usual address, however often others try the account', async () => {
    const office = '192.0.2.10';
    expect((await signIn(t.app, office, 'designer@greyfield.example')).status).toBe(200);
    // A stranger elsewhere guesses until refused: the owner in the office is not even slowed.
    for (let i = 0; i < 6; i++) {
      const res = await signIn(t.app, '203.0.113.99', 'designer@greyfield.example', 'guess');
      if (res.status === 429 && res.body.error.code === 'sign-in-wait') t.advance(Number(res.headers['retry-after']) * 1000);
    }
    expect((await signIn(t.app, '203.0.113.99', 'designer@greyfield.example')).status).toBe(429);
    expect((await signIn(t.app, office, 'designer@greyfield.example')).status).toBe(200);
    // Someone in the same office guesses far past every refusal limit: the owner is only slowed, by at most maxDelayMs.
    for (let i = 0; i < 20; i++) {
      const res = await signIn(t.app, office, 'designer@greyfield.example', 'guess');
      expect(res.body.error.code).not.toBe('too-many-attempts');
      if (res.status === 429) t.advance(Number(res.headers['retry-after']) * 1000);
    }
    const owner = await signIn(t.app, office, 'designer@greyfield.example');
    if (owner.status === 429) {
      expect(owner.body.error.code).toBe('sign-in-wait');
      expect(Number(owner.headers['retry-after']) * 1000).toBeLessThanOrEqual(LIMITS.maxDelayMs);
      t.advance(Number(owner.headers['retry-after']) * 1000);
    }
    expect((await signIn(t.app, office, 'designer@greyfield.example')).status).toBe(200);
  });

  it('counts attempts sent in parallel before checking any of them', async () => {
    const answers = await Promise.all(Array.from({ length: 12 }, () => signIn(t.app, '198.51.100.77', 'owner@greyfield.example', 'guess')));
    const statuses = answers.map((r) => r.status);
    expect(statuses.filter((s) => s === 401)).toHaveLength(LIMITS.perPair.free);
    expect(statuses.filter((s) => s === 429)).toHaveLength(12 - LIMITS.perPair.free);
  });

  it('keeps its counters in the database: a restarted server or a second one on it counts on', async () => {
    const from = '198.51.100.123';
    for (let i = 0; i < 2; i++) expect((await signIn(t.app, from, 'viewer@greyfield.example', 'guess')).status).toBe(401);
    const second = createApp({ db: t.database.db, config: testConfig(config), sessionSecret: TEST_SESSION_SECRET, logger: createLogger('silent'), mailer: t.mailer, jobEvents: t.database.jobEvents });
    const res = await signIn(second, from, 'viewer@greyfield.example', 'guess');
    expect([res.status, res.body.error.code]).toEqual([429, 'sign-in-wait']);
  });
});

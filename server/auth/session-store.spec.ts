import type { SessionData } from 'express-session';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../db/client';
import { sessions } from '../db/schema';
import { inShop } from '../db/shop-scope';
import { insertShop } from '../shops/shops.repository';
import { openTestDatabase } from '../testing/test-database';
import { accountReadWithSession, DrizzleSessionStore } from './session-store';
import { insertUsers } from './users.repository';
import type { Request } from 'express';

const call = <T>(fn: (cb: (err: unknown, value?: T) => void) => void) =>
  new Promise<T | undefined>((resolve, reject) => fn((err, value) => (err ? reject(err) : resolve(value))));

const session = (expires: Date, user = 7) => ({ cookie: { expires: expires.toISOString(), originalMaxAge: 1000 }, passport: { user } }) as unknown as SessionData;
const signedOut = (expires: Date) => ({ cookie: { expires: expires.toISOString(), originalMaxAge: 1000 }, csrfToken: 't' }) as unknown as SessionData;

describe('DrizzleSessionStore', () => {
  let database: DatabaseHandle;
  let store: DrizzleSessionStore;
  beforeAll(async () => {
    database = await openTestDatabase('empty');
    store = new DrizzleSessionStore(database.db);
  });
  afterAll(() => database.close());

  const later = () => new Date(Date.now() + 3_600_000);

  it('keeps, replaces, touches and destroys a session', async () => {
    await call((cb) => store.set('a', session(later()), cb));
    expect(await call<SessionData | null>((cb) => store.get('a', cb))).toMatchObject({ passport: { user: 7 } });
    await call((cb) => store.set('a', session(later(), 8), cb));
    expect(await call<SessionData | null>((cb) => store.get('a', cb))).toMatchObject({ passport: { user: 8 } });
    await call((cb) => store.destroy('a', cb));
    expect(await call((cb) => store.get('a', cb))).toBeNull();
  });

  it('moves the expiry of a session not signed in when touched, and leaves a signed-in one to its recorded requests', async () => {
    const expiry = async (sid: string) => (await database.db.select().from(sessions)).find((r) => r.sid === sid)!.expire.getTime();
    const extended = new Date(Date.now() + 7_200_000);
    await call((cb) => store.set('visitor', signedOut(later()), cb));
    await call((cb) => store.touch('visitor', signedOut(extended), cb));
    expect(await expiry('visitor')).toBe(extended.getTime());
    const written = later();
    await call((cb) => store.set('member', session(written), cb));
    await call((cb) => store.touch('member', session(extended), cb));
    expect(await expiry('member')).toBe(written.getTime());
    for (const sid of ['visitor', 'member']) await call((cb) => store.destroy(sid, cb));
  });

  it('reads the account with a signed-in session for that request alone, and keeps it out of the session', async () => {
    const shopId = await insertShop(database.db, 'Reader shop');
    const [member] = await inShop(shopId, () => insertUsers(database.db, [{ email: 'reader@example.test', name: 'Reader', role: 'viewer', passwordHash: 'x' }]));
    await call((cb) => store.set('signed-in', session(later(), member.id), cb));
    await call((cb) => store.set('visitor', signedOut(later()), cb));
    const made = async (sid: string) => {
      const req = {} as Request;
      const sess = await call<SessionData | null>((cb) => store.get(sid, cb));
      return { req, session: store.createSession(req, sess!) };
    };
    const signedIn = await made('signed-in');
    expect(accountReadWithSession(signedIn.req)).toMatchObject({ id: member.id, role: 'viewer', active: true, shopId });
    expect(JSON.parse(JSON.stringify(signedIn.session))).not.toHaveProperty('account');
    expect(Object.getOwnPropertySymbols(signedIn.session)).toEqual([]);
    expect(accountReadWithSession((await made('visitor')).req)).toBeUndefined();
    expect(accountReadWithSession({} as Request)).toBeUndefined();
    for (const sid of ['signed-in', 'visitor']) await call((cb) => store.destroy(sid, cb));
  });

  it('never returns an expired session, and prunes expired rows', async () => {
    await call((cb) => store.set('old', session(new Date(Date.now() - 1000)), cb));
    await call((cb) => store.set('new', session(later()), cb));
    expect(await call((cb) => store.get('old', cb))).toBeNull();
    await store.prune();
    expect((await database.db.select({ sid: sessions.sid }).from(sessions)).map((r) => r.sid)).toEqual(['new']);
  });
});

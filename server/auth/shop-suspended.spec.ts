import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { changeShopStatus } from '../cli/shop-command';
import { setShopStatus } from '../shops/shops.repository';
import { DEMO_PASSWORD } from '../demo/greyfield-people';
import { ApiClient, signedIn } from '../testing/api-client';
import { createTestApp, DEMO_SHOP_ID, type TestApp } from '../testing/test-app';

describe('a suspended shop', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it("refuses its members' sign-in with the reason only after the right password, ends its sessions, and lets them in again once resumed", async () => {
    const designer = await signedIn(t.app, 'designer@greyfield.example');
    await designer.get('/api/jobs').expect(200);
    const viewer = await signedIn(t.app, 'viewer@greyfield.example');
    const { ended } = await changeShopStatus(t.database.db, DEMO_SHOP_ID, 'suspended');
    expect(ended).toBe(2);
    await designer.get('/api/jobs').expect(401);
    await viewer.get('/api/jobs').expect(401);

    const wrong = await new ApiClient(t.app).signIn('designer@greyfield.example', 'not the password at all');
    expect(wrong.status).toBe(401);
    expect(wrong.body.error.code).toBe('bad-credentials');
    const right = await new ApiClient(t.app).signIn('designer@greyfield.example', DEMO_PASSWORD);
    expect(right.status).toBe(403);
    expect(right.body.error).toMatchObject({ code: 'shop-suspended', message: "This shop's account is suspended. Contact the Borewright operator." });

    await changeShopStatus(t.database.db, DEMO_SHOP_ID, 'active');
    expect((await new ApiClient(t.app).signIn('designer@greyfield.example', DEMO_PASSWORD)).status).toBe(200);
  });

  it('stops a session whose row was not deleted at its next request', async () => {
    const owner = await signedIn(t.app, 'owner@greyfield.example');
    await owner.get('/api/jobs').expect(200);
    // Only the status changes and the session's row stays (saved back by a request in flight): every
    // request reads the shop's status with its session, so it stops all the same.
    await setShopStatus(t.database.db, DEMO_SHOP_ID, 'suspended');
    await owner.get('/api/jobs').expect(401);
    await setShopStatus(t.database.db, DEMO_SHOP_ID, 'active');
  });
});

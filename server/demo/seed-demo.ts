import { parseJobDocument } from '../../shared/model/parse-job';
import type { JobDocumentInput } from '../../shared/model/job-document';
import { countUsers, insertUsers } from '../auth/users.repository';
import { hashPassword } from '../auth/passwords';
import type { Database } from '../db/client';
import { countJobs } from '../jobs/jobs.repository';
import { importJob } from '../jobs/jobs.service';
import { clinicStorageWall } from './clinic-storage-wall';
import { inShop } from '../db/shop-scope';
import { countShops, insertShop } from '../shops/shops.repository';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_SHOP_NAME, type DemoPerson } from './greyfield-people';
import { larchLaneKitchen } from './larch-lane-kitchen';
import { loftStudyBookcase } from './loft-study-bookcase';

export const DEMO_JOBS: readonly JobDocumentInput[] = [larchLaneKitchen, loftStudyBookcase, clinicStorageWall];

/**
 * Fills an empty database with the Greyfield Joinery demo shop: the shop, its four people and three jobs,
 * stored through the same import as an uploaded file, as that shop. A database with any shop, user or
 * job is left alone. Returns whether it seeded.
 */
export async function seedDemoShop(db: Database): Promise<boolean> {
  if ((await countShops(db)) > 0 || (await countUsers(db)) > 0 || (await countJobs(db)) > 0) return false;
  // One hash for all four: the password is published in the README, so a shared salt gives nothing away.
  await addDemoShop(db, DEMO_SHOP_NAME, DEMO_PEOPLE, await hashPassword(DEMO_PASSWORD));
  return true;
}

/**
 * Adds a shop of the demo's size beside any others: the demo's people under the addresses given (an
 * address is unique across shops), each signing in with `passwordHash`, and its three jobs imported by
 * its admin. The many-shops bench (tests/bench/api-postgres.bench.ts) seeds its shops with it.
 */
export async function addDemoShop(db: Database, name: string, people: readonly DemoPerson[], passwordHash: string): Promise<number> {
  const shopId = await insertShop(db, name);
  await inShop(shopId, () => seedPeopleAndJobs(db, people, passwordHash));
  return shopId;
}

async function seedPeopleAndJobs(db: Database, people: readonly DemoPerson[], passwordHash: string): Promise<void> {
  const members = await insertUsers(db, people.map((p) => ({ ...p, passwordHash, demo: true })));
  const owner = members.find((p) => p.role === 'admin') ?? members[0];
  for (const input of DEMO_JOBS) {
    const parsed = parseJobDocument(input);
    if (!parsed.ok) throw new Error(`demo job "${input.name}" is not a valid document:\n${parsed.errors.join('\n')}`);
    await importJob(db, { id: owner.id, email: owner.email, name: owner.name, role: owner.role, units: owner.units }, parsed.value);
  }
}

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseJobDocument } from '../../shared/model/parse-job';
import type { JobDocument } from '../../shared/model/job-document';
import { larchLaneKitchen } from '../demo/larch-lane-kitchen';
import { insertJobDraft, loadJobRows } from '../jobs/jobs.repository';
import { insertShop } from '../shops/shops.repository';
import { inShop } from './shop-scope';
import { openTestDatabase } from '../testing/test-database';
import type { DatabaseHandle } from './client';
import { fromJobDocument, toJobDocument } from './job-mapping';

function parsed(input: unknown): JobDocument {
  const result = parseJobDocument(input);
  if (!result.ok) throw new Error(result.errors.join('\n'));
  return result.value;
}

/** A document touching every optional part: edge and face bores, placements with params and mirror, hang, handle mass. */
const everything = parsed({
  ...larchLaneKitchen,
  panels: [
    ...(larchLaneKitchen.panels ?? []),
    {
      id: 'loose-1',
      name: 'Loose test panel <script>alert(1)</script>',
      role: 'loose',
      width: 400,
      height: 300,
      thickness: 18,
      material: 'particleboard-18',
      status: 'drilled',
      placements: [
        { id: 'p1', fitting: 'hinge-a', x: 21.5, y: 100, face: 'B', rotation: 90, mirrored: true, params: { boringDistance: 4 } },
        { id: 'p2', fitting: 'pin-5', x: 37, y: 41, face: 'A', rotation: 0 },
      ],
      bores: [
        { id: 'e1', edge: 'y0', at: 32, z: 9, diameter: 8, depth: 30 },
        { id: 'f1', x: 37, y: 9, face: 'B', diameter: 5, depth: 13 },
      ],
    },
  ],
});

describe('job mapping', () => {
  let database: DatabaseHandle;
  let shopId: number;
  beforeAll(async () => {
    database = await openTestDatabase('empty');
    shopId = await insertShop(database.db, 'Mapping shop');
  });
  afterAll(() => database.close());

  it('gives back the same document after a trip through the tables', async () => {
    const jobId = await inShop(shopId, () => database.db.transaction((tx) => insertJobDraft(tx, fromJobDocument(everything))));
    const rows = await inShop(shopId, () => loadJobRows(database.db, jobId));
    expect(rows).toBeDefined();
    expect(toJobDocument(rows!)).toEqual(everything);
  });

  it('keeps the document order whatever order the rows come in', async () => {
    const jobId = await inShop(shopId, () => database.db.transaction((tx) => insertJobDraft(tx, fromJobDocument(everything))));
    const rows = (await inShop(shopId, () => loadJobRows(database.db, jobId)))!;
    const shuffled = { ...rows, panels: [...rows.panels].reverse(), bores: [...rows.bores].reverse(), carcasses: [...rows.carcasses].reverse() };
    expect(toJobDocument(shuffled)).toEqual(everything);
  });
});

import { describe, expect, it } from 'vitest';
import { isBalancedHeight } from '../../shared/grid/balanced-height';
import { parseJobDocument } from '../../shared/model/parse-job';
import { isEdgeBore, type JobDocument } from '../../shared/model/job-document';
import { countUsers } from '../auth/users.repository';
import { countJobs } from '../jobs/jobs.repository';
import { openTestDatabase } from '../testing/test-database';
import { DEMO_JOBS, seedDemoShop } from './seed-demo';

const documents = DEMO_JOBS.map((input) => {
  const result = parseJobDocument(input);
  if (!result.ok) throw new Error(`${input.name}: ${result.errors.join('; ')}`);
  return result.value;
});
const sides = (doc: JobDocument) => doc.panels.filter((p) => p.role === 'side');

describe('the demo jobs', () => {
  it('are valid job documents', () => {
    expect(documents.map((d) => d.name)).toEqual(['Larch Lane kitchen', 'Loft study bookcase', 'Clinic storage wall']);
  });

  it('have balanced sides: H = 32·n + T (WOODWEB Knowledge Base, "Panel and Door Balancing with 32mm Systems")', () => {
    for (const doc of documents) for (const side of sides(doc)) expect(isBalancedHeight(side.height, side.thickness), `${doc.name}: ${side.name}`).toBe(true);
  });

  it('line-bore each side with Ø5 holes from half the board thickness, 32 mm apart, on the 37 mm row and a rear row', () => {
    for (const doc of documents) {
      for (const side of sides(doc)) {
        const faceBores = side.bores.filter((b) => !isEdgeBore(b)) as { x: number; y: number; diameter: number }[];
        expect(faceBores.length).toBe(side.bores.length);
        const rows = [...new Set(faceBores.map((b) => b.x))];
        expect(rows[0]).toBe(37);
        expect(rows).toHaveLength(2);
        expect((rows[1] - 37) % 32).toBe(0);
        const ys = faceBores.filter((b) => b.x === 37).map((b) => b.y);
        // First hole as far from the bottom as the last from the top (Wikipedia, "32 mm cabinetmaking system").
        expect(ys[0]).toBe(side.thickness / 2);
        expect(side.height - ys.at(-1)!).toBe(side.thickness / 2);
        expect(faceBores.every((b) => b.diameter === 5)).toBe(true);
      }
    }
  });

  it('include the 2131 mm tall side of the 32 mm literature, holes at 9.5 + 32k', () => {
    // WOODWEB Knowledge Base (2010): T = 19, n = 66 gives H = 2131, the last hole 9.5 mm below the top.
    const tall = sides(documents[2])[0];
    expect(tall).toMatchObject({ height: 2131, thickness: 19 });
    expect(tall.bores.filter((b) => !isEdgeBore(b) && b.x === 37)).toHaveLength(67);
  });

  it('hang every door and flap on panels of their own carcass', () => {
    for (const doc of documents) {
      for (const front of doc.panels.filter((p) => p.role === 'door' || p.role === 'flap')) {
        expect(front.hang, front.name).toBeDefined();
        for (const id of front.hang!.on) expect(doc.panels.find((p) => p.id === id)?.carcass).toBe(front.carcass);
      }
    }
  });
});

describe('seedDemoShop', () => {
  it('seeds an empty database once, and never one that has data', async () => {
    const database = await openTestDatabase('empty');
    expect(await seedDemoShop(database.db)).toBe(true);
    expect({ users: await countUsers(database.db), jobs: await countJobs(database.db) }).toEqual({ users: 4, jobs: 3 });
    expect(await seedDemoShop(database.db)).toBe(false);
    expect(await countJobs(database.db)).toBe(3);
    await database.close();
  });
});

import { describe, expect, it } from 'vitest';
import { isBalancedHeight } from '../../shared/grid/balanced-height';
import { parseJobDocument } from '../../shared/model/parse-job';
import type { JobDocument } from '../../shared/model/job-document';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import { checkJob } from '../../shared/checks';
import { panelBores } from '../../shared/layout/panel-layout';
import { countUsers } from '../auth/users.repository';
import { countJobs } from '../jobs/jobs.repository';
import { openTestDatabase } from '../testing/test-database';
import { DEMO_JOBS, seedDemoShop } from './seed-demo';

const documents = DEMO_JOBS.map((input) => {
  const result = parseJobDocument(input);
  if (!result.ok) throw new Error(`${input.name}: ${result.errors.join('; ')}`);
  return result.value;
});
const catalog = builtinCatalog();
const sides = (doc: JobDocument) => doc.panels.filter((p) => p.role === 'side');

describe('the demo jobs', () => {
  it('are valid job documents', () => {
    expect(documents.map((d) => d.name)).toEqual(['Larch Lane kitchen', 'Loft study bookcase', 'Clinic storage wall']);
    expect(documents.every((d) => d.carcasses.length > 0 && d.panels.length > 0)).toBe(true);
  });

  it('have balanced sides: H = 32·n + T (WOODWEB Knowledge Base, "Panel and Door Balancing with 32mm Systems")', () => {
    for (const doc of documents) for (const side of sides(doc)) expect(isBalancedHeight(side.height, side.thickness), `${doc.name}: ${side.name}`).toBe(true);
  });

  it('put every shelf pin and mounting plate bore of a side on its system rows: x = 37 + 32k, y = T/2 + 32j', () => {
    // 32 mm system (Wikipedia, "32 mm cabinetmaking system", published): Ø5 holes on a 32 mm pitch, the front row
    // 37 mm from the front edge; rows start at half the board thickness (WOODWEB Knowledge Base, published).
    for (const doc of documents) {
      for (const side of sides(doc)) {
        const onRows = panelBores(side, catalog, doc.system).filter(
          (b) => b.kind === 'face' && (b.purpose === 'shelf-pin' || b.purpose === 'mounting-plate'),
        ) as { x: number; y: number; diameter: number }[];
        for (const b of onRows) {
          expect((b.x - 37) % 32, `${side.name} x ${b.x}`).toBe(0);
          expect((b.y - side.thickness / 2) % 32, `${side.name} y ${b.y}`).toBe(0);
          expect(b.diameter).toBe(5);
        }
      }
    }
  });

  it("pass every check with no error: the demo shows a shop's clean work, with a sagging shelf or two as warnings", () => {
    for (const doc of documents) {
      const errors = checkJob(doc, catalog).filter((f) => f.severity === 'error');
      expect(errors, doc.name).toEqual([]);
    }
  });

  it('include the 2131 mm tall side of the 32 mm literature, shelf pins at 9.5 + 32k', () => {
    // WOODWEB Knowledge Base (2010): T = 19, n = 66 gives H = 2131, the last hole 9.5 mm below the top.
    const tall = sides(documents[2])[0];
    expect(tall).toMatchObject({ height: 2131, thickness: 19 });
    const pins = panelBores(tall, catalog, documents[2].system).filter((b) => b.purpose === 'shelf-pin') as { y: number }[];
    expect(pins.length).toBeGreaterThan(0);
    expect(pins.every((b) => (b.y - 9.5) % 32 === 0)).toBe(true);
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

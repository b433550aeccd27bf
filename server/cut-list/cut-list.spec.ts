import JSZip from 'jszip';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cutListImported, cutListPreview } from '../../shared/api/cut-list-contract';
import type { JobDetail } from '../../shared/api/contract';
import { CUT_LIST_MAX_BYTES } from '../../shared/cut-list/cut-list-rules';
import { activity, panels } from '../db/schema';
import { signedIn, type ApiClient } from '../testing/api-client';
import { binaryBody } from '../testing/binary-body';
import { createTestApp, type TestApp } from '../testing/test-app';

/** A cut list as a spreadsheet saves it, quoted by papaparse (RFC 4180) rather than by hand. */
function cutList(rows: (string | number)[][]): Buffer {
  return Buffer.from(Papa.unparse({ fields: ['Panel name', 'Width', 'Height', 'Thickness', 'Material', 'Qty'], data: rows }, { newline: '\r\n' }));
}

const GOOD = [
  ['Left side', 560, 720, 19, 'mdf-19', 1],
  ['Shelf', 540, 300, 18, 'plywood-18', 3],
];

describe('cut list import', () => {
  let t: TestApp;
  let designer: ApiClient;
  let jobId: number;

  const counts = async () => ({ panels: await t.database.db.$count(panels), activity: await t.database.db.$count(activity) });
  const job = async (): Promise<JobDetail> => (await designer.get(`/api/jobs/${jobId}`).expect(200)).body;

  beforeAll(async () => {
    t = await createTestApp();
    designer = await signedIn(t.app, 'designer@greyfield.example');
    jobId = (await designer.post('/api/jobs').send({ name: 'Utility room' }).expect(201)).body.id;
  });
  afterAll(() => t.close());

  it('previews every row with its errors and writes nothing', async () => {
    const before = await counts();
    const res = await designer
      .post(`/api/jobs/${jobId}/cut-list/preview`)
      .attach('file', cutList([...GOOD, ['Door', 400, 700, 18, 'mdf-19', 2]]), 'utility.csv')
      .expect(200);
    const preview = cutListPreview.parse(res.body);
    expect(preview).toMatchObject({ fileName: 'utility.csv', problems: [], panelCount: 4, rowsWithErrors: 1 });
    expect(preview.rows.map((r) => [r.row, r.role, r.errors])).toEqual([
      [2, 'side', []],
      [3, 'shelf', []],
      [4, 'door', ['thickness: MDF 19 comes in 19 mm only, not 18 mm']],
    ]);
    expect(await counts()).toEqual(before);
  });

  it('refuses the whole file when one row is bad, naming the row, and writes nothing', async () => {
    const before = await counts();
    const res = await designer
      .post(`/api/jobs/${jobId}/cut-list`)
      .attach('file', cutList([...GOOD, ['Plinth', 'long', 100, 18, 'walnut', 1]]), 'utility.csv')
      .expect(400);
    expect(res.body.error).toMatchObject({ code: 'invalid-cut-list', message: 'The cut list has errors in 1 of its 3 rows; nothing was imported.' });
    expect(res.body.error.details).toEqual([
      'row 4: width: "long" is not a number',
      expect.stringMatching(/^row 4: material: this job has no material "walnut"; its materials are mdf-19 \(MDF 19, 19 mm\), /),
    ]);
    expect(await counts()).toEqual(before);
  });

  it('creates every copy of every row in one go, with one activity entry', async () => {
    const before = await counts();
    const res = await designer.post(`/api/jobs/${jobId}/cut-list`).attach('file', cutList(GOOD), 'utility.csv').expect(201);
    expect(cutListImported.parse(res.body)).toEqual({ panelCount: 4 });
    expect(await counts()).toEqual({ panels: before.panels + 4, activity: before.activity + 1 });
    const stored = (await job()).panels.map(({ id, name, role, width, height, thickness, material, carcass, status }) => ({ id, name, role, width, height, thickness, material, carcass, status }));
    expect(stored).toEqual([
      { id: 'side-1', name: 'Left side', role: 'side', width: 560, height: 720, thickness: 19, material: 'mdf-19', carcass: undefined, status: 'planned' },
      // Ids come from the role and count the job's panels, as for a panel added by hand.
      ...[1, 2, 3].map((n) => ({ id: `shelf-${n + 1}`, name: `Shelf ${n}`, role: 'shelf', width: 540, height: 300, thickness: 18, material: 'plywood-18', carcass: undefined, status: 'planned' })),
    ]);
    const { body: log } = await designer.get(`/api/activity?jobId=${jobId}`).expect(200);
    expect(log.entries[0]).toMatchObject({ action: 'cut-list.imported', details: { file: 'utility.csv', rows: 2, panels: 4 } });
  });

  it('keeps a formula cell as the literal name, and the pack writes it back defused', async () => {
    const formula = '=HYPERLINK("http://x","y")';
    const { body: target } = await designer.post('/api/jobs').send({ name: 'Formula job' }).expect(201);
    await designer.post(`/api/jobs/${target.id}/cut-list`).attach('file', cutList([[formula, 300, 300, 18, 'plywood-18', 1]]), 'f.csv').expect(201);
    const [panel] = (await designer.get(`/api/jobs/${target.id}`).expect(200)).body.panels;
    expect(panel.name).toBe(formula);
    // The hole schedule lists bores, so give the panel one.
    const bore = { id: 'b1', x: 50, y: 50, face: 'A', diameter: 5, depth: 13 };
    await designer.put(`/api/panels/${panel.dbId}/drilling`).send({ version: panel.version, placements: [], bores: [bore] }).expect(200);

    const pack = await designer.get(`/api/jobs/${target.id}/pack.zip`).buffer(true).parse(binaryBody).expect(200);
    const [schedule] = (await JSZip.loadAsync(pack.body)).file(/hole schedule\.csv$/);
    // Read back by papaparse, as a spreadsheet would read it: the cell begins with a quote mark, so it is
    // text and never a live formula (OWASP, CSV injection).
    const [header, row] = Papa.parse<string[]>(await schedule.async('string'), { skipEmptyLines: true }).data;
    expect(row[header.indexOf('panel name')]).toBe(`'${formula}`);
  }, 60_000);

  it('refuses a file that is not UTF-8 text, one over the size limit, and one with no file', async () => {
    const latin1 = Buffer.concat([cutList([]), Buffer.from('Caf\xe9 shelf,540,300,18,plywood-18,1\r\n', 'latin1')]);
    const notUtf8 = await designer.post(`/api/jobs/${jobId}/cut-list/preview`).attach('file', latin1, 'latin1.csv').expect(400);
    expect(notUtf8.body.error.message).toBe('The file is not UTF-8 text. Save the cut list from the spreadsheet as "CSV UTF-8" and try again.');
    const big = await designer.post(`/api/jobs/${jobId}/cut-list/preview`).attach('file', Buffer.alloc(CUT_LIST_MAX_BYTES + 1, 32), 'big.csv').expect(413);
    expect(big.body.error).toMatchObject({ code: 'too-large', message: 'file: the file is larger than 1 MB, the most this upload takes.' });
    await designer.post(`/api/jobs/${jobId}/cut-list`).field('x', 'y').expect(400);
  });

  it('answers 404 for a job that does not exist', async () => {
    await designer.post('/api/jobs/999999/cut-list/preview').attach('file', cutList(GOOD), 'x.csv').expect(404);
    await designer.post('/api/jobs/999999/cut-list').attach('file', cutList(GOOD), 'x.csv').expect(404);
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachmentList, attachmentSummary } from '../../shared/api/attachment-contract';
import { attachments } from '../db/schema';
import { signedIn, type ApiClient } from '../testing/api-client';
import { attachmentName, binaryBody } from '../testing/binary-body';
import { minimalPng, smallJpeg, smallPdf } from '../testing/sample-files';
import { createTestApp, type TestApp } from '../testing/test-app';

const LIMIT = 64 * 1024;

describe('job attachments', () => {
  let t: TestApp;
  let designer: ApiClient;
  let viewer: ApiClient;
  let jobId: number;

  const upload = (bytes: Buffer, filename: string, contentType?: string) =>
    designer.post(`/api/jobs/${jobId}/attachments`).attach('file', bytes, contentType ? { filename, contentType } : filename);
  const download = (id: number) => viewer.get(`/api/attachments/${id}`).buffer(true).parse(binaryBody);

  beforeAll(async () => {
    t = await createTestApp({ config: { attachmentLimitBytes: LIMIT } });
    designer = await signedIn(t.app, 'designer@greyfield.example');
    viewer = await signedIn(t.app, 'viewer@greyfield.example');
    jobId = (await designer.post('/api/jobs').send({ name: 'Site photos' }).expect(201)).body.id;
  });
  afterAll(() => t.close());

  it('takes a real PNG, JPEG and PDF, typed by their content whatever their names say', async () => {
    const png = attachmentSummary.parse((await upload(minimalPng(), 'wall.png', 'image/png').expect(201)).body);
    expect(png).toMatchObject({ jobId, filename: 'wall.png', contentType: 'image/png', size: minimalPng().length, uploadedBy: 'Tomas Ward' });
    // Named and sent as something else: the content decides.
    const jpg = (await upload(smallJpeg(), 'survey.bin', 'application/octet-stream').expect(201)).body;
    expect(jpg.contentType).toBe('image/jpeg');
    const pdf = (await upload(await smallPdf(), 'drawing.pdf').expect(201)).body;
    expect(pdf.contentType).toBe('application/pdf');

    const list = attachmentList.parse((await viewer.get(`/api/jobs/${jobId}/attachments`).expect(200)).body);
    expect(list.maxBytes).toBe(LIMIT);
    expect(list.attachments.map((a) => [a.filename, a.contentType])).toEqual([
      ['wall.png', 'image/png'],
      ['survey.jpg', 'image/jpeg'],
      ['drawing.pdf', 'application/pdf'],
    ]);
    const { body: log } = await designer.get(`/api/activity?jobId=${jobId}`).expect(200);
    expect(log.entries[0]).toMatchObject({ action: 'attachment.uploaded', details: { file: 'drawing.pdf', type: 'application/pdf' } });
  });

  it('refuses a file that claims to be a PNG but is not, saying what it is not', async () => {
    const before = await t.database.db.$count(attachments);
    const text = await upload(Buffer.from('just some text, not a picture'), 'photo.png', 'image/png').expect(415);
    expect(text.body.error).toMatchObject({
      code: 'unsupported-file-type',
      message:
        'This file is named or sent as a PNG image, but it is not one: its content is not a kind of file Borewright recognises. Attachments may be PNG, JPEG or WebP images or PDF documents, told by their content.',
    });
    // A GIF's signature is "GIF89a" (GIF89a specification, §17 Header).
    const gif = await upload(Buffer.from('GIF89a\x01\x00\x01\x00\x00\x00\x00;', 'latin1'), 'photo.png').expect(415);
    expect(gif.body.error.message).toMatch(/^This file is named or sent as a PNG image, but it is not one: its content is GIF \(image\/gif\)\./);
    expect(await t.database.db.$count(attachments)).toBe(before);
  });

  it('refuses a file over the size limit with 413, naming the limit', async () => {
    const res = await upload(Buffer.concat([minimalPng(), Buffer.alloc(LIMIT)]), 'huge.png').expect(413);
    expect(res.body.error).toMatchObject({ code: 'too-large', message: 'file: the file is larger than 64 kB, the most this upload takes.' });
  });

  it('serves a download as an attachment, with its sniffed type, a safe encoded name and nosniff', async () => {
    const name = 'Küche "links" – Foto.png';
    const { body: sent } = await upload(minimalPng(), name, 'application/pdf').expect(201);
    const res = await download(sent.id).expect(200);
    expect(res.headers['content-type']).toBe('image/png');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    // RFC 6266: an ASCII fallback with the quote escaped, and the exact name as RFC 5987 UTF-8.
    expect(res.headers['content-disposition']).toBe(`attachment; filename="K?che \\"links\\" ? Foto.png"; filename*=UTF-8''K%C3%BCche%20%22links%22%20%E2%80%93%20Foto.png`);
    expect(attachmentName(res)).toBe(name);
    expect(Buffer.compare(res.body, minimalPng())).toBe(0);
  });

  it('keeps only the base name of an uploaded path', async () => {
    const { body } = await upload(minimalPng(), '../../etc/plan.png').expect(201);
    expect(body.filename).toBe('plan.png');
  });

  it('deletes an attachment with an activity entry; it is gone afterwards', async () => {
    const { body: sent } = await upload(await smallPdf(), 'old.pdf').expect(201);
    await designer.delete(`/api/attachments/${sent.id}`).expect(204);
    await download(sent.id).expect(404);
    await designer.delete(`/api/attachments/${sent.id}`).expect(404);
    const { body: log } = await designer.get(`/api/activity?jobId=${jobId}`).expect(200);
    expect(log.entries[0]).toMatchObject({ action: 'attachment.deleted', details: { file: 'old.pdf' } });
  });

  it('answers 404 for a job that does not exist', async () => {
    await viewer.get('/api/jobs/999999/attachments').expect(404);
    await designer.post('/api/jobs/999999/attachments').attach('file', minimalPng(), 'x.png').expect(404);
  });
});

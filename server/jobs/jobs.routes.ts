import type { Router } from 'express';
import { carcassCreateBody, jobCreateBody, jobListQuery, jobParams, jobUpdateBody } from '../../shared/api/contract';
import { requirePermission } from '../auth/require-permission';
import { invalidField } from '../http/app-error';
import { fileUpload, jsonBody, uploadedFileName } from '../http/body';
import type { RouteContext } from '../http/route-context';
import { documentFileName } from './document-file-name';
import { JobDetailReads } from './job-detail-reads';
import * as jobs from './jobs.service';

/** The jobs: list, create, import, read, change, download as a document, add carcasses. */
export function jobsRoutes(router: Router, { db }: RouteContext): void {
  const details = new JobDetailReads();
  router.get('/jobs', requirePermission('readJobs'), async (req, res) => {
    const { archived } = jobListQuery.parse(req.query);
    res.json({ jobs: await jobs.listJobs(db, archived) });
  });

  router.post('/jobs', requirePermission('editJobs'), jsonBody, async (req, res) => {
    res.status(201).json(await jobs.createJob(db, req.user!, jobCreateBody.parse(req.body)));
  });

  router.post('/jobs/import', requirePermission('editJobs'), fileUpload('file'), async (req, res) => {
    if (!req.file) throw invalidField('file', 'is required: send the job document as the multipart field "file"');
    const doc = jobs.readJobFile(req.file.buffer);
    res.status(201).json(await jobs.importJob(db, req.user!, doc, uploadedFileName(req.file)));
  });

  // After the permission check: a 304 tells that the job is unchanged, which only a reader may learn.
  router.get('/jobs/:jobId', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const etag = await details.etag(db, jobId);
    res.set('ETag', etag);
    if (req.fresh) res.status(304).end();
    else res.type('json').send(await details.body(db, jobId, etag));
  });

  router.patch('/jobs/:jobId', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.json(await jobs.updateJob(db, req.user!, jobId, jobUpdateBody.parse(req.body)));
  });

  router.get('/jobs/:jobId/document', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const doc = await jobs.jobAsDocument(db, jobId);
    res.attachment(documentFileName(doc.name)).type('application/json').send(`${JSON.stringify(doc, null, 2)}\n`);
  });

  router.post('/jobs/:jobId/carcasses', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.status(201).json(await jobs.addCarcass(db, req.user!, jobId, carcassCreateBody.parse(req.body)));
  });
}

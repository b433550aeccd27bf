import type { Router } from 'express';
import { attachmentParams } from '../../shared/api/attachment-contract';
import { jobParams } from '../../shared/api/contract';
import { requirePermission } from '../auth/require-permission';
import { invalidField } from '../http/app-error';
import { fileUpload, uploadedFileName } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as attachments from './attachments.service';

/** A job's photos and PDFs: upload (typed by content, size-limited), list, download, delete. */
export function attachmentsRoutes(router: Router, { db, config }: RouteContext): void {
  const upload = fileUpload('file', config.attachmentLimitBytes);

  router.get('/jobs/:jobId/attachments', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.json({ attachments: await attachments.listAttachments(db, jobId), maxBytes: config.attachmentLimitBytes });
  });

  router.post('/jobs/:jobId/attachments', requirePermission('editJobs'), upload, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    if (!req.file) throw invalidField('file', 'is required: send the photo or PDF as the multipart field "file"');
    const file = { bytes: req.file.buffer, fileName: uploadedFileName(req.file), declaredType: req.file.mimetype };
    res.status(201).json(await attachments.uploadAttachment(db, req.user!, jobId, file));
  });

  router.get('/attachments/:attachmentId', requirePermission('readJobs'), async (req, res) => {
    const { attachmentId } = attachmentParams.parse(req.params);
    const found = await attachments.attachmentForDownload(db, attachmentId);
    // Express's attachment() writes RFC 6266 with an RFC 5987 `filename*` for names beyond Latin-1; the
    // type is the one the content was found to be, and the sandbox keeps a PDF's script from running as our origin.
    res
      .attachment(found.filename)
      .type(found.contentType)
      .set({ 'X-Content-Type-Options': 'nosniff', 'Content-Security-Policy': "sandbox; default-src 'none'" })
      .send(found.content);
  });

  router.delete('/attachments/:attachmentId', requirePermission('editJobs'), async (req, res) => {
    const { attachmentId } = attachmentParams.parse(req.params);
    await attachments.deleteAttachment(db, req.user!, attachmentId);
    res.status(204).end();
  });
}

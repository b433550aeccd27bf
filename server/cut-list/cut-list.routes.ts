import type { Request, Router } from 'express';
import { jobParams } from '../../shared/api/contract';
import { CUT_LIST_MAX_BYTES } from '../../shared/cut-list/cut-list-rules';
import { requirePermission } from '../auth/require-permission';
import { invalidField } from '../http/app-error';
import { fileUpload, uploadedFileName } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as cutList from './cut-list.service';

const upload = fileUpload('file', CUT_LIST_MAX_BYTES);

function cutListFile(req: Request): cutList.CutListFile {
  if (!req.file) throw invalidField('file', 'is required: send the cut list (CSV) as the multipart field "file"');
  return { bytes: req.file.buffer, fileName: uploadedFileName(req.file) };
}

/** A cut list (CSV) becomes panels: first a preview that writes nothing, then the import, all rows or none. */
export function cutListRoutes(router: Router, { db }: RouteContext): void {
  router.post('/jobs/:jobId/cut-list/preview', requirePermission('editJobs'), upload, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.json(await cutList.previewCutList(db, jobId, cutListFile(req)));
  });

  router.post('/jobs/:jobId/cut-list', requirePermission('editJobs'), upload, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.status(201).json(await cutList.importCutList(db, req.user!, jobId, cutListFile(req)));
  });
}

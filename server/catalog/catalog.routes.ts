import type { RequestHandler, Router } from 'express';
import { fittingParams } from '../../shared/api/catalog-contract';
import { requirePermission } from '../auth/require-permission';
import { invalidField } from '../http/app-error';
import { fileUpload, jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as catalog from './catalog.service';

const upload = fileUpload('file');

/** An import comes as JSON (one fitting or a catalog file) or as an uploaded .json file in the field "file". */
const fittingsBody: RequestHandler = (req, res, next) => (req.is('multipart/form-data') ? upload(req, res, next) : jsonBody(req, res, next));

/** The catalog: every fitting for everyone; the admin imports the shop's own and deletes those no job uses. */
export function catalogRoutes(router: Router, { db }: RouteContext): void {
  router.get('/catalog', requirePermission('readJobs'), async (_req, res) => {
    res.json({ fittings: await catalog.listCatalog(db) });
  });

  router.post('/catalog/fittings', requirePermission('manageCatalog'), fittingsBody, async (req, res) => {
    let input: unknown = req.body;
    let fileName: string | undefined;
    if (req.is('multipart/form-data')) {
      if (!req.file) throw invalidField('file', 'is required: send the catalog file as the multipart field "file"');
      input = catalog.readFittingFile(req.file.buffer);
      // The name is the client's to choose: keep it printable before it goes into the activity log.
      fileName = req.file.originalname.replace(/[\u0000-\u001f\u007f]/g, '').slice(0, 200);
    }
    res.status(201).json({ fittings: await catalog.importFittings(db, req.user!, catalog.readFittingImport(input), fileName) });
  });

  router.delete('/catalog/fittings/:fittingId', requirePermission('manageCatalog'), async (req, res) => {
    const { fittingId } = fittingParams.parse(req.params);
    await catalog.deleteFitting(db, req.user!, fittingId);
    res.status(204).end();
  });
}

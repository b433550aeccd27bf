import type { Response, Router } from 'express';
import { pipeline } from 'node:stream/promises';
import { jobParams, panelParams } from '../../shared/api/contract';
import { drillingMapQuery, packQuery, packSendBody, paperQuery } from '../../shared/api/pack-contract';
import type { LengthUnit } from '../../shared/units/length-unit';
import { requirePermission } from '../auth/require-permission';
import { packZipStream } from '../export/pack-zip';
import { AppError } from '../http/app-error';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import { inShop } from '../db/shop-scope';
import { verifyPackLink } from './pack-links';
import { sendPack } from './pack-send.service';
import * as packs from './packs.service';
import { linkOrigin } from '../http/request-origin';

function sendFile(res: Response, file: packs.DownloadFile): void {
  res.attachment(file.name).type(file.type).send(typeof file.bytes === 'string' ? file.bytes : Buffer.from(file.bytes));
}

/**
 * Streams a job's pack as a zip, made by a pack worker, each file when the zip reaches it, so no length is
 * known up front. With a progress ticket, /api/pack-progress/:ticket tells how far it has got meanwhile.
 */
async function streamPack(res: Response, context: RouteContext, jobId: number, paper: 'a4' | 'letter', origin: string, unit: LengthUnit, ticket?: string): Promise<void> {
  const order = await packs.jobPackOrder(context.db, jobId, paper, context.clock(), origin, unit);
  const making = context.packPool.make(order, ticket ? await context.packProgress.start(ticket, order.job.panels.length) : undefined);
  try {
    const { root } = await making.planned;
    res.attachment(`${root}.zip`).type('application/zip');
    // Once the first bytes are out, a failure can only cut the download short; the error handler then
    // leaves the response to Express, which ends it, and the client sees a broken zip rather than a wrong one.
    await pipeline(making.zip, res);
  } finally {
    if (ticket) await context.packProgress.finish(ticket);
  }
}

/** The bench pack: a panel's drilling map, DXF, drilling programs and template sheets; the job's findings and whole pack; sending it. */
export function packsRoutes(router: Router, context: RouteContext): void {
  const { db, clock } = context;

  router.get('/panels/:panelId/drilling-map.svg', requirePermission('readJobs'), async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    const { face } = drillingMapQuery.parse(req.query);
    sendFile(res, await packs.drillingMapSvg(db, panelId, face, clock(), req.user!.units));
  });

  router.get('/panels/:panelId/drilling-map.dxf', requirePermission('readJobs'), async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    sendFile(res, await packs.drillingDxf(db, panelId, clock()));
  });

  router.get('/panels/:panelId/drilling-programs.zip', requirePermission('readJobs'), async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    const date = clock();
    const { pack, fileName } = await packs.drillingProgramsZip(db, panelId, date);
    res.attachment(fileName).type('application/zip');
    await pipeline(packZipStream(pack, date), res);
  });

  router.get('/panels/:panelId/template.pdf', requirePermission('readJobs'), async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    const { paper } = paperQuery.parse(req.query);
    sendFile(res, await packs.templateSheets(db, panelId, paper, clock(), req.user!.units));
  });

  router.get('/jobs/:jobId/findings', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.json(await packs.jobFindings(db, jobId, req.user!.units));
  });

  router.get('/jobs/:jobId/pack.zip', requirePermission('readJobs'), async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    const { paper, progress } = packQuery.parse(req.query);
    await streamPack(res, context, jobId, paper, linkOrigin(context.config, req), req.user!.units, progress);
  });

  router.get('/pack-progress/:ticket', requirePermission('readJobs'), async (req, res) => {
    const progress = await context.packProgress.get(String(req.params.ticket));
    if (!progress) throw new AppError(404, 'no-such-pack', 'No pack is being made under this ticket: it has finished, or never started.');
    res.json(progress);
  });

  router.post('/jobs/:jobId/pack/send', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.json(await sendPack(context, req.user!, jobId, packSendBody.parse(req.body), linkOrigin(context.config, req)));
  });

  // No sign-in: the signed token is the permission, for a recipient without an account.
  router.get('/pack-links/:token', async (req, res) => {
    const { shopId, jobId, paper } = verifyPackLink(context.sessionSecret, req.params.token, clock());
    // Whoever opens a mailed link has told us no units: the pack is in millimetres, as the job is.
    await inShop(shopId, () => streamPack(res, context, jobId, paper, linkOrigin(context.config), 'mm'));
  });
}

import type { Router } from 'express';
import { jobParams, panelDeleteQuery, panelDrillingBody, panelFieldsBody, panelParams, panelStatusBody, panelUpdateBody } from '../../shared/api/contract';
import { requirePermission } from '../auth/require-permission';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as panels from './panels.service';

/** The panels: add to a job, change, delete, save drilling, mark status. */
export function panelsRoutes(router: Router, { db }: RouteContext): void {
  router.post('/jobs/:jobId/panels', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { jobId } = jobParams.parse(req.params);
    res.status(201).json(await panels.addPanel(db, req.user!, jobId, panelFieldsBody.parse(req.body)));
  });

  router.patch('/panels/:panelId', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    res.json(await panels.updatePanel(db, req.user!, panelId, panelUpdateBody.parse(req.body)));
  });

  router.delete('/panels/:panelId', requirePermission('editJobs'), async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    const { version } = panelDeleteQuery.parse(req.query);
    await panels.deletePanel(db, req.user!, panelId, version);
    res.status(204).end();
  });

  router.put('/panels/:panelId/drilling', requirePermission('editJobs'), jsonBody, async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    res.json(await panels.saveDrilling(db, req.user!, panelId, panelDrillingBody.parse(req.body)));
  });

  router.patch('/panels/:panelId/status', requirePermission('markPanels'), jsonBody, async (req, res) => {
    const { panelId } = panelParams.parse(req.params);
    res.json(await panels.setPanelStatus(db, req.user!, panelId, panelStatusBody.parse(req.body)));
  });
}

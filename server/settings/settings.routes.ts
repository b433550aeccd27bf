import type { Router } from 'express';
import { machineSettingsBody } from '../../shared/api/settings-contract';
import { requirePermission } from '../auth/require-permission';
import { jsonBody } from '../http/body';
import type { RouteContext } from '../http/route-context';
import * as settings from './settings.service';

/** The shop's settings: its machine conventions, read by everyone signed in (the packs follow them), set by the admin. */
export function settingsRoutes(router: Router, { db, clock }: RouteContext): void {
  router.get('/settings/machine', requirePermission('readJobs'), async (_req, res) => {
    res.json(await settings.machineSettingsAnswer(db));
  });

  router.put('/settings/machine', requirePermission('manageShopSettings'), jsonBody, async (req, res) => {
    res.json(await settings.setMachineSettings(db, req.user!, machineSettingsBody.parse(req.body), clock()));
  });
}
